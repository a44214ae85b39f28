package org.littoral.model.nonlinear;

import org.littoral.model.surface.KProfile;
import org.littoral.model.thermo.Thermo;

/**
 * Implicit (backward Euler) vertical mixing of u, v, theta and r with K from the K-profile
 * K = kappa w_s z (1 - z/h)^2 below h (Troen &amp; Mahrt 1986), w_s = (u*^3 + 0.6 w*^3)^(1/3)
 * (Holtslag &amp; Boville 1993; from memory), plus a background K above; surface fluxes and the bulk drag
 * tau/rho = C_D |V| V (implicit in V) as the lower boundary condition, and the countergradient (non-local)
 * flux of heated columns. The domain's columns are solved all at once ({@link #mixDomain}); a single column
 * such as the far field alone ({@link #mixColumn}). Both use {@link Tridiagonal}.
 */
final class VerticalMixing {
    /** Countergradient coefficient C of Troen &amp; Mahrt (1986), gamma_c = C w'x'_s / (w_s h) (from memory). */
    static final double COUNTERGRADIENT_C = 6.5;
    /** Critical bulk Richardson number of the mixing-depth diagnosis (Vogelezang &amp; Holtslag 1996, from memory). */
    static final double RI_CRITICAL = 0.25;
    /** Weight of u*^2 in the bulk Richardson number's shear (Vogelezang &amp; Holtslag 1996, b = 100, from memory). */
    static final double RI_USTAR_WEIGHT = 100.0;
    /** Thermal excess of a surface parcel, b w'theta'_s / w_s with b = 8.5 (Troen &amp; Mahrt 1986, from memory). */
    static final double EXCESS_B = 8.5;

    private final NonlinearConfig.BoundaryLayer bl;
    private final StaggeredGrid g;
    private final ModelState st;
    private final BaseState base;
    private final int nx;
    private final int nz;
    private final double kb;
    // domain: all columns at once, [k * nx + i]
    private final double[] kIface;
    private final double[] cgFactor;
    private final double[] dragCol;
    private final double[] dragFace;
    private final double[] fluxCol;
    private final double[] cgCol;
    private final double[] dtOverDz;
    private final double[] triK;
    private final double[] triLo;
    private final double[] triHi;
    private final double[] triM;
    private final double[] triB;
    private final double[] triR;
    // one column
    private final double[] colTv;
    private final double[] colU;
    private final double[] colV;
    private final double[] colA;
    private final double[] colB;
    private final double[] colC;
    private final double[] colR;
    private final double[] colK;

    VerticalMixing(NonlinearConfig cfg, StaggeredGrid g, ModelState st, BaseState base) {
        this.bl = cfg.boundaryLayer();
        this.g = g;
        this.st = st;
        this.base = base;
        this.nx = g.nx;
        this.nz = g.nz;
        this.kb = bl.backgroundDiffusivityM2PerS();
        int nc = nz * nx;
        kIface = new double[(nz + 1) * nx];
        cgFactor = new double[nx];
        dragCol = new double[nx];
        dragFace = new double[nx];
        fluxCol = new double[nx];
        cgCol = new double[nx];
        dtOverDz = new double[nz];
        triK = new double[(nz + 1) * nx];
        triLo = new double[nc];
        triHi = new double[nc];
        triM = new double[nc];
        triB = new double[nc];
        triR = new double[nc];
        colTv = new double[nz];
        colU = new double[nz];
        colV = new double[nz];
        colA = new double[nz];
        colB = new double[nz];
        colC = new double[nz];
        colR = new double[nz];
        colK = new double[nz + 1];
    }

