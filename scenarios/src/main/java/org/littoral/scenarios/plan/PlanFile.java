package org.littoral.scenarios.plan;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;
import org.littoral.scenarios.input.InputDocument;
import org.littoral.scenarios.input.Shown;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.sweep.ScenarioMemberRunner;
import org.littoral.scenarios.sweep.SweepFile;
import org.littoral.scenarios.sweep.SweepSpec;

/**
 * Reads a plan file: a sweep file (base scenario and {@code ensemble}, see docs/sweeps.md) with a
 * {@code plan} section for the campaign options. Every error names the file, the key path, the value and
 * what is allowed. The format is documented in docs/planning.md.
 */
public final class PlanFile {
    public static final String BUILTIN_FOLDER = "/org/littoral/scenarios/builtin/plans/";
    public static final List<String> BUILTINS = List.of("bay-coast-plan", "quillmarsh-plan", "quillmarsh-plan-nonlinear");

    private static final Set<String> PLAN_KEYS = new TreeSet<>(List.of("candidates_km", "sites_per_set", "cadences",
            "operating_hours", "max_flights_per_site_per_day", "altitude_ceiling_m", "min_profiles_before",
            "min_profiles_after", "timing_tolerance_min", "speed_tolerance_fraction", "recommendations", "model",
            "pilot_members"));
    private static final Set<String> CADENCE_KEYS = new TreeSet<>(List.of("name", "interval_min", "dense_interval_min",
            "dense_window"));

    private final String source;
    private final InputDocument doc;

    private PlanFile(String source, InputDocument doc) {
        this.source = source;
        this.doc = doc;
    }

