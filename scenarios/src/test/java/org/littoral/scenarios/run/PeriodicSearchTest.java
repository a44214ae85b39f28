package org.littoral.scenarios.run;

import org.littoral.model.front.BreezeDiagnostics;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.littoral.scenarios.scenario.BuiltinScenarios;

/**
 * classic-45N (linear, periodic domain of 2048 km): the diagnostics keep to half-way to the wrapped coast, so the
 * peak onshore wind is this coast's (Rotunno 1983: at the coast, near noon, for f > omega), not the periodic image
 * at x = -1024 km; and arrivals that differ by less than their timing uncertainty give no implied speed.
 */
class PeriodicSearchTest {
    @Test
    void classic45NPeaksAtTheCoastAndReportsNoImplausibleSpeed() throws Exception {
        Path dir = Files.createTempDirectory("littoral-classic-");
        try {
            ScenarioRun.Outcome o = new ScenarioRun(BuiltinScenarios.resolve("classic-45N"), Solver.standard(), null).figures(false)
                    .fieldsNetcdf(false).run(dir);
            BreezeDiagnostics.Result d = o.diagnostics();
            assertTrue(Math.abs(d.peakXM()) <= 20_000, "peak at " + d.peakXM() + " m");
            assertTrue(d.peakClockH() >= 10 && d.peakClockH() <= 14, "peak at " + d.peakClockH() + " h");
            assertFalse(d.peak().atSearchLimit());
            assertFalse(d.track().fronts(), "linear theory has no front");
            for (BreezeDiagnostics.SpeedBetween s : d.speeds()) {
                assertTrue(!s.speed().resolved() || Math.abs(s.speed().mPerS()) <= 30.0, s.toString());
            }
            double[] zone = d.track().searchedM();
            assertTrue(zone[0] >= -512_000 - 1 && zone[1] <= 512_000 + 1, zone[0] + " .. " + zone[1]);
        } finally {
            try (var w = Files.walk(dir)) {
                w.sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
            }
        }
    }
}
