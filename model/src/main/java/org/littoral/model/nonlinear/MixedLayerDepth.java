package org.littoral.model.nonlinear;

import org.littoral.model.coast.SurfaceSegment;
import org.littoral.model.mixedlayer.SlabMixedLayer;

/**
 * Slab mixed-layer depth h(x, t) per column: zero-order-jump growth d(h^2)/dt = 2 (1 + 2A) H_kin / gamma
 * (Tennekes 1973) while the surface heats, upwind advection by the surface-layer cross-shore wind, collapse to
 * the night depth when the heat flux turns negative; the marine layer over water keeps at least its
 * configured depth.
 */
final class MixedLayerDepth {
    private final NonlinearConfig cfg;
    private final StaggeredGrid g;
    private final ModelState st;
    private final int nx;
    private final int nz;
    private final double invDx;
    private final boolean[] land;
    /** Depth per column, m. */
    final double[] h;
    private final double[] hWork;

    MixedLayerDepth(NonlinearConfig cfg, StaggeredGrid g, ModelState st) {
        this.cfg = cfg;
        this.g = g;
        this.st = st;
        this.nx = g.nx;
        this.nz = g.nz;
        this.invDx = 1.0 / g.dx;
        land = new boolean[nx];
        h = new double[nx];
        hWork = new double[nx];
        for (int i = 0; i < nx; i++) {
            SurfaceSegment s = cfg.surface().at(g.xc[i]);
            land[i] = s.isLand();
            h[i] = s.isLand() ? cfg.boundaryLayer().initialDepthM() : cfg.boundaryLayer().marineDepthM();
        }
    }

    boolean isLand(int i) {
        return land[i];
    }

    /** The start depth of a column over land or water. */
    double initialDepthM(int i) {
        return land[i] ? cfg.boundaryLayer().initialDepthM() : cfg.boundaryLayer().marineDepthM();
    }

    /** Fraction of the depth whose mean wind carries it: the surface layer, the lowest tenth (common practice). */
    static final double CARRIER_FRACTION = 0.1;

    /**
     * One step of every column: advection dh/dt = -u_s dh/dx (first-order upwind, monotone), then growth. The depth
     * is carried by u_s, the mean cross-shore wind of the surface layer (the lowest tenth of h, at least the lowest
     * model layer), not by the mean over the whole layer: where marine air runs inland under the land's convective
     * layer behind a breeze front, the mean over 0..h mixes that onshore flow with the offshore return flow above it
     * and is near zero, so the land's deep layer stayed in place over the marine air and mixed it through 1.5 km.
     * Carried by the air near the ground, the depth behind the front is the thermal internal boundary layer of the
     * marine air, growing inland from the marine-layer depth by the surface heat flux (Venkatram 1977; Garratt 1990;
     * from memory). Over uniform ground h is uniform and the carrier does not matter.
     */
    void step(double[] heatFluxKin, double dt) {
        double[] u = st.u;
        for (int i = 0; i < nx; i++) {
            double hu = 0;
            double wsum = 0;
            double top = Math.max(g.zf[1], CARRIER_FRACTION * h[i]);
            for (int k = 0; k < nz && g.zf[k] < top; k++) {
                double dz = Math.min(g.zf[k + 1], top) - g.zf[k];
                hu += 0.5 * (u[k * nx + i] + u[k * nx + g.ip1[i]]) * dz;
                wsum += dz;
            }
            double um = wsum > 0 ? hu / wsum : 0;
            double dhdx = um >= 0 ? (h[i] - h[g.im1[i]]) * invDx : (h[g.ip1[i]] - h[i]) * invDx;
            hWork[i] = h[i] - dt * um * dhdx;
        }
        for (int i = 0; i < nx; i++) {
            h[i] = grownDepth(hWork[i], heatFluxKin[i], land[i], dt);
        }
    }

    /** One step of the slab depth: ZOJ growth while heated, collapse on land when not, marine floor on water. */
    double grownDepth(double hh, double heatFlux, boolean isLand, double dt) {
        NonlinearConfig.BoundaryLayer bl = cfg.boundaryLayer();
        double floor = isLand ? bl.nightDepthM() : bl.marineDepthM();
        if (heatFlux > 0 || isLand) {
            double gamma = Math.min(0.09, Math.max(1e-4, cfg.theta().gradientKPerM(hh)));
            // zero-order-jump growth d(h^2)/dt = 2 (1 + 2A) H_kin / gamma, collapse when not heated (Tennekes 1973)
            hh = new SlabMixedLayer(bl.entrainmentRatio(), gamma, floor).step(hh, heatFlux, dt);
        }
        return Math.min(Math.max(hh, floor), 0.9 * g.topM());
    }
}
