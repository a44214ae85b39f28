package org.littoral.model.nonlinear;

/**
 * The linearised vertical advection of the basic state, -w d(theta_0)/dz and -w d(r_0)/dz, with w averaged to
 * cell centres. Wired only in linear mode (in the full equations the flux-form advection of the total theta
 * and r already holds it).
 */
final class BasicStateAdvection implements ExplicitTerm {
    private final ModelState st;
    private final BaseState base;
    private final int nx;
    private final int nz;

    BasicStateAdvection(StaggeredGrid g, ModelState st, BaseState base) {
        this.st = st;
        this.base = base;
        this.nx = g.nx;
        this.nz = g.nz;
    }

    @Override
    public void apply(double timeSec, double stageWeight) {
        double[] w = st.w;
        double[] tth = st.tth;
        double[] tq = st.tq;
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            for (int i = 0; i < nx; i++) {
                double wc = 0.5 * (w[o + i] + w[o + nx + i]);
                tth[o + i] -= wc * base.dth0[k];
                tq[o + i] -= wc * base.dq0[k];
            }
        }
    }
}
