package org.littoral.scenarios.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.littoral.model.coast.SurfaceSegment;
import org.littoral.model.nonlinear.Forcing;
import org.littoral.model.nonlinear.NonlinearConfig;
import org.littoral.model.nonlinear.ThetaProfile;
import org.littoral.model.surface.SurfaceEnergyBalance;
import org.littoral.scenarios.input.UserInputException;

/**
 * Scenario files of kind nonlinear and their mapping to the nonlinear model's configuration. Direction
 * checks follow the axis convention of DEVELOPERS.md (x inland, u > 0 onshore, y 90 deg to the left of
 * x) and the meteorological convention (a direction is where the wind blows FROM); the component values
 * are worked by hand for a coast whose sea lies to the south-east (bearing land to sea 135 deg).
 */
class NonlinearScenarioTest {

    static final String BASE = """
            name: nl
            description: nonlinear mapping
            kind: nonlinear
            coast:
              latitude_deg: 39.6
              longitude_deg: -45
              utc_offset_h: -3
              bearing_land_to_sea_deg: 135
              day_of_year: 202
            surface:
              - {name: sea, type: water, ends_at_km: 0, sst_K: 294.15, roughness_m: 0.0002}
              - {name: mainland, type: land, albedo: 0.18, bowen_ratio: 0.8, roughness_m: 0.12, soil_moisture_fraction: 0.35}
            grid:
              points: 400
              spacing_km: 1
              levels: 49
              top_m: 5000
              first_level_spacing_m: 25
            atmosphere:
              surface_theta_K: 296
              buoyancy_frequency_per_s: 0.012
              surface_mixing_ratio_g_per_kg: 10
              mixing_ratio_gradient_g_per_kg_per_km: -3
              surface_pressure_hPa: 1010
            ambient_wind:
              speed_m_per_s: 4
              from_deg: FROM
            physics:
              friction_per_s: 2.0e-5
            sites:
              - {name: a, inland_km: 10}
            flights:
              start_h: 7
              end_h: 18
              ceiling_m: 600
              ascent_rate_m_per_s: 2
            output:
              start_h: 8
              end_h: 20
              step_min: 15
            """;

    static Scenario parse(String fromDeg) {
        return ScenarioFile.parse("nl.yaml", BASE.replace("FROM", fromDeg), false);
    }

    static double[] components(String fromDeg) {
        return parse(fromDeg).toNonlinearConfig().geostrophicModelComponents();
    }

    @Test
    void aWindFromTheSeaIsOnshore() {
        double[] uv = components("135");
        assertEquals(4.0, uv[0], 1e-12);
        assertEquals(0.0, uv[1], 1e-12);
    }

    @Test
    void aWindFromTheLandIsOffshore() {
        double[] uv = components("315");
        assertEquals(-4.0, uv[0], 1e-12);
        assertEquals(0.0, uv[1], 1e-12);
    }

    @Test
    void aShoreParallelWindWithTheLandOnItsLeftBlowsTowardMinusY() {
        // from 225 (south-west) it blows toward the north-east; facing downwind, the land (north-west) is on
        // the left; +y points 90 deg left of inland (azimuth 315 - 90 = 225), so the wind is along -y
        double[] uv = components("225");
        assertEquals(0.0, uv[0], 1e-12);
        assertEquals(-4.0, uv[1], 1e-12);
        double[] other = components("45");
        assertEquals(0.0, other[0], 1e-12);
        assertEquals(4.0, other[1], 1e-12);
    }

    @Test
    void theGeostrophicWindIsTheAmbientWindOfTheFile() {
        NonlinearConfig c = parse("200").toNonlinearConfig();
        assertEquals(4.0, c.geostrophicSpeedMPerS());
        assertEquals(200.0, c.geostrophicDirectionFromDeg());
        Scenario s = parse("200");
        double[] uv = c.geostrophicModelComponents();
        assertEquals(s.ambientWind().crossShoreMPerS(), uv[0], 1e-12);
        assertEquals(s.ambientWind().alongshoreMPerS(), uv[1], 1e-12);
    }

