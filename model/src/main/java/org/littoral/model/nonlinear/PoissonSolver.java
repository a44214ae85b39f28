package org.littoral.model.nonlinear;

/**
 * Solves the discrete pressure Poisson equation of the C-grid projection, div(grad chi) = D, with x
 * periodic and zero normal gradient at the ground and the lid (w = 0 there). The x direction is
 * diagonalised by the FFT (the discrete eigenvalues -(2 - 2 cos(2 pi m / nx)) / dx^2 of the
 * second difference, so the discrete divergence of the corrected flow is zero to round-off); each
 * wavenumber leaves a tridiagonal problem in z solved by the Thomas algorithm (e.g. Press et al.,
 * Numerical Recipes, sec. 2.4). Two real levels are packed into one complex transform.
 * The horizontal-mean mode is fixed by chi = 0 in the lowest layer.
 *
 * <p>Preallocates everything in the constructor; {@link #solve} does not allocate. Not thread-safe.
 */
final class PoissonSolver {
    private final StaggeredGrid g;
    private final int nx;
    private final int nz;
    private final int nh;
    private final ComplexFft fft;
    /** Thomas factors per wavenumber m: modified super-diagonal and reciprocal pivots, [m * nz + k]. */
    private final double[] cPrime;
    private final double[] invPivot;
    private final double[] sub;
    /** The same factors as [k * nh + m]. */
    private final double[] ipT;
    private final double[] cpT;
    private final double[] sRe;
    private final double[] sIm;
    private final double[] rowRe;
    private final double[] rowIm;

    PoissonSolver(StaggeredGrid g) {
        this.g = g;
        this.nx = g.nx;
        this.nz = g.nz;
        this.nh = nx / 2 + 1;
        this.fft = new ComplexFft(nx);
        this.cPrime = new double[nh * nz];
        this.invPivot = new double[nh * nz];
        this.sub = new double[nz];
        double[] sup = new double[nz];
        double[] diag = new double[nz];
        for (int k = 0; k < nz; k++) {
            sub[k] = k > 0 ? 1.0 / (g.dzf[k] * g.dzc[k]) : 0.0;
            sup[k] = k < nz - 1 ? 1.0 / (g.dzf[k] * g.dzc[k + 1]) : 0.0;
        }
        for (int m = 0; m < nh; m++) {
            double lambda = -(2.0 - 2.0 * Math.cos(2.0 * Math.PI * m / nx)) / (g.dx * g.dx);
            for (int k = 0; k < nz; k++) {
                diag[k] = -(sub[k] + sup[k]) + lambda;
            }
            double[] a = sub;
            double[] c = sup.clone();
            if (m == 0) {
                // pin the mean: chi_0 = 0 (the problem is singular for m = 0 with Neumann ends)
                diag[0] = 1.0;
                c[0] = 0.0;
            }
            double piv = diag[0];
            invPivot[m * nz] = 1.0 / piv;
            cPrime[m * nz] = c[0] / piv;
            for (int k = 1; k < nz; k++) {
                piv = diag[k] - a[k] * cPrime[m * nz + k - 1];
                invPivot[m * nz + k] = 1.0 / piv;
                cPrime[m * nz + k] = c[k] / piv;
            }
        }
        this.ipT = new double[nz * nh];
        this.cpT = new double[nz * nh];
        for (int m = 0; m < nh; m++) {
            for (int k = 0; k < nz; k++) {
                ipT[k * nh + m] = invPivot[m * nz + k];
                cpT[k * nh + m] = cPrime[m * nz + k];
            }
        }
        this.sRe = new double[nz * nh];
        this.sIm = new double[nz * nh];
        this.rowRe = new double[nx];
        this.rowIm = new double[nx];
    }

