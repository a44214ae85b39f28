package org.littoral.model.nonlinear;

import org.littoral.model.grid.HorizontalGrid;
import org.littoral.model.grid.VerticalGrid;

/**
 * Arakawa C-grid in (x, z) (Arakawa &amp; Lamb 1977, Methods Comput. Phys. 17): scalars, v, theta and
 * mixing ratio at cell centres (x_i, zc_k); u at the west face of each cell (x_i - dx/2, zc_k); w on
 * the interfaces (x_i, zf_k), k = 0..nz with w = 0 on the ground (k = 0) and the lid (k = nz).
 * The configured {@link VerticalGrid} gives the interfaces zf, from 0 to the lid; x is periodic.
 * Arrays are flattened {@code a[k * nx + i]}.
 */
final class StaggeredGrid {
    final int nx;
    final int nz;
    final double dx;
    final double[] xc;
    final double[] zf;
    final double[] zc;
    /** Cell thickness zf[k+1] - zf[k]. */
    final double[] dzf;
    /** Centre spacing zc[k] - zc[k-1] (k = 1..nz-1; entries 0 and nz are copies of their neighbours). */
    final double[] dzc;
    /** Linear-interpolation weight of level k-1 at interface k (the weight of level k is 1 - wLo[k]). */
    final double[] wLo;
    final int[] im1;
    final int[] ip1;
    final int[] im2;
    final int[] ip2;

    StaggeredGrid(HorizontalGrid x, VerticalGrid interfaces) {
        if (interfaces.levelM(0) != 0.0) {
            throw new IllegalArgumentException("vertical grid: the first interface must be the ground (0 m); got "
                    + interfaces.levelM(0) + " m; build the grid from 0 m");
        }
        if (interfaces.size() < 3) {
            throw new IllegalArgumentException("vertical grid: need at least 3 interfaces (2 layers); got " + interfaces.size());
        }
        nx = x.nx();
        dx = x.dxM();
        nz = interfaces.size() - 1;
        xc = x.pointsM();
        zf = interfaces.levelsM();
        zc = new double[nz];
        dzf = new double[nz];
        for (int k = 0; k < nz; k++) {
            zc[k] = 0.5 * (zf[k] + zf[k + 1]);
            dzf[k] = zf[k + 1] - zf[k];
        }
        dzc = new double[nz + 1];
        wLo = new double[nz + 1];
        for (int k = 1; k < nz; k++) {
            dzc[k] = zc[k] - zc[k - 1];
            wLo[k] = (zc[k] - zf[k]) / dzc[k];
        }
        dzc[0] = dzf[0];
        dzc[nz] = dzf[nz - 1];
        im1 = new int[nx];
        ip1 = new int[nx];
        im2 = new int[nx];
        ip2 = new int[nx];
        for (int i = 0; i < nx; i++) {
            im1[i] = (i - 1 + nx) % nx;
            ip1[i] = (i + 1) % nx;
            im2[i] = (i - 2 + 2 * nx) % nx;
            ip2[i] = (i + 2) % nx;
        }
    }

    double topM() {
        return zf[nz];
    }

    double lengthM() {
        return nx * dx;
    }
}
