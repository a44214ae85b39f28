package org.littoral.scenarios.compare;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.analysis.AnalysisSettings;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.observe.ObserveIngest;
import org.littoral.scenarios.run.ScenarioRun;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.scenario.BuiltinScenarios;
import org.littoral.scenarios.scenario.Scenario;

/**
 * A scenario compared with its own synthetic soundings: the exactness check (zero bias, zero RMSE, zero
 * passage error, by construction of the comparison: identical inputs through the identical chain), the
 * same after a round trip through the soundings CSV (errors bounded by the CSV's printed precision), and
 * the one-line errors for bad inputs.
 */
class CompareSelfTest {
    static Scenario scenario;
    static ScenarioRun.Outcome model;
    static Path runDir;

    @BeforeAll
    static void runScenario(@TempDir Path dir) throws Exception {
        scenario = BuiltinScenarios.resolve("classic-45N");
        runDir = dir.resolve("model");
        model = new ScenarioRun(scenario, Solver.standard(), null).run(runDir);
    }

    static Comparison.Result compare(List<Profile> observed, String selection) {
        return Comparison.compute(new Comparison.Inputs(scenario, model, observed, scenario.coast(), new AnalysisSettings(),
                selection, "test observations", Map.of()));
    }

    @Test
    void aScenarioAgainstItsOwnSoundingsHasZeroBiasRmseAndPassageError() {
        Comparison.Result r = compare(model.profiles(), "all");
        assertEquals(scenario.sites().size(), r.sites().size());
        assertEquals(model.profiles().size(), r.pairs());
        int checked = 0;
        for (Comparison.MetricRow m : r.metrics()) {
            assertTrue(m.n() > 0, "no pairs for " + m);
            assertEquals(0.0, m.bias(), 0.0, m.toString());
            assertEquals(0.0, m.rmse(), 0.0, m.toString());
            checked++;
        }
        assertEquals(scenario.sites().size() * 3 * 4, checked);
        int passages = 0;
        for (Comparison.PassageError p : r.passages()) {
            if (!Double.isNaN(p.observedH())) {
                assertEquals(0.0, p.chainMinusObservedH(), 0.0, p.toString());
                passages++;
            }
        }
        assertTrue(passages > 0, "the chain found no onshore passage in classic-45N's soundings");
        for (Comparison.Section sec : r.sections()) {
            for (int k = 0; k < sec.heightM().length; k++) {
                for (int j = 0; j < sec.timeH().length; j++) {
                    assertEquals(sec.modelCrossShore()[k][j], sec.observedCrossShore()[k][j], 1e-12,
                            sec.site() + " cross-shore at " + sec.heightM()[k] + " m, " + sec.timeH()[j] + " h");
                    assertEquals(sec.modelTheta()[k][j], sec.observedTheta()[k][j], 1e-12);
                }
            }
        }
    }

    @Test
    void aRoundTripThroughTheSoundingsCsvKeepsErrorsWithinItsPrintedPrecision() throws Exception {
        AnalysisSettings s = new AnalysisSettings();
        List<Profile> back = ObserveIngest.ingest(runDir.resolve("soundings.csv"), s).profiles();
        Comparison.Result r = compare(back, "all");
        for (Comparison.MetricRow m : r.metrics()) {
            // soundings.csv prints temperature to 0.01 C, mixing ratio to 0.001 g/kg, speed to 0.01 m/s, direction to 0.1 deg
            double tol = switch (m.variable()) {
                case "temperature_K" -> 0.005 + 1e-9;
                case "mixing_ratio_g_per_kg" -> 0.0005 + 1e-9;
                case "wind_speed_m_per_s" -> 0.02;
                default -> 1.0;
            };
            assertTrue(Math.abs(m.bias()) <= tol && m.rmse() <= tol, m + " beyond " + tol);
        }
    }

