package org.littoral.model.nonlinear;

import static org.littoral.model.nonlinear.AdvectionFluxes.flux3;

/**
 * Advection of momentum by the flow, in flux form with the third-order upwind-biased flux of Wicker &amp;
 * Skamarock (2002), eq. 4 (centred second order next to the ground and the lid): u on its own control volumes
 * around the west faces, v at cell centres ({@link CentredAdvection}), w around the interfaces. Writes tu,
 * tv and tw (w at the ground and the lid has no tendency).
 *
 * <p>Each routine sweeps up the levels once: the x fluxes of a row, then the z flux through its top, so each
 * tendency row is written once while the few rows the fluxes read are still in cache (the same operations
 * in the same order per point as an x pass followed by a z pass).
 */
final class MomentumAdvection implements ExplicitTerm {
    private final StaggeredGrid g;
    private final ModelState st;
    private final CentredAdvection centred;
    private final int nx;
    private final int nz;
    private final double invDx;
    private final double[] fx;
    private final double[] fxs;
    private final double[] sh1;
    private final double[] sh2;
    private final double[] sh3;
    private final double[] sh4;
    private final double[] fzBot;
    private final double[] fzTop;

    MomentumAdvection(StaggeredGrid g, ModelState st) {
        this.g = g;
        this.st = st;
        this.centred = new CentredAdvection(g, st);
        this.nx = g.nx;
        this.nz = g.nz;
        this.invDx = 1.0 / g.dx;
        fx = new double[nx + 1];
        fxs = new double[nx];
        sh1 = new double[nx];
        sh2 = new double[nx];
        sh3 = new double[nx];
        sh4 = new double[nx];
        fzBot = new double[nx];
        fzTop = new double[nx];
    }

    @Override
    public void apply(double timeSec, double stageWeight) {
        java.util.Arrays.fill(st.tw, 0, nx, 0.0);
        java.util.Arrays.fill(st.tw, nz * nx, (nz + 1) * nx, 0.0);
        advectU();
        centred.advect(st.v, st.tv, null, null, stageWeight);
        advectW();
    }

    private void advectU() {
        double[] u = st.u;
        double[] w = st.w;
        double[] tu = st.tu;
        java.util.Arrays.fill(fzBot, 0.0);
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            AdvectionFluxes.shift(u, o, -1, sh1, nx);
            AdvectionFluxes.shift(u, o, 1, sh2, nx);
            AdvectionFluxes.shift(u, o, 2, sh3, nx);
            // fx[i]: flux through cell centre i, the east side of the u control volume around face i
            for (int i = 0; i < nx; i++) {
                double a = 0.5 * (u[o + i] + sh2[i]);
                fx[i] = flux3(a, sh1[i], u[o + i], sh2[i], sh3[i]);
            }
            AdvectionFluxes.shift(fx, 0, -1, fxs, nx);
            int kf = k + 1;
            int of = kf * nx;
            if (kf < nz) {
                AdvectionFluxes.shift(w, of, -1, sh1, nx);
            }
            if (kf >= 2 && kf <= nz - 2) {
                for (int i = 0; i < nx; i++) {
                    double a = 0.5 * (sh1[i] + w[of + i]);
                    int n = o + i;
                    fzTop[i] = flux3(a, u[n - nx], u[n], u[n + nx], u[n + 2 * nx]);
                }
            } else if (kf < nz) {
                double wl = g.wLo[kf];
                for (int i = 0; i < nx; i++) {
                    double a = 0.5 * (sh1[i] + w[of + i]);
                    int n = o + i;
                    fzTop[i] = a * (wl * u[n] + (1.0 - wl) * u[n + nx]);
                }
            } else {
                java.util.Arrays.fill(fzTop, 0.0);
            }
            double idz = 1.0 / g.dzf[k];
            for (int i = 0; i < nx; i++) {
                double t = 0.0 - (fx[i] - fxs[i]) * invDx;
                tu[o + i] = t - (fzTop[i] - fzBot[i]) * idz;
                fzBot[i] = fzTop[i];
            }
        }
    }

    private void advectW() {
        double[] u = st.u;
        double[] w = st.w;
        double[] tw = st.tw;
        // vertical flux through layer centre 0 (between the ground and interface 1)
        for (int i = 0; i < nx; i++) {
            double a = 0.5 * (w[i] + w[nx + i]);
            fzBot[i] = a * a;
        }
        for (int k = 1; k < nz; k++) {
            int o = k * nx;
            double wl = g.wLo[k];
            AdvectionFluxes.shift(w, o, -1, sh1, nx);
            AdvectionFluxes.shift(w, o, 1, sh2, nx);
            AdvectionFluxes.shift(w, o, 2, sh3, nx);
            // fx[i]: flux through x_{i+1/2} at interface k
            AdvectionFluxes.shift(u, o - nx, 1, sh4, nx);
            AdvectionFluxes.shift(u, o, 1, fxs, nx);
            for (int i = 0; i < nx; i++) {
                double a = wl * sh4[i] + (1.0 - wl) * fxs[i];
                fx[i] = flux3(a, sh1[i], w[o + i], sh2[i], sh3[i]);
            }
            AdvectionFluxes.shift(fx, 0, -1, fxs, nx);
            // vertical flux through layer centre k (between interfaces k and k+1)
            if (k + 2 <= nz) {
                for (int i = 0; i < nx; i++) {
                    int n = o + i;
                    double a = 0.5 * (w[n] + w[n + nx]);
                    fzTop[i] = flux3(a, w[n - nx], w[n], w[n + nx], w[n + 2 * nx]);
                }
            } else {
                for (int i = 0; i < nx; i++) {
                    int n = o + i;
                    double a = 0.5 * (w[n] + w[n + nx]);
                    fzTop[i] = a * a;
                }
            }
            double idz = 1.0 / g.dzc[k];
            for (int i = 0; i < nx; i++) {
                double t = 0.0 - (fx[i] - fxs[i]) * invDx;
                tw[o + i] = t - (fzTop[i] - fzBot[i]) * idz;
                fzBot[i] = fzTop[i];
            }
        }
    }
}
