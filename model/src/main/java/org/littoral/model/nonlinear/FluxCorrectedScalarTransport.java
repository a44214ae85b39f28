package org.littoral.model.nonlinear;

/**
 * Scalar transport limited once per step (the {@link NonlinearConfig.ScalarTransport#FCT_STEP} choice): at
 * every stage theta and r are advected with the unlimited third-order flux ({@link CentredAdvection}) while
 * the step's weighted mean fluxes and velocity are accumulated; after the last stage theta and r leave the
 * step as s_n + dt S - dt div F with F the step's mean flux limited against first-order upwind
 * ({@link FluxCorrectedTransport}; final-stage limiting, Skamarock 2006). Writes tth and tq.
 */
final class FluxCorrectedScalarTransport implements ExplicitTerm {
    private final ModelState st;
    private final CentredAdvection centred;
    private final FluxCorrectedTransport fct;
    private final double[] fxTh;
    private final double[] fzTh;
    private final double[] fxQ;
    private final double[] fzQ;
    private final double[] uMean;
    private final double[] wMean;

    FluxCorrectedScalarTransport(StaggeredGrid g, ModelState st) {
        this.st = st;
        this.centred = new CentredAdvection(g, st);
        int nx = g.nx;
        int nz = g.nz;
        int nc = nz * nx;
        fct = new FluxCorrectedTransport(nx, nz, g.dx, g.dzf);
        fxTh = new double[nc];
        fzTh = new double[(nz + 1) * nx];
        fxQ = new double[nc];
        fzQ = new double[(nz + 1) * nx];
        uMean = new double[nc];
        wMean = new double[(nz + 1) * nx];
    }

    @Override
    public void beginStep() {
        java.util.Arrays.fill(fxTh, 0.0);
        java.util.Arrays.fill(fzTh, 0.0);
        java.util.Arrays.fill(fxQ, 0.0);
        java.util.Arrays.fill(fzQ, 0.0);
        java.util.Arrays.fill(uMean, 0.0);
        java.util.Arrays.fill(wMean, 0.0);
    }

    @Override
    public void apply(double timeSec, double stageWeight) {
        double wt = stageWeight;
        double[] u = st.u;
        double[] w = st.w;
        for (int n = 0; n < uMean.length; n++) {
            uMean[n] += wt * u[n];
        }
        for (int n = 0; n < wMean.length; n++) {
            wMean[n] += wt * w[n];
        }
        centred.advect(st.th, st.tth, fxTh, fzTh, wt);
        centred.advect(st.q, st.tq, fxQ, fzQ, wt);
    }

    @Override
    public void endStep(double[] thStart, double[] qStart, double dt) {
        // theta and r leave the step as s_n + dt S - dt div F with F the step's mean third-order flux:
        // limit F against first-order upwind (final-stage limiting, Skamarock 2006)
        fct.limit(thStart, st.th, fxTh, fzTh, uMean, wMean, dt);
        fct.limit(qStart, st.q, fxQ, fzQ, uMean, wMean, dt);
    }
}
