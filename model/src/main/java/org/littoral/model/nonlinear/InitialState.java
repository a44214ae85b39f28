package org.littoral.model.nonlinear;

import org.littoral.model.coast.SurfaceSegment;

/**
 * The start of a run: theta and r from the basic state plus the configured perturbations, and the wind of each
 * column's own steady boundary layer (one balance per surface segment, {@link EkmanBalance}) or the
 * geostrophic wind; then one projection so the start is non-divergent.
 */
final class InitialState {
    private InitialState() {
    }

    /**
     * Fills the state and starts the far-field columns (either may be null) from the balanced wind of their
     * column.
     */
    static void fill(NonlinearConfig cfg, StaggeredGrid g, BaseState base, ModelState st, SurfaceFluxScheme surface,
                     VerticalMixing mixing, double[] h, double[] rTopC, FarFieldColumn farLeft, FarFieldColumn farRight) {
        int nx = g.nx;
        int nz = g.nz;
        ScalarField thp = cfg.initialThetaPerturbationK();
        ScalarField up = cfg.initialUPerturbationMPerS();
        ScalarField qp = cfg.initialMixingRatioPerturbation();
        double t0 = cfg.startSolarHours() * 3600.0;
        // the wind of each column's own steady boundary layer (one balance per surface segment), or geostrophic
        double[][] colU = new double[nx][];
        double[][] colV = new double[nx][];
        java.util.Map<SurfaceSegment, double[][]> bySegment = new java.util.IdentityHashMap<>();
        for (int i = 0; i < nx; i++) {
            int col = i;
            double[][] b = bySegment.computeIfAbsent(cfg.surface().at(g.xc[i]),
                    s -> balancedWind(cfg, g, base, surface, mixing, h, rTopC, col, t0));
            colU[i] = b[0];
            colV[i] = b[1];
        }
        for (int k = 0; k < nz; k++) {
            for (int i = 0; i < nx; i++) {
                int n = k * nx + i;
                // u at the west face of cell i: between the columns i - 1 and i
                st.u[n] = 0.5 * (colU[g.im1[i]][k] + colU[i][k]) + up.at(g.xc[i] - 0.5 * g.dx, g.zc[k]);
                st.v[n] = colV[i][k];
                st.th[n] = base.th0[k] + thp.at(g.xc[i], g.zc[k]);
                st.q[n] = Math.max(0.0, base.q0[k] + qp.at(g.xc[i], g.zc[k]));
            }
        }
        if (farLeft != null) {
            farLeft.startFrom(colU[farLeft.i], colV[farLeft.i]);
            farRight.startFrom(colU[farRight.i], colV[farRight.i]);
        }
    }

    /**
     * The steady boundary-layer wind {u, v} of column i at time t ({@link NonlinearConfig.InitialWind}): the
     * geostrophic wind without mixing or with {@link NonlinearConfig.InitialWind#GEOSTROPHIC}; otherwise the
     * {@link EkmanBalance} of the column's surface drag and K-profile at the background theta and r and the start
     * depth h, iterated until the drag (which depends on the wind it makes) settles.
     */
    private static double[][] balancedWind(NonlinearConfig cfg, StaggeredGrid g, BaseState base, SurfaceFluxScheme surface,
                                           VerticalMixing mixing, double[] h, double[] rTopC, int i, double t) {
        int nz = g.nz;
        double[] ub = new double[nz];
        double[] vb = new double[nz];
        java.util.Arrays.fill(ub, base.ug);
        java.util.Arrays.fill(vb, base.vg);
        if (!cfg.switches().mixing() || cfg.initialWind() == NonlinearConfig.InitialWind.GEOSTROPHIC) {
            return new double[][] {ub, vb};
        }
        double alpha = cfg.damping().rayleighFrictionPerS();
        double[] damp = new double[nz];
        for (int k = 0; k < nz; k++) {
            damp[k] = alpha + rTopC[k];
        }
        SurfaceFluxScheme.Column one = surface.column(i);
        double[] kI = new double[nz + 1];
        double[] fl = new double[3];
        double drag = Double.NaN;
        for (int it = 0; it < 60; it++) {
            double spd = Math.max(0.5, Math.hypot(ub[0], vb[0]));
            one.compute(t, spd, base.th0[0], base.q0[0], fl);
            mixing.kProfile(fl[0], spd, fl[2], h[i], kI, 0, 1);
            double d = fl[2] * spd;
            // under-relaxed: the drag and the wind it makes settle together
            double next = Double.isNaN(drag) ? d : 0.5 * (drag + d);
            boolean settled = !Double.isNaN(drag) && Math.abs(next - drag) <= 1e-6 * Math.max(next, 1e-6);
            drag = next;
            EkmanBalance.solve(g.dzf, g.dzc, kI, drag, base.f, damp, base.ug, base.vg, ub, vb);
            if (settled) {
                break;
            }
        }
        return new double[][] {ub, vb};
    }
}
