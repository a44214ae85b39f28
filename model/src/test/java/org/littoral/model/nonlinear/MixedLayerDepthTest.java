package org.littoral.model.nonlinear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.littoral.model.coast.Coast;
import org.littoral.model.coast.SurfaceMap;
import org.littoral.model.grid.HorizontalGrid;
import org.littoral.model.grid.VerticalGrid;

/**
 * The slab mixed-layer depth is carried by the wind of the surface layer (the lowest tenth of h). Behind a breeze
 * front marine air runs inland under the land's deep convective layer while the return flow above it blows
 * offshore: the depth must move inland with the marine air (its thermal internal boundary layer; Venkatram 1977,
 * Garratt 1990), not stay where a mean over the whole layer, near zero there, would leave it.
 */
class MixedLayerDepthTest {
    static final int NX = 160; // wide enough for the default 50 km sponges (not used here)
    static final double DX = 1000.0;

    static StaggeredGrid grid() {
        return new StaggeredGrid(HorizontalGrid.centred(NX, DX), VerticalGrid.stretched(41, 4000.0, 20.0));
    }

    static NonlinearConfig config() {
        Coast coast = new Coast(40.0, 0.0, 0.0, 270.0, 172);
        return NonlinearConfig.builder(coast, SurfaceMap.simpleCoast(293.15, 0.2, 1.0, 0.1), HorizontalGrid.centred(NX, DX),
                VerticalGrid.stretched(41, 4000.0, 20.0)).forcing(new Forcing.None()).build();
    }

    /** Onshore (+x) below zTurn, offshore above with the same column integral over 0..2 zTurn: a breeze cell. */
    static void breezeCell(StaggeredGrid g, ModelState st, double uLow, double zTurn) {
        for (int k = 0; k < g.nz; k++) {
            double u = g.zc[k] < zTurn ? uLow : g.zc[k] < 2 * zTurn ? -uLow : 0.0;
            for (int i = 0; i < g.nx; i++) {
                st.u[k * g.nx + i] = u;
            }
        }
    }

    static int column(StaggeredGrid g, double xM) {
        int best = 0;
        for (int i = 0; i < g.nx; i++) {
            if (Math.abs(g.xc[i] - xM) < Math.abs(g.xc[best] - xM)) {
                best = i;
            }
        }
        return best;
    }

    static double[] weakUpwardFlux() {
        double[] f = new double[NX];
        java.util.Arrays.fill(f, 1e-12);
        return f;
    }

    @Test
    void aShallowMarineLayerMovesInlandUnderTheOpposingReturnFlow() {
        StaggeredGrid g = grid();
        ModelState st = new ModelState(g.nx, g.nz);
        MixedLayerDepth ml = new MixedLayerDepth(config(), g, st);
        // 300 m deep marine layer seaward of x = 0, 1500 m convective layer inland
        for (int i = 0; i < NX; i++) {
            ml.h[i] = g.xc[i] < 0 ? 300.0 : 1500.0;
        }
        // 3 m/s onshore below 750 m, 3 m/s offshore 750-1500 m: the mean over the land's 1500 m is zero
        breezeCell(g, st, 3.0, 750.0);
        double dt = 20.0;
        // 30 min at 3 m/s: the marine air runs 5.4 km inland (a vanishing upward flux: the land layer neither collapses
        // nor grows measurably, so only the carrying is tested)
        for (int n = 0; n < 90; n++) {
            ml.step(weakUpwardFlux(), dt);
        }
        int i3 = column(g, 3000.0);
        assertTrue(ml.h[i3] < 900.0, "3 km inland, 30 min of 3 m/s onshore surface wind: depth " + ml.h[i3]
                + " m should be the marine layer's, not the land's 1500 m");
        int i15 = column(g, 15000.0);
        assertEquals(1500.0, ml.h[i15], 1.0, "15 km inland, beyond the marine air's reach, the land's layer is untouched (to the first-order upwind scheme's spread)");
    }

    @Test
    void aUniformLayerStaysUniformWhateverTheWind() {
        StaggeredGrid g = grid();
        ModelState st = new ModelState(g.nx, g.nz);
        MixedLayerDepth ml = new MixedLayerDepth(config(), g, st);
        java.util.Arrays.fill(ml.h, 1200.0);
        breezeCell(g, st, 4.0, 500.0);
        for (int n = 0; n < 50; n++) {
            ml.step(weakUpwardFlux(), 30.0);
        }
        for (int i = 0; i < NX; i++) {
            // water columns keep at least their marine depth, land columns at least the night depth: 1200 m is above both
            assertEquals(1200.0, ml.h[i], 1e-3);
        }
    }
}
