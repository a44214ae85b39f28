package org.littoral.scenarios.run;

import org.littoral.model.front.FarFieldSolution;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.model.nonlinear.ModelBlowUpException;
import org.littoral.model.nonlinear.NonlinearConfig;
import org.littoral.model.nonlinear.NonlinearModel;
import org.littoral.model.nonlinear.NonlinearSolution;
import org.littoral.scenarios.analysis.ingest.ProfileColumns;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.scenario.Scenario;
import org.littoral.scenarios.scenario.ScenarioFile;

/** A nonlinear run that goes unstable ends with one line in the scenario's terms and leaves the output folder alone. */
class NonlinearBlowUpTest {
    static final String YAML = """
            name: unstable
            description: blow-up message
            kind: nonlinear
            coast: {latitude_deg: 39.6, longitude_deg: -45, utc_offset_h: -3, bearing_land_to_sea_deg: 135, day_of_year: 202}
            grid: {points: 256, spacing_km: 1, levels: 9, top_m: 4000}
            ambient_wind: {speed_m_per_s: 4, from_deg: 135}
            sites:
              - {name: a, inland_km: 10}
            flights: {start_h: 5, end_h: 6}
            output: {start_h: 5, end_h: 7, step_min: 30}
            """;

    /** A real blow-up: the same configuration with a wind limit (1 m/s) below the ambient wind (4 m/s). */
    static ModelBlowUpException realBlowUp(Scenario s) {
        return realBlowUp(s, 1.0, 0.5);
    }

    /** A real blow-up once some wind exceeds {@code limit} (m/s), in a run of {@code hours}. */
    static ModelBlowUpException realBlowUp(Scenario s, double limit, double hours) {
        NonlinearConfig c = s.toNonlinearConfig();
        NonlinearConfig bad = new NonlinearConfig(c.coast(), c.surface(), c.xGrid(), c.zInterfaces(), c.theta(), c.surfaceMixingRatio(),
                c.mixingRatioGradientPerM(), c.surfacePressurePa(), c.geostrophicSpeedMPerS(), c.geostrophicDirectionFromDeg(),
                c.startSolarHours(), c.startSolarHours() + hours, c.outputIntervalS(), c.forcing(), c.switches(), c.damping(),
                c.boundaryLayer(), new NonlinearConfig.Numerics(0.5, 1.0, 300.0, limit), null, null, null, null);
        return assertThrows(ModelBlowUpException.class, () -> NonlinearModel.run(bad));
    }

    @Test
    void theMessageIsOneLineWithLocalTimePlaceAndFix() {
        Scenario s = ScenarioFile.parse("unstable.yaml", YAML, false);
        UserInputException u = NonlinearSolver.blowUp(s, realBlowUp(s));
        String m = u.getMessage();
        assertFalse(m.contains("\n"), m);
        // the run starts 2 h before sunrise (02:48 local here) and the 1 m/s limit trips at once
        assertTrue(m.startsWith("unstable.yaml: the nonlinear model became unstable at 02:"), m);
        assertTrue(m.contains("x = ") && m.contains("km from the coast") && m.contains("z = "), m);
        assertTrue(m.contains("try a finer grid.spacing_km"), m);
    }

    /** A solver that runs the scenario with a wind limit, as {@link NonlinearSolver} reports a blow-up. */
    static Solver limited(double limit, double hours) {
        return sc -> {
            ModelBlowUpException e = realBlowUp(sc, limit, hours);
            NonlinearSolution part = e.partialSolution();
            throw new UnstableRunException(NonlinearSolver.blowUp(sc, e).getMessage(), e,
                    part.snapshotCount() >= 2 ? new FarFieldSolution(part, sc.toNonlinearConfig().damping().lateralSpongeWidthM()) : null);
        };
    }

    @Test
    void aBlowUpBeforeTheSecondSnapshotWritesNothingAndKeepsOldFiles(@TempDir Path dir) throws Exception {
        Scenario s = ScenarioFile.parse("unstable.yaml", YAML, false);
        Path old = dir.resolve("summary.json");
        Files.writeString(old, "{\"from\": \"an earlier run\"}");
        UserInputException thrown = assertThrows(UserInputException.class, () -> new ScenarioRun(s, limited(1.0, 0.5), null).run(dir));
        assertTrue(thrown.getMessage().contains("nothing of it was written and files already in the output folder are kept"),
                thrown.getMessage());
        assertEquals("{\"from\": \"an earlier run\"}", Files.readString(old));
        try (var files = Files.list(dir)) {
            assertEquals(1, files.count(), "nothing else written");
        }
    }