    @Test
    void anObservedSiteTheScenarioLacksIsAOneLineErrorListingBothSiteSets() {
        List<Profile> renamed = new ArrayList<>();
        for (Profile p : model.profiles()) {
            renamed.add(new Profile("harbour-mole", p.day(), p.timeHours(), p.heightM(), p.pressurePa(), p.temperatureK(),
                    p.relativeHumidity(), p.mixingRatioKgPerKg(), p.dewpointK(), p.windEastMPerS(), p.windNorthMPerS(), p.thetaK(),
                    p.thetaVK(), p.thetaEK()));
        }
        UserInputException e = assertThrows(UserInputException.class, () -> compare(renamed.subList(0, 30), "all"));
        assertTrue(e.getMessage().contains("harbour-mole") && e.getMessage().contains(scenario.sites().get(0).name()),
                e.getMessage());
        assertTrue(!e.getMessage().contains("\n"));
    }

    @Test
    void aSiteAtAnotherInlandDistanceInTheCoastFileIsAnErrorNamingBothDistances() {
        String site = scenario.sites().get(0).name();
        double km = scenario.sites().get(0).inlandDistanceM() / 1000.0;
        UserInputException e = assertThrows(UserInputException.class, () -> Comparison.compute(new Comparison.Inputs(scenario,
                model, model.profiles(), scenario.coast(), new AnalysisSettings(), "all", "test observations",
                Map.of(site, (km + 1.0) * 1000.0))));
        assertTrue(e.getMessage().contains(site) && e.getMessage().contains(String.format(java.util.Locale.ROOT, "%.2f km", km + 1.0))
                && e.getMessage().contains(String.format(java.util.Locale.ROOT, "%.2f km", km)), e.getMessage());
    }

    @Test
    void observationsOutsideTheModelsFlightTimesAreAOneLineErrorWithBothSpans() {
        List<Profile> night = new ArrayList<>();
        for (Profile p : model.profiles()) {
            double t = p.timeHours() - 7.0;
            if (t > 0 && t < 3) {
                night.add(new Profile(p.site(), "2031-01-01", t, p.heightM(), p.pressurePa(), p.temperatureK(),
                        p.relativeHumidity(), p.mixingRatioKgPerKg(), p.dewpointK(), p.windEastMPerS(), p.windNorthMPerS(),
                        p.thetaK(), p.thetaVK(), p.thetaEK()));
            }
        }
        UserInputException e = assertThrows(UserInputException.class, () -> compare(night, "all"));
        assertTrue(e.getMessage().contains("test observations") && e.getMessage().contains("no observed profile"), e.getMessage());
    }

    @Test
    void anUnknownBreezeTypeIsRejectedWithTheAllowedChoices() {
        UserInputException e = assertThrows(UserInputException.class, () -> compare(model.profiles(), "sideways"));
        assertTrue(e.getMessage().contains("corkscrew"), e.getMessage());
    }

    @Test
    void theCommandWritesTablesSectionsAndAReportThatEmbedsThem(@TempDir Path out) throws Exception {
        CompareRun.Outcome o = CompareRun.run("classic-45N", "linear", runDir.resolve("soundings.csv"), null, null, "all", out, null);
        for (String f : List.of("metrics.csv", "metrics.json", "metrics-by-day.csv", "passage-errors.csv", "passage-summary.csv",
                "report.html", "model/summary.json")) {
            assertTrue(Files.size(out.resolve(f)) > 0, f);
        }
        assertEquals(scenario.sites().size(), o.figures().size(), "one time-height section per site");
        assertTrue(o.passageFigure() != null && Files.size(o.passageFigure()) > 0, "passage-time figure");
        String html = Files.readString(o.report());
        assertEquals(o.figures().size() + 1, html.split("data:image/png;base64,", -1).length - 1);
        assertTrue(html.contains("not a weather forecast"));
        List<String> lines = Files.readAllLines(out.resolve("metrics.csv"));
        assertEquals("site,layer,variable,n,bias,rmse,mean_observed,mean_model,unit", lines.get(0));
        assertEquals(1 + scenario.sites().size() * 3 * 4, lines.size());
    }
}
