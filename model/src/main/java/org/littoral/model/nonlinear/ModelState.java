package org.littoral.model.nonlinear;

/**
 * The prognostic fields on the C-grid and their explicit tendencies, flattened {@code a[k * nx + i]}: u at the
 * west face of cell i (nz rows), v, theta and r at cell centres (nz rows), w at interface k (nz + 1 rows, the
 * ground and the lid included). TOTAL values (ambient wind and background included). The explicit terms
 * write or add to the tendency arrays; the Runge-Kutta scheme combines them.
 */
final class ModelState {
    final int nx;
    final int nz;
    final double[] u;
    final double[] v;
    final double[] w;
    final double[] th;
    final double[] q;
    final double[] tu;
    final double[] tv;
    final double[] tw;
    final double[] tth;
    final double[] tq;

    ModelState(int nx, int nz) {
        this.nx = nx;
        this.nz = nz;
        int nc = nz * nx;
        u = new double[nc];
        v = new double[nc];
        w = new double[(nz + 1) * nx];
        th = new double[nc];
        q = new double[nc];
        tu = new double[nc];
        tv = new double[nc];
        tw = new double[(nz + 1) * nx];
        tth = new double[nc];
        tq = new double[nc];
    }
}