    /** One backward-Euler step of every column of the domain, K from the surface layer and the slab depths h. */
    void mixDomain(SurfaceLayer sfc, double[] h, double dt) {
        double[] u = st.u;
        double[] v = st.v;
        double[] th = st.th;
        double[] q = st.q;
        double[] heatFluxKin = sfc.heatFluxKin;
        double[] moistFluxKin = sfc.moistFluxKin;
        double[] cd = sfc.cd;
        double[] windSfc = sfc.windSfc;
        for (int i = 0; i < nx; i++) {
            double hm = h[i];
            if (heatFluxKin[i] > 0) {
                for (int k = 0; k < nz; k++) {
                    int n = k * nx + i;
                    colTv[k] = th[n] * (1.0 + Buoyancy.VIRTUAL_FACTOR * q[n]);
                    colU[k] = 0.5 * (u[n] + u[k * nx + g.ip1[i]]);
                    colV[k] = v[n];
                }
                hm = mixingDepth(colTv, colU, colV, h[i], heatFluxKin[i], Math.sqrt(cd[i]) * windSfc[i]);
            }
            cgFactor[i] = kProfile(heatFluxKin[i], windSfc[i], cd[i], hm, kIface, i, nx);
        }
        // all columns at once: each level is a loop over columns, so the Thomas recurrences of
        // different columns run side by side (same arithmetic per column as a column-by-column solve)
        for (int i = 0; i < nx; i++) {
            dragCol[i] = cd[i] * windSfc[i];
        }
        double dragFactor = dt / g.dzf[0];
        // theta and r: K of the column itself, no drag; one factorisation for both
        diffusionCoefficients(kIface, false, dt);
        Tridiagonal.factoriseColumns(triLo, triHi, null, dragFactor, triM, triB, nx, nz);
        for (int i = 0; i < nx; i++) {
            fluxCol[i] = heatFluxKin[i];
            cgCol[i] = cgFactor[i] * heatFluxKin[i];
        }
        solveFactorised(th, dt);
        for (int i = 0; i < nx; i++) {
            fluxCol[i] = moistFluxKin[i];
            cgCol[i] = cgFactor[i] * moistFluxKin[i];
        }
        solveFactorised(q, dt);
        // v: same K, drag on the lowest layer
        java.util.Arrays.fill(fluxCol, 0.0);
        java.util.Arrays.fill(cgCol, 0.0);
        Tridiagonal.factoriseColumns(triLo, triHi, dragCol, dragFactor, triM, triB, nx, nz);
        solveFactorised(v, dt);
        // u at the west face of cell i: average K and drag of the two columns
        for (int i = 0; i < nx; i++) {
            int l = g.im1[i];
            dragFace[i] = 0.5 * (cd[i] * windSfc[i] + cd[l] * windSfc[l]);
        }
        diffusionCoefficients(kIface, true, dt);
        Tridiagonal.factoriseColumns(triLo, triHi, dragFace, dragFactor, triM, triB, nx, nz);
        solveFactorised(u, dt);
        for (int i = 0; i < nx; i++) {
            q[i] = Math.max(q[i], 0.0);
        }
    }