    @Test
    void aLaterBlowUpKeepsWhatWasComputedBeforeIt(@TempDir Path dir) throws Exception {
        Scenario s = ScenarioFile.parse("unstable.yaml", YAML, false);
        Path old = dir.resolve("summary.json");
        Files.writeString(old, "{\"from\": \"an earlier run\"}");
        // with a 4.3 m/s limit the growing breeze trips it near 06:46 local (6.66 solar h), after 24 ten-minute snapshots
        // of a run that starts at 02:48 (2 h before sunrise)
        UserInputException thrown = assertThrows(UserInputException.class, () -> new ScenarioRun(s, limited(4.3, 4.5), null).run(dir));
        String m = thrown.getMessage();
        Path part = dir.resolve(ScenarioRun.PARTIAL_DIR);
        assertFalse(m.contains("\n"), m);
        assertTrue(m.contains("what it computed up to 06:45 local") && m.contains(part.toString()), m);
        assertTrue(m.endsWith("files already in the output folder are kept"), m);
        assertEquals("{\"from\": \"an earlier run\"}", Files.readString(old));

        JsonNode rec = new ObjectMapper().readTree(part.resolve("instability.json").toFile());
        assertFalse(rec.get("complete").asBoolean());
        assertEquals("u", rec.get("variable").asText());
        double blowUpH = rec.get("blow_up_solar_h").asDouble();
        assertTrue(blowUpH > 6.5 && blowUpH < 6.8, "blow-up at " + blowUpH);
        assertTrue(rec.get("snapshots_kept").asInt() >= 10);

        // the section holds every output time up to the last snapshot and none after it
        List<String> sec = Files.readAllLines(part.resolve("near_surface_breeze.csv"));
        double lastSection = sec.stream().skip(1).mapToDouble(l -> Double.parseDouble(l.split(",")[0])).max().orElseThrow();
        assertEquals(6.5, lastSection, 1e-9, "05:00-07:00 every 30 min, cut at the last snapshot before the blow-up");
        // every kept flight ends before the blow-up, and the flights before it are all there
        List<String> snd = Files.readAllLines(part.resolve("soundings.csv"));
        int timeCol = List.of(snd.get(0).split(",")).indexOf(ProfileColumns.TIME_LOCAL);
        assertTrue(timeCol >= 0, snd.get(0));
        double lastFlight = snd.stream().skip(1).mapToDouble(l -> Double.parseDouble(l.split(",")[timeCol])).max().orElseThrow();
        assertTrue(lastFlight < blowUpH && lastFlight >= 5.9, "last kept flight at " + lastFlight);
        assertEquals(rec.get("flights_kept").asInt(), snd.stream().skip(1).map(l -> l.split(",")[timeCol]).distinct().count());
        // the last state: every cell, finite
        List<String> state = Files.readAllLines(part.resolve("last_state.csv"));
        assertEquals(256 * 8 + 1, state.size(), "256 columns x 8 cells (9 level interfaces)");
        assertTrue(state.stream().skip(1).noneMatch(l -> l.contains(",,") || l.endsWith(",")), "no missing values");
    }

    @Test
    void filesAlreadyInTheOutputFolderAreKept(@TempDir Path dir) throws Exception {
        Scenario s = ScenarioFile.parse("unstable.yaml", YAML, false);
        UserInputException u = NonlinearSolver.blowUp(s, realBlowUp(s));
        Path old = dir.resolve("summary.json");
        Files.writeString(old, "{\"from\": \"an earlier run\"}");
        UserInputException thrown = assertThrows(UserInputException.class, () -> new ScenarioRun(s, sc -> {
            throw u;
        }, null).run(dir));
        assertEquals(u.getMessage(), thrown.getMessage());
        assertEquals("{\"from\": \"an earlier run\"}", Files.readString(old));
        try (var files = Files.list(dir)) {
            assertEquals(1, files.count(), "nothing else written");
        }
    }
}
