package org.littoral.model.linear;

import org.littoral.model.mixedlayer.ZeroOrderJump;
import org.littoral.model.thermo.Thermo;

/**
 * The buoyancy forcing of the linear model, Q(x, z, t) = M(x) Re Sum_n q_n(z) exp(i omega_n t), with
 * M the smoothed land mask ({@link ShoreMask}), omega_n = n 2 pi / 86400 s and q_n in m s^-3
 * (buoyancy units: g / theta0 times the potential-temperature heating rate).
 *
 * <p>ClassicShape: Q0 pi M(x) exp(-z/H) sin(Omega (t - t_sunrise)), only n = 1; for a single coast
 * pi M(x) = pi/2 + arctan(x/x0) exactly as in Rotunno (1983).
 *
 * <p>SlabMixedLayer: the land-minus-water sensible heat flux dH(t) = dH_peak sin(pi (t - t_r)/(t_s - t_r))
 * between sunrise and sunset (zero at night) spread uniformly through the mixed layer,
 * heating rate dH / (rho c_p h(t)) for z &lt; h(t), with h(t) from the zero-order-jump model
 * (Tennekes 1973) driven by the same flux and reset to h0 at sunrise. Its Fourier coefficients,
 * q_n(z) = (c_n / T) Integral_{t*(z)}^{t_s} g(t) exp(-i omega_n t) dt with c_0 = 1, c_n = 2 and t*(z)
 * the time the layer top passes z (analytic for the half-sine flux), are evaluated by trapezoidal
 * cumulative integrals on a fine time grid and linear interpolation at t*(z).
 */
final class HeatingHarmonics {
    static final double DAY_S = 86400.0;
    static final double OMEGA_DAY = 2.0 * Math.PI / DAY_S;
    private static final int TIME_STEPS = 2048;

    private final int[] harmonic;
    private final boolean exponential;
    private final double decayPerM;
    private final double sourceTopM;
    private final double halfWidthM;
    // classic: q_1(z) = (cr + i ci) exp(-z/H)
    private final double classicR;
    private final double classicI;
    // slab: cumulative integrals C_n(tau_j) (g weight) and D_n (g h weight), from tau_j to sunset
    private final double[][] cumR;
    private final double[][] cumI;
    private final double[][] cumHR;
    private final double[][] cumHI;
    private final double dTau;
    private final double initialDepthM;
    private final double tauPerDepth2Factor;
    private final double dayLengthS;

    private HeatingHarmonics(int[] harmonic, boolean exponential, double decayPerM, double sourceTopM,
                             double halfWidthM, double classicR, double classicI, double[][] cumR, double[][] cumI,
                             double[][] cumHR, double[][] cumHI, double dTau, double initialDepthM,
                             double tauPerDepth2Factor, double dayLengthS) {
        this.harmonic = harmonic;
        this.exponential = exponential;
        this.decayPerM = decayPerM;
        this.sourceTopM = sourceTopM;
        this.halfWidthM = halfWidthM;
        this.classicR = classicR;
        this.classicI = classicI;
        this.cumR = cumR;
        this.cumI = cumI;
        this.cumHR = cumHR;
        this.cumHI = cumHI;
        this.dTau = dTau;
        this.initialDepthM = initialDepthM;
        this.tauPerDepth2Factor = tauPerDepth2Factor;
        this.dayLengthS = dayLengthS;
    }

