package org.littoral.model.nonlinear;

/**
 * Newtonian relaxation of theta and r toward the basic state at the rate alpha_N (the thermal damping of
 * linear breeze theory, Rotunno 1983): d(theta)/dt -= alpha_N (theta - theta_0), dr/dt -= alpha_N (r - r_0).
 * Wired only when alpha_N is not zero.
 */
final class NewtonianCooling implements ExplicitTerm {
    private final ModelState st;
    private final BaseState base;
    private final int nx;
    private final int nz;
    private final double alphaN;

    NewtonianCooling(StaggeredGrid g, ModelState st, BaseState base, double newtonianCoolingPerS) {
        this.st = st;
        this.base = base;
        this.nx = g.nx;
        this.nz = g.nz;
        this.alphaN = newtonianCoolingPerS;
    }

    @Override
    public void apply(double timeSec, double stageWeight) {
        double[] th = st.th;
        double[] q = st.q;
        double[] tth = st.tth;
        double[] tq = st.tq;
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            double t0k = base.th0[k];
            double q0k = base.q0[k];
            for (int i = 0; i < nx; i++) {
                int n = o + i;
                tth[n] -= alphaN * (th[n] - t0k);
                tq[n] -= alphaN * (q[n] - q0k);
            }
        }
    }
}
