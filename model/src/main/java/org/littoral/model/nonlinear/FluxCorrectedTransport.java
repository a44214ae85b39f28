package org.littoral.model.nonlinear;

/**
 * Two-dimensional flux-corrected transport limiter (Zalesak 1979, J. Comput. Phys. 31, 335-362, eqs. 5-19)
 * on a grid periodic in x with no flux through the ground and the lid, applied once per step to the
 * time-averaged high-order flux of a Runge-Kutta step ("final-stage" limiting, Skamarock 2006, Mon. Wea.
 * Rev. 134, 2241-2250).
 *
 * <p>Given the start-of-step field s0, the unlimited Runge-Kutta result sRk = s0 + dt S - dt div F_H (F_H the
 * step's weighted mean of the stage fluxes, S any other tendency) and the step's mean velocity (u, w), the
 * limited result is sRk + dt div((1 - C) A), that is s0 + dt S - dt div(F_L + C A), where F_L is the
 * first-order upwind flux of s0, A = F_H - F_L the antidiffusive flux and C in [0, 1] Zalesak's face
 * coefficient. The bounds are the largest and smallest of s0 and the low-order solution over each cell
 * and its four neighbours, so the result has no new extrema while the low-order solution has none (Courant
 * sums up to about 1 in a non-divergent flow).
 *
 * <p>Layout: cells n = k nx + i (k = 0..nz-1), x fluxes at the west face of cell n, z fluxes and w at
 * interface k (the bottom of layer k), arrays of (nz + 1) nx. Each loop runs over whole arrays with one
 * index, reading neighbours from shifted copies, so the JIT compiles the loops to vector instructions.
 */
final class FluxCorrectedTransport {
    /** Keeps R = Q / P finite where no antidiffusive flux enters or leaves (Q is then irrelevant). */
    private static final double TINY = 1e-300;

    private final int nx;
    private final int nc;
    private final double invDx;
    private final double[] idz;
    private final double[] west;
    private final double[] below;
    private final double[] ax;
    private final double[] axE;
    private final double[] az;
    private final double[] azT;
    private final double[] td;
    private final double[] hi;
    private final double[] lo;
    private final double[] rp;
    private final double[] rm;
    private final double[] rpN;
    private final double[] rmN;

    /**
     * @param nx cells in x (periodic)
     * @param nz layers
     * @param dx cell width, m
     * @param dzf layer thicknesses, m (nz values)
     */
    FluxCorrectedTransport(int nx, int nz, double dx, double[] dzf) {
        this.nx = nx;
        this.nc = nx * nz;
        this.invDx = 1.0 / dx;
        idz = new double[nc];
        for (int k = 0; k < nz; k++) {
            java.util.Arrays.fill(idz, k * nx, (k + 1) * nx, 1.0 / dzf[k]);
        }
        int nf = nc + nx;
        west = new double[nc];
        below = new double[nf];
        ax = new double[nc];
        axE = new double[nc];
        az = new double[nf];
        azT = new double[nc];
        td = new double[nc];
        hi = new double[nc];
        lo = new double[nc];
        rp = new double[nc];
        rm = new double[nc];
        rpN = new double[nf];
        rmN = new double[nf];
    }

