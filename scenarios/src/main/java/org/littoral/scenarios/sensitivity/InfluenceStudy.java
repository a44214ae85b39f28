package org.littoral.scenarios.sensitivity;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.run.WorkEstimate;
import org.littoral.scenarios.sweep.Axis;
import org.littoral.scenarios.sweep.AxisValue;
import org.littoral.scenarios.sweep.Distribution;
import org.littoral.scenarios.sweep.KeyPath;
import org.littoral.scenarios.sweep.Member;
import org.littoral.scenarios.sweep.MemberExpander;
import org.littoral.scenarios.sweep.MemberStore;
import org.littoral.scenarios.sweep.SweepExecutor;
import org.littoral.scenarios.sweep.SweepSpec;
import org.littoral.scenarios.timing.DaySpec;

/**
 * The use case of {@code littoral influence}: which uncertain input of a day controls the front's arrival at each site,
 * its inland penetration and the post-passage change. The uncertain inputs and their distributions are exactly those of
 * the day file's check-timing ensemble ({@link DaySpec#ensemble()}, docs/timing-checks.md); the Saltelli design
 * ({@link SampleDesign}) is written as a zipped sweep (one axis per input, N (k + 2) points), so its members run
 * through the sweep machinery like any other sweep (all cores, one atomic file per member, --resume).
 *
 * <p>Members without an arrival at a site: the arrival time is <b>censored</b>: a front that never reaches the site in
 * the output window counts as arriving at the end of the window, one already there at the first output time at that
 * time; the indices of the arrival are those of this censored time. Beside them the study gives the probability of
 * arrival and, when some members arrive and some do not, the indices of the indicator "the front arrives" (which
 * input decides whether it gets there at all). The post-passage change exists only for members whose front arrives
 * and whose two hours after lie in the window: its indices use those rows only (rows missing it in any block are
 * left out as a whole) and say how many remained.
 */
public final class InfluenceStudy {

    /**
     * @param rows base sample size N (rows of A and B)
     * @param points Sobol' sequence or seeded random points
     * @param seed seed of random points and of the bootstrap
     * @param resamples bootstrap resamples
     * @param level confidence level of the intervals
     */
    public record Settings(int rows, SampleDesign.Points points, long seed, int resamples, double level) {
        public Settings {
            if (rows < 4 || rows > 4096) {
                throw new UserInputException("--rows " + rows + " is outside 4..4096; give the base sample size N (the study runs "
                        + "N (k + 2) members for k uncertain inputs)");
            }
            if (resamples < 0 || resamples > 100_000) {
                throw new UserInputException("--bootstrap " + resamples + " is outside 0..100000");
            }
        }
    }

    /** An uncertain input: its reader name, scenario key path and distribution. */
    public record Input(String name, KeyPath path, Distribution distribution) {
    }

    /**
     * Indices of one output.
     *
     * @param key stable identifier (arrival:site, arrives:site, theta_v_change:site, penetration)
     * @param label in words, with unit
     * @param site the site, or null for a whole-coast output
     * @param fraction for arrival outputs the fraction of members whose front arrives (NaN otherwise)
     */
    public record OutputIndices(String key, String label, String site, SobolIndices.Result indices, double fraction) {
    }

    public record Result(DaySpec spec, List<Input> inputs, SampleDesign design, List<Member> members, double[][] values,
                         List<String> valueKeys, List<OutputIndices> outputs, SweepExecutor.Outcome outcome, String model,
                         List<String> notes, double wallSeconds) {
    }

    private InfluenceStudy() {
    }

    /** The uncertain inputs of the day's ensemble, in the day file's order. */
    public static List<Input> inputs(DaySpec spec) {
        SweepSpec.Ensemble e = spec.ensemble().ensemble();
        if (e == null || e.draws().isEmpty()) {
            throw new UserInputException("day file " + spec.source() + ": the ensemble draws no uncertain input; leave at least "
                    + "one drawn (docs/timing-checks.md)");
        }
        List<Input> out = new ArrayList<>();
        for (SweepSpec.Draw d : e.draws()) {
            out.add(new Input(readerName(d.path().toString()), d.path(), d.distribution()));
        }
        return out;
    }