    /**
     * Solves div(grad chi) = rhs. {@code rhs} and {@code chi} are nz * nx arrays (may be the same array).
     * For a solvable problem the area-weighted mean of rhs must vanish (true for the divergence of any
     * flow with w = 0 at the ground and the lid).
     */
    void solve(double[] rhs, double[] chi) {
        // forward transforms, two levels at a time
        for (int k = 0; k < nz; k += 2) {
            boolean pair = k + 1 < nz;
            System.arraycopy(rhs, k * nx, rowRe, 0, nx);
            if (pair) {
                System.arraycopy(rhs, (k + 1) * nx, rowIm, 0, nx);
            } else {
                java.util.Arrays.fill(rowIm, 0.0);
            }
            fft.forward(rowRe, rowIm);
            for (int m = 0; m < nh; m++) {
                int mm = m == 0 ? 0 : nx - m;
                double zr = rowRe[m];
                double zi = rowIm[m];
                double cr = rowRe[mm];
                double ci = rowIm[mm];
                sRe[k * nh + m] = 0.5 * (zr + cr);
                sIm[k * nh + m] = 0.5 * (zi - ci);
                if (pair) {
                    sRe[(k + 1) * nh + m] = 0.5 * (zi + ci);
                    sIm[(k + 1) * nh + m] = -0.5 * (zr - cr);
                }
            }
        }
        // tridiagonal solve in z for each wavenumber; level loops over wavenumbers (contiguous, and the
        // recurrences of different wavenumbers run side by side)
        for (int m = 0; m < nh; m++) {
            sRe[m] = (m == 0 ? 0.0 : sRe[m]) * ipT[m];
            sIm[m] = (m == 0 ? 0.0 : sIm[m]) * ipT[m];
        }
        for (int k = 1; k < nz; k++) {
            int o = k * nh;
            double a = sub[k];
            for (int m = 0; m < nh; m++) {
                sRe[o + m] = (sRe[o + m] - a * sRe[o - nh + m]) * ipT[o + m];
                sIm[o + m] = (sIm[o + m] - a * sIm[o - nh + m]) * ipT[o + m];
            }
        }
        for (int k = nz - 2; k >= 0; k--) {
            int o = k * nh;
            for (int m = 0; m < nh; m++) {
                sRe[o + m] -= cpT[o + m] * sRe[o + nh + m];
                sIm[o + m] -= cpT[o + m] * sIm[o + nh + m];
            }
        }
        // inverse transforms, two levels at a time: Z = A + i B with Hermitian A, B
        double inv = 1.0 / nx;
        for (int k = 0; k < nz; k += 2) {
            boolean pair = k + 1 < nz;
            int oa = k * nh;
            int ob = (k + 1) * nh;
            if (pair) {
                for (int m = 0; m < nh; m++) {
                    rowRe[m] = sRe[oa + m] - sIm[ob + m];
                    rowIm[m] = sIm[oa + m] + sRe[ob + m];
                }
                for (int m = nh; m < nx; m++) {
                    int mm = nx - m;
                    rowRe[m] = sRe[oa + mm] - -sIm[ob + mm];
                    rowIm[m] = -sIm[oa + mm] + sRe[ob + mm];
                }
            } else {
                for (int m = 0; m < nh; m++) {
                    rowRe[m] = sRe[oa + m] - 0.0;
                    rowIm[m] = sIm[oa + m] + 0.0;
                }
                for (int m = nh; m < nx; m++) {
                    int mm = nx - m;
                    rowRe[m] = sRe[oa + mm] - 0.0;
                    rowIm[m] = -sIm[oa + mm] + 0.0;
                }
            }
            fft.inverse(rowRe, rowIm);
            for (int i = 0; i < nx; i++) {
                chi[k * nx + i] = rowRe[i] * inv;
            }
            if (pair) {
                for (int i = 0; i < nx; i++) {
                    chi[(k + 1) * nx + i] = rowIm[i] * inv;
                }
            }
        }
    }

    /** Discrete Laplacian of chi (allocates; for tests and checks). */
    double[] laplacian(double[] chi) {
        double[] out = new double[nz * nx];
        for (int k = 0; k < nz; k++) {
            for (int i = 0; i < nx; i++) {
                double c = chi[k * nx + i];
                double lx = (chi[k * nx + g.ip1[i]] - 2 * c + chi[k * nx + g.im1[i]]) / (g.dx * g.dx);
                double up = k < nz - 1 ? (chi[(k + 1) * nx + i] - c) / g.dzc[k + 1] : 0.0;
                double dn = k > 0 ? (c - chi[(k - 1) * nx + i]) / g.dzc[k] : 0.0;
                out[k * nx + i] = lx + (up - dn) / g.dzf[k];
            }
        }
        return out;
    }
}
