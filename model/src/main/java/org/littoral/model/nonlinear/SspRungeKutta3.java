package org.littoral.model.nonlinear;

/**
 * The three-stage strong-stability-preserving Runge-Kutta scheme of Shu &amp; Osher (1988), J. Comput. Phys.
 * 77, 439-471, eq. (2.18), with a pressure projection after each stage:
 * u1 = un + dt L(un); u2 = 3/4 un + 1/4 (u1 + dt L(u1)); u(n+1) = 1/3 un + 2/3 (u2 + dt L(u2)); stage times t,
 * t + dt, t + dt/2; the weight of each stage's tendency in the step is 1/6, 1/6, 2/3. Owns the
 * start-of-step copies.
 */
final class SspRungeKutta3 {
    private final ModelState st;
    private final ExplicitTerm[] terms;
    private final PressureProjection projection;
    private final double[] un;
    private final double[] vn;
    private final double[] wn;
    private final double[] thn;
    private final double[] qn;

    /** @param terms the explicit terms in the order their tendencies are added (advection first) */
    SspRungeKutta3(ModelState st, ExplicitTerm[] terms, PressureProjection projection) {
        this.st = st;
        this.terms = terms.clone();
        this.projection = projection;
        un = new double[st.u.length];
        vn = new double[st.v.length];
        wn = new double[st.w.length];
        thn = new double[st.th.length];
        qn = new double[st.q.length];
    }

    void step(double t, double dt) {
        System.arraycopy(st.u, 0, un, 0, un.length);
        System.arraycopy(st.v, 0, vn, 0, vn.length);
        System.arraycopy(st.w, 0, wn, 0, wn.length);
        System.arraycopy(st.th, 0, thn, 0, thn.length);
        System.arraycopy(st.q, 0, qn, 0, qn.length);
        for (ExplicitTerm term : terms) {
            term.beginStep();
        }
        stage(t, dt, 0.0, 1.0, 1.0 / 6.0);
        stage(t + dt, dt, 0.75, 0.25, 1.0 / 6.0);
        stage(t + 0.5 * dt, dt, 1.0 / 3.0, 2.0 / 3.0, 2.0 / 3.0);
        for (ExplicitTerm term : terms) {
            term.endStep(thn, qn, dt);
        }
    }

    private void stage(double t, double dt, double a, double b, double weight) {
        for (ExplicitTerm term : terms) {
            term.apply(t, weight);
        }
        combine(st.u, un, st.tu, a, b, dt);
        combine(st.v, vn, st.tv, a, b, dt);
        combine(st.w, wn, st.tw, a, b, dt);
        combine(st.th, thn, st.tth, a, b, dt);
        combine(st.q, qn, st.tq, a, b, dt);
        projection.project(b * dt);
    }

    private static void combine(double[] x, double[] xn, double[] tx, double a, double b, double dt) {
        if (a == 0.0) {
            for (int n = 0; n < x.length; n++) {
                x[n] = x[n] + dt * tx[n];
            }
        } else {
            for (int n = 0; n < x.length; n++) {
                x[n] = a * xn[n] + b * (x[n] + dt * tx[n]);
            }
        }
    }
}
