package org.littoral.model.surface;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class ClearSkyRadiationTest {

    private static double g(double elevationDeg) {
        return ClearSkyRadiation.clearSkyGlobalWm2(Math.sin(Math.toRadians(elevationDeg)));
    }

    @Test
    void kastenCzeplakClearSkyAt30DegreesIs425() {
        // Kasten & Czeplak (1980); docs/references.md section 10 (C): 910 sin 30 - 30.
        assertEquals(425.0, g(30), 0.05);
    }

    @Test
    void kastenCzeplakClearSkyAt45DegreesIs613Point5() {
        assertEquals(613.5, g(45), 0.05);
    }

    @Test
    void kastenCzeplakClearSkyAt60DegreesIs758Point1() {
        assertEquals(758.1, g(60), 0.05);
    }

    @Test
    void clearSkyIrradianceIsZeroWhenTheFitTurnsNegativeAtLowSun() {
        assertEquals(0.0, ClearSkyRadiation.clearSkyGlobalWm2(0.02), 0.0);
        assertEquals(0.0, ClearSkyRadiation.clearSkyGlobalWm2(-0.5), 0.0);
    }

    @Test
    void overcastSkyPassesAQuarterOfTheClearSkyIrradiance() {
        // Kasten & Czeplak (1980): 1 - 0.75 (8/8)^3.4 = 0.25.
        assertEquals(0.25, ClearSkyRadiation.cloudFactor(1.0), 1e-12);
        assertEquals(1.0, ClearSkyRadiation.cloudFactor(0.0), 1e-12);
        assertEquals(1.0 - 0.75 * Math.pow(0.5, 3.4), ClearSkyRadiation.cloudFactor(0.5), 1e-12);
    }

    @Test
    void cloudFractionOutsideZeroToOneIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> ClearSkyRadiation.cloudFactor(8.0));
    }
}