    static HeatingHarmonics of(HeatingSpec spec, int maxHarmonic, double surfaceThetaK, double rhoCp) {
        double gOverTheta = Thermo.G / surfaceThetaK;
        if (spec instanceof HeatingSpec.ClassicShape c) {
            if (!(c.depthM() > 0)) {
                throw new IllegalArgumentException("heating depthM must be positive; got " + c.depthM() + " m");
            }
            if (!Double.isFinite(c.amplitudeKPerS())) {
                throw new IllegalArgumentException("heating amplitudeKPerS must be finite; got " + c.amplitudeKPerS());
            }
            if (maxHarmonic < 1) {
                throw new IllegalArgumentException("harmonics = " + maxHarmonic + ": the classic sinusoidal heating needs at least 1");
            }
            // sin(Omega t - phi) = Re[-i exp(-i phi) exp(i Omega t)], phi = Omega t_sunrise
            double phi = OMEGA_DAY * c.sunriseSolarHours() * 3600.0;
            double amp = gOverTheta * c.amplitudeKPerS() * Math.PI;
            return new HeatingHarmonics(new int[] {1}, true, 1.0 / c.depthM(), Double.POSITIVE_INFINITY,
                    c.halfWidthM(), -amp * Math.sin(phi), -amp * Math.cos(phi), null, null, null, null, 0, 0, 0, 0);
        }
        HeatingSpec.SlabMixedLayer s = (HeatingSpec.SlabMixedLayer) spec;
        double tr = s.sunriseSolarHours() * 3600.0;
        double ts = s.sunsetSolarHours() * 3600.0;
        if (!(s.sunriseSolarHours() >= 0 && s.sunsetSolarHours() > s.sunriseSolarHours() && s.sunsetSolarHours() <= 24)) {
            throw new IllegalArgumentException("slab heating needs 0 <= sunriseSolarHours < sunsetSolarHours <= 24; got "
                    + s.sunriseSolarHours() + " and " + s.sunsetSolarHours());
        }
        if (!(s.lapseGammaKPerM() > 0)) {
            throw new IllegalArgumentException("slab heating lapseGammaKPerM must be positive; got " + s.lapseGammaKPerM() + " K/m");
        }
        if (!(s.entrainmentRatio() >= 0 && s.entrainmentRatio() <= 1)) {
            throw new IllegalArgumentException("slab heating entrainmentRatio must be in 0..1; got " + s.entrainmentRatio());
        }
        if (!(s.initialDepthM() > 0)) {
            throw new IllegalArgumentException("slab heating initialDepthM must be positive; got " + s.initialDepthM() + " m");
        }
        if (!(s.peakFluxDifferenceWm2() >= 0)) {
            throw new IllegalArgumentException("slab heating peakFluxDifferenceWm2 must be >= 0; got " + s.peakFluxDifferenceWm2());
        }
        if (maxHarmonic < 0) {
            throw new IllegalArgumentException("harmonics must be >= 0; got " + maxHarmonic);
        }
        double td = ts - tr;
        double hp = s.peakFluxDifferenceWm2() / rhoCp; // kinematic peak flux, K m/s
        double a = s.entrainmentRatio();
        double gamma = s.lapseGammaKPerM();
        double h0 = s.initialDepthM();
        // Integral_0^tau of the half-sine flux = hp (td/pi)(1 - cos(pi tau/td))
        double hMax = ZeroOrderJump.depthM(h0, a, gamma, hp * 2.0 * td / Math.PI);
        int nh = maxHarmonic + 1;
        int[] harm = new int[nh];
        for (int n = 0; n < nh; n++) {
            harm[n] = n;
        }
        int nt = TIME_STEPS;
        double dTau = td / nt;
        double[] g = new double[nt + 1];
        double[] h = new double[nt + 1];
        for (int j = 0; j <= nt; j++) {
            double tau = j * dTau;
            double flux = hp * Math.sin(Math.PI * tau / td);
            h[j] = ZeroOrderJump.depthM(h0, a, gamma, hp * (td / Math.PI) * (1.0 - Math.cos(Math.PI * tau / td)));
            g[j] = gOverTheta * Math.max(0.0, flux) / h[j];
        }
        double[][] cr = new double[nh][nt + 1];
        double[][] ci = new double[nh][nt + 1];
        double[][] chr = new double[nh][nt + 1];
        double[][] chi = new double[nh][nt + 1];
        for (int n = 0; n < nh; n++) {
            double w = n * OMEGA_DAY;
            double scale = (n == 0 ? 1.0 : 2.0) / DAY_S;
            double prevR = g[nt] * Math.cos(w * ts) * scale;
            double prevI = -g[nt] * Math.sin(w * ts) * scale;
            for (int j = nt - 1; j >= 0; j--) {
                double t = tr + j * dTau;
                double curR = g[j] * Math.cos(w * t) * scale;
                double curI = -g[j] * Math.sin(w * t) * scale;
                cr[n][j] = cr[n][j + 1] + 0.5 * dTau * (curR + prevR);
                ci[n][j] = ci[n][j + 1] + 0.5 * dTau * (curI + prevI);
                chr[n][j] = chr[n][j + 1] + 0.5 * dTau * (curR * h[j] + prevR * h[j + 1]);
                chi[n][j] = chi[n][j + 1] + 0.5 * dTau * (curI * h[j] + prevI * h[j + 1]);
                prevR = curR;
                prevI = curI;
            }
        }
        // tau*(z): 1 - cos(pi tau/td) = (z^2 - h0^2) gamma / (2 (1 + 2A) hp td / pi)
        double factor = (hp > 0) ? gamma / (2.0 * (1.0 + 2.0 * a) * hp * td / Math.PI) : 0.0;
        return new HeatingHarmonics(harm, false, 0, hMax, s.transitionHalfWidthM(), 0, 0, cr, ci, chr, chi, dTau, h0,
                factor, td);
    }