    /**
     * Replaces sRk by the limited result.
     *
     * @param s0 field at the start of the step (cells)
     * @param sRk unlimited result of the step (cells); overwritten with the limited result
     * @param fxH mean high-order flux through the west face of each cell, s m/s
     * @param fzH mean high-order flux through each interface ((nz + 1) nx; rows 0 and nz are not read)
     * @param uMean mean u at the west face of each cell, m/s
     * @param wMean mean w at each interface, m/s ((nz + 1) nx)
     * @param dt step, s
     */
    void limit(double[] s0, double[] sRk, double[] fxH, double[] fzH, double[] uMean, double[] wMean, double dt) {
        // antidiffusive fluxes A = F_H - F_L; F_L upwind of s0 (Zalesak eq. 6)
        shiftWest(s0, west);
        for (int n = 0; n < nc; n++) {
            double a = uMean[n];
            ax[n] = fxH[n] - (Math.max(a, 0.0) * west[n] + Math.min(a, 0.0) * s0[n]);
        }
        System.arraycopy(s0, 0, below, nx, nc);
        for (int n = nx; n < nc; n++) {
            double a = wMean[n];
            az[n] = fzH[n] - (Math.max(a, 0.0) * below[n] + Math.min(a, 0.0) * s0[n]);
        }
        // rows 0 (ground) and nz (lid) of az are never written: no flux there
        shiftEast(ax, axE);
        System.arraycopy(az, nx, azT, 0, nc);
        // low-order solution td = sRk + dt div A (eq. 7)
        for (int n = 0; n < nc; n++) {
            td[n] = sRk[n] + dt * ((axE[n] - ax[n]) * invDx + (azT[n] - az[n]) * idz[n]);
        }
        // bounds: extremes of s0 and td over the cell and its four neighbours (eqs. 17)
        for (int n = 0; n < nc; n++) {
            hi[n] = Math.max(s0[n], td[n]);
            lo[n] = Math.min(s0[n], td[n]);
        }
        neighbourExtremes(hi, true);
        neighbourExtremes(lo, false);
        // R+ and R- (eqs. 8-13): the fraction of the incoming (outgoing) antidiffusive flux the cell can take
        for (int n = 0; n < nc; n++) {
            double pIn = dt * ((Math.max(ax[n], 0.0) - Math.min(axE[n], 0.0)) * invDx
                    + (Math.max(az[n], 0.0) - Math.min(azT[n], 0.0)) * idz[n]);
            double pOut = dt * ((Math.max(axE[n], 0.0) - Math.min(ax[n], 0.0)) * invDx
                    + (Math.max(azT[n], 0.0) - Math.min(az[n], 0.0)) * idz[n]);
            rp[n] = Math.min(1.0, (hi[n] - td[n]) / (pIn + TINY));
            rm[n] = Math.min(1.0, (td[n] - lo[n]) / (pOut + TINY));
        }
        // face coefficients (eq. 14) and the part (1 - C) A that the limiter takes back: x faces
        shiftWest(rp, rpN);
        shiftWest(rm, rmN);
        for (int n = 0; n < nc; n++) {
            double a = ax[n];
            double cPos = Math.min(rp[n], rmN[n]); // flow from cell i-1 into cell i
            double cNeg = Math.min(rpN[n], rm[n]); // flow from cell i into cell i-1
            ax[n] = (1.0 - cPos) * Math.max(a, 0.0) + (1.0 - cNeg) * Math.min(a, 0.0);
        }
        // z faces (interfaces 1..nz-1; the cell below is n - nx)
        System.arraycopy(rp, 0, rpN, nx, nc);
        System.arraycopy(rm, 0, rmN, nx, nc);
        for (int n = nx; n < nc; n++) {
            double a = az[n];
            double cPos = Math.min(rp[n], rmN[n]);
            double cNeg = Math.min(rpN[n], rm[n]);
            az[n] = (1.0 - cPos) * Math.max(a, 0.0) + (1.0 - cNeg) * Math.min(a, 0.0);
        }
        shiftEast(ax, axE);
        System.arraycopy(az, nx, azT, 0, nc);
        for (int n = 0; n < nc; n++) {
            sRk[n] = sRk[n] + dt * ((axE[n] - ax[n]) * invDx + (azT[n] - az[n]) * idz[n]);
        }
    }

    /** Replaces m by its extreme over each cell and its four neighbours (the ground and lid rows have three). */
    private void neighbourExtremes(double[] m, boolean max) {
        double[] wv = rp; // free until R+ is computed
        double[] ev = rm;
        shiftWest(m, wv);
        shiftEast(m, ev);
        double[] up = rpN; // free until the face coefficients
        double[] dn = rmN;
        System.arraycopy(m, 0, dn, nx, nc - nx);
        System.arraycopy(m, 0, dn, 0, nx);
        System.arraycopy(m, nx, up, 0, nc - nx);
        System.arraycopy(m, nc - nx, up, nc - nx, nx);
        if (max) {
            for (int n = 0; n < nc; n++) {
                m[n] = Math.max(Math.max(m[n], Math.max(wv[n], ev[n])), Math.max(up[n], dn[n]));
            }
        } else {
            for (int n = 0; n < nc; n++) {
                m[n] = Math.min(Math.min(m[n], Math.min(wv[n], ev[n])), Math.min(up[n], dn[n]));
            }
        }
    }

    /** out[k nx + i] = s[k nx + (i - 1) mod nx]. */
    private void shiftWest(double[] s, double[] out) {
        for (int o = 0; o < nc; o += nx) {
            out[o] = s[o + nx - 1];
            System.arraycopy(s, o, out, o + 1, nx - 1);
        }
    }

    /** out[k nx + i] = s[k nx + (i + 1) mod nx]. */
    private void shiftEast(double[] s, double[] out) {
        for (int o = 0; o < nc; o += nx) {
            System.arraycopy(s, o + 1, out, o, nx - 1);
            out[o + nx - 1] = s[o];
        }
    }
}
