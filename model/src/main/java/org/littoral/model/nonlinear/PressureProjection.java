package org.littoral.model.nonlinear;

/**
 * The pressure projection (Chorin 1968, Math. Comp. 22, 745-762): solves the Poisson equation for the
 * divergence of (u, w) ({@link PoissonSolver}: FFT in x, tridiagonal in z) and removes its gradient, so the
 * flow is discretely non-divergent. The kinematic pressure p' / rho_0 of the last projection is
 * chi * {@link #phiScale()}.
 */
final class PressureProjection {
    private final StaggeredGrid g;
    private final ModelState st;
    private final PoissonSolver poisson;
    private final int nx;
    private final int nz;
    private final double invDx;
    private final double[] chi;
    private double phiScale;

    PressureProjection(StaggeredGrid g, ModelState st) {
        this.g = g;
        this.st = st;
        this.poisson = new PoissonSolver(g);
        this.nx = g.nx;
        this.nz = g.nz;
        this.invDx = 1.0 / g.dx;
        this.chi = new double[nz * nx];
    }

    /** Removes the divergence of (u, w); chi / dtEff is the kinematic pressure p' / rho_0. */
    void project(double dtEff) {
        double[] u = st.u;
        double[] w = st.w;
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            double idz = 1.0 / g.dzf[k];
            for (int i = 0; i < nx - 1; i++) {
                chi[o + i] = (u[o + i + 1] - u[o + i]) * invDx + (w[o + nx + i] - w[o + i]) * idz;
            }
            int e = o + nx - 1;
            chi[e] = (u[o] - u[e]) * invDx + (w[e + nx] - w[e]) * idz;
        }
        poisson.solve(chi, chi);
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            u[o] -= (chi[o] - chi[o + nx - 1]) * invDx;
            for (int i = 1; i < nx; i++) {
                u[o + i] -= (chi[o + i] - chi[o + i - 1]) * invDx;
            }
        }
        for (int k = 1; k < nz; k++) {
            int o = k * nx;
            double idz = 1.0 / g.dzc[k];
            for (int i = 0; i < nx; i++) {
                w[o + i] -= (chi[o + i] - chi[o - nx + i]) * idz;
            }
        }
        // phi = chi / dtEff is only read when a snapshot is stored: keep chi and the factor
        phiScale = 1.0 / dtEff;
    }

    /** Forgets the pressure (before the first step there is none). */
    void clearPressure() {
        phiScale = 0.0;
    }

    /** The solution of the last projection (read-only for callers). */
    double[] chi() {
        return chi;
    }

    /** 1 / dtEff of the last projection, 0 before the first step. */
    double phiScale() {
        return phiScale;
    }

    /** Largest |du/dx + dw/dz| * dx / (typical |u - Ug|) of the current state: relative discrete divergence (tests). */
    double maxRelativeDivergence(double ug) {
        double[] u = st.u;
        double[] w = st.w;
        double maxD = 0;
        double maxU = 1e-30;
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            for (int i = 0; i < nx; i++) {
                double d = (u[o + g.ip1[i]] - u[o + i]) * invDx + (w[o + nx + i] - w[o + i]) / g.dzf[k];
                maxD = Math.max(maxD, Math.abs(d));
                maxU = Math.max(maxU, Math.abs(u[o + i] - ug));
            }
        }
        return maxD * g.dx / maxU;
    }
}
