package org.littoral.model.nonlinear;

import static org.littoral.model.nonlinear.AdvectionFluxes.flux3;

/**
 * Advection of a cell-centred field (v; theta and r under flux-corrected transport) by the flow, in flux form
 * with the third-order upwind-biased flux of Wicker &amp; Skamarock (2002), eq. 4, inside and the centred
 * second-order flux next to the ground and the lid.
 *
 * <p>One sweep up the levels: the x fluxes of a row, then the z flux through its top, so each tendency row
 * is written once while the few rows the fluxes read are still in cache (the same operations in the same
 * order per point as an x pass followed by a z pass). Every loop reads and writes row copies at one index,
 * so that all of them compile to vector instructions.
 */
final class CentredAdvection {
    private final StaggeredGrid g;
    private final ModelState st;
    private final int nx;
    private final int nz;
    private final double invDx;
    private final double[] fx;
    private final double[] fxs;
    private final double[] sh1;
    private final double[] sh2;
    private final double[] sh3;
    private final double[] rowA;
    private final double[] rowB;
    private final double[] rowC;
    private final double[] rowD;
    private final double[] rowU;
    private final double[] rowW;
    private final double[] rowT;
    private final double[] fzBot;
    private final double[] fzTop;

    CentredAdvection(StaggeredGrid g, ModelState st) {
        this.g = g;
        this.st = st;
        this.nx = g.nx;
        this.nz = g.nz;
        this.invDx = 1.0 / g.dx;
        fx = new double[nx + 1];
        fxs = new double[nx];
        sh1 = new double[nx];
        sh2 = new double[nx];
        sh3 = new double[nx];
        rowA = new double[nx];
        rowB = new double[nx];
        rowC = new double[nx];
        rowD = new double[nx];
        rowU = new double[nx];
        rowW = new double[nx];
        rowT = new double[nx];
        fzBot = new double[nx];
        fzTop = new double[nx];
    }

    /**
     * Writes -div(s V) into ts. When accX is not null the fluxes, times weight, are added to accX (west faces)
     * and accZ (interfaces).
     */
    void advect(double[] s, double[] ts, double[] accX, double[] accZ, double weight) {
        double[] u = st.u;
        double[] w = st.w;
        java.util.Arrays.fill(fzBot, 0.0);
        double wt = weight;
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            AdvectionFluxes.shift(s, o, -2, sh1, nx);
            AdvectionFluxes.shift(s, o, -1, sh2, nx);
            AdvectionFluxes.shift(s, o, 1, sh3, nx);
            System.arraycopy(s, o, rowB, 0, nx);
            System.arraycopy(u, o, rowU, 0, nx);
            for (int i = 0; i < nx; i++) {
                fx[i] = flux3(rowU[i], sh1[i], sh2[i], rowB[i], sh3[i]);
            }
            AdvectionFluxes.shift(fx, 0, 1, fxs, nx);
            if (accX != null) {
                System.arraycopy(accX, o, rowT, 0, nx);
                for (int i = 0; i < nx; i++) {
                    rowT[i] += wt * fx[i];
                }
                System.arraycopy(rowT, 0, accX, o, nx);
            }
            int kf = k + 1; // top interface of layer k
            int of = kf * nx;
            if (kf >= 2 && kf <= nz - 2) {
                System.arraycopy(s, o - nx, rowA, 0, nx);
                System.arraycopy(s, o + nx, rowC, 0, nx);
                System.arraycopy(s, o + 2 * nx, rowD, 0, nx);
                System.arraycopy(w, of, rowW, 0, nx);
                for (int i = 0; i < nx; i++) {
                    fzTop[i] = flux3(rowW[i], rowA[i], rowB[i], rowC[i], rowD[i]);
                }
            } else if (kf < nz) {
                double wl = g.wLo[kf];
                System.arraycopy(s, o + nx, rowC, 0, nx);
                System.arraycopy(w, of, rowW, 0, nx);
                for (int i = 0; i < nx; i++) {
                    fzTop[i] = rowW[i] * (wl * rowB[i] + (1.0 - wl) * rowC[i]);
                }
            } else {
                java.util.Arrays.fill(fzTop, 0.0);
            }
            if (accZ != null && kf < nz) {
                System.arraycopy(accZ, of, rowT, 0, nx);
                for (int i = 0; i < nx; i++) {
                    rowT[i] += wt * fzTop[i];
                }
                System.arraycopy(rowT, 0, accZ, of, nx);
            }
            double idz = 1.0 / g.dzf[k];
            for (int i = 0; i < nx; i++) {
                double t = 0.0 - (fxs[i] - fx[i]) * invDx;
                rowT[i] = t - (fzTop[i] - fzBot[i]) * idz;
                fzBot[i] = fzTop[i];
            }
            System.arraycopy(rowT, 0, ts, o, nx);
        }
    }
}
