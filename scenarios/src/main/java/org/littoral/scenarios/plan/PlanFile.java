package org.littoral.scenarios.plan;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;
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

    private PlanFile(String source) {
        this.source = source;
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
                return parse("built-in plan " + ref, new String(in.readAllBytes(), StandardCharsets.UTF_8), null, ref);
            } catch (IOException e) {
                throw new UserInputException("built-in plan '" + ref + "' cannot be read: " + e.getMessage(), e);
            }
        }
        throw new UserInputException("plan file '" + ref + "' does not exist and is not a built-in plan; built-in plans: "
                + BUILTINS + "; give a path to a YAML or JSON plan file (see docs/planning.md)");
    }

    public static PlanSpec read(Path file) {
        String text;
        try {
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new UserInputException("plan file " + file + " does not exist; check the path");
        } catch (IOException e) {
            throw new UserInputException("plan file " + file + " cannot be read: " + e.getMessage(), e);
        }
        String base = file.getFileName().toString().replaceFirst("\\.(ya?ml|json)$", "");
        return parse(file.toString(), text, file.toAbsolutePath().getParent(), base);
    }

    public static PlanSpec parse(String source, String text, Path folder, String defaultName) {
        JsonNode root;
        try {
            root = new ObjectMapper(new YAMLFactory()).readTree(text);
        } catch (JsonProcessingException e) {
            String where = e.getLocation() == null ? "" : ":" + e.getLocation().getLineNr() + ":" + e.getLocation().getColumnNr();
            throw new UserInputException("plan file " + source + where + ": not valid YAML/JSON: " + e.getOriginalMessage());
        }
        if (root == null || !root.isObject()) {
            throw new UserInputException("plan file " + source + ": expected a mapping with 'base', 'ensemble' and 'plan'");
        }
        ObjectNode sweepPart = ((ObjectNode) root).deepCopy();
        JsonNode plan = sweepPart.remove("plan");
        PlanFile pf = new PlanFile(source);
        if (plan == null || !plan.isObject()) {
            throw pf.err("plan", "missing or not a mapping; give the campaign options (candidates_km, sites_per_set, cadences, ...)");
        }
        SweepSpec spec = SweepFile.parse(source, sweepPart, folder, ScenarioMemberRunner.scenarioSource(), defaultName);
        return pf.parsePlan((ObjectNode) plan, spec);
    }

    private UserInputException err(String keyPath, String problem) {
        return new UserInputException("plan file " + source + ": " + keyPath + ": " + problem);
    }

    private PlanSpec parsePlan(ObjectNode plan, SweepSpec spec) {
        for (Iterator<String> it = plan.fieldNames(); it.hasNext(); ) {
            String k = it.next();
            if (!PLAN_KEYS.contains(k)) {
                throw err("plan." + k, "unknown key; allowed keys are " + PLAN_KEYS);
            }
        }
        double[] candidates = candidates(plan.get("candidates_km"));
        int sitesPerSet = (int) number(plan, "sites_per_set", 2, 1, 6, "sites", true);
        if (sitesPerSet > candidates.length) {
            throw err("plan.sites_per_set", "value " + sitesPerSet + " is more than the " + candidates.length
                    + " candidate distances; give more candidates or fewer sites");
        }
        JsonNode hours = plan.get("operating_hours");
        double start = 7.0;
        double end = 19.0;
        if (hours != null) {
            if (!hours.isObject()) {
                throw err("plan.operating_hours", "value " + hours + " must be a mapping {start_h, end_h}");
            }
            for (Iterator<String> it = hours.fieldNames(); it.hasNext(); ) {
                String k = it.next();
                if (!k.equals("start_h") && !k.equals("end_h")) {
                    throw err("plan.operating_hours." + k, "unknown key; allowed keys are [end_h, start_h]");
                }
            }
            start = number((ObjectNode) hours, "start_h", 7, 0, 24, "h local clock", false, "plan.operating_hours.");
            end = number((ObjectNode) hours, "end_h", 19, 0, 24, "h local clock", false, "plan.operating_hours.");
        }
        if (!(end > start + 1)) {
            throw err("plan.operating_hours", "end_h = " + end + " must be at least an hour after start_h = " + start);
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
        if (!List.of("scenario", "linear", "nonlinear").contains(model)) {
            throw err("plan.model", "value '" + model + "' is not one of [scenario, linear, nonlinear]");
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
                if (!n.get(i).isNumber()) {
                    throw err(key + "[" + i + "]", "value " + n.get(i) + " is not a number (km)");
                }
                out.add(n.get(i).asDouble());
            }
        } else if (n.isObject()) {
            for (Iterator<String> it = n.fieldNames(); it.hasNext(); ) {
                String k = it.next();
                if (!List.of("from", "to", "step").contains(k)) {
                    throw err(key + "." + k, "unknown key; allowed keys are [from, step, to]");
                }
            }
            double from = number((ObjectNode) n, "from", Double.NaN, -500, 500, "km", false, key + ".");
            double to = number((ObjectNode) n, "to", Double.NaN, -500, 500, "km", false, key + ".");
            double step = number((ObjectNode) n, "step", Double.NaN, 0.01, 500, "km", false, key + ".");
            if (!(to >= from)) {
                throw err(key, "to = " + to + " km must not be less than from = " + from + " km");
            }
            long count = Math.round(Math.floor((to - from) / step + 1e-9)) + 1;
            if (count > 400) {
                throw err(key, count + " candidate distances is more than the 400 allowed; use a larger step");
            }
            for (long i = 0; i < count; i++) {
                out.add(Math.round((from + i * step) * 1e6) / 1e6);
            }
        } else {
            throw err(key, "value " + n + " must be a list of km or {from, to, step}");
        }
        if (out.isEmpty()) {
            throw err(key, "no candidate distances; give at least one");
        }
        for (int i = 0; i < out.size(); i++) {
            if (!(out.get(i) > 0)) {
                throw err(key + "[" + i + "]", "value " + out.get(i) + " km is not inland; candidate sites must be at positive "
                        + "inland distances (x > 0)");
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
            throw err(key, "value " + n + " must be a non-empty list of {name, interval_min, dense_interval_min, dense_window}");
        }
        for (int i = 0; i < n.size(); i++) {
            String k = key + "[" + i + "]";
            JsonNode c = n.get(i);
            if (!c.isObject()) {
                throw err(k, "value " + c + " must be a mapping");
            }
            for (Iterator<String> it = c.fieldNames(); it.hasNext(); ) {
                String f = it.next();
                if (!CADENCE_KEYS.contains(f)) {
                    throw err(k + "." + f, "unknown key; allowed keys are " + CADENCE_KEYS);
                }
            }
            ObjectNode o = (ObjectNode) c;
            double interval = number(o, "interval_min", Double.NaN, 1, 240, "minutes", false, k + ".");
            double dense = number(o, "dense_interval_min", 0, 0, 240, "minutes", false, k + ".");
            if (dense > 0 && !(dense < interval)) {
                throw err(k + ".dense_interval_min", "value " + dense + " must be shorter than interval_min = " + interval);
            }
            if (dense > 0 && Math.abs(interval / dense - Math.rint(interval / dense)) > 1e-9) {
                throw err(k + ".dense_interval_min", "value " + dense + " must divide interval_min = " + interval
                        + " exactly (so that dense flights include every base flight), e.g. " + interval / 2);
            }
            boolean auto = true;
            double ds = Double.NaN;
            double de = Double.NaN;
            JsonNode w = o.get("dense_window");
            if (w != null && !(w.isTextual() && w.asText().equals("auto"))) {
                if (!w.isObject()) {
                    throw err(k + ".dense_window", "value " + w + " must be 'auto' or {start_h, end_h}");
                }
                auto = false;
                ds = number((ObjectNode) w, "start_h", Double.NaN, start, end, "h local clock (inside operating hours)", false,
                        k + ".dense_window.");
                de = number((ObjectNode) w, "end_h", Double.NaN, ds, end, "h local clock (after start_h)", false,
                        k + ".dense_window.");
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
        if (v == null || v.isNull()) {
            if (Double.isNaN(dflt)) {
                throw err(prefix + key, "missing; give a number in " + lo + ".." + hi + " " + unit);
            }
            return dflt;
        }
        if (!v.isNumber()) {
            throw err(prefix + key, "value " + v + " is not a number; allowed range " + fmt(lo) + ".." + fmt(hi) + " " + unit);
        }
        double d = v.asDouble();
        if (integer && d != Math.rint(d)) {
            throw err(prefix + key, "value " + v + " must be a whole number in " + fmt(lo) + ".." + fmt(hi) + " " + unit);
        }
        if (!(d >= lo && d <= hi)) {
            throw err(prefix + key, "value " + v + " is outside the allowed range " + fmt(lo) + ".." + fmt(hi) + " " + unit);
        }
        return d;
    }

    private static String fmt(double d) {
        return d == Math.rint(d) ? String.valueOf((long) d) : String.valueOf(d);
    }
}
