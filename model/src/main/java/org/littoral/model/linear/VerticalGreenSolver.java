package org.littoral.model.linear;

/**
 * Exact solution of the vertical problem of the linear breeze model for one (wavenumber, frequency):
 * Psi'' - m^2 Psi = F(z), Psi(0) = 0, Psi bounded (or radiating) aloft, with Re(m) &gt;= 0 chosen by the
 * caller. The Green's function is G(z, z') = -(1/m) sinh(m z_&lt;) exp(-m z_&gt;), written in the
 * overflow-free form G = -(1/2m) [exp(-m|z - z'|) - exp(-m (z + z'))], so
 *
 * <pre>
 *   Psi(z)   = -(I1 + I2 - exp(-m z) I2(0)) / (2 m)
 *   Psi_z(z) =  (I1 - I2 - exp(-m z) I2(0)) / 2
 *   I1(z) = Integral_0^z exp(-m (z - s)) F(s) ds,   I2(z) = Integral_z^inf exp(-m (s - z)) F(s) ds
 * </pre>
 *
 * F is taken as piecewise linear between the nodes and zero above the last node, and the cell
 * integrals are done in closed form, so the result is exact for that F (no truncation error in z
 * beyond the representation of F). Both recursions multiply by |exp(-m dz)| &lt;= 1 and are stable
 * for any m with Re(m) &gt;= 0, including the purely oscillatory (radiating, inviscid) case.
 *
 * <p>Not thread-safe: one instance holds its scratch arrays. Allocates only in the constructor.
 */
final class VerticalGreenSolver {
    /** Below this |m dz| the cell weights use their Taylor series (cancellation in the closed form). */
    private static final double SERIES_LIMIT = 0.05;

    private final int nNodes;
    private final double[] dz;
    private final double[] i1r;
    private final double[] i1i;
    private final double[] i2r;
    private final double[] i2i;
    private final double[] er;
    private final double[] ei;
    private final double[] nearR;
    private final double[] nearI;
    private final double[] farR;
    private final double[] farI;
    private final double[] ezR;
    private final double[] ezI;

    /** @param nodesM node heights, the first exactly 0, strictly increasing */
    VerticalGreenSolver(double[] nodesM) {
        if (nodesM.length < 2 || nodesM[0] != 0.0) {
            throw new IllegalArgumentException("vertical solver nodes must start at z = 0 and have at least 2 points");
        }
        nNodes = nodesM.length;
        dz = new double[nNodes - 1];
        for (int j = 0; j + 1 < nNodes; j++) {
            dz[j] = nodesM[j + 1] - nodesM[j];
            if (!(dz[j] > 0)) {
                throw new IllegalArgumentException("vertical solver nodes must increase strictly at node " + (j + 1));
            }
        }
        i1r = new double[nNodes];
        i1i = new double[nNodes];
        i2r = new double[nNodes];
        i2i = new double[nNodes];
        ezR = new double[nNodes];
        ezI = new double[nNodes];
        er = new double[nNodes - 1];
        ei = new double[nNodes - 1];
        nearR = new double[nNodes - 1];
        nearI = new double[nNodes - 1];
        farR = new double[nNodes - 1];
        farI = new double[nNodes - 1];
    }

    int size() {
        return nNodes;
    }

