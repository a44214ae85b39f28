package org.littoral.model.nonlinear;

import static org.littoral.model.nonlinear.AdvectionFluxes.flux3;
import static org.littoral.model.nonlinear.AdvectionFluxes.mcSlope;

/**
 * Advection in the linearised equations (the switch that removes the nonlinear terms): every field is
 * carried by the ambient cross-shore wind Ug in x only. Momentum with the third-order upwind-biased flux of
 * Wicker &amp; Skamarock (2002), eq. 4; theta and r with the MUSCL reconstruction (van Leer 1979) and the
 * monotonised-central limiter (van Leer 1977). The basic state's own vertical advection is
 * {@link BasicStateAdvection}. Writes tu, tv, tw, tth and tq.
 */
final class LinearisedAdvection implements ExplicitTerm {
    private final ModelState st;
    private final int nx;
    private final int nz;
    private final double invDx;
    private final double ug;
    private final double[] fx;
    private final double[] fxs;
    private final double[] sh1;
    private final double[] sh2;
    private final double[] sh3;
    private final double[] slope;

    LinearisedAdvection(StaggeredGrid g, ModelState st, double ug) {
        this.st = st;
        this.nx = g.nx;
        this.nz = g.nz;
        this.invDx = 1.0 / g.dx;
        this.ug = ug;
        fx = new double[nx + 1];
        fxs = new double[nx];
        sh1 = new double[nx];
        sh2 = new double[nx];
        sh3 = new double[nx];
        slope = new double[nx];
    }

    @Override
    public void apply(double timeSec, double stageWeight) {
        java.util.Arrays.fill(st.tw, 0, nx, 0.0);
        java.util.Arrays.fill(st.tw, nz * nx, (nz + 1) * nx, 0.0);
        faceField(st.u, st.tu, 0, nz);
        centreField(st.v, st.tv);
        faceField(st.w, st.tw, 1, nz);
        limitedScalar(st.th, st.tth);
        limitedScalar(st.q, st.tq);
    }

    /** u (rows 0..nz-1) or w (rows 1..nz-1): the x flux through the cell centre east of each point. */
    private void faceField(double[] s, double[] ts, int kFrom, int kTo) {
        for (int k = kFrom; k < kTo; k++) {
            int o = k * nx;
            AdvectionFluxes.shift(s, o, -1, sh1, nx);
            AdvectionFluxes.shift(s, o, 1, sh2, nx);
            AdvectionFluxes.shift(s, o, 2, sh3, nx);
            for (int i = 0; i < nx; i++) {
                fx[i] = flux3(ug, sh1[i], s[o + i], sh2[i], sh3[i]);
            }
            AdvectionFluxes.shift(fx, 0, -1, fxs, nx);
            for (int i = 0; i < nx; i++) {
                ts[o + i] = 0.0 - (fx[i] - fxs[i]) * invDx;
            }
        }
    }

    /** v: fx[i] is the flux through the west face of cell i. */
    private void centreField(double[] s, double[] ts) {
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            AdvectionFluxes.shift(s, o, -2, sh1, nx);
            AdvectionFluxes.shift(s, o, -1, sh2, nx);
            AdvectionFluxes.shift(s, o, 1, sh3, nx);
            for (int i = 0; i < nx; i++) {
                fx[i] = flux3(ug, sh1[i], sh2[i], s[o + i], sh3[i]);
            }
            AdvectionFluxes.shift(fx, 0, 1, fxs, nx);
            for (int i = 0; i < nx; i++) {
                ts[o + i] = 0.0 - (fxs[i] - fx[i]) * invDx;
            }
        }
    }

    /** theta, r: limited piecewise-linear upwind flux through the west face of each cell. */
    private void limitedScalar(double[] s, double[] ts) {
        double ap = Math.max(ug, 0.0);
        double am = Math.min(ug, 0.0);
        for (int k = 0; k < nz; k++) {
            int o = k * nx;
            AdvectionFluxes.shift(s, o, -1, sh1, nx);
            AdvectionFluxes.shift(s, o, 1, sh2, nx);
            for (int i = 0; i < nx; i++) {
                double c = s[o + i];
                slope[i] = mcSlope(c - sh1[i], sh2[i] - c);
            }
            AdvectionFluxes.shift(slope, 0, -1, sh3, nx); // slope of cell i - 1
            for (int i = 0; i < nx; i++) {
                fx[i] = ap * (sh1[i] + 0.5 * sh3[i]) + am * (s[o + i] - 0.5 * slope[i]);
            }
            AdvectionFluxes.shift(fx, 0, 1, fxs, nx);
            for (int i = 0; i < nx; i++) {
                ts[o + i] = 0.0 - (fxs[i] - fx[i]) * invDx;
            }
        }
    }
}
