package org.littoral.model.surface;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class NetRadiationTest {

    @Test
    void clearNightNetRadiationIsAFewTensOfWattsOutward() {
        // Holtslag & van Ulden (1983) scheme, constants from memory; Oke (1987) ch. 2: clear-night Q* of
        // roughly -50 to -100 W/m2 over grass (from memory).
        double q = NetRadiation.netRadiationWm2(0.23, 0.0, 283.15, 0.0);
        assertTrue(q < -50 && q > -100, "Q* = " + q);
    }

    @Test
    void cloudAddsC2OverOnePlusC3OfLongWave() {
        double clear = NetRadiation.netRadiationWm2(0.23, 0.0, 283.15, 0.0);
        double overcast = NetRadiation.netRadiationWm2(0.23, 0.0, 283.15, 1.0);
        assertEquals(60.0 / 1.12, overcast - clear, 1e-9);
    }

    @Test
    void middayClearSkyNetRadiationIsAboutHalfToTwoThirdsOfTheGlobalIrradiance() {
        // Oke (1987) ch. 2: daytime Q* over grass is typically 0.5-0.7 of K_down (from memory).
        double k = 800.0;
        double q = NetRadiation.netRadiationWm2(0.23, k, 293.15, 0.0);
        assertTrue(q / k > 0.5 && q / k < 0.75, "Q*/K = " + q / k);
    }

    @Test
    void groundHeatFluxIsOneTenthOfQStarByDayAndHalfAtNight() {
        // Holtslag & van Ulden (1983) by day; Allen et al. (1998) FAO-56 eq. 46 at night (from memory).
        assertEquals(50.0, NetRadiation.groundHeatFluxWm2(500.0, true), 1e-12);
        assertEquals(-40.0, NetRadiation.groundHeatFluxWm2(-80.0, false), 1e-12);
        assertEquals(-40.0, NetRadiation.groundHeatFluxWm2(-80.0, true), 1e-12);
    }
}