    @Test
    void surfaceGridAtmosphereAndPhysicsPassThrough() {
        Scenario s = parse("135");
        NonlinearConfig c = s.toNonlinearConfig();
        assertEquals(2, c.surface().segments().size());
        SurfaceSegment.Water sea = (SurfaceSegment.Water) c.surface().at(-5000);
        assertEquals(294.15, sea.seaSurfaceTemperatureK());
        SurfaceSegment.Land land = (SurfaceSegment.Land) c.surface().at(5000);
        assertEquals(0.18, land.albedo());
        assertEquals(0.8, land.bowenRatio());
        assertEquals(0.12, land.roughnessM());
        assertEquals(0.35, land.soilMoistureFraction());
        assertEquals(400, c.xGrid().nx());
        assertEquals(1000.0, c.xGrid().dxM());
        // the grid's 49 levels are the layer interfaces: ground, 25 m, ..., lid at 5000 m
        assertEquals(49, c.zInterfaces().size());
        assertEquals(0.0, c.zInterfaces().levelM(0), 1e-9);
        assertEquals(25.0, c.zInterfaces().levelM(1), 1e-9);
        assertEquals(5000.0, c.zInterfaces().topM(), 1e-9);
        ThetaProfile.ConstantN th = assertInstanceOf(ThetaProfile.ConstantN.class, c.theta());
        assertEquals(296.0, th.surfaceThetaK());
        assertEquals(0.012, th.buoyancyFrequencyPerS());
        assertEquals(0.010, c.surfaceMixingRatio(), 1e-15);
        assertEquals(-3e-6, c.mixingRatioGradientPerM(), 1e-18);
        assertEquals(101000.0, c.surfacePressurePa(), 1e-9);
        assertEquals(2e-5, c.damping().rayleighFrictionPerS());
        assertEquals(2e-5, c.damping().newtonianCoolingPerS(), "cooling defaults to friction");
        assertEquals(Scenario.NONLINEAR_SPONGE_M, c.damping().lateralSpongeWidthM());
        assertEquals(39.6, c.coast().latitudeDeg());
    }

    @Test
    void theHeatingOfANonlinearFileDefaultsToTheEnergyBalance() {
        Scenario s = parse("135");
        assertNull(s.heating());
        Forcing.SurfaceEnergyBalance f = assertInstanceOf(Forcing.SurfaceEnergyBalance.class, s.toNonlinearConfig().forcing());
        assertEquals(0.0, f.cloudFraction());
        assertEquals(SurfaceEnergyBalance.Partition.BOWEN_RATIO, f.partition());
        assertEquals("energy_balance", s.inputs().get("heating").get("shape").asText(), "the default is echoed in the inputs");
    }

    @Test
    void cloudAndPartitionReachTheForcing() {
        Scenario s = ScenarioFile.parse("nl.yaml", BASE.replace("FROM", "135")
                + "heating: {shape: energy_balance, cloud_fraction: 0.4, partition: priestley_taylor}\n", false);
        Forcing.SurfaceEnergyBalance f = (Forcing.SurfaceEnergyBalance) s.toNonlinearConfig().forcing();
        assertEquals(0.4, f.cloudFraction());
        assertEquals(SurfaceEnergyBalance.Partition.PRIESTLEY_TAYLOR, f.partition());
    }

    @Test
    void aSlabHeatingBecomesAPrescribedLandFluxAndSetsTheMixedLayer() {
        Scenario s = ScenarioFile.parse("nl.yaml", BASE.replace("FROM", "135")
                + "heating: {shape: slab, peak_flux_difference_W_per_m2: 300, sunrise_solar_h: 5.5, sunset_solar_h: 19, "
                + "entrainment_ratio: 0.3, initial_depth_m: 150}\n", false);
        NonlinearConfig c = s.toNonlinearConfig();
        Forcing.PrescribedSurfaceFlux f = assertInstanceOf(Forcing.PrescribedSurfaceFlux.class, c.forcing());
        assertEquals(300.0, f.peakLandSensibleWm2());
        assertEquals(5.5, f.sunriseSolarHours());
        assertEquals(19.0, f.sunsetSolarHours());
        assertEquals(0.3, c.boundaryLayer().entrainmentRatio());
        assertEquals(150.0, c.boundaryLayer().initialDepthM());
    }

