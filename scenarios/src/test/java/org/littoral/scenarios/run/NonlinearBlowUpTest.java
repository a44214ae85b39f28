package org.littoral.scenarios.run;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.model.nonlinear.ModelBlowUpException;
import org.littoral.model.nonlinear.NonlinearConfig;
import org.littoral.model.nonlinear.NonlinearModel;
import org.littoral.scenarios.cli.UserInputException;
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
            flights: {start_h: 7, end_h: 8}
            output: {start_h: 7, end_h: 9, step_min: 30}
            """;

    /** A real blow-up: the same configuration with a wind limit (1 m/s) below the ambient wind (4 m/s). */
    static ModelBlowUpException realBlowUp(Scenario s) {
        NonlinearConfig c = s.toNonlinearConfig();
        NonlinearConfig bad = new NonlinearConfig(c.coast(), c.surface(), c.xGrid(), c.zInterfaces(), c.theta(), c.surfaceMixingRatio(),
                c.mixingRatioGradientPerM(), c.surfacePressurePa(), c.geostrophicSpeedMPerS(), c.geostrophicDirectionFromDeg(),
                c.startSolarHours(), c.startSolarHours() + 0.5, c.outputIntervalS(), c.forcing(), c.switches(), c.damping(),
                c.boundaryLayer(), new NonlinearConfig.Numerics(0.5, 1.0, 300.0, 1.0), null, null, null);
        return assertThrows(ModelBlowUpException.class, () -> NonlinearModel.run(bad));
    }

    @Test
    void theMessageIsOneLineWithLocalTimePlaceAndFix() {
        Scenario s = ScenarioFile.parse("unstable.yaml", YAML, false);
        UserInputException u = NonlinearSolver.blowUp(s, realBlowUp(s));
        String m = u.getMessage();
        assertFalse(m.contains("\n"), m);
        assertTrue(m.startsWith("unstable.yaml: the nonlinear model became unstable at 07:"), m);
        assertTrue(m.contains("x = ") && m.contains("km from the coast") && m.contains("z = "), m);
        assertTrue(m.contains("try a finer grid.spacing_km"), m);
        assertTrue(m.contains("files already in the output folder are kept"), m);
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
