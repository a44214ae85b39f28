package org.littoral.scenarios.run;

import org.littoral.model.front.BreezeDiagnostics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.scenario.Scenario;
import org.littoral.scenarios.scenario.ScenarioFile;

class ScenarioRunTest {
    static final String YAML = """
            name: fake
            description: diagnostics against a hand-made breeze
            coast: {latitude_deg: 45, bearing_land_to_sea_deg: 270}
            grid: {points: 256, spacing_km: 2, levels: 61, top_m: 3000}
            sites:
              - {name: near, inland_km: 10}
              - {name: far, inland_km: 40}
            flights: {cadence_min: 60, start_h: 8, end_h: 16, ceiling_m: 500}
            output: {start_h: 0, end_h: 24, step_min: 5, near_surface_m: 10, onshore_threshold_m_per_s: 0.5}
            """;

    final Scenario scenario = ScenarioFile.parse("fake.yaml", YAML, false);
    // A = 5 m/s, L = 50 km, D = 500 m: levels every 50 m, so D, 2D and 2.9D fall on or between levels exactly
    final FakeBreeze fake = new FakeBreeze(scenario, 5.0, 50e3, 500.0);

    ScenarioRun.Outcome run(Path dir) throws Exception {
        return new ScenarioRun(scenario, s -> fake, null).run(dir);
    }

    /** Solar time (h) when A g(x) h(z) sin(omega (t - 6 h)) first reaches the threshold. */
    double riseSolarH(double xM, double thr) {
        double amp = 5.0 * Math.exp(-(xM / 50e3) * (xM / 50e3)) * fake.h(10.0);
        return 6.0 + Math.asin(thr / amp) / FakeBreeze.OMEGA / 3600.0;
    }

    @Test
    void onsetAndArrivalsMatchTheAnalyticThresholdCrossings(@TempDir Path dir) throws Exception {
        BreezeDiagnostics.Result d = run(dir).diagnostics();
        // 5-min output with linear interpolation of a sinusoid: crossing times good to well under a minute
        assertEquals(scenario.coast().clockHoursFromSolar(riseSolarH(0, 0.5)), d.onsetClockH(), 1.0 / 60);
        assertEquals(scenario.coast().clockHoursFromSolar(riseSolarH(10e3, 0.5)), d.sites().get(0).arrivalClockH(), 1.0 / 60);
        assertEquals(scenario.coast().clockHoursFromSolar(riseSolarH(40e3, 0.5)), d.sites().get(1).arrivalClockH(), 1.0 / 60);
        assertEquals(1, d.speeds().size());
    }

    @Test
    void peakOnshoreWindIsAtTheCoastAtSolarNoon(@TempDir Path dir) throws Exception {
        BreezeDiagnostics.Result d = run(dir).diagnostics();
        assertEquals(5.0 * fake.h(10.0), d.peakBreezeMPerS(), 1e-3);
        assertEquals(0.0, d.peakXM(), 1e-9);
        assertEquals(scenario.coast().clockHoursFromSolar(12.0), d.peakClockH(), 2.5 / 60 + 1e-9);
    }

    @Test
    void circulationDepthsFollowTheProfileShape(@TempDir Path dir) throws Exception {
        BreezeDiagnostics.Circulation c = run(dir).circulation();
        assertEquals(500.0, c.onshoreLayerDepthM(), 1e-6);
        assertEquals(1000.0, c.returnFlowHeightM(), 1e-6);
        assertEquals(2.9 * 500.0, c.circulationDepthM(), 1e-6);
    }

    @Test
    void penetrationIsWhereTheNoonBreezeFallsToTheThreshold(@TempDir Path dir) throws Exception {
        BreezeDiagnostics.Result d = run(dir).diagnostics();
        // at the peak time (close to noon) A h exp(-(x/L)^2) = 0.5: x = L sqrt(ln(A h / 0.5)); to one grid step
        double x = 50e3 * Math.sqrt(Math.log(5.0 * fake.h(10.0) / 0.5));
        assertEquals(x, d.maxPenetrationM(), 2e3 + 1);
    }

    @Test
    void summaryAndSoundingsAreWritten(@TempDir Path dir) throws Exception {
        ScenarioRun.Outcome o = run(dir);
        JsonNode s = new ObjectMapper().readTree(dir.resolve("summary.json").toFile());
        assertEquals("fake", s.get("scenario").asText());
        assertEquals(45.0, s.get("inputs").get("coast").get("latitude_deg").doubleValue());
        assertNotNull(s.get("diagnostics").get("peak_onshore_wind").get("time_local").asText());
        assertEquals(2, s.get("diagnostics").get("sites").size());
        List<String> lines = Files.readAllLines(dir.resolve("soundings.csv"));
        assertEquals("day,site,time_local,height_m,pressure_hPa,temperature_C,rh_percent,mixing_ratio_g_per_kg,dewpoint_C,"
                + "wind_speed_m_per_s,wind_direction_deg,theta_K,theta_v_K,theta_e_K", lines.get(0));
        // 9 launches x 2 sites x 100 bins of 5 m up to 500 m
        assertEquals(1 + 9 * 2 * 100, lines.size());
        assertTrue(lines.get(1).startsWith("fake,near,8.0000,2.5,"), lines.get(1));
        assertEquals(o.profiles().size(), 18);
        try (var files = Files.list(dir)) {
            assertTrue(files.noneMatch(p -> p.getFileName().toString().endsWith(".tmp")), "no temporary files left behind");
        }
    }

    @Test
    void theAnalysisChainReadsTheSoundingsBackUnchanged(@TempDir Path dir) throws Exception {
        ScenarioRun.Outcome o = run(dir);
        var back = new org.littoral.scenarios.analysis.ingest.ProfileCsvReader(
                new org.littoral.scenarios.analysis.ingest.IngestSettings()).read(dir.resolve("soundings.csv"));
        assertEquals(o.profiles().size(), back.profiles().size());
        var a = o.profiles().get(3);
        var b = back.profiles().stream().filter(p -> p.site().equals(a.site()) && Math.abs(p.timeHours() - a.timeHours()) < 1e-3)
                .findFirst().orElseThrow();
        // written with 3 decimals in deg C and 2 in hPa
        assertEquals(a.temperatureK()[40], b.temperatureK()[40], 1e-3);
        assertEquals(a.pressurePa()[40], b.pressurePa()[40], 1.0);
        assertEquals(a.windDirectionDeg(40), b.windDirectionDeg(40), 0.1);
    }

    @Test
    void clockTimesAreFormattedWithTheNextDayMarked() {
        assertEquals("13:15", ScenarioRun.clock(13.25));
        assertEquals("00:30 +1d", ScenarioRun.clock(24.5));
        assertEquals("23:59", ScenarioRun.clock(23.99));
    }
}
