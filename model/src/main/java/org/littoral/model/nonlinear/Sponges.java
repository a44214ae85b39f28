package org.littoral.model.nonlinear;

/**
 * Implicit Rayleigh relaxation with sin^2 ramps (Durran &amp; Klemp 1983, Mon. Wea. Rev. 111, 2341-2361):
 * aloft toward the ambient state (Ug, Vg, 0, theta_0, r_0); in the lateral sponges u, v toward the
 * {@link FarFieldColumn} of that end, w toward 0 and theta, r toward the far-field column too (the far field
 * over that surface keeps its own heating without a spurious coast at the wrap).
 */
final class Sponges {
    private final StaggeredGrid g;
    private final ModelState st;
    private final BaseState base;
    private final int nx;
    private final int nz;
    private final boolean lateral;
    /** Rates, 1/s: top layer at centres and interfaces, lateral at cell centres and west faces. */
    final double[] rTopC;
    private final double[] rTopF;
    private final double[] rLatC;
    private final double[] rLatU;
    /** First column from the left and last from the right whose centre lies outside the sponges (far-field columns). */
    final int iLeftC;
    final int iRightC;
    private FarFieldColumn farLeft;
    private FarFieldColumn farRight;

    Sponges(NonlinearConfig.Damping d, StaggeredGrid g, ModelState st, BaseState base) {
        this.g = g;
        this.st = st;
        this.base = base;
        this.nx = g.nx;
        this.nz = g.nz;
        rTopC = new double[nz];
        rTopF = new double[nz + 1];
        if (d.topLayerFraction() > 0) {
            double zd = g.topM() * (1.0 - d.topLayerFraction());
            double depth = g.topM() - zd;
            for (int k = 0; k < nz; k++) {
                rTopC[k] = topRate(g.zc[k], zd, depth, d.topTimescaleS());
            }
            for (int k = 1; k < nz; k++) {
                rTopF[k] = topRate(g.zf[k], zd, depth, d.topTimescaleS());
            }
        }
        rLatC = new double[nx];
        rLatU = new double[nx];
        double width = d.lateralSpongeWidthM();
        lateral = width > 0;
        double left = g.xc[0] - 0.5 * g.dx;
        double right = g.xc[nx - 1] + 0.5 * g.dx;
        int il = 0;
        int ir = nx - 1;
        if (width > 0) {
            while (il < nx && g.xc[il] - left < width) {
                il++;
            }
            while (ir >= 0 && right - g.xc[ir] < width) {
                ir--;
            }
            for (int i = 0; i < nx; i++) {
                rLatC[i] = lateralRate(g.xc[i], left, right, width, d.lateralTimescaleS());
                rLatU[i] = lateralRate(g.xc[i] - 0.5 * g.dx, left, right, width, d.lateralTimescaleS());
            }
        }
        iLeftC = il;
        iRightC = ir;
    }

    /** True when there are lateral sponges (and so far-field columns). */
    boolean lateral() {
        return lateral;
    }

    /** The references of the lateral sponges (required when {@link #lateral()}). */
    void relaxTowards(FarFieldColumn left, FarFieldColumn right) {
        this.farLeft = left;
        this.farRight = right;
    }

    private static double topRate(double z, double zd, double depth, double tau) {
        if (z <= zd) {
            return 0.0;
        }
        double s = Math.sin(0.5 * Math.PI * (z - zd) / depth);
        return s * s / tau;
    }

    private static double lateralRate(double x, double left, double right, double width, double tau) {
        double dist = Math.min(x - left, right - x);
        if (dist >= width) {
            return 0.0;
        }
        double s = Math.sin(0.5 * Math.PI * (1.0 - Math.max(0.0, dist) / width));
        return s * s / tau;
    }

    /** One backward-Euler step of all the relaxations. */
    void apply(double dt) {
        relaxWind(st.u, dt, rLatU, base.ug, farLeft == null ? null : farLeft.uRef, farRight == null ? null : farRight.uRef);
        relaxWind(st.v, dt, rLatC, base.vg, farLeft == null ? null : farLeft.vRef, farRight == null ? null : farRight.vRef);
        relaxScalar(st.th, base.th0, farLeft == null ? null : farLeft.thRef, farRight == null ? null : farRight.thRef, dt);
        relaxScalar(st.q, base.q0, farLeft == null ? null : farLeft.qRef, farRight == null ? null : farRight.qRef, dt);
        double[] w = st.w;
        for (int k = 1; k < nz; k++) {
            int o = k * nx;
            for (int i = 0; i < nx; i++) {
                double r = dt * (rTopF[k] + (lateral ? rLatC[i] : 0.0));
                if (r > 0) {
                    w[o + i] /= 1.0 + r;
                }
            }
        }
    }

    /**
     * Horizontal wind: aloft toward the geostrophic value, in the lateral sponges toward the far-field column of
     * that end (its own boundary layer over that surface; an independent reference, so no feedback).
     */
    private void relaxWind(double[] s, double dt, double[] rLat, double ambient, double[] refLeft, double[] refRight) {
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            double rt = dt * rTopC[k];
            if (rt > 0) {
                for (int i = 0; i < nx; i++) {
                    s[o + i] = (s[o + i] + rt * ambient) / (1.0 + rt);
                }
            }
            if (!lateral) {
                continue;
            }
            double left = refLeft[k];
            double right = refRight[k];
            for (int i = 0; i < nx; i++) {
                double rl = dt * rLat[i];
                if (rl > 0) {
                    double ref = i < nx / 2 ? left : right;
                    s[o + i] = (s[o + i] + rl * ref) / (1.0 + rl);
                }
            }
        }
    }

    /** Top layer toward the ambient profile first, then the lateral sponge toward the far-field column. */
    private void relaxScalar(double[] s, double[] ambient, double[] farLeft, double[] farRight, double dt) {
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            double rt = dt * rTopC[k];
            if (rt > 0) {
                for (int i = 0; i < nx; i++) {
                    s[o + i] = (s[o + i] + rt * ambient[k]) / (1.0 + rt);
                }
            }
            if (!lateral) {
                continue;
            }
            double refLeft = farLeft[k];
            double refRight = farRight[k];
            for (int i = 0; i < nx; i++) {
                double rl = dt * rLatC[i];
                if (rl > 0) {
                    double ref = i < nx / 2 ? refLeft : refRight;
                    s[o + i] = (s[o + i] + rl * ref) / (1.0 + rl);
                }
            }
        }
    }
}
