package org.littoral.model.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class HydrostaticTest {

    @Test
    void dryIntegrationThroughTheStandardAtmosphereReproducesItsPressures() {
        // US Standard Atmosphere 1976 pressures are the exact hydrostatic solution of its lapse rate; the
        // residual here comes from R_d = 287.04 (Bolton) against the standard's 287.053 (about 0.5 Pa at 1 km).
        int n = 301;
        double[] z = new double[n];
        double[] t = new double[n];
        double[] r = new double[n];
        for (int k = 0; k < n; k++) {
            z[k] = 10.0 * k;
            t[k] = StandardAtmosphere.temperatureK(z[k]);
        }
        double[] p = Hydrostatic.pressureProfilePa(z, t, r, StandardAtmosphere.SEA_LEVEL_PRESSURE_PA);
        assertEquals(StandardAtmosphere.pressurePa(500), p[50], 2.0);
        assertEquals(StandardAtmosphere.pressurePa(1000), p[100], 2.0);
        assertEquals(StandardAtmosphere.pressurePa(3000), p[300], 5.0);
    }

    @Test
    void moistAirIsLighterSoPressureFallsMoreSlowlyWithHeight() {
        double[] z = {0, 500, 1000};
        double[] t = {288.15, 284.9, 281.65};
        double[] p0 = Hydrostatic.pressureProfilePa(z, t, new double[3], 101325.0);
        double[] p1 = Hydrostatic.pressureProfilePa(z, t, new double[] {0.012, 0.010, 0.008}, 101325.0);
        assertTrue(p1[2] > p0[2]);
    }

    @Test
    void nonIncreasingHeightsAreRejected() {
        assertThrows(IllegalArgumentException.class,
                () -> Hydrostatic.pressureProfilePa(new double[] {0, 0}, new double[] {288, 288}, new double[2], 1e5));
    }
}
