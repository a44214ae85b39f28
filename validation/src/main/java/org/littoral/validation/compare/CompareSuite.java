package org.littoral.validation.compare;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.littoral.scenarios.analysis.AnalysisChain;
import org.littoral.scenarios.analysis.AnalysisResult;
import org.littoral.scenarios.analysis.AnalysisSettings;
import org.littoral.scenarios.analysis.Layer;
import org.littoral.scenarios.analysis.SiteDayResult;
import org.littoral.scenarios.analysis.detect.Passage;
import org.littoral.scenarios.compare.Angles;
import org.littoral.scenarios.compare.Comparison;
import org.littoral.model.front.BreezeDiagnostics;
import org.littoral.scenarios.run.ScenarioRun;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.scenario.BuiltinScenarios;
import org.littoral.scenarios.scenario.Scenario;
import org.littoral.scenarios.validate.ValidationCase;
import org.littoral.scenarios.validate.ValidationSuite;

/**
 * The model against itself through the analysis chain: on a built-in scenario's synthetic soundings the
 * chain's onshore passage must fall within one flight interval of the model's own front arrival
 * (model.front.FrontTrack, docs/fronts.md) at every site the breeze reaches; a scenario compared with its own soundings has zero
 * error; and direction differences are circular.
 */
public final class CompareSuite implements ValidationSuite {
    /** An offshore ambient wind opposes the breeze, so the onshore flow arrives as a shift rather than a slow turn. */
    static final String SCENARIO = "offshore-ambient";
    static final String SOURCE = "consistency of littoral's two definitions: the model's arrival (model.front.FrontTrack, "
            + "docs/fronts.md) and the analysis chain's passage (docs/analysis.md), on the same model run";

    @Override
    public String title() {
        return "Model against observations (compare)";
    }

    @Override
    public int order() {
        return 65;
    }

    @Override
    public List<ValidationCase> run() {
        List<ValidationCase> out = new ArrayList<>();
        circular(out);
        Scenario s = BuiltinScenarios.resolve(SCENARIO);
        ScenarioRun.Outcome model;
        Path dir = null;
        try {
            dir = Files.createTempDirectory("littoral-compare-suite");
            model = new ScenarioRun(s, Solver.standard(), null).run(dir);
        } catch (IOException | RuntimeException e) {
            out.add(new ValidationCase("compare.passage-vs-front-arrival", SOURCE, "run " + SCENARIO, "runs", "", "failed: " + e,
                    false, false, null));
            return out;
        } finally {
            deleteQuietly(dir);
        }
        passageVersusArrival(s, model, out);
        selfComparison(s, model, out);
        return out;
    }

    static void circular(List<ValidationCase> out) {
        String src = "definition of the circular difference (shortest signed turn, wrapped to (-180, 180]), e.g. Fisher (1993), "
                + "Statistical Analysis of Circular Data, section 2.3, from memory";
        out.add(ValidationCase.absolute("compare.direction-difference-across-north", src, "model 10 deg minus observed 350 deg, deg",
                20.0, 0.0, Angles.differenceDeg(10, 350), true, "not -340"));
        out.add(ValidationCase.absolute("compare.direction-difference-opposite", src, "model 90 deg minus observed 270 deg, deg",
                180.0, 0.0, Angles.differenceDeg(90, 270), true, "the half-open range keeps +180"));
    }

