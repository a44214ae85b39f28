package org.littoral.validation.linear;

import org.apache.commons.math3.analysis.integration.gauss.GaussIntegrator;
import org.apache.commons.math3.analysis.integration.gauss.GaussIntegratorFactory;

/**
 * Closed-form linear theory for the surface cross-shore wind of the classic heating, evaluated on the
 * unbounded x axis (continuous Fourier integral), independently of the model's periodic FFT path.
 *
 * <p>Rotunno (1983), J. Atmos. Sci. 40, 1999-2009, hydrostatic, with Rayleigh friction = Newtonian
 * cooling alpha (Dalu &amp; Pielke 1989) and the Doppler shift d/dt -&gt; d/dt + U d/dx (Jiang 2012):
 * (D^2 + f^2) psi_zz + N^2 psi_xx = -Q_x. For Q = Re[Qc (pi/2 + arctan(x/x0)) exp(-z/H) exp(i omega t)]
 * and psi = Integral psiHat(k, z) exp(i k x) dk, the forcing transform is
 * (d/dx arctan(x/x0))^ = exp(-|k| x0)/2, and the solution bounded (radiating) aloft with psi(0) = 0 is
 * psiHat = C (exp(-z/H) - exp(-m z)) / (1/H^2 - m^2), C = -Qc exp(-|k| x0) / (2 den), so the surface wind
 *
 * <pre>
 *   u(x, 0) = Qc Integral exp(-|k| x0) exp(i k x) / (2 den(k) (1/H + m(k))) dk,
 *   den(k) = f^2 + (alpha + i (omega + k U))^2,  m(k) = |k| N / sqrt(den(k))  (principal root, Re m &gt;= 0).
 * </pre>
 *
 * The alpha -&gt; 0+ limit of the principal root is Rotunno's upward-radiating choice for omega &gt; f. At x = 0
 * with U = 0 the integral is elementary: u(0, 0) = Qc G(c) / (N sqrt(den)), G(c) = exp(c) E1(c),
 * c = x0 sqrt(den) / (N H) = x0 / L (L the complex horizontal scale of docs/references.md section 1).
 *
 * <p>The integrals are done by 20-point Gauss-Legendre on geometric panels in k (fine near k = 0 where
 * the integrand varies on the scale 1/L, capped in width where exp(i k x) oscillates or where the
 * Doppler-shifted frequency meets f), to 1e-9 relative or better for the arguments used here.
 */
final class ClassicSurfaceWind {
    private static final GaussIntegrator GAUSS = new GaussIntegratorFactory().legendre(20, -1.0, 1.0);

    private final double n;
    private final double h;
    private final double f;
    private final double omega;
    private final double alpha;
    private final double ambientU;
    private final double x0;

    ClassicSurfaceWind(double buoyancyFrequencyPerS, double heatingDepthM, double coriolisPerS, double omegaPerS,
                       double dampingPerS, double ambientUMPerS, double halfWidthM) {
        this.n = buoyancyFrequencyPerS;
        this.h = heatingDepthM;
        this.f = coriolisPerS;
        this.omega = omegaPerS;
        this.alpha = dampingPerS;
        this.ambientU = ambientUMPerS;
        this.x0 = halfWidthM;
    }

    /** Complex amplitude {re, im} of u(x, 0) per unit complex forcing Qc (m s^-3): u = Re[Qc a exp(i omega t)]. */
    double[] amplitude(double xM) {
        double[] plus = halfLine(xM, 1);
        double[] minus = halfLine(xM, -1);
        return new double[] {plus[0] + minus[0], plus[1] + minus[1]};
    }

    /** G(c) = exp(c) E1(c) = Integral_0^inf exp(-t)/(t + c) dt for Re c &gt;= 0, c != 0; {re, im}. */
    static double[] expE1(double cr, double ci) {
        double mag = Math.hypot(cr, ci);
        double sr = 0;
        double si = 0;
        double lo = 0;
        double hi = Math.min(mag, 1.0) * 0.05;
        while (lo < 60) {
            for (int p = 0; p < GAUSS.getNumberOfPoints(); p++) {
                double t = 0.5 * (lo + hi) + 0.5 * (hi - lo) * GAUSS.getPoint(p);
                double w = 0.5 * (hi - lo) * GAUSS.getWeight(p) * Math.exp(-t);
                double dr = t + cr;
                double dd = dr * dr + ci * ci;
                sr += w * dr / dd;
                si += -w * ci / dd;
            }
            lo = hi;
            hi = Math.min(60, Math.min(hi * 1.5, hi + 0.5));
        }
        return new double[] {sr, si};
    }

    /** Integral over k in (0, inf) (sign = 1) or (-inf, 0) (sign = -1) of the integrand above. */
    private double[] halfLine(double xM, int sign) {
        double kMax = 40.0 / x0;
        double scaleK = Math.min(1.0 / x0, Math.abs(Math.sqrt(Math.abs(f * f - omega * omega) + alpha * omega)) / n / h);
        double cap = Double.POSITIVE_INFINITY;
        if (xM != 0) {
            cap = Math.min(cap, 0.5 / Math.abs(xM));
        }
        if (ambientU != 0) {
            // the Doppler-shifted frequency omega + k U meets f on the scale alpha / |U|
            cap = Math.min(cap, 0.25 * Math.max(alpha, 1e-7) / Math.abs(ambientU));
        }
        double sr = 0;
        double si = 0;
        double lo = 0;
        double hi = 1e-3 * scaleK;
        double[] v = new double[2];
        while (lo < kMax) {
            for (int p = 0; p < GAUSS.getNumberOfPoints(); p++) {
                double kAbs = 0.5 * (lo + hi) + 0.5 * (hi - lo) * GAUSS.getPoint(p);
                double w = 0.5 * (hi - lo) * GAUSS.getWeight(p);
                integrand(sign * kAbs, xM, v);
                sr += w * v[0];
                si += w * v[1];
            }
            lo = hi;
            hi = Math.min(kMax, Math.min(hi * 1.25, hi + cap));
        }
        return new double[] {sr, si};
    }

    /** exp(-|k| x0) exp(i k x) / (2 den (1/H + m)). */
    private void integrand(double k, double xM, double[] out) {
        double wh = omega + k * ambientU;
        // den = f^2 + (alpha + i wh)^2
        double dR = f * f + alpha * alpha - wh * wh;
        double dI = 2 * alpha * wh;
        // principal square root of den
        double r = Math.hypot(dR, dI);
        double sqR = Math.sqrt(0.5 * (r + dR));
        double sqI = Math.copySign(Math.sqrt(0.5 * (r - dR)), dI);
        // m = |k| N / sqrt(den)
        double sq2 = sqR * sqR + sqI * sqI;
        double mR = Math.abs(k) * n * sqR / sq2;
        double mI = -Math.abs(k) * n * sqI / sq2;
        // d = 2 den (1/H + m)
        double aR = 1.0 / h + mR;
        double aI = mI;
        double pR = 2 * (dR * aR - dI * aI);
        double pI = 2 * (dR * aI + dI * aR);
        double e = Math.exp(-Math.abs(k) * x0);
        double cR = e * Math.cos(k * xM);
        double cI = e * Math.sin(k * xM);
        double pp = pR * pR + pI * pI;
        out[0] = (cR * pR + cI * pI) / pp;
        out[1] = (cI * pR - cR * pI) / pp;
    }
}
