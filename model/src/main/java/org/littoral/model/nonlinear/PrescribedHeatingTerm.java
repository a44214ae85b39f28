package org.littoral.model.nonlinear;

/** The prescribed diabatic heating Q(x, z, t) of {@link Forcing.PrescribedHeating}: d(theta)/dt += Q. */
final class PrescribedHeatingTerm implements ExplicitTerm {
    private final StaggeredGrid g;
    private final ModelState st;
    private final HeatingRate heating;

    PrescribedHeatingTerm(StaggeredGrid g, ModelState st, HeatingRate heating) {
        this.g = g;
        this.st = st;
        this.heating = heating;
    }

    @Override
    public void apply(double timeSec, double stageWeight) {
        int nx = g.nx;
        double[] tth = st.tth;
        for (int k = 0; k < g.nz; k++) {
            for (int i = 0; i < nx; i++) {
                tth[k * nx + i] += heating.kelvinPerSecond(g.xc[i], g.zc[k], timeSec);
            }
        }
    }
}