    static void passageVersusArrival(Scenario s, ScenarioRun.Outcome model, List<ValidationCase> out) {
        double zs = s.output().nearSurfaceM();
        AnalysisSettings matched = new AnalysisSettings();
        Layer layer = null;
        for (Layer l : matched.metrics.layers) {
            if (l.contains(zs)) {
                layer = l;
                break;
            }
        }
        if (layer == null) {
            layer = new Layer(Math.max(0, zs - 5), zs + 90);
        }
        // compare like with like: the arrival is read at the near-surface level, so the chain's wind layer is the
        // metric layer that contains it (10-100 m; the chain's default wind layer 100-300 m is reported in the note)
        matched.detection.windLayer = layer;
        AnalysisResult r = AnalysisChain.run(model.profiles(), s.coast(), matched);
        AnalysisResult rDefault = AnalysisChain.run(model.profiles(), s.coast(), new AnalysisSettings());
        List<Double> launches = s.flights().schedule().launchTimesClockHours();
        int arrivals = 0;
        for (BreezeDiagnostics.SiteTiming t : model.diagnostics().sites()) {
            if (t.arrivalClockH() == null) {
                continue;
            }
            double arrival = t.arrivalClockH();
            double interval = intervalAt(launches, arrival);
            if (Double.isNaN(interval)) {
                continue; // arrives outside the flights: no sounding can see it
            }
            arrivals++;
            double found = firstOnshore(r, t.name());
            double foundDefault = firstOnshore(rDefault, t.name());
            boolean ok = !Double.isNaN(found) && Math.abs(found - arrival) <= interval + 1e-9;
            out.add(new ValidationCase("compare.passage-vs-front-arrival." + t.name(), SOURCE,
                    String.format(Locale.ROOT, "%s, %s (%.0f km inland): first onshore passage in the synthetic soundings, local h",
                            SCENARIO, t.name(), t.xM() / 1000.0),
                    ValidationCase.fmt(arrival), "+/- one flight interval (" + ValidationCase.fmt(interval * 60) + " min)",
                    ValidationCase.fmt(found), ok, false,
                    String.format(Locale.ROOT, "chain wind layer %s (contains the %.0f m arrival level); with the default %s "
                                    + "layer the passage is at %s h (%+.2f h)", layer.label(), zs,
                            new AnalysisSettings().detection.windLayer.label(), ValidationCase.fmt(foundDefault),
                            foundDefault - arrival)));
        }
        if (arrivals == 0) {
            out.add(new ValidationCase("compare.passage-vs-front-arrival", SOURCE, "sites the breeze reaches during the flights in " + SCENARIO,
                    ">= 1", "", "0", false, false, "the scenario no longer has an arrival at any site"));
        }
    }

    /** The spacing of the flights around time t: the gap between the launches that bracket it. */
    static double intervalAt(List<Double> launches, double t) {
        for (int i = 0; i + 1 < launches.size(); i++) {
            if (launches.get(i) <= t && t <= launches.get(i + 1)) {
                return launches.get(i + 1) - launches.get(i);
            }
        }
        return Double.NaN;
    }

    static double firstOnshore(AnalysisResult r, String site) {
        for (SiteDayResult d : r.siteDays()) {
            if (d.siteDay().site().equals(site)) {
                Passage p = d.firstOnshorePassage();
                return p == null ? Double.NaN : p.timeHours();
            }
        }
        return Double.NaN;
    }

    static void selfComparison(Scenario s, ScenarioRun.Outcome model, List<ValidationCase> out) {
        Comparison.Result r = Comparison.compute(new Comparison.Inputs(s, model, model.profiles(), s.coast(), new AnalysisSettings(),
                "all", "the model's own soundings", Map.of()));
        double worst = 0;
        int n = 0;
        for (Comparison.MetricRow m : r.metrics()) {
            worst = Math.max(worst, Math.max(Math.abs(m.bias()), m.rmse()));
            n += m.n();
        }
        double worstPassage = 0;
        int passages = 0;
        for (Comparison.PassageError p : r.passages()) {
            if (!Double.isNaN(p.observedH())) {
                worstPassage = Math.max(worstPassage, Math.abs(p.chainMinusObservedH()));
                passages++;
            }
        }
        if (passages == 0) {
            worstPassage = Double.NaN; // nothing compared: the case must not pass vacuously
        }
        String src = "identity: the same profiles through the same chain (exactness of the comparison)";
        out.add(ValidationCase.absolute("compare.self-zero-bias-rmse", src, "largest |bias| or RMSE over sites, layers and "
                + "variables, scenario against its own soundings", 0.0, 0.0, worst, false, n + " paired layer values, " + SCENARIO));
        out.add(ValidationCase.absolute("compare.self-zero-passage-error", src, "largest |passage-time error|, h", 0.0, 0.0,
                worstPassage, false, passages + " site(s) with an onshore passage, " + SCENARIO));
    }

    private static void deleteQuietly(Path dir) {
        if (dir == null) {
            return;
        }
        try (var s = Files.walk(dir)) {
            s.sorted(java.util.Comparator.reverseOrder()).forEach(p -> {
                try {
                    Files.deleteIfExists(p);
                } catch (IOException ignored) {
                    // a temporary folder; the OS cleans it up
                }
            });
        } catch (IOException ignored) {
            // nothing to clean
        }
    }
}
