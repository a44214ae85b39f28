package org.littoral.model.nonlinear;

/**
 * The undisturbed far field over the surface at one end of the domain: a single column with the same
 * surface fluxes, slab mixed layer, K-profile mixing, drag, Coriolis and damping but no circulation. It starts
 * from the same balanced state as the domain and then follows the day (the boundary layer deepens, mixes
 * momentum down, and turns with the inertial oscillation of its changing friction). The lateral
 * {@link Sponges} relax u, v, theta and r toward it: a reference that evolves with the local physics yet
 * cannot feed back on the circulation.
 */
final class FarFieldColumn {
    final int i;
    final double[] thRef;
    final double[] qRef;
    final double[] uRef;
    final double[] vRef;
    private double hRef;
    private final double[] flRef = new double[3];
    private final NonlinearConfig cfg;
    private final StaggeredGrid g;
    private final BaseState base;
    private final SurfaceFluxScheme.Column surface;
    private final MixedLayerDepth mixedLayer;
    private final VerticalMixing mixing;
    private final double[] rTopC;
    /** The prescribed heating of the forcing, or null. */
    private final HeatingRate heating;

    FarFieldColumn(int i, NonlinearConfig cfg, StaggeredGrid g, BaseState base, SurfaceFluxScheme surfaceScheme,
                   MixedLayerDepth mixedLayer, VerticalMixing mixing, Sponges sponges) {
        this.i = i;
        this.cfg = cfg;
        this.g = g;
        this.base = base;
        this.surface = surfaceScheme.column(i);
        this.mixedLayer = mixedLayer;
        this.mixing = mixing;
        this.rTopC = sponges.rTopC;
        this.heating = cfg.forcing() instanceof Forcing.PrescribedHeating ph ? ph.heating() : null;
        int nz = g.nz;
        thRef = base.th0.clone();
        qRef = base.q0.clone();
        uRef = new double[nz];
        vRef = new double[nz];
        java.util.Arrays.fill(uRef, base.ug);
        java.util.Arrays.fill(vRef, base.vg);
        hRef = mixedLayer.initialDepthM(i);
    }

    void startFrom(double[] u0, double[] v0) {
        System.arraycopy(u0, 0, uRef, 0, g.nz);
        System.arraycopy(v0, 0, vRef, 0, g.nz);
    }

    void step(double t, double dt) {
        int nz = g.nz;
        double[] th0 = base.th0;
        double[] q0 = base.q0;
        double spd = Math.max(0.5, Math.hypot(uRef[0], vRef[0]));
        double[] fl = flRef;
        surface.compute(t, spd, thRef[0], qRef[0], fl);
        double alphaN = cfg.damping().newtonianCoolingPerS();
        if (alphaN > 0 || heating != null) {
            for (int k = 0; k < nz; k++) {
                double q = heating == null ? 0.0 : heating.kelvinPerSecond(g.xc[i], g.zc[k], t);
                thRef[k] = (thRef[k] + dt * (q + alphaN * th0[k])) / (1.0 + dt * alphaN);
                qRef[k] = (qRef[k] + dt * alphaN * q0[k]) / (1.0 + dt * alphaN);
            }
        }
        if (!cfg.switches().mixing()) {
            thRef[0] += dt * fl[0] / g.dzf[0];
            qRef[0] = Math.max(0.0, qRef[0] + dt * fl[1] / g.dzf[0]);
        } else {
            hRef = mixedLayer.grownDepth(hRef, fl[0], mixedLayer.isLand(i), dt);
            mixing.mixColumn(thRef, qRef, uRef, vRef, fl, spd, hRef, dt);
        }
        // Coriolis and Rayleigh friction about the geostrophic wind, trapezoidal in time (the rotation is neutral):
        // W - Wg -> (W - Wg) (1 - c dt/2) / (1 + c dt/2), c = alpha + i f
        double ug = base.ug;
        double vg = base.vg;
        double a = 0.5 * dt * cfg.damping().rayleighFrictionPerS();
        double b = 0.5 * dt * base.f;
        double den = (1 + a) * (1 + a) + b * b;
        // (1 - a - i b) / (1 + a + i b) = [(1 - a)(1 + a) - b^2 - i 2b] / den
        double gRe = ((1 - a) * (1 + a) - b * b) / den;
        double gIm = -2 * b / den;
        for (int k = 0; k < nz; k++) {
            double du = uRef[k] - ug;
            double dv = vRef[k] - vg;
            uRef[k] = ug + gRe * du - gIm * dv;
            vRef[k] = vg + gRe * dv + gIm * du;
        }
        // the same damping layer aloft as the domain, so the sponge corners agree
        for (int k = 0; k < nz; k++) {
            double rt = dt * rTopC[k];
            if (rt > 0) {
                thRef[k] = (thRef[k] + rt * th0[k]) / (1.0 + rt);
                qRef[k] = (qRef[k] + rt * q0[k]) / (1.0 + rt);
                uRef[k] = (uRef[k] + rt * ug) / (1.0 + rt);
                vRef[k] = (vRef[k] + rt * vg) / (1.0 + rt);
            }
        }
    }
}
