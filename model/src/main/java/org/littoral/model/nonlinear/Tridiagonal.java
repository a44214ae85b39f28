package org.littoral.model.nonlinear;

/**
 * The tridiagonal (Thomas) solver of the implicit vertical schemes (e.g. Press et al. 2007, Numerical
 * Recipes, 3rd ed., section 2.4), in two layouts: all columns of the domain at once, interleaved
 * {@code a[k * nx + i]} so that each level is one loop over columns and the recurrences of different columns
 * run side by side ({@link #factoriseColumns}, {@link #solveColumns}); and one column alone
 * ({@link #solveColumn}). No pivoting: the backward-Euler diffusion matrices are diagonally dominant.
 */
final class Tridiagonal {
    private Tridiagonal() {
    }

    /**
     * Forward elimination of the matrices (-lo, 1 + lo + hi (+ extra0[i] at k = 0), -hi) of nx interleaved
     * columns of nz rows: multipliers into m and reciprocal pivots into b (one division per point; the solves
     * then only multiply).
     *
     * @param extra0 per-column addition to the first diagonal element times extraFactor, or null
     */
    static void factoriseColumns(double[] lo, double[] hi, double[] extra0, double extraFactor, double[] m, double[] b,
                                 int nx, int nz) {
        for (int i = 0; i < nx; i++) {
            double b0 = 1.0 + lo[i] + hi[i];
            if (extra0 != null) {
                b0 += extraFactor * extra0[i];
            }
            b[i] = 1.0 / b0;
        }
        for (int k = 1; k < nz; k++) {
            int o = k * nx;
            for (int i = 0; i < nx; i++) {
                double mk = -lo[o + i] * b[o - nx + i];
                m[o + i] = mk;
                b[o + i] = 1.0 / (1.0 + lo[o + i] + hi[o + i] + mk * hi[o - nx + i]);
            }
        }
    }

    /**
     * Solves the factorised systems of {@link #factoriseColumns} for the right-hand sides r (overwritten) into
     * s.
     */
    static void solveColumns(double[] r, double[] m, double[] b, double[] hi, double[] s, int nx, int nz) {
        for (int k = 1; k < nz; k++) {
            int o = k * nx;
            for (int i = 0; i < nx; i++) {
                r[o + i] -= m[o + i] * r[o - nx + i];
            }
        }
        int top = (nz - 1) * nx;
        for (int i = 0; i < nx; i++) {
            s[top + i] = r[top + i] * b[top + i];
        }
        for (int k = nz - 2; k >= 0; k--) {
            int o = k * nx;
            for (int i = 0; i < nx; i++) {
                s[o + i] = (r[o + i] + hi[o + i] * s[o + nx + i]) * b[o + i];
            }
        }
    }

    /**
     * Solves a[k] x[k-1] + b[k] x[k] + c[k] x[k+1] = r[k], k = 0..n-1, into x; b and r are overwritten.
     */
    static void solveColumn(double[] a, double[] b, double[] c, double[] r, double[] x, int n) {
        for (int k = 1; k < n; k++) {
            double m = a[k] / b[k - 1];
            b[k] -= m * c[k - 1];
            r[k] -= m * r[k - 1];
        }
        double xk = r[n - 1] / b[n - 1];
        x[n - 1] = xk;
        for (int k = n - 2; k >= 0; k--) {
            xk = (r[k] - c[k] * xk) / b[k];
            x[k] = xk;
        }
    }
}