    int count() {
        return harmonic.length;
    }

    int harmonic(int h) {
        return harmonic[h];
    }

    double omega(int h) {
        return harmonic[h] * OMEGA_DAY;
    }

    boolean exponential() {
        return exponential;
    }

    /** 1/H of the classic exp(-z/H) shape. */
    double decayPerM() {
        return decayPerM;
    }

    /** Height above which the slab forcing vanishes (the afternoon mixed-layer depth); infinite for the classic shape. */
    double sourceTopM() {
        return sourceTopM;
    }

    double halfWidthM() {
        return halfWidthM;
    }

    /** q_h(z) into out[0], out[1]. */
    void profile(int h, double z, double[] out) {
        if (exponential) {
            double e = Math.exp(-decayPerM * z);
            out[0] = classicR * e;
            out[1] = classicI * e;
            return;
        }
        if (z >= sourceTopM) {
            out[0] = 0;
            out[1] = 0;
            return;
        }
        interpolate(cumR[h], cumI[h], tauStar(z), out);
    }

    /** Integral_z^inf q_h dz' into out (for the horizontally uniform pressure). */
    void integralAbove(int h, double z, double[] out) {
        if (exponential) {
            double e = Math.exp(-decayPerM * z) / decayPerM;
            out[0] = classicR * e;
            out[1] = classicI * e;
            return;
        }
        if (z >= sourceTopM) {
            out[0] = 0;
            out[1] = 0;
            return;
        }
        double tau = tauStar(z);
        double[] c = new double[2];
        interpolate(cumR[h], cumI[h], tau, c);
        interpolate(cumHR[h], cumHI[h], tau, out);
        // Integral max(0, h(t) - z) g e^{-i w t} dt = D(tau*) - z C(tau*)
        out[0] -= z * c[0];
        out[1] -= z * c[1];
    }

    private double tauStar(double z) {
        if (z <= initialDepthM) {
            return 0.0;
        }
        double c = 1.0 - (z * z - initialDepthM * initialDepthM) * tauPerDepth2Factor;
        c = Math.max(-1.0, Math.min(1.0, c));
        return dayLengthS / Math.PI * Math.acos(c);
    }

    private void interpolate(double[] r, double[] i, double tau, double[] out) {
        double p = tau / dTau;
        int j = (int) Math.floor(p);
        if (j >= r.length - 1) {
            out[0] = r[r.length - 1];
            out[1] = i[i.length - 1];
            return;
        }
        double w = p - j;
        out[0] = (1 - w) * r[j] + w * r[j + 1];
        out[1] = (1 - w) * i[j] + w * i[j + 1];
    }
}