    /** A reader's name for a swept key path. */
    public static String readerName(String path) {
        if (path.equals("ambient_wind.from_deg")) {
            return "ambient direction";
        }
        if (path.equals("ambient_wind.speed_m_per_s")) {
            return "ambient speed";
        }
        if (path.equals("heating.peak_flux_difference_W_per_m2")) {
            return "land heating (peak flux)";
        }
        if (path.equals("heating.amplitude_K_per_h")) {
            return "land heating (amplitude)";
        }
        if (path.equals("atmosphere.buoyancy_frequency_per_s")) {
            return "stratification (N)";
        }
        if (path.endsWith(".sst_K")) {
            return "sea-surface temperature";
        }
        if (path.equals("heating.initial_depth_m")) {
            return "morning mixed-layer depth";
        }
        return path;
    }

    /** The study's design as a zipped sweep: one axis per input, point p of the design as member p. */
    public static SweepSpec designSweep(DaySpec spec, List<Input> inputs, SampleDesign d) {
        List<Axis> axes = new ArrayList<>();
        int runs = d.runs();
        for (int i = 0; i < inputs.size(); i++) {
            List<AxisValue> values = new ArrayList<>(runs);
            for (int p = 0; p < runs; p++) {
                values.add(InputQuantiles.valueAt(inputs.get(i).distribution(), d.point(p)[i]));
            }
            axes.add(new Axis(inputs.get(i).path(), values));
        }
        SweepSpec e = spec.ensemble();
        return new SweepSpec(spec.source(), "influence-" + spec.date(), "variance-based sensitivity study of " + spec.date()
                + " (" + d.points().name().toLowerCase(Locale.ROOT) + " design, N = " + d.n() + ", " + inputs.size() + " inputs)",
                e.baseLabel(), e.base(), e.fixed(), true, axes, null, e.typing());
    }

    /**
     * Runs the study's members where {@code opt.placement()} says and analyses them; null when this process did not end
     * with every member's result (one shard of a job array, or a submission).
     */
    public static Result run(DaySpec spec, Settings s, Path dir, SweepExecutor.Options opt, Solver solver) throws IOException {
        long t0 = System.nanoTime();
        List<Input> inputs = inputs(spec);
        SampleDesign design = SampleDesign.of(s.points(), s.rows(), inputs.size(), s.seed());
        SweepSpec sweep = designSweep(spec, inputs, design);
        List<Member> members = MemberExpander.expand(sweep);
        List<String> siteNames = new ArrayList<>();
        double[] xM = new double[spec.sites().size()];
        for (int i = 0; i < xM.length; i++) {
            siteNames.add(spec.sites().get(i).name());
            xM[i] = spec.sites().get(i).inlandKm() * 1000.0;
        }
        OutcomeMemberRunner runner = new OutcomeMemberRunner(spec.source(), solver, siteNames, xM);
        WorkEstimate largest = null;
        for (Member m : members) {
            WorkEstimate w = WorkEstimate.of(runner.scenarioOf(m));
            largest = largest == null || w.runBytes() > largest.runBytes() ? w : largest;
        }
        int here = opt.placement().concurrentHere(opt.threads());
        if (here > 0) {
            largest.check(Math.min(here, members.size()), "day file " + spec.source());
        }
        Files.createDirectories(dir);
        opt.log().println("influence: " + inputs.size() + " uncertain inputs, N = " + s.rows() + " rows: " + members.size()
                + " members, " + spec.model() + " model, " + opt.threads() + " thread(s)");
        SweepExecutor.Outcome so = SweepExecutor.run(sweep, members, dir, runner, opt.placed(opt.placement(), largest));
        if (!so.complete()) {
            return null; // one shard, or a submission to a batch system: the merge step analyses the members
        }
        return analyse(spec, s, inputs, design, members, dir, so, (System.nanoTime() - t0) / 1e9);
    }