    /**
     * Interface diffusivities (column K, or the average of columns i-1 and i at u points) into triK and
     * the backward-Euler couplings lo = dt K_k / (dz_k dzc_k), hi = dt K_(k+1) / (dz_k dzc_(k+1)) into
     * triLo and triHi, all [k * nx + i].
     */
    private void diffusionCoefficients(double[] kI, boolean faces, double dt) {
        int[] im = g.im1;
        for (int k = 0; k <= nz; k++) {
            int o = k * nx;
            if (faces) {
                for (int i = 0; i < nx; i++) {
                    triK[o + i] = 0.5 * (kI[o + im[i]] + kI[o + i]);
                }
            } else {
                System.arraycopy(kI, o, triK, o, nx);
            }
        }
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            double cLo = k > 0 ? dt / (g.dzf[k] * g.dzc[k]) : 0.0;
            double cHi = k < nz - 1 ? dt / (g.dzf[k] * g.dzc[k + 1]) : 0.0;
            for (int i = 0; i < nx; i++) {
                triLo[o + i] = cLo * triK[o + i];
                triHi[o + i] = cHi * triK[o + nx + i];
            }
        }
    }

    /**
     * Backward-Euler diffusion of s for all columns with the factorised matrices; surface flux fluxCol
     * into the lowest layer and the explicit divergence of the non-local flux cgCol * max(0, K - K_bg).
     */
    private void solveFactorised(double[] s, double dt) {
        for (int k = 0; k < nz; k++) {
            dtOverDz[k] = dt / g.dzf[k];
        }
        double[] r = triR;
        System.arraycopy(s, 0, r, 0, nz * nx);
        for (int i = 0; i < nx; i++) {
            double cg = cgCol[i];
            if (cg == 0.0) {
                continue;
            }
            // explicit divergence of the non-local flux K gamma_c through the layer's interfaces
            for (int k = 0; k < nz; k++) {
                int n = k * nx + i;
                double fTop = k + 1 < nz ? Math.max(0.0, triK[n + nx] - kb) : 0.0;
                double fBot = k > 0 ? Math.max(0.0, triK[n] - kb) : 0.0;
                r[n] -= dtOverDz[k] * cg * (fTop - fBot);
            }
        }
        double fluxFactor = dt / g.dzf[0];
        for (int i = 0; i < nx; i++) {
            r[i] += fluxFactor * fluxCol[i];
        }
        Tridiagonal.solveColumns(r, triM, triB, triHi, s, nx, nz);
    }

    /**
     * One backward-Euler step of a single column (theta, r, u, v at its layer centres) with surface fluxes
     * fl = {heat, moisture, drag coefficient}, lowest-level wind speed spd and slab depth hSlab.
     */
    void mixColumn(double[] th, double[] q, double[] u, double[] v, double[] fl, double spd, double hSlab, double dt) {
        double hm = hSlab;
        if (fl[0] > 0) {
            for (int k = 0; k < nz; k++) {
                colTv[k] = th[k] * (1.0 + Buoyancy.VIRTUAL_FACTOR * q[k]);
            }
            hm = mixingDepth(colTv, u, v, hSlab, fl[0], Math.sqrt(fl[2]) * spd);
        }
        double cg = kProfile(fl[0], spd, fl[2], hm, colK, 0, 1);
        solveColumn(th, dt, fl[0], 0.0, cg * fl[0]);
        solveColumn(q, dt, fl[1], 0.0, cg * fl[1]);
        q[0] = Math.max(0.0, q[0]);
        // momentum: the same K, and the implicit drag C_D |V| on the lowest layer
        solveColumn(u, dt, 0.0, fl[2] * spd, 0.0);
        solveColumn(v, dt, 0.0, fl[2] * spd, 0.0);
    }

    /**
     * Backward-Euler diffusion of the column s with the interface diffusivities colK; a surface flux
     * (kinematic) into the lowest layer, a linear drag coefficient (m/s) on the lowest layer and the non-local
     * (countergradient) flux term.
     */
    private void solveColumn(double[] s, double dt, double surfaceFlux, double dragMPerS, double countergradient) {
        for (int k = 0; k < nz; k++) {
            double lo = k > 0 ? dt * colK[k] / (g.dzf[k] * g.dzc[k]) : 0.0;
            double hi = k < nz - 1 ? dt * colK[k + 1] / (g.dzf[k] * g.dzc[k + 1]) : 0.0;
            colA[k] = -lo;
            colC[k] = -hi;
            colB[k] = 1.0 + lo + hi;
            colR[k] = s[k];
            if (countergradient != 0.0) {
                // explicit divergence of the non-local flux K gamma_c through the layer's interfaces
                double fTop = k + 1 < nz ? Math.max(0.0, colK[k + 1] - kb) : 0.0;
                double fBot = k > 0 ? Math.max(0.0, colK[k] - kb) : 0.0;
                colR[k] -= dt * countergradient * (fTop - fBot) / g.dzf[k];
            }
        }
        colR[0] += dt * surfaceFlux / g.dzf[0];
        colB[0] += dt * dragMPerS / g.dzf[0];
        Tridiagonal.solveColumn(colA, colB, colC, colR, s, nz);
    }

    /**
     * K at interfaces 0..nz of one column into out[offset + k * stride]; returns the countergradient factor
     * gamma_c / (surface flux) of the column (0 unless heated).
     */
    double kProfile(double heatFlux, double wind, double cdI, double hI, double[] out, int offset, int stride) {
        double ustar = Math.max(0.01, Math.sqrt(cdI) * wind);
        // Troen & Mahrt (1986) profile with the Holtslag & Boville (1993) velocity scale (surface package)
        KProfile kp = KProfile.of(ustar, heatFlux, base.th0[0], hI, kb);
        out[offset] = 0;
        out[offset + nz * stride] = 0;
        for (int k = 1; k < nz; k++) {
            out[offset + k * stride] = g.zf[k] < hI ? kp.diffusivityM2s(g.zf[k]) : kb;
        }
        // countergradient (non-local) term of Troen & Mahrt (1986): gamma_c = C w'x'_s / (w_s h), C = 6.5
        // (from memory), so the heated layer mixes to neutral instead of staying superadiabatic
        return heatFlux > 0 ? COUNTERGRADIENT_C / (kp.velocityScaleMs(0.5 * hI) * hI) : 0.0;
    }

    /**
     * Depth of the turbulent layer of a heated column, m: the slab mixed-layer depth, unless the column's own
     * profile caps the turbulence lower, as where cool marine air has run in under the warm convective layer
     * behind a breeze front. Diagnosed as in non-local K-profile schemes (Troen &amp; Mahrt 1986, BLM 37,
     * 129-148; Vogelezang &amp; Holtslag 1996, BLM 81, 245-269; from memory): the lowest height where the bulk
     * Richardson number of a surface parcel with its thermal excess,
     * Ri_b(z) = (g / theta_v1) (theta_v(z) - theta_v1 - b w'theta'_s / w_s) (z - z1) / (|V(z) - V1|^2 + 100 u*^2),
     * reaches 0.25; never above the slab depth and never below the night depth.
     */
    double mixingDepth(double[] tv, double[] uc, double[] vc, double hSlab, double heatFlux, double ustar) {
        double ws = KProfile.mixedLayerVelocityScaleMs(Math.max(0.01, ustar), KProfile.convectiveVelocityMs(heatFlux, base.th0[0], hSlab));
        double thS = tv[0] + EXCESS_B * heatFlux / ws;
        double shear0 = RI_USTAR_WEIGHT * ustar * ustar;
        double floor = bl.nightDepthM();
        double prevRi = 0.0;
        for (int k = 1; k < nz && g.zc[k - 1] < hSlab; k++) {
            double du = uc[k] - uc[0];
            double dv = vc[k] - vc[0];
            double ri = Thermo.G / tv[0] * (tv[k] - thS) * (g.zc[k] - g.zc[0]) / (du * du + dv * dv + shear0 + 1e-6);
            if (ri >= RI_CRITICAL) {
                double f0 = (RI_CRITICAL - prevRi) / (ri - prevRi);
                double z = g.zc[k - 1] + Math.max(0.0, Math.min(1.0, f0)) * (g.zc[k] - g.zc[k - 1]);
                return Math.max(floor, Math.min(hSlab, z));
            }
            prevRi = ri;
        }
        return hSlab;
    }
}
