package org.littoral.model.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class StandardAtmosphereTest {
    // US Standard Atmosphere 1976, table values as in docs/references.md section 6 (C, matches the tables).

    @Test
    void seaLevelIs288Point15Kelvin101325PascalAnd1Point225KilogramsPerCubicMetre() {
        assertEquals(288.15, StandardAtmosphere.temperatureK(0), 1e-9);
        assertEquals(101325.0, StandardAtmosphere.pressurePa(0), 1e-6);
        assertEquals(1.2250, StandardAtmosphere.densityKgM3(0), 5e-5);
    }

    @Test
    void fiveHundredMetresIs284Point90KelvinAnd95460Point8Pascal() {
        assertEquals(284.90, StandardAtmosphere.temperatureK(500), 1e-9);
        assertEquals(95460.8, StandardAtmosphere.pressurePa(500), 0.1);
        // 1976 table: 1.1673 kg/m3 at 500 m.
        assertEquals(1.1673, StandardAtmosphere.densityKgM3(500), 5e-5);
    }

    @Test
    void oneKilometreIs281Point65Kelvin89874Point6PascalAnd1Point11164KilogramsPerCubicMetre() {
        assertEquals(281.65, StandardAtmosphere.temperatureK(1000), 1e-9);
        assertEquals(89874.6, StandardAtmosphere.pressurePa(1000), 0.1);
        assertEquals(1.11164, StandardAtmosphere.densityKgM3(1000), 5e-6);
    }

    @Test
    void heightsOutsideTheLowestLayerAreRejected() {
        assertThrows(IllegalArgumentException.class, () -> StandardAtmosphere.temperatureK(12000));
    }
}
