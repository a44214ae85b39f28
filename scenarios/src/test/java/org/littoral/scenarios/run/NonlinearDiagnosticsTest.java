package org.littoral.scenarios.run;

import org.littoral.model.front.FieldSections;

import org.littoral.model.front.BreezeDiagnostics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.scenario.BuiltinScenarios;
import org.littoral.scenarios.scenario.Scenario;
import org.littoral.scenarios.scenario.ScenarioFile;

/**
 * The run diagnostics on a nonlinear run: the built-in nl-offshore-2ms on a coarse grid (2 km, 24 layers,
 * 06-17 h, a few seconds). Expected behaviour from 2D studies of a breeze against weak offshore flow
 * (Estoque 1962; Arritt 1993, the validation suite's offshore case): onshore flow starts at the coast in
 * the morning and a front, the head of the onshore flow where the near-surface convergence peaks, moves
 * inland through the day. Nothing may come from the far-field sponges at the domain ends.
 */
class NonlinearDiagnosticsTest {
    @TempDir
    static Path dir;
    static ScenarioRun.Outcome out;
    static Scenario scenario;

    @BeforeAll
    static void runCoarse() throws Exception {
        String yaml = BuiltinScenarios.text("nl-offshore-2ms").replace("points: 400", "points: 200").replace("spacing_km: 1", "spacing_km: 2")
                .replace("levels: 65", "levels: 25").replace("first_level_spacing_m: 20", "first_level_spacing_m: 40")
                .replace("  end_h: 24", "  end_h: 17");
        scenario = ScenarioFile.parse("coarse-nl-offshore-2ms", yaml, false);
        out = new ScenarioRun(scenario, Solver.standard(), null).run(dir);
    }

    @Test
    void theFrontIsAtTheHeadOfTheOnshoreFlowAndMovesInland() {
        // FrontTrack: where the front passes its criteria it lies at the landward edge of the onshore flow
        BreezeDiagnostics.Result d = out.diagnostics();
        double dx = scenario.xGrid().dxM();
        double first = Double.NaN;
        double last = Double.NaN;
        for (int n = 0; n < d.reachM().length; n++) {
            if (Double.isNaN(d.frontXM()[n])) {
                continue;
            }
            assertTrue(Math.abs(d.frontXM()[n] - d.reachM()[n]) <= 3 * dx + 1,
                    "front " + d.frontXM()[n] + " m vs onshore reach " + d.reachM()[n] + " m at " + out.sections().clockH[n] + " h");
            if (Double.isNaN(first)) {
                first = d.frontXM()[n];
            }
            last = d.frontXM()[n];
        }
        assertTrue(first <= 2 * dx, "the front starts at the coast: " + first);
        assertTrue(last >= 10_000, "and is more than 10 km inland by 17 h: " + last);
        assertEquals(d.maxPenetrationM(), max(d.frontXM()), 1e-9);
    }

    @Test
    void onsetAndArrivalsComeInOrderOfDistance() {
        BreezeDiagnostics.Result d = out.diagnostics();
        assertNotNull(d.onsetClockH());
        assertTrue(d.onsetClockH() > 7 && d.onsetClockH() < 12, "morning onset at the coast: " + d.onsetClockH());
        Double a3 = d.sites().get(0).arrivalClockH();
        Double a10 = d.sites().get(1).arrivalClockH();
        assertNotNull(a3);
        assertNotNull(a10);
        assertTrue(d.onsetClockH() < a3 && a3 < a10, d.onsetClockH() + " < " + a3 + " < " + a10);
    }

    @Test
    void nothingIsFoundInTheSpongesAtTheDomainEnds() throws Exception {
        BreezeDiagnostics.Result d = out.diagnostics();
        FieldSections fs = out.sections();
        double edge = scenario.xGrid().lastM() - Scenario.NONLINEAR_SPONGE_M;
        assertTrue(fs.interiorToM <= edge && fs.interiorFromM >= -edge, fs.interiorFromM + " .. " + fs.interiorToM);
        assertTrue(d.peakXM() >= fs.interiorFromM && d.peakXM() <= fs.interiorToM);
        assertTrue(Math.abs(d.peakXM()) < 30_000, "the strongest breeze is near the coast: " + d.peakXM());
        JsonNode s = new ObjectMapper().readTree(dir.resolve("summary.json").toFile());
        assertEquals("nonlinear", s.get("model").asText());
        assertTrue(s.get("diagnostics").get("searched_zone").get("to_km").doubleValue() <= edge / 1000.0);
        assertTrue(Files.exists(dir.resolve("soundings.csv")));
    }

    @Test
    void theTimeDistanceAndSiteFiguresAreWrittenAsPngs() throws Exception {
        for (String f : new String[] {"near_surface_breeze.png", "site_shore-3km_breeze.png", "site_plain-50km_breeze.png"}) {
            java.awt.image.BufferedImage img = javax.imageio.ImageIO.read(dir.resolve(f).toFile());
            assertNotNull(img, f);
            assertTrue(img.getWidth() >= 1000, f);
        }
        JsonNode s = new ObjectMapper().readTree(dir.resolve("summary.json").toFile());
        assertTrue(s.get("files").toString().contains("near_surface_breeze.png"));
    }

    static double max(double[] a) {
        double m = 0;
        for (double v : a) {
            if (!Double.isNaN(v)) {
                m = Math.max(m, v);
            }
        }
        return m;
    }
}
