package org.littoral.scenarios.run;

import org.littoral.model.front.FarFieldSolution;

import org.littoral.model.front.BreezeDiagnostics;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.littoral.model.front.Arrival;
import org.littoral.model.nonlinear.NonlinearSolution;
import org.littoral.scenarios.scenario.BuiltinScenarios;
import org.littoral.scenarios.scenario.Scenario;
import org.littoral.scenarios.scenario.ScenarioFile;

/**
 * The balanced morning (issue 11, item 2), with heating: a nonlinear run starts before sunrise from the balanced
 * boundary layer, so no front reaches the coast or a site before the land's sensible heat flux has been upward for
 * an hour. A breeze needs the land warmer than the sea (Simpson 1994); a start out of balance made calm-air wind
 * shifts in the first hours instead. Built-ins whose ambient wind is not onshore, on a coarse grid (2 km, 24 layers,
 * to 14 h local).
 */
class MorningArrivalTest {
    @ParameterizedTest
    @ValueSource(strings = {"nl-offshore-2ms", "nl-corkscrew-4ms", "nl-backdoor-4ms"})
    void noArrivalBeforeTheLandHasHeatedTheAirForAnHour(String name) throws Exception {
        String yaml = BuiltinScenarios.text(name).replace("points: 400", "points: 200").replace("spacing_km: 1", "spacing_km: 2")
                .replace("levels: 65", "levels: 25").replace("first_level_spacing_m: 20", "first_level_spacing_m: 40")
                .replace("  end_h: 24", "  end_h: 14").replace("  end_h: 18", "  end_h: 13");
        Scenario s = ScenarioFile.parse("coarse-" + name, yaml, false);
        Path dir = Files.createTempDirectory("littoral-morning-");
        try {
            ScenarioRun.Outcome out = new ScenarioRun(s, Solver.standard(), null).figures(false).run(dir);
            NonlinearSolution run = ((FarFieldSolution) out.solution()).run();
            double upwardClockH = firstUpwardLandFlux(s, run);
            assertTrue(s.coast().clockHoursFromSolar(run.startSec() / 3600.0) < upwardClockH - 1.0,
                    "the run starts at night, before the land heats: " + run.startSec() / 3600.0);
            Arrival onset = out.diagnostics().onset();
            int checked = check(name + " onset", onset, upwardClockH);
            for (BreezeDiagnostics.SiteTiming t : out.diagnostics().sites()) {
                checked += check(name + " " + t.name(), t.arrival(), upwardClockH);
            }
            assertTrue(checked >= 2, name + ": the front must reach the coast and a site by 14 h for this to test anything");
        } finally {
            try (var w = Files.walk(dir)) {
                w.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }

    private static int check(String what, Arrival a, double upwardClockH) {
        if (!a.exists()) {
            return 0;
        }
        assertTrue(a.timeH() >= upwardClockH + 1.0, what + " at " + a.timeH() + " h, land heat flux upward from " + upwardClockH + " h");
        return 1;
    }

    /** Local clock time when the land's sensible heat flux (median over the land columns 20-80 km inland) turns upward. */
    static double firstUpwardLandFlux(Scenario s, NonlinearSolution run) {
        double[] x = run.xM();
        for (double t : run.storedTimesSec()) {
            if (t == run.startSec()) {
                continue; // no step has computed a flux yet
            }
            double[] h = run.sensibleHeatFluxWm2(t);
            java.util.List<Double> land = new java.util.ArrayList<>();
            for (int i = 0; i < x.length; i++) {
                if (x[i] >= 20_000 && x[i] <= 80_000) {
                    land.add(h[i]);
                }
            }
            java.util.Collections.sort(land);
            if (land.get(land.size() / 2) > 0) {
                return s.coast().clockHoursFromSolar(t / 3600.0);
            }
        }
        return Double.POSITIVE_INFINITY;
    }
}
