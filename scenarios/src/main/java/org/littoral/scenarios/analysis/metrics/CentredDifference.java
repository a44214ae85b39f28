package org.littoral.scenarios.analysis.metrics;

/**
 * First derivative of samples at uneven spacing by three-point finite differences, exact for
 * quadratics: the non-uniform centred formula inside and the one-sided three-point formulas at the
 * ends (weights from Fornberg 1988, Math. Comp. 51, 699-706, for a three-point stencil). With
 * h1 = x1 - x0, h2 = x2 - x1:
 * f'(x1) = [-h2 / (h1 (h1 + h2))] f0 + [(h2 - h1) / (h1 h2)] f1 + [h1 / (h2 (h1 + h2))] f2.
 * Missing samples (NaN) are skipped: the stencil uses the neighbouring valid samples.
 */
public final class CentredDifference {
    private CentredDifference() {
    }

    /** df/dx at each sample (NaN where f is NaN or fewer than two valid samples). Allocates the result. */
    public static double[] derivative(double[] x, double[] f) {
        int n = x.length;
        double[] out = new double[n];
        java.util.Arrays.fill(out, Double.NaN);
        int[] v = new int[n];
        int m = 0;
        for (int i = 0; i < n; i++) {
            if (!Double.isNaN(f[i]) && !Double.isNaN(x[i])) {
                v[m++] = i;
            }
        }
        if (m < 2) {
            return out;
        }
        if (m == 2) {
            double s = (f[v[1]] - f[v[0]]) / (x[v[1]] - x[v[0]]);
            out[v[0]] = s;
            out[v[1]] = s;
            return out;
        }
        for (int j = 0; j < m; j++) {
            int c = j == 0 ? 1 : j == m - 1 ? m - 2 : j; // centre of the stencil
            int i0 = v[c - 1];
            int i1 = v[c];
            int i2 = v[c + 1];
            double h1 = x[i1] - x[i0];
            double h2 = x[i2] - x[i1];
            double f0 = f[i0];
            double f1 = f[i1];
            double f2 = f[i2];
            double d;
            if (j == 0) {
                d = -(2 * h1 + h2) / (h1 * (h1 + h2)) * f0 + (h1 + h2) / (h1 * h2) * f1 - h1 / (h2 * (h1 + h2)) * f2;
            } else if (j == m - 1) {
                d = h2 / (h1 * (h1 + h2)) * f0 - (h1 + h2) / (h1 * h2) * f1 + (h1 + 2 * h2) / (h2 * (h1 + h2)) * f2;
            } else {
                d = -h2 / (h1 * (h1 + h2)) * f0 + (h2 - h1) / (h1 * h2) * f1 + h1 / (h2 * (h1 + h2)) * f2;
            }
            out[v[j]] = d;
        }
        return out;
    }
}
