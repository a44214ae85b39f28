package org.littoral.model.surface;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.littoral.model.coast.Coast;

class SolarGeometryTest {

    @Test
    void noonElevationAtLatitude45WithDeclination2344Is6844Degrees() {
        // docs/references.md section 10 (C): at noon alpha = 90 - |lat - decl| = 90 - 45 + 23.44.
        double alpha = SolarGeometry.elevationDeg(45.0, Math.toRadians(23.44), 12.0);
        assertEquals(68.44, alpha, 1e-9);
    }

    @Test
    void cooperDeclinationVanishesNearTheMarchEquinox() {
        // Cooper (1969) formula: 284 + n = 365 at n = 81 (22 March); the equinox falls on 20-21 March.
        assertEquals(0.0, Math.toDegrees(SolarGeometry.declinationRad(81)), 1e-9);
        assertEquals(0.0, Math.toDegrees(SolarGeometry.declinationRad(79)), 1.0);
    }

    @Test
    void cooperDeclinationAtTheJuneSolsticeEqualsTheObliquity() {
        // June solstice 21 June = day 172; obliquity of the ecliptic 23.44 deg (astronomical almanac).
        assertEquals(23.44, Math.toDegrees(SolarGeometry.declinationRad(172)), 0.02);
    }

    @Test
    void dayLengthIsTwelveHoursAtTheEquinoxAtAnyLatitude() {
        // Geometry: with delta = 0, cos(omega_s) = 0 at every latitude.
        for (double lat : new double[] {-60, -10, 0, 35, 50, 65}) {
            assertEquals(6.0, SolarGeometry.sunriseSolarHours(lat, 0.0), 1e-9);
            assertEquals(18.0, SolarGeometry.sunsetSolarHours(lat, 0.0), 1e-9);
        }
    }

    @Test
    void solsticeDayAt45NorthLastsAbout15Point4Hours() {
        // cos(omega_s) = -tan 45 tan 23.44 = -0.4335, omega_s = 115.69 deg: 15.42 h of geometric daylight.
        double len = SolarGeometry.sunsetSolarHours(45, Math.toRadians(23.44)) - SolarGeometry.sunriseSolarHours(45, Math.toRadians(23.44));
        double expected = 2.0 * Math.toDegrees(Math.acos(-Math.tan(Math.toRadians(45)) * Math.tan(Math.toRadians(23.44)))) / 15.0;
        assertEquals(expected, len, 1e-9);
        assertEquals(15.42, len, 0.01);
    }

    @Test
    void sunIsOnTheHorizonAtSunrise() {
        double decl = Math.toRadians(15.0);
        double rise = SolarGeometry.sunriseSolarHours(40, decl);
        assertEquals(0.0, SolarGeometry.sinElevation(40, decl, rise), 1e-12);
    }

    @Test
    void polarNightAndPolarDayHaveNoSunriseAndSunset() {
        double decl = Math.toRadians(23.44);
        assertEquals(0.0, SolarGeometry.sunriseSolarHours(80, decl), 1e-12);
        assertEquals(12.0, SolarGeometry.sunriseSolarHours(-80, decl), 1e-12);
    }

    @Test
    void modelTimeAdvancesTheDayOfYearAfterMidnight() {
        Coast c = new Coast(45, 0, 0, 270, 172);
        assertEquals(172, SolarGeometry.dayOfYearAt(c, 12 * 3600.0));
        assertEquals(173, SolarGeometry.dayOfYearAt(c, 36 * 3600.0));
        assertEquals(12.0, SolarGeometry.solarHoursAt(36 * 3600.0), 1e-12);
        assertTrue(SolarGeometry.sinElevationAt(c, 12 * 3600.0) > SolarGeometry.sinElevationAt(c, 9 * 3600.0));
    }
}
