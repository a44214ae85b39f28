package org.littoral.scenarios.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.littoral.model.linear.HeatingSpec;
import org.littoral.model.linear.LinearConfig;
import org.littoral.scenarios.input.UserInputException;

class ScenarioFileTest {

    static final String MINIMAL = """
            name: t
            description: minimal
            coast:
              latitude_deg: 45
              bearing_land_to_sea_deg: 270
            sites:
              - {name: a, inland_km: 10}
            """;

    static String error(String yaml) {
        return assertThrows(UserInputException.class, () -> ScenarioFile.parse("s.yaml", yaml, false)).getMessage();
    }

    @ParameterizedTest
    @MethodSource("org.littoral.scenarios.scenario.BuiltinScenarios#names")
    void everyBuiltinScenarioIsValidAndSaysWhatItShows(String name) {
        Scenario s = BuiltinScenarios.resolve(name);
        assertEquals(name, s.name());
        assertTrue(BuiltinScenarios.headline(name).length() > 80, "starts with a comment on what it shows");
        if (s.kind() == Scenario.Kind.LINEAR) {
            assertTrue(Integer.bitCount(s.xGrid().nx()) == 1);
        }
    }

    @Test
    void aMinimalFileGetsTheDocumentedDefaults() {
        Scenario s = ScenarioFile.parse("s.yaml", MINIMAL, false);
        assertEquals(512, s.xGrid().nx());
        assertEquals(2000.0, s.xGrid().dxM());
        assertEquals(0.01, s.atmosphere().buoyancyFrequencyPerS());
        assertEquals(0.008, s.atmosphere().surfaceMixingRatio(), 1e-15);
        assertEquals(101325.0, s.atmosphere().surfacePressurePa(), 1e-9);
        assertTrue(s.heating() instanceof HeatingSpec.ClassicShape);
        assertEquals(600.0, s.flights().sounding().ceilingM());
        assertEquals(5.0, s.flights().sounding().binM());
        assertNull(s.flights().sounding().noise());
        assertEquals(Scenario.Kind.LINEAR, s.kind());
        // the echo carries the filled-in defaults
        assertEquals(172, s.inputs().get("coast").get("day_of_year").intValue());
    }

    @Test
    void theSameScenarioReadsFromJson() {
        String json = """
                {"name": "t", "description": "json", "coast": {"latitude_deg": -33.9, "bearing_land_to_sea_deg": 250},
                 "sites": [{"name": "a", "inland_km": 3}]}
                """;
        Scenario s = ScenarioFile.parse("s.json", json, true);
        assertEquals(-33.9, s.coast().latitudeDeg());
    }

    @Test
    void anOffshoreAmbientWindBecomesANegativeCrossShoreFlow() {
        // sea to the west (bearing 270); a wind from the east (90) blows offshore
        Scenario s = ScenarioFile.parse("s.yaml", MINIMAL + "ambient_wind: {speed_m_per_s: 3, from_deg: 90}\n", false);
        assertEquals(-3.0, s.ambientWind().crossShoreMPerS(), 1e-12);
        assertEquals(0.0, s.ambientWind().alongshoreMPerS(), 1e-12);
        LinearConfig c = s.toLinearConfig();
        assertEquals(-3.0, c.ambientCrossShoreMPerS(), 1e-12);
    }

    @Test
    void aNorthWindOnAWestCoastIsAlongshoreWithNegativeY() {
        // +y is 90 deg left of +x = east, so +y points north; a northerly blows toward the south: v < 0
        Scenario s = ScenarioFile.parse("s.yaml", MINIMAL + "ambient_wind: {speed_m_per_s: 4, from_deg: 0}\n", false);
        assertEquals(-4.0, s.ambientWind().alongshoreMPerS(), 1e-12);
        assertEquals(0.0, s.ambientWind().crossShoreMPerS(), 1e-12);
    }

    @Test
    void slabHeatingDerivesSunriseAndLapseRateWhenOmitted() {
        Scenario s = ScenarioFile.parse("s.yaml", MINIMAL + "heating: {shape: slab}\nphysics: {friction_per_s: 1.0e-5}\n", false);
        HeatingSpec.SlabMixedLayer h = (HeatingSpec.SlabMixedLayer) s.heating();
        // N^2 theta / g = 1e-4 * 293.15 / 9.80665 = 2.989e-3 K/m
        assertEquals(1e-4 * 293.15 / 9.80665, h.lapseGammaKPerM(), 1e-12);
        // 45 N at the June solstice: day length about 15.4 h (geometric), sunrise near 4.3 h solar
        assertEquals(12.0 - h.sunriseSolarHours(), h.sunsetSolarHours() - 12.0, 1e-9);
        assertEquals(4.3, h.sunriseSolarHours(), 0.1);
    }