    /** Reads the member files and computes every output's indices. */
    static Result analyse(DaySpec spec, Settings s, List<Input> inputs, SampleDesign design, List<Member> members, Path dir,
                          SweepExecutor.Outcome so, double wall) throws IOException {
        MemberStore store = new MemberStore(dir);
        int ns = spec.sites().size();
        List<String> keys = new ArrayList<>();
        for (DaySpec.Site site : spec.sites()) {
            keys.add("arrival:" + site.name());
        }
        for (DaySpec.Site site : spec.sites()) {
            keys.add("arrives:" + site.name());
        }
        for (DaySpec.Site site : spec.sites()) {
            keys.add("theta_v_change:" + site.name());
        }
        keys.add("penetration");
        double[][] v = new double[keys.size()][members.size()];
        for (double[] row : v) {
            java.util.Arrays.fill(row, Double.NaN);
        }
        String model = spec.model();
        String firstError = null;
        int failed = 0;
        boolean fronts = true;
        for (Member m : members) {
            ObjectNode rec = store.read(m.id());
            if (!MemberStore.STATUS_OK.equals(rec.path("status").asText())) {
                failed++;
                if (firstError == null) {
                    firstError = m.id() + ": " + rec.path("error").asText();
                }
                continue;
            }
            JsonNode r = rec.get("result");
            model = r.path("model").asText(model);
            fronts = r.path("fronts").asBoolean(true);
            double start = r.path("output_start_h").asDouble();
            double end = r.path("output_end_h").asDouble();
            int p = m.index();
            for (int i = 0; i < ns; i++) {
                JsonNode site = r.path("sites").path(i);
                JsonNode a = site.get("arrival_h");
                boolean arrived = a != null && a.isNumber();
                // censored arrival: the end of the window when the front never gets there, the first output time when
                // it is already there
                v[i][p] = arrived ? a.asDouble() : site.path("before_output").asBoolean(false) ? start : end;
                v[ns + i][p] = arrived || site.path("before_output").asBoolean(false) ? 1 : 0;
                JsonNode c = site.get("theta_v_change_K");
                v[2 * ns + i][p] = c != null && c.isNumber() ? c.asDouble() : Double.NaN;
            }
            JsonNode pen = r.get("penetration_km");
            v[3 * ns][p] = pen != null && pen.isNumber() ? pen.asDouble() : 0.0;
        }
        if (failed == members.size()) {
            throw new UserInputException("influence " + spec.source() + ": every one of the " + members.size() + " members failed"
                    + " (first: " + firstError + "); fix the cause and run again with --resume");
        }
        List<String> notes = new ArrayList<>();
        if (failed > 0) {
            notes.add(failed + " member(s) failed (first: " + firstError + "); the rows of the design holding them are left "
                    + "out of every index");
        }
        String arrivalWord = fronts ? "front arrival" : "onset of onshore flow (linear theory has no front)";
        List<OutputIndices> outs = new ArrayList<>();
        int n = design.n();
        for (int k = 0; k < keys.size(); k++) {
            double[] y = v[k];
            String key = keys.get(k);
            String site = key.contains(":") ? key.substring(key.indexOf(':') + 1) : null;
            double frac = Double.NaN;
            if (key.startsWith("arrives:")) {
                frac = mean(y);
                if (!(frac > 0 && frac < 1)) {
                    continue; // every member (or none) arrives: nothing varies
                }
            }
            if (key.startsWith("theta_v_change:") && count(y) < 8) {
                continue;
            }
            double[] ya = java.util.Arrays.copyOfRange(y, 0, n);
            double[] yb = java.util.Arrays.copyOfRange(y, n, 2 * n);
            double[][] yab = new double[inputs.size()][];
            for (int i = 0; i < inputs.size(); i++) {
                yab[i] = java.util.Arrays.copyOfRange(y, (2 + i) * n, (3 + i) * n);
            }
            SobolIndices.Result res = SobolIndices.estimate(ya, yb, yab, s.resamples(), s.level(), s.seed() ^ (k + 1L));
            if (key.startsWith("theta_v_change:") && res.rowsUsed() < 8) {
                notes.add("the post-passage change at " + site + " is left out: only " + res.rowsUsed() + " of " + n + " rows "
                        + "have it in every block (at least 8 needed)");
                continue;
            }
            if (key.startsWith("arrival:")) {
                frac = mean(v[ns + keys.indexOf(key)]);
            }
            String label = switch (key.substring(0, key.contains(":") ? key.indexOf(':') : key.length())) {
                case "arrival" -> arrivalWord + " at " + site + " (h, censored at the window's ends)";
                case "arrives" -> "whether the " + (fronts ? "front" : "onshore flow") + " reaches " + site + " (0/1)";
                case "theta_v_change" -> "near-surface theta-v change in the 2 h after passage at " + site + " (K)";
                default -> "maximum inland penetration (km; 0 when no front)";
            };
            outs.add(new OutputIndices(key, label, site, res, frac));
        }
        if (!fronts) {
            notes.add("linear quick look: times are the onset of onshore flow (linear theory has no front) and there is no "
                    + "post-passage change; run with --model nonlinear for the front");
        }
        return new Result(spec, inputs, design, members, v, keys, outs, so, model, notes, wall);
    }

    private static double mean(double[] y) {
        double s = 0;
        int c = 0;
        for (double x : y) {
            if (Double.isFinite(x)) {
                s += x;
                c++;
            }
        }
        return c == 0 ? Double.NaN : s / c;
    }

    private static int count(double[] y) {
        int c = 0;
        for (double x : y) {
            c += Double.isFinite(x) ? 1 : 0;
        }
        return c;
    }
}
