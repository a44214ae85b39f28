package org.littoral.scenarios.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import org.junit.jupiter.api.Test;

/**
 * The model's arrival at a site is when the total near-surface wind turns into the onshore sector
 * (within 60 deg of the inland direction), the same definition the analysis chain labels passages by.
 */
class BreezeArrivalTest {
    private static final double[] T = {8, 9, 10, 11, 12};

    @Test
    void anOffshoreWindTurningOnshoreArrivesWhereTheCrossShoreComponentPassesTheThreshold() {
        Double a = BreezeDiagnostics.firstOnshore(T, new double[] {-3, -2, -0.5, 1.5, 3}, new double[] {0, 0, 0, 0, 0}, 0.5);
        assertEquals(10.5, a, 1e-12);
    }

    @Test
    void aShoreParallelWindWithAWeakOnshoreComponentHasNotArrived() {
        // 5 m/s alongshore with 1 m/s onshore is 79 deg from the inland direction: outside the 60 deg sector
        assertNull(BreezeDiagnostics.firstOnshore(T, new double[] {0, 0.5, 1, 1, 1}, new double[] {5, 5, 5, 5, 5}, 0.5));
    }

    @Test
    void theSectorEdgeIsInterpolatedOnTheAngularMargin() {
        // along = 2 m/s: in the sector once cross >= 2 / tan(60 deg) = 1.1547 m/s
        Double a = BreezeDiagnostics.firstOnshore(new double[] {10, 11}, new double[] {0.1547, 2.1547}, new double[] {2, 2}, 0.5);
        assertEquals(10.5, a, 1e-4);
    }

    @Test
    void aWindOnshoreFromTheStartHasNoArrival() {
        assertNull(BreezeDiagnostics.firstOnshore(T, new double[] {3, 3, 4, 5, 4}, new double[] {0, 0, 0, 0, 0}, 0.5));
    }
}