    /**
     * Solves for one m = mr + i mi (Re m &gt;= 0, m != 0) and source F = fr + i fi at the nodes; writes
     * Psi and Psi_z at the nodes.
     */
    void solve(double mr, double mi, double[] fr, double[] fi, double[] psiR, double[] psiI,
               double[] psiZR, double[] psiZI) {
        // cell weights; reuse them while the cell width repeats to 1e-9 (uniform stretches cost one exp)
        double lastDz = -1;
        double cEr = 0, cEi = 0, cNr = 0, cNi = 0, cFr = 0, cFi = 0;
        for (int j = 0; j < nNodes - 1; j++) {
            double d = dz[j];
            if (Math.abs(d - lastDz) > 1e-9 * d) {
                double xr = mr * d;
                double xi = mi * d;
                double mag = Math.exp(-xr);
                cEr = mag * Math.cos(xi);
                cEi = -mag * Math.sin(xi);
                double p1r, p1i, p2r, p2i;
                if (xr * xr + xi * xi < SERIES_LIMIT * SERIES_LIMIT) {
                    // phi1 = (1 - e^-x)/x = 1 - x/2 + x^2/6 - x^3/24 + x^4/120
                    // phi2 = (1 - (1 + x) e^-x)/x^2 = 1/2 - x/3 + x^2/8 - x^3/30 + x^4/144
                    double x2r = xr * xr - xi * xi, x2i = 2 * xr * xi;
                    double x3r = x2r * xr - x2i * xi, x3i = x2r * xi + x2i * xr;
                    double x4r = x3r * xr - x3i * xi, x4i = x3r * xi + x3i * xr;
                    p1r = 1 - xr / 2 + x2r / 6 - x3r / 24 + x4r / 120;
                    p1i = -xi / 2 + x2i / 6 - x3i / 24 + x4i / 120;
                    p2r = 0.5 - xr / 3 + x2r / 8 - x3r / 30 + x4r / 144;
                    p2i = -xi / 3 + x2i / 8 - x3i / 30 + x4i / 144;
                } else {
                    // phi1 = (1 - E)/x
                    double nr = 1 - cEr, ni = -cEi;
                    double den = xr * xr + xi * xi;
                    p1r = (nr * xr + ni * xi) / den;
                    p1i = (ni * xr - nr * xi) / den;
                    // phi2 = (1 - E - E x)/x^2 = (phi1 - E)/x
                    double qr = p1r - cEr, qi = p1i - cEi;
                    p2r = (qr * xr + qi * xi) / den;
                    p2i = (qi * xr - qr * xi) / den;
                }
                cNr = d * (p1r - p2r);
                cNi = d * (p1i - p2i);
                cFr = d * p2r;
                cFi = d * p2i;
                lastDz = d;
            }
            er[j] = cEr;
            ei[j] = cEi;
            nearR[j] = cNr;
            nearI[j] = cNi;
            farR[j] = cFr;
            farI[j] = cFi;
        }
        // I1 upward: the node the cell integral ends at carries the "near" weight
        i1r[0] = 0;
        i1i[0] = 0;
        ezR[0] = 1;
        ezI[0] = 0;
        for (int j = 0; j < nNodes - 1; j++) {
            double ar = er[j] * i1r[j] - ei[j] * i1i[j];
            double ai = er[j] * i1i[j] + ei[j] * i1r[j];
            ar += nearR[j] * fr[j + 1] - nearI[j] * fi[j + 1] + farR[j] * fr[j] - farI[j] * fi[j];
            ai += nearR[j] * fi[j + 1] + nearI[j] * fr[j + 1] + farR[j] * fi[j] + farI[j] * fr[j];
            i1r[j + 1] = ar;
            i1i[j + 1] = ai;
            ezR[j + 1] = ezR[j] * er[j] - ezI[j] * ei[j];
            ezI[j + 1] = ezR[j] * ei[j] + ezI[j] * er[j];
        }
        // I2 downward; F = 0 above the top node
        i2r[nNodes - 1] = 0;
        i2i[nNodes - 1] = 0;
        for (int j = nNodes - 2; j >= 0; j--) {
            double ar = er[j] * i2r[j + 1] - ei[j] * i2i[j + 1];
            double ai = er[j] * i2i[j + 1] + ei[j] * i2r[j + 1];
            ar += nearR[j] * fr[j] - nearI[j] * fi[j] + farR[j] * fr[j + 1] - farI[j] * fi[j + 1];
            ai += nearR[j] * fi[j] + nearI[j] * fr[j] + farR[j] * fi[j + 1] + farI[j] * fr[j + 1];
            i2r[j] = ar;
            i2i[j] = ai;
        }
        double i20r = i2r[0], i20i = i2i[0];
        // -1/(2m)
        double mm = mr * mr + mi * mi;
        double hr = -0.5 * mr / mm;
        double hi = 0.5 * mi / mm;
        for (int j = 0; j < nNodes; j++) {
            double tr = ezR[j] * i20r - ezI[j] * i20i;
            double ti = ezR[j] * i20i + ezI[j] * i20r;
            double sr = i1r[j] + i2r[j] - tr;
            double si = i1i[j] + i2i[j] - ti;
            psiR[j] = hr * sr - hi * si;
            psiI[j] = hr * si + hi * sr;
            psiZR[j] = 0.5 * (i1r[j] - i2r[j] - tr);
            psiZI[j] = 0.5 * (i1i[j] - i2i[j] - ti);
        }
        psiR[0] = 0;
        psiI[0] = 0;
    }

    /**
     * Closed form for an exponential source F = exp(-a z) (a &gt; 0): Psi = (exp(-a z) - exp(-m z)) / (a^2 - m^2),
     * written stably as Psi = E / (a + m), Psi_z = -(a E + exp(-m z)) / (a + m), with
     * E = (exp(-a z) - exp(-m z)) / (a - m) = -z exp(-a z) phi1((m - a) z), phi1(x) = (1 - e^-x)/x.
     * Writes {Psi_r, Psi_i, PsiZ_r, PsiZ_i} into out.
     */
    static void exponentialSource(double a, double mr, double mi, double z, double[] out) {
        double ea = Math.exp(-a * z);
        double xr = (mr - a) * z;
        double xi = mi * z;
        double mag = Math.exp(-mr * z);
        double emr = mag * Math.cos(mi * z);
        double emi = -mag * Math.sin(mi * z);
        double p1r, p1i;
        if (xr * xr + xi * xi < SERIES_LIMIT * SERIES_LIMIT) {
            double x2r = xr * xr - xi * xi, x2i = 2 * xr * xi;
            double x3r = x2r * xr - x2i * xi, x3i = x2r * xi + x2i * xr;
            double x4r = x3r * xr - x3i * xi, x4i = x3r * xi + x3i * xr;
            p1r = 1 - xr / 2 + x2r / 6 - x3r / 24 + x4r / 120;
            p1i = -xi / 2 + x2i / 6 - x3i / 24 + x4i / 120;
        } else {
            // e^-x = exp(-(m - a) z) = exp(-m z) / exp(-a z); form it directly to avoid 0/0 when both underflow
            double mag2 = Math.exp(-xr);
            double exr = mag2 * Math.cos(xi);
            double exi = -mag2 * Math.sin(xi);
            double nr = 1 - exr, ni = -exi;
            double den = xr * xr + xi * xi;
            p1r = (nr * xr + ni * xi) / den;
            p1i = (ni * xr - nr * xi) / den;
        }
        double eR = -z * ea * p1r;
        double eI = -z * ea * p1i;
        double dr = a + mr, di = mi;
        double dd = dr * dr + di * di;
        // 1/(a + m)
        double invR = dr / dd, invI = -di / dd;
        out[0] = eR * invR - eI * invI;
        out[1] = eR * invI + eI * invR;
        double nr = a * eR + emr, ni = a * eI + emi;
        out[2] = -(nr * invR - ni * invI);
        out[3] = -(nr * invI + ni * invR);
    }
}
