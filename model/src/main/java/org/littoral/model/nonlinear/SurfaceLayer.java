package org.littoral.model.nonlinear;

/**
 * The surface layer of every column: the wind speed at the lowest level (at least 0.5 m/s, a common floor for
 * the gustiness of light winds) and, from the {@link SurfaceFluxScheme}, the kinematic heat and moisture
 * fluxes and the drag coefficient, updated once per step from the air in the lowest layer.
 */
final class SurfaceLayer {
    private final StaggeredGrid g;
    private final ModelState st;
    private final SurfaceFluxScheme scheme;
    final double[] windSfc;
    final double[] heatFluxKin;
    final double[] moistFluxKin;
    final double[] cd;

    SurfaceLayer(StaggeredGrid g, ModelState st, SurfaceFluxScheme scheme) {
        this.g = g;
        this.st = st;
        this.scheme = scheme;
        windSfc = new double[g.nx];
        heatFluxKin = new double[g.nx];
        moistFluxKin = new double[g.nx];
        cd = new double[g.nx];
    }

    SurfaceFluxScheme scheme() {
        return scheme;
    }

    /** Heat and moisture fluxes and drag coefficients of every column at time t. */
    void update(double t) {
        double[] u = st.u;
        double[] v = st.v;
        for (int i = 0; i < g.nx; i++) {
            double uc = 0.5 * (u[i] + u[g.ip1[i]]);
            windSfc[i] = Math.max(0.5, Math.sqrt(uc * uc + v[i] * v[i]));
        }
        scheme.domain(t, windSfc, st.th, st.q, heatFluxKin, moistFluxKin, cd);
    }

    /** Without turbulent mixing: the surface fluxes heat and moisten the lowest layer alone. */
    void fluxIntoLowestLayer(double dt) {
        double idz = dt / g.dzf[0];
        double[] th = st.th;
        double[] q = st.q;
        for (int i = 0; i < g.nx; i++) {
            th[i] += heatFluxKin[i] * idz;
            q[i] = Math.max(0.0, q[i] + moistFluxKin[i] * idz);
        }
    }
}
