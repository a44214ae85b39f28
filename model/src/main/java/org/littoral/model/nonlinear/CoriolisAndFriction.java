package org.littoral.model.nonlinear;

/**
 * Coriolis acceleration about the geostrophic wind on the f-plane and Rayleigh friction toward it:
 * du/dt += f (v - Vg) - alpha (u - Ug), dv/dt += -f (u - Ug) - alpha (v - Vg), with v averaged to u points
 * and u to v points on the C-grid. Rayleigh friction on w is applied with the buoyancy ({@link Buoyancy}).
 * A zero friction rate adds nothing, so its terms are left out (chosen once).
 */
final class CoriolisAndFriction implements ExplicitTerm {
    private final ModelState st;
    private final int nx;
    private final int nz;
    private final double f;
    private final double ug;
    private final double vg;
    private final double alpha;
    private final boolean damped;
    private final double[] sh1;
    private final double[] sh2;

    CoriolisAndFriction(StaggeredGrid g, ModelState st, BaseState base, double rayleighFrictionPerS) {
        this.st = st;
        this.nx = g.nx;
        this.nz = g.nz;
        this.f = base.f;
        this.ug = base.ug;
        this.vg = base.vg;
        this.alpha = rayleighFrictionPerS;
        this.damped = rayleighFrictionPerS != 0.0;
        sh1 = new double[nx];
        sh2 = new double[nx];
    }

    @Override
    public void apply(double timeSec, double stageWeight) {
        double[] u = st.u;
        double[] v = st.v;
        double[] tu = st.tu;
        double[] tv = st.tv;
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            AdvectionFluxes.shift(v, o, -1, sh1, nx); // v of cell i - 1
            AdvectionFluxes.shift(u, o, 1, sh2, nx);  // u at the east face of cell i
            if (damped) {
                for (int i = 0; i < nx; i++) {
                    int n = o + i;
                    tu[n] += f * (0.5 * (sh1[i] + v[n]) - vg) - alpha * (u[n] - ug);
                    tv[n] += -f * (0.5 * (u[n] + sh2[i]) - ug) - alpha * (v[n] - vg);
                }
            } else {
                for (int i = 0; i < nx; i++) {
                    int n = o + i;
                    tu[n] += f * (0.5 * (sh1[i] + v[n]) - vg);
                    tv[n] += -f * (0.5 * (u[n] + sh2[i]) - ug);
                }
            }
        }
    }
}
