package org.littoral.model.nonlinear;

import org.littoral.model.thermo.Thermo;

/**
 * Buoyancy of the Boussinesq equations at the w points, b = g [(theta - theta_0) / theta_0 + 0.608 (r - r_0)]
 * (the moisture part only when moisture buoyancy is switched on), interpolated linearly from the two
 * neighbouring layer centres, together with the Rayleigh friction on w, dw/dt += b - alpha w.
 */
final class Buoyancy implements ExplicitTerm {
    /** Virtual-temperature factor 1/eps - 1 (e.g. Emanuel 1994, Atmospheric Convection, eq. 4.3.1). */
    static final double VIRTUAL_FACTOR = 0.608;

    private final StaggeredGrid g;
    private final ModelState st;
    private final BaseState base;
    private final int nx;
    private final int nz;
    private final double alpha;
    private final boolean damped;
    private final boolean moist;

    Buoyancy(StaggeredGrid g, ModelState st, BaseState base, double rayleighFrictionPerS, boolean moistureBuoyancy) {
        this.g = g;
        this.st = st;
        this.base = base;
        this.nx = g.nx;
        this.nz = g.nz;
        this.alpha = rayleighFrictionPerS;
        this.damped = rayleighFrictionPerS != 0.0;
        this.moist = moistureBuoyancy;
    }

    @Override
    public void apply(double timeSec, double stageWeight) {
        double[] th = st.th;
        double[] q = st.q;
        double[] w = st.w;
        double[] tw = st.tw;
        double[] th0 = base.th0;
        double[] q0 = base.q0;
        for (int k = 1; k < nz; k++) {
            int o = k * nx;
            double wl = g.wLo[k];
            double bl = Thermo.G * wl / th0[k - 1];
            double bh = Thermo.G * (1.0 - wl) / th0[k];
            double tLo = th0[k - 1];
            double tHi = th0[k];
            if (moist) {
                double qLo = q0[k - 1];
                double qHi = q0[k];
                double gv = Thermo.G * VIRTUAL_FACTOR;
                double wh = 1.0 - wl;
                for (int i = 0; i < nx; i++) {
                    int n = o + i;
                    double b = bl * (th[n - nx] - tLo) + bh * (th[n] - tHi);
                    b += gv * (wl * (q[n - nx] - qLo) + wh * (q[n] - qHi));
                    tw[n] += damped ? b - alpha * w[n] : b;
                }
            } else {
                for (int i = 0; i < nx; i++) {
                    int n = o + i;
                    double b = bl * (th[n - nx] - tLo) + bh * (th[n] - tHi);
                    tw[n] += damped ? b - alpha * w[n] : b;
                }
            }
        }
    }
}
