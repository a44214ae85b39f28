package org.littoral.model.nonlinear;

import static org.littoral.model.nonlinear.AdvectionFluxes.mcSlope;

/**
 * Scalar transport at every Runge-Kutta stage (the {@link NonlinearConfig.ScalarTransport#LIMITED_STAGES}
 * choice): theta and r in flux form with the MUSCL piecewise-linear reconstruction (van Leer 1979, J.
 * Comput. Phys. 32, 101-136) and the monotonised-central limiter (van Leer 1977, J. Comput. Phys. 23,
 * 276-299), first order next to the ground and the lid; monotone and positivity-preserving at Courant sums up
 * to 0.5. Writes tth and tq.
 */
final class LimitedScalarTransport implements ExplicitTerm {
    private final StaggeredGrid g;
    private final ModelState st;
    private final int nx;
    private final int nz;
    private final double invDx;
    private final double[] fx;
    private final double[] fxs;
    private final double[] hSlope;
    private final double[] sh1;
    private final double[] sh2;
    private final double[] sh3;
    private final double[] fzBot;
    private final double[] fzTop;
    private final double[] slopeA;
    private final double[] slopeB;

    LimitedScalarTransport(StaggeredGrid g, ModelState st) {
        this.g = g;
        this.st = st;
        this.nx = g.nx;
        this.nz = g.nz;
        this.invDx = 1.0 / g.dx;
        fx = new double[nx + 1];
        fxs = new double[nx];
        hSlope = new double[nx];
        sh1 = new double[nx];
        sh2 = new double[nx];
        sh3 = new double[nx];
        fzBot = new double[nx];
        fzTop = new double[nx];
        slopeA = new double[nx];
        slopeB = new double[nx];
    }

    @Override
    public void apply(double timeSec, double stageWeight) {
        advect(st.th, st.tth);
        advect(st.q, st.tq);
    }

    private void advect(double[] s, double[] ts) {
        double[] u = st.u;
        double[] w = st.w;
        // one sweep up the levels: x fluxes of level k, then the z flux through its top, so each row of
        // ts is updated once while rows k..k+2 of s are still in cache (same operations in the same order
        // per point as an x pass followed by a z pass)
        double[] sl = hSlope;
        java.util.Arrays.fill(fzBot, 0.0);
        java.util.Arrays.fill(slopeA, 0.0); // z slope of layer k: zero next to ground and lid (first order there)
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            AdvectionFluxes.shift(s, o, -1, sh1, nx);
            AdvectionFluxes.shift(s, o, 1, sh2, nx);
            for (int i = 0; i < nx; i++) {
                double c = s[o + i];
                sl[i] = mcSlope(c - sh1[i], sh2[i] - c);
            }
            AdvectionFluxes.shift(sl, 0, -1, sh3, nx); // slope of cell i - 1
            // fx[i]: flux through the west face of cell i, upwind reconstruction; the upwind choice as
            // max(a, 0) L + min(a, 0) R (the same value as selecting L or R, without a branch)
            for (int i = 0; i < nx; i++) {
                double a = u[o + i];
                fx[i] = Math.max(a, 0.0) * (sh1[i] + 0.5 * sh3[i]) + Math.min(a, 0.0) * (s[o + i] - 0.5 * sl[i]);
            }
            AdvectionFluxes.shift(fx, 0, 1, fxs, nx);
            if (k + 1 < nz) {
                if (k + 1 < nz - 1) {
                    for (int i = 0; i < nx; i++) {
                        slopeB[i] = mcSlope(s[o + nx + i] - s[o + i], s[o + 2 * nx + i] - s[o + nx + i]);
                    }
                } else {
                    java.util.Arrays.fill(slopeB, 0.0);
                }
                for (int i = 0; i < nx; i++) {
                    double a = w[o + nx + i];
                    fzTop[i] = Math.max(a, 0.0) * (s[o + i] + 0.5 * slopeA[i])
                            + Math.min(a, 0.0) * (s[o + nx + i] - 0.5 * slopeB[i]);
                }
            } else {
                java.util.Arrays.fill(fzTop, 0.0);
            }
            double idz = 1.0 / g.dzf[k];
            for (int i = 0; i < nx; i++) {
                double t = 0.0 - (fxs[i] - fx[i]) * invDx;
                ts[o + i] = t - (fzTop[i] - fzBot[i]) * idz;
                fzBot[i] = fzTop[i];
                slopeA[i] = slopeB[i];
            }
        }
    }
}