    /** The YAML text of a built-in plan. */
    public static String builtinText(String name) {
        try (InputStream in = PlanFile.class.getResourceAsStream(BUILTIN_FOLDER + name + ".yaml")) {
            if (in == null) {
                throw new UserInputException("no built-in plan '" + name + "'; built-in plans: " + BUILTINS);
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UserInputException("built-in plan '" + name + "' cannot be read: " + e.getMessage(), e);
        }
    }

    /** A built-in plan name or a file path. */
    public static PlanSpec load(String ref) {
        Path p = Path.of(ref);
        if (Files.isRegularFile(p)) {
            return read(p);
        }
        if (BUILTINS.contains(ref)) {
            try (InputStream in = PlanFile.class.getResourceAsStream(BUILTIN_FOLDER + ref + ".yaml")) {
                if (in == null) {
                    throw new UserInputException("built-in plan '" + ref + "' is missing from this build");
                }
                String name = "built-in plan " + ref;
                return parse(name, InputDocument.parse(name, new String(in.readAllBytes(), StandardCharsets.UTF_8), false), null, ref);
            } catch (IOException e) {
                throw new UserInputException("built-in plan '" + ref + "' cannot be read: " + e.getMessage(), e);
            }
        }
        throw new UserInputException("plan file " + Shown.text(ref) + " does not exist and is not a built-in plan; built-in plans: "
                + BUILTINS + "; give a path to a YAML or JSON plan file (see docs/planning.md)");
    }

    public static PlanSpec read(Path file) {
        if (!Files.exists(file)) {
            throw new UserInputException("plan file " + file + " does not exist; check the path");
        }
        InputDocument doc = InputDocument.read(file, "plan file");
        String base = file.getFileName().toString().replaceFirst("\\.(ya?ml|json)$", "");
        return parse(file.toString(), doc, file.toAbsolutePath().getParent(), base);
    }

    public static PlanSpec parse(String source, String text, Path folder, String defaultName) {
        return parse(source, InputDocument.parse("plan file " + source, text, false), folder, defaultName);
    }

    private static PlanSpec parse(String source, InputDocument doc, Path folder, String defaultName) {
        ObjectNode root = doc.rootMapping("plan keys (base, ensemble and plan)");
        ObjectNode sweepPart = root.deepCopy();
        JsonNode plan = sweepPart.remove("plan");
        PlanFile pf = new PlanFile(source, doc);
        if (plan == null || !plan.isObject()) {
            throw pf.err("plan", (plan == null ? "missing" : Shown.value(plan) + " is not a mapping")
                    + "; give the campaign options (candidates_km, sites_per_set, cadences, ...) indented under plan:");
        }
        SweepSpec spec = SweepFile.parse(source, doc, sweepPart, folder, ScenarioMemberRunner.scenarioSource(), defaultName);
        return pf.parsePlan((ObjectNode) plan, spec);
    }

    private UserInputException err(String keyPath, String problem) {
        return new UserInputException(doc.where(keyPath) + ": " + Shown.clip(keyPath, 100) + ": " + problem);
    }

    private PlanSpec parsePlan(ObjectNode plan, SweepSpec spec) {
        doc.onlyKeys(plan, "plan", PLAN_KEYS);
        double[] candidates = candidates(plan.get("candidates_km"));
        int sitesPerSet = (int) number(plan, "sites_per_set", 2, 1, 6, "sites", true);
        if (sitesPerSet > candidates.length) {
            throw err("plan.sites_per_set", sitesPerSet + " is more than the " + candidates.length
                    + " candidate distances; give more candidates or fewer sites");
        }
        JsonNode hours = plan.get("operating_hours");
        double start = 7.0;
        double end = 19.0;
        if (hours != null) {
            if (!hours.isObject()) {
                throw err("plan.operating_hours", Shown.value(hours) + " is not a mapping; give {start_h, end_h}");
            }
            doc.onlyKeys(hours, "plan.operating_hours", List.of("start_h", "end_h"));
            start = number((ObjectNode) hours, "start_h", 7, 0, 24, "h local clock", false, "plan.operating_hours.");
            end = number((ObjectNode) hours, "end_h", 19, 0, 24, "h local clock", false, "plan.operating_hours.");
        }
        if (!(end > start + 1)) {
            throw err("plan.operating_hours", "end_h = " + fmt(end) + " is not at least an hour after start_h = " + fmt(start)
                    + "; give a later end_h");
        }
        List<CadenceOption> cadences = cadences(plan.get("cadences"), start, end);
        int maxFlights = (int) number(plan, "max_flights_per_site_per_day", 48, 1, 500, "flights", true);
        double ceiling = number(plan, "altitude_ceiling_m", 600, 50, 3000, "m above ground", false);
        int before = (int) number(plan, "min_profiles_before", 2, 0, 20, "profiles", true);
        int after = (int) number(plan, "min_profiles_after", 2, 0, 20, "profiles", true);
        double tolMin = number(plan, "timing_tolerance_min", cadences.get(0).intervalMin(), 1, 240, "minutes", false);
        double speedTol = number(plan, "speed_tolerance_fraction", 0.25, 0.01, 2, "(fraction)", false);
        int top = (int) number(plan, "recommendations", 10, 1, 1000, "rows", true);
        int pilot = (int) number(plan, "pilot_members", Math.min(spec.memberCount(), 20), 1, 100000, "members", true);
        // fronts need the nonlinear model (linear theory has none): it is the default
        String model = plan.has("model") ? plan.get("model").asText() : "nonlinear";
        if (!plan.path("model").isMissingNode() && !plan.get("model").isTextual()
                || !List.of("scenario", "linear", "nonlinear").contains(model)) {
            throw err("plan.model", Shown.value(plan.get("model")) + " is not a model; use scenario, linear or nonlinear");
        }
        return new PlanSpec(spec, candidates, sitesPerSet, cadences, start, end, maxFlights, ceiling,
                new PlanCriteria(before, after, tolMin / 60.0, speedTol), top, model, pilot);
    }

    private double[] candidates(JsonNode n) {
        String key = "plan.candidates_km";
        if (n == null) {
            throw err(key, "missing; give a list of inland distances or {from, to, step} in km");
        }
        List<Double> out = new ArrayList<>();
        if (n.isArray()) {
            for (int i = 0; i < n.size(); i++) {
                if (!n.get(i).isNumber() || !Double.isFinite(n.get(i).asDouble())) {
                    throw err(key + "[" + i + "]", Shown.value(n.get(i)) + " is not a number; give an inland distance in km");
                }
                out.add(n.get(i).asDouble());
            }
        } else if (n.isObject()) {
            doc.onlyKeys(n, key, List.of("from", "to", "step"));
            double from = number((ObjectNode) n, "from", Double.NaN, -500, 500, "km", false, key + ".");
            double to = number((ObjectNode) n, "to", Double.NaN, -500, 500, "km", false, key + ".");
            double step = number((ObjectNode) n, "step", Double.NaN, 0.01, 500, "km", false, key + ".");
            if (!(to >= from)) {
                throw err(key, "to = " + fmt(to) + " km is less than from = " + fmt(from) + " km; swap them");
            }
            long count = Math.round(Math.floor((to - from) / step + 1e-9)) + 1;
            if (count > 400) {
                throw err(key, count + " candidate distances is more than the 400 allowed; use a larger step");
            }
            for (long i = 0; i < count; i++) {
                out.add(Math.round((from + i * step) * 1e6) / 1e6);
            }
        } else {
            throw err(key, Shown.value(n) + " is not a list of distances; give a list of km or {from, to, step}");
        }
        if (out.isEmpty()) {
            throw err(key, "no candidate distances; give at least one");
        }
        for (int i = 0; i < out.size(); i++) {
            if (!(out.get(i) > 0)) {
                throw err(key + "[" + i + "]", fmt(out.get(i)) + " km is not inland; give positive inland distances (x > 0)");
            }
        }
        return out.stream().mapToDouble(Double::doubleValue).sorted().distinct().toArray();
    }

    private List<CadenceOption> cadences(JsonNode n, double start, double end) {
        String key = "plan.cadences";
        List<CadenceOption> out = new ArrayList<>();
        if (n == null) {
            out.add(new CadenceOption("every 30 min", 30, 0, false, Double.NaN, Double.NaN));
            out.add(new CadenceOption("30 min, 15 min in the front window", 30, 15, true, Double.NaN, Double.NaN));
            return out;
        }
        if (!n.isArray() || n.isEmpty()) {
            throw err(key, Shown.value(n) + " is not a list of cadences; give a non-empty list of {name, interval_min, "
                    + "dense_interval_min, dense_window}");
        }
        for (int i = 0; i < n.size(); i++) {
            String k = key + "[" + i + "]";
            JsonNode c = n.get(i);
            if (!c.isObject()) {
                throw err(k, Shown.value(c) + " is not a mapping; give {name, interval_min, dense_interval_min, dense_window}");
            }
            doc.onlyKeys(c, k, CADENCE_KEYS);
            ObjectNode o = (ObjectNode) c;
            double interval = number(o, "interval_min", Double.NaN, 1, 240, "minutes", false, k + ".");
            double dense = number(o, "dense_interval_min", 0, 0, 240, "minutes", false, k + ".");
            if (dense > 0 && dense < 1) {
                throw err(k + ".dense_interval_min", fmt(dense) + " min is shorter than a minute; give 0 (no dense window) or "
                        + "1 to 240 min");
            }
            if (dense > 0 && !(dense < interval)) {
                throw err(k + ".dense_interval_min", fmt(dense) + " is not shorter than interval_min = " + fmt(interval)
                        + "; give a shorter dense interval, or 0 for none");
            }
            if (dense > 0 && Math.abs(interval / dense - Math.rint(interval / dense)) > 1e-9) {
                throw err(k + ".dense_interval_min", fmt(dense) + " does not divide interval_min = " + fmt(interval)
                        + " exactly (dense flights must include every base flight); give e.g. " + fmt(interval / 2));
            }
            boolean auto = true;
            double ds = Double.NaN;
            double de = Double.NaN;
            JsonNode w = o.get("dense_window");
            if (w != null && !(w.isTextual() && w.asText().equals("auto"))) {
                if (!w.isObject()) {
                    throw err(k + ".dense_window", Shown.value(w) + " is not a window; give 'auto' or {start_h, end_h}");
                }
                doc.onlyKeys(w, k + ".dense_window", List.of("start_h", "end_h"));
                auto = false;
                ds = number((ObjectNode) w, "start_h", Double.NaN, start, end, "h local clock (inside operating hours)", false,
                        k + ".dense_window.");
                de = number((ObjectNode) w, "end_h", Double.NaN, ds, end, "h local clock (after start_h)", false,
                        k + ".dense_window.");
            }
            if (o.has("name") && (!o.get("name").isTextual() || o.get("name").asText().isBlank() || o.get("name").asText().length() > 80)) {
                throw err(k + ".name", Shown.value(o.get("name")) + " is not a cadence name; give a short text (at most 80 characters)");
            }
            String name = o.has("name") ? o.get("name").asText() : String.format(Locale.ROOT, "%.0f min%s", interval,
                    dense > 0 ? String.format(Locale.ROOT, ", %.0f min dense", dense) : "");
            out.add(new CadenceOption(name, interval, dense, dense > 0 && auto, ds, de));
        }
        return out;
    }

    private double number(ObjectNode o, String key, double dflt, double lo, double hi, String unit, boolean integer) {
        return number(o, key, dflt, lo, hi, unit, integer, "plan.");
    }

    private double number(ObjectNode o, String key, double dflt, double lo, double hi, String unit, boolean integer,
                          String prefix) {
        JsonNode v = o.get(key);
        String range = InputDocument.range(lo, hi, unit, integer);
        if (v == null || v.isNull()) {
            if (Double.isNaN(dflt)) {
                throw err(prefix + key, "missing; give " + range);
            }
            return dflt;
        }
        if (!v.isNumber() || !Double.isFinite(v.asDouble())) {
            throw err(prefix + key, Shown.value(v) + " is not a number; give " + range);
        }
        double d = v.asDouble();
        if (integer && d != Math.rint(d)) {
            throw err(prefix + key, Shown.value(v) + " is not a whole number; give " + range);
        }
        if (!(d >= lo && d <= hi)) {
            throw err(prefix + key, Shown.value(v) + " is outside the allowed range; give " + range);
        }
        return d;
    }

    private static String fmt(double d) {
        return Shown.number(d);
    }
}