    @Test
    void aClassicHeatingBecomesTheSameHeatingRateFarInland() {
        Scenario s = ScenarioFile.parse("nl.yaml", BASE.replace("FROM", "135")
                + "heating: {shape: classic, amplitude_K_per_h: 0.36, half_width_km: 10, depth_m: 1000, sunrise_solar_h: 6}\n", false);
        Forcing.PrescribedHeating f = assertInstanceOf(Forcing.PrescribedHeating.class, s.toNonlinearConfig().forcing());
        // classic shape Q0 [pi/2 + arctan(x/x0)] exp(-z/H) sin(omega (t - t_r)) (Rotunno 1983) on the periodic domain: land
        // on [0, L/2), so at noon and z = 0 the rate is Q0 [arctan(x/x0) - arctan((x - L/2)/x0)] (periodic images add
        // about 1 %); 100 km inland that is 2.94 Q0; 100 km out to sea it is small (0.07 Q0 plus images)
        double q0 = 0.36 / 3600.0;
        double l2 = 200_000.0;
        double inland = q0 * (Math.atan(100_000 / 10_000.0) - Math.atan((100_000 - l2) / 10_000.0));
        assertEquals(inland, f.heating().kelvinPerSecond(100_000, 0, 12 * 3600.0), 0.015 * inland);
        assertTrue(f.heating().kelvinPerSecond(-100_000, 0, 12 * 3600.0) < 0.06 * inland);
    }

    @Test
    void theRunCoversTheOutputWindowAndTheLastAscent() {
        Scenario s = parse("135");
        NonlinearConfig c = s.toNonlinearConfig();
        // flights start 7 h clock (before output 8 h), but the run starts 2 h before sunrise, from its balanced boundary
        // layer; the last launch at 18 h climbs 600 m at 2 m/s (5 min); output ends 20 h
        assertEquals(Math.min(s.coast().solarHoursFromClock(7.0), s.sunriseSolarHours() - 2.0), c.startSolarHours(), 1e-9);
        assertTrue(c.startSolarHours() < s.sunriseSolarHours() - 1.99);
        assertEquals(s.coast().solarHoursFromClock(20.0), c.endSolarHours(), 1e-9);
        assertEquals(600.0, c.outputIntervalS(), "snapshots at most 10 min apart");
    }

    @Test
    void aNonlinearGridNeedsOnlyFactorsTwoThreeAndFive() {
        String msg = assertThrows(UserInputException.class,
                () -> ScenarioFile.parse("nl.yaml", BASE.replace("FROM", "135").replace("points: 400", "points: 448"), false)).getMessage();
        assertTrue(msg.contains("grid.points = 448 has a prime factor above 5"), msg);
        assertTrue(msg.contains("use e.g. 450"), msg);
    }

    @Test
    void aNonlinearDomainMustHoldBothSponges() {
        String msg = assertThrows(UserInputException.class,
                () -> ScenarioFile.parse("nl.yaml", BASE.replace("FROM", "135").replace("points: 400", "points: 180"), false)).getMessage();
        assertTrue(msg.contains("180 km is too narrow for kind nonlinear"), msg);
        assertTrue(msg.contains("more than 200 km"), msg);
    }

    @Test
    void theEnergyBalanceNeedsKindNonlinear() {
        String msg = assertThrows(UserInputException.class, () -> ScenarioFile.parse("nl.yaml",
                BASE.replace("FROM", "135").replace("kind: nonlinear", "kind: linear").replace("points: 400", "points: 512")
                        + "heating: {shape: energy_balance}\n", false)).getMessage();
        assertTrue(msg.contains("heating.shape = 'energy_balance' needs kind: nonlinear"), msg);
    }

    @Test
    void aLinearFileKeepsItsClassicDefault() {
        Scenario s = ScenarioFile.parse("l.yaml", BASE.replace("FROM", "135").replace("kind: nonlinear", "kind: linear")
                .replace("points: 400", "points: 512"), false);
        assertEquals("classic", s.inputs().get("heating").get("shape").asText());
        assertNull(s.energyBalance());
    }
}