    @Test
    void coolingDefaultsToTheFriction() {
        Scenario s = ScenarioFile.parse("s.yaml", MINIMAL + "physics: {friction_per_s: 3.0e-5}\n", false);
        assertEquals(3.0e-5, s.physics().coolingPerS());
    }

    @Test
    void anUnknownKeyListsTheValidKeysAndSuggestsTheNearest() {
        String m = error(MINIMAL.replace("latitude_deg", "latitud_deg"));
        assertTrue(m.startsWith("s.yaml:4:3: unknown key 'coast.latitud_deg' (did you mean 'latitude_deg'?)"), m);
        assertTrue(m.contains("valid keys in 'coast': latitude_deg, longitude_deg, utc_offset_h, bearing_land_to_sea_deg, day_of_year"), m);
    }

    @Test
    void anOutOfRangeValueNamesFileLineKeyValueAndRange() {
        String m = error(MINIMAL.replace("latitude_deg: 45", "latitude_deg: 95"));
        assertEquals("s.yaml:4:17: coast.latitude_deg = 95: outside the allowed range; give a number, -90 to 90 deg", m);
    }

    @Test
    void aWrongTypeIsNamed() {
        String m = error(MINIMAL.replace("latitude_deg: 45", "latitude_deg: forty-five"));
        assertTrue(m.startsWith("s.yaml:4:17: coast.latitude_deg = 'forty-five': not a number; give a number, -90 to 90 deg"), m);
    }

    @Test
    void aMissingRequiredKeyIsNamed() {
        String m = error(MINIMAL.replace("  bearing_land_to_sea_deg: 270\n", ""));
        assertTrue(m.contains("missing key 'coast.bearing_land_to_sea_deg'"), m);
    }

    @Test
    void aNegativeGridSizeIsRejected() {
        String m = error(MINIMAL + "grid: {points: -64}\n");
        assertTrue(m.startsWith("s.yaml:8:16: grid.points = -64: outside the allowed range"), m);
    }

    @Test
    void aGridSizeThatIsNotAPowerOfTwoSuggestsNeighbours() {
        String m = error(MINIMAL + "grid: {points: 600}\n");
        assertTrue(m.contains("grid.points = 600 is not a power of two") && m.contains("512 or 1024"), m);
    }

    @Test
    void aSiteOutsideTheDomainIsRejected() {
        String m = error(MINIMAL.replace("inland_km: 10", "inland_km: 900"));
        assertTrue(m.startsWith("s.yaml:7:26: sites[0].inland_km = 900 (site 'a') is outside the model domain -512 to 510 km"), m);
    }

    @Test
    void aYamlSyntaxErrorGivesLineAndColumn() {
        String m = error(MINIMAL + "grid: {points: 64\n");
        assertTrue(m.matches("s\\.yaml:\\d+:\\d+: YAML syntax error: .*"), m);
        assertFalse(m.contains("\n"));
    }

    @Test
    void aDuplicateKeyIsASyntaxError() {
        String m = error(MINIMAL + "name: again\n");
        assertEquals("s.yaml:8:1: key 'name' appears twice at the top level (first on line 1; only one would count); keep one of them", m);
    }

    @Test
    void surfaceSegmentsMustPutTheMainCoastAtZero() {
        String m = error(MINIMAL + """
                surface:
                  - {name: sea, type: water, ends_at_km: -5}
                  - {name: land, type: land}
                """);
        assertTrue(m.contains("x = 0 is the main coastline"), m);
    }

    @Test
    void waterKeysAreNotAllowedOnLand() {
        String m = error(MINIMAL + """
                surface:
                  - {name: sea, type: water, ends_at_km: 0}
                  - {name: land, type: land, sst_K: 300}
                """);
        assertTrue(m.contains("unknown key 'surface[1].sst_K'"), m);
    }

    @Test
    void aCeilingAboveTheModelTopIsRejected() {
        String m = error(MINIMAL + "grid: {top_m: 500}\n");
        assertTrue(m.contains("flights.ceiling_m = 600 is above the model top"), m);
    }

    @Test
    void everyProblemMessageIsOneLine() {
        String m = error(MINIMAL.replace("latitude_deg: 45", "latitude_deg: 95") + "grid: {points: 3}\n");
        assertFalse(m.contains("\n"));
        assertTrue(m.endsWith("(and 1 more problem)"), m);
    }
}
