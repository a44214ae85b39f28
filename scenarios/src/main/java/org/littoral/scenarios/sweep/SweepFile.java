package org.littoral.scenarios.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.DoubleNode;
import com.fasterxml.jackson.databind.node.LongNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.InputStream;
import java.math.BigDecimal;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.apache.commons.math3.special.Erf;
import org.littoral.scenarios.analysis.stats.BreezeTyping;
import org.littoral.scenarios.input.InputDocument;
import org.littoral.scenarios.input.Shown;
import org.littoral.scenarios.input.UserInputException;

/**
 * Reads sweep files (YAML or JSON; the schema is in {@code docs/sweeps.md}). Every problem is a
 * {@link UserInputException} with one line naming the file, the key path, the value and the allowed values.
 */
public final class SweepFile {

    /** Built-in sweep files live here as {@code <name>.yaml}. */
    public static final String BUILTIN_FOLDER = "/org/littoral/scenarios/builtin/sweeps/";
    /** Built-in sweeps shipped with littoral. */
    public static final List<String> BUILTINS = List.of("ambient-flow", "ambient-ensemble", "quillmarsh-ambient", "hypotheses");

    private static final Set<String> TOP_KEYS = Set.of("name", "description", "base", "set", "mode", "axes",
            "ensemble", "breeze_typing");
    private static final int MAX_AXIS_VALUES = 10_000;
    /**
     * Most members a sweep, plan or ensemble may have: each member holds its scenario document in memory (a few tens
     * of KB), and 20,000 linear members take about a day on two cores.
     */
    public static final int MAX_MEMBERS = 20_000;

    private final String source;
    private final InputDocument doc;
    private final ObjectNode root;
    private final Path folder;
    private final ScenarioSource scenarios;
    private final String defaultName;

    private SweepFile(String source, InputDocument doc, ObjectNode root, Path folder, ScenarioSource scenarios, String defaultName) {
        this.source = source;
        this.doc = doc;
        this.root = root;
        this.folder = folder;
        this.scenarios = scenarios;
        this.defaultName = defaultName;
    }

    /** A sweep file path, or the name of a built-in sweep. */
    public static SweepSpec load(String ref, ScenarioSource scenarios) {
        Path p = Path.of(ref);
        if (Files.isRegularFile(p)) {
            return read(p, scenarios);
        }
        if (BUILTINS.contains(ref)) {
            return readBuiltin(ref, scenarios);
        }
        throw new UserInputException("sweep " + Shown.text(ref) + " is neither a file nor a built-in sweep; give a path to a"
                + " sweep file or one of " + BUILTINS);
    }

    public static SweepSpec read(Path file, ScenarioSource scenarios) {
        InputDocument doc = InputDocument.read(file, "sweep file");
        ObjectNode root = doc.rootMapping("sweep keys (name, base, axes, ensemble, ...)");
        String fn = file.getFileName().toString();
        int dot = fn.lastIndexOf('.');
        Path parent = file.toAbsolutePath().getParent();
        return new SweepFile(file.toString(), doc, root, parent, scenarios, dot > 0 ? fn.substring(0, dot) : fn).parse();
    }

    public static SweepSpec readBuiltin(String name, ScenarioSource scenarios) {
        String res = BUILTIN_FOLDER + name + ".yaml";
        try (InputStream in = SweepFile.class.getResourceAsStream(res)) {
            if (in == null) {
                throw new UserInputException("no built-in sweep '" + name + "'; choose one of " + BUILTINS);
            }
            InputDocument doc = InputDocument.parse("built-in sweep " + name, new String(in.readAllBytes(),
                    java.nio.charset.StandardCharsets.UTF_8), false);
            return new SweepFile("built-in sweep " + name, doc, doc.rootMapping("sweep keys"), null, scenarios, name).parse();
        } catch (IOException e) {
            throw new UserInputException("built-in sweep '" + name + "' cannot be read: " + e.getMessage(), e);
        }
    }

    /** Parses an already-read tree (tests, inline use); messages start with "sweep file SOURCE". */
    public static SweepSpec parse(String source, ObjectNode root, Path folder, ScenarioSource scenarios, String defaultName) {
        return new SweepFile(source, InputDocument.of("sweep file " + source, root), root, folder, scenarios, defaultName).parse();
    }

    /**
     * Parses the sweep part of a larger file (a plan file): {@code doc} gives the places and the name messages start
     * with, {@code root} the keys that belong to the sweep.
     */
    public static SweepSpec parse(String source, InputDocument doc, ObjectNode root, Path folder, ScenarioSource scenarios,
                                  String defaultName) {
        return new SweepFile(source, doc, root, folder, scenarios, defaultName).parse();
    }

    private UserInputException err(String keyPath, String problem) {
        return new UserInputException(doc.where(keyPath) + ": " + Shown.clip(keyPath, 100) + ": " + problem);
    }

    private SweepSpec parse() {
        doc.onlyKeys(root, "", TOP_KEYS);
        String name = root.has("name") ? text("name", root.get("name")) : defaultName;
        if (!name.matches("[A-Za-z0-9._-]{1,80}") || name.matches("\\.+")) {
            throw err("name", Shown.text(name) + ": a sweep name becomes a folder name; rename it with 1 to 80 letters, digits, "
                    + "'.', '_' and '-'");
        }
        String description = root.has("description") ? text("description", root.get("description")) : "";

        JsonNode baseNode = root.get("base");
        if (baseNode == null) {
            throw err("base", "missing; give the base scenario as a built-in name, a path, or an inline scenario");
        }
        String baseLabel;
        ObjectNode base;
        if (baseNode.isTextual()) {
            baseLabel = baseNode.asText();
            try {
                base = scenarios.load(baseLabel, folder);
            } catch (UserInputException e) {
                throw err("base", Shown.clip(e.getMessage(), 320));
            }
        } else if (baseNode.isObject()) {
            baseLabel = "(inline)";
            // the same reader as a scenario file: every default filled in, so every key can be swept
            try {
                base = scenarios.inline((ObjectNode) baseNode, doc.name() + " (inline base)");
            } catch (UserInputException e) {
                throw err("base", "the inline base scenario: " + e.getMessage().replace(doc.name() + " (inline base): ", ""));
            }
        } else {
            throw err("base", Shown.value(baseNode) + " is neither a scenario name or path nor an inline scenario; give a "
                    + "built-in name, a path to a scenario file, or the scenario's keys indented under base:");
        }

        List<SweepSpec.Setting> fixed = new ArrayList<>();
        Set<String> used = new HashSet<>();
        JsonNode set = root.get("set");
        if (set != null) {
            requireObject("set", set);
            for (Iterator<Map.Entry<String, JsonNode>> it = set.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                String where = "set." + e.getKey();
                KeyPath p = path(where, e.getKey(), base);
                checkValue(where, p, base, e.getValue());
                fixed.add(new SweepSpec.Setting(p, AxisValue.of(e.getValue())));
                used.add(p.toString());
            }
        }

        boolean zip = false;
        if (root.has("mode")) {
            String m = text("mode", root.get("mode"));
            if (m.equals("zip")) {
                zip = true;
            } else if (!m.equals("cartesian")) {
                throw err("mode", "value " + Shown.text(m) + " is not allowed; use 'cartesian' (every combination) or 'zip'"
                        + " (axes advance together)");
            }
        }

        List<Axis> axes = new ArrayList<>();
        JsonNode axesNode = root.get("axes");
        if (axesNode != null) {
            requireObject("axes", axesNode);
            for (Iterator<Map.Entry<String, JsonNode>> it = axesNode.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                String where = "axes." + e.getKey();
                KeyPath p = path(where, e.getKey(), base);
                if (!used.add(p.toString())) {
                    throw err(where, "key path is already set elsewhere in this sweep file; set each key once");
                }
                axes.add(new Axis(p, axisValues(where, p, base, e.getValue())));
            }
        }
        if (zip) {
            for (Axis a : axes) {
                if (a.values().size() != axes.get(0).values().size()) {
                    throw err("axes." + a.path(), "has " + a.values().size() + " values but axes." + axes.get(0).path()
                            + " has " + axes.get(0).values().size() + "; in zip mode give every axis the same number of values, or "
                            + "use mode: cartesian");
                }
            }
        }

        SweepSpec.Ensemble ensemble = null;
        JsonNode ens = root.get("ensemble");
        if (ens != null) {
            ensemble = ensemble(ens, base, used);
        }
        if (axes.isEmpty() && ensemble == null) {
            throw err("axes", "missing; a sweep needs at least one axis or an ensemble: add axes: or ensemble:");
        }
        SweepSpec.Typing typing = typing(root.get("breeze_typing"));
        long points = 1;
        for (Axis a : axes) {
            points = zip ? a.values().size() : Math.min((long) MAX_MEMBERS + 1, points * a.values().size());
        }
        long total = points * (ensemble == null ? 1 : ensemble.members());
        if (total > MAX_MEMBERS) {
            throw err(ensemble == null ? "axes" : "ensemble.members", "the sweep would have " + total
                    + " members; the limit is " + MAX_MEMBERS + ", split it into several sweeps");
        }
        return new SweepSpec(source, name, description, baseLabel, base, fixed, zip, axes, ensemble, typing);
    }

    private KeyPath path(String where, String text, JsonNode base) {
        KeyPath p;
        try {
            p = KeyPath.parse(text);
        } catch (IllegalArgumentException e) {
            throw err(where, Shown.clip(e.getMessage(), 160) + "; write the key path as in docs/sweeps.md, e.g. ambient_wind.speed_m_per_s");
        }
        try {
            p.get(base);
        } catch (IllegalArgumentException e) {
            throw err(where, "not in the base scenario: " + Shown.clip(e.getMessage(), 150)
                    + " (check the spelling, or set the key in the base scenario first)");
        }
        return p;
    }

    private List<AxisValue> axisValues(String where, KeyPath p, JsonNode base, JsonNode spec) {
        List<AxisValue> out = new ArrayList<>();
        if (spec.isArray()) {
            if (spec.isEmpty()) {
                throw err(where, "empty list; give at least one value");
            }
            int i = 0;
            for (JsonNode v : spec) {
                checkValue(where + "[" + i++ + "]", p, base, v);
                if (v.isContainerNode()) {
                    throw err(where, "a list of values must hold numbers, names or true/false; for whole sub-documents"
                            + " (e.g. coast layouts) use {choices: {label: value, ...}}");
                }
                out.add(AxisValue.of(v));
            }
        } else if (spec.isObject() && spec.has("choices")) {
            onlyKeys(where, spec, Set.of("choices"));
            JsonNode ch = spec.get("choices");
            requireObject(where + ".choices", ch);
            if (ch.isEmpty()) {
                throw err(where + ".choices", "empty; give at least one labelled value");
            }
            for (Iterator<Map.Entry<String, JsonNode>> it = ch.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                checkValue(where + ".choices." + e.getKey(), p, base, e.getValue());
                out.add(new AxisValue(e.getKey(), e.getValue()));
            }
        } else if (spec.isObject() && spec.has("from")) {
            onlyKeys(where, spec, Set.of("from", "to", "step"));
            double from = number(where + ".from", spec.get("from"));
            double to = number(where + ".to", spec.get("to"));
            double step = number(where + ".step", spec.get("step"));
            if (!(step > 0)) {
                throw err(where + ".step", Shown.value(spec.get("step")) + " is not above 0; give a positive step");
            }
            if (to < from) {
                throw err(where + ".to", Shown.value(spec.get("to")) + " is below from = " + Shown.value(spec.get("from"))
                        + "; a range runs upward from 'from' to 'to': swap them");
            }
            BigDecimal f = new BigDecimal(spec.get("from").asText());
            BigDecimal s = new BigDecimal(spec.get("step").asText());
            long n = (long) Math.floor((to - from) / step + 1e-9) + 1;
            if (n > MAX_AXIS_VALUES) {
                throw err(where, "range gives " + n + " values; the limit is " + MAX_AXIS_VALUES + ", use a larger step");
            }
            boolean integral = spec.get("from").isIntegralNumber() && spec.get("step").isIntegralNumber();
            for (long i = 0; i < n; i++) {
                BigDecimal v = f.add(s.multiply(BigDecimal.valueOf(i))); // exact decimal steps: 0.1 + 2*0.1 is 0.3
                JsonNode node = integral ? LongNode.valueOf(v.longValueExact()) : DoubleNode.valueOf(v.doubleValue());
                checkValue(where + " (value " + node + " of the range)", p, base, node);
                out.add(AxisValue.of(node));
            }
        } else {
            throw err(where, Shown.value(spec) + " is not a list of values, a range or choices; give [v1, v2, ...],"
                    + " {from, to, step} or {choices: {label: value, ...}}");
        }
        return out;
    }

    private SweepSpec.Ensemble ensemble(JsonNode ens, JsonNode base, Set<String> used) {
        requireObject("ensemble", ens);
        onlyKeys("ensemble", ens, Set.of("members", "seed", "draws"));
        JsonNode m = ens.get("members");
        if (m == null || !m.canConvertToInt() || !m.isIntegralNumber() || m.asInt() < 1 || m.asInt() > MAX_MEMBERS) {
            throw err("ensemble.members", Shown.value(m) + " is not a member count; give a whole number, 1 to " + MAX_MEMBERS);
        }
        JsonNode s = ens.get("seed");
        if (s == null || !s.isIntegralNumber() || !s.canConvertToLong()) {
            throw err("ensemble.seed", Shown.value(s) + " is not a seed; give a whole number (the same seed draws the same members)");
        }
        JsonNode draws = ens.get("draws");
        if (draws == null || !draws.isObject() || draws.isEmpty()) {
            throw err("ensemble.draws", "missing or empty; give key paths with a distribution each, e.g."
                    + " ambient_wind.speed_m_per_s: {uniform: {from: 0, to: 8}}");
        }
        List<SweepSpec.Draw> out = new ArrayList<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = draws.fields(); it.hasNext(); ) {
            Map.Entry<String, JsonNode> e = it.next();
            String where = "ensemble.draws." + e.getKey();
            KeyPath p = path(where, e.getKey(), base);
            if (!used.add(p.toString())) {
                throw err(where, "key path is already set elsewhere in this sweep file; set each key once");
            }
            out.add(new SweepSpec.Draw(p, distribution(where, p, base, e.getValue())));
        }
        return new SweepSpec.Ensemble(m.asInt(), s.asLong(), out);
    }

    private Distribution distribution(String where, KeyPath p, JsonNode base, JsonNode d) {
        if (!d.isObject() || d.size() < 1) {
            throw err(where, Shown.value(d) + " is not a distribution; use {uniform: {from, to}}, {normal: {mean, sd, min,"
                    + " max}} or {choice: [...]}");
        }
        KeyRanges.Range range = KeyRanges.forPath(p);
        boolean circular = range != null && range.circular();
        if (d.has("uniform")) {
            onlyKeys(where, d, Set.of("uniform"));
            JsonNode u = d.get("uniform");
            String w = where + ".uniform";
            requireObject(w, u);
            onlyKeys(w, u, Set.of("from", "to"));
            requireNumericLeaf(where, p, base);
            double from = number(w + ".from", u.get("from"));
            double to = number(w + ".to", u.get("to"));
            if (!(to > from)) {
                throw err(w + ".to", Shown.value(u.get("to")) + " is not above from = " + Shown.value(u.get("from"))
                        + "; give a 'to' above 'from'");
            }
            if (range != null && !circular) {
                inRange(w + ".from", p, from, range);
                inRange(w + ".to", p, to, range);
            }
            return new Distribution.Uniform(from, to, circular);
        }
        if (d.has("normal")) {
            onlyKeys(where, d, Set.of("normal"));
            JsonNode n = d.get("normal");
            String w = where + ".normal";
            requireObject(w, n);
            onlyKeys(w, n, Set.of("mean", "sd", "min", "max"));
            requireNumericLeaf(where, p, base);
            double mean = number(w + ".mean", n.get("mean"));
            double sd = number(w + ".sd", n.get("sd"));
            if (!(sd > 0)) {
                throw err(w + ".sd", Shown.value(n.get("sd")) + " is not above 0; give a positive standard deviation");
            }
            double lo = n.has("min") ? number(w + ".min", n.get("min")) : (range != null && !circular ? range.min() : Double.NEGATIVE_INFINITY);
            double hi = n.has("max") ? number(w + ".max", n.get("max")) : (range != null && !circular ? range.max() : Double.POSITIVE_INFINITY);
            if (circular && (n.has("min") || n.has("max"))) {
                throw err(w, "a direction is drawn on the circle (wrapped into 0..360); leave out min and max");
            }
            if (!(hi > lo)) {
                throw err(w + ".max", KeyRanges.fmt(hi) + " is not above min = " + KeyRanges.fmt(lo) + "; give a max above the min");
            }
            if (range != null && !circular) {
                if (n.has("min")) {
                    inRange(w + ".min", p, lo, range);
                }
                if (n.has("max")) {
                    inRange(w + ".max", p, hi, range);
                }
            }
            double inside = 0.5 * (Erf.erf((hi - mean) / (sd * Math.sqrt(2))) - Erf.erf((lo - mean) / (sd * Math.sqrt(2))));
            if (!(inside >= 1e-3)) {
                throw err(w, "only a fraction " + String.format("%.1e", inside) + " of normal(mean " + mean + ", sd " + sd
                        + ") lies in [" + lo + ", " + hi + "]; move the mean or widen min/max");
            }
            return new Distribution.Normal(mean, sd, lo, hi, circular);
        }
        if (d.has("choice")) {
            onlyKeys(where, d, Set.of("choice", "weights"));
            JsonNode c = d.get("choice");
            List<AxisValue> opts = new ArrayList<>();
            if (c.isArray() && !c.isEmpty()) {
                int i = 0;
                for (JsonNode v : c) {
                    checkValue(where + ".choice[" + i++ + "]", p, base, v);
                    opts.add(AxisValue.of(v));
                }
            } else if (c.isObject() && !c.isEmpty()) {
                for (Iterator<Map.Entry<String, JsonNode>> it = c.fields(); it.hasNext(); ) {
                    Map.Entry<String, JsonNode> e = it.next();
                    checkValue(where + ".choice." + e.getKey(), p, base, e.getValue());
                    opts.add(new AxisValue(e.getKey(), e.getValue()));
                }
            } else {
                throw err(where + ".choice", Shown.value(c) + " is not a list of choices; give a non-empty list of values or "
                        + "{label: value, ...}");
            }
            double[] w = new double[opts.size()];
            JsonNode wn = d.get("weights");
            if (wn == null) {
                java.util.Arrays.fill(w, 1.0);
            } else {
                if (!wn.isArray() || wn.size() != opts.size()) {
                    throw err(where + ".weights", Shown.value(wn) + " does not match the choices; give a list of " + opts.size()
                            + " numbers, one per choice");
                }
                for (int i = 0; i < w.length; i++) {
                    w[i] = number(where + ".weights[" + i + "]", wn.get(i));
                    if (!(w[i] >= 0)) {
                        throw err(where + ".weights[" + i + "]", Shown.value(wn.get(i)) + " is negative; give a weight of 0 or more");
                    }
                }
                if (java.util.Arrays.stream(w).sum() <= 0) {
                    throw err(where + ".weights", "all weights are zero; give at least one positive weight");
                }
            }
            return new Distribution.Choice(List.copyOf(opts), w);
        }
        throw err(where, "unknown distribution " + Shown.text(String.join(", ", sorted(fieldNames(d)))) + "; use uniform, normal or choice");
    }

    private SweepSpec.Typing typing(JsonNode t) {
        SweepSpec.Typing def = SweepSpec.Typing.defaults();
        if (t == null) {
            return def;
        }
        String w = "breeze_typing";
        requireObject(w, t);
        onlyKeys(w, t, Set.of("onshore_half_width_deg", "offshore_half_width_deg", "weak_below_m_per_s", "from_deg_key",
                "speed_key", "coast_bearing_key", "latitude_key"));
        BreezeTyping d = def.sectors();
        double on = t.has("onshore_half_width_deg") ? number(w + ".onshore_half_width_deg", t.get("onshore_half_width_deg"))
                : d.onshoreHalfWidthDeg;
        double off = t.has("offshore_half_width_deg") ? number(w + ".offshore_half_width_deg", t.get("offshore_half_width_deg"))
                : d.offshoreHalfWidthDeg;
        if (!(on >= 0 && off >= 0 && on + off <= 180)) {
            throw err(w, "onshore_half_width_deg " + KeyRanges.fmt(on) + " and offshore_half_width_deg " + KeyRanges.fmt(off)
                    + " must be >= 0 and add up to at most 180 deg; give e.g. 45 and 45 (quadrants)");
        }
        double weak = t.has("weak_below_m_per_s") ? number(w + ".weak_below_m_per_s", t.get("weak_below_m_per_s"))
                : d.weakWindMPerS;
        if (!(weak >= 0 && weak <= 40)) {
            throw err(w + ".weak_below_m_per_s", KeyRanges.fmt(weak) + " is outside the allowed range; give a number, 0 to 40 m/s");
        }
        return new SweepSpec.Typing(
                keyOr(t, w, "from_deg_key", def.fromDeg()), keyOr(t, w, "speed_key", def.speedMPerS()),
                keyOr(t, w, "coast_bearing_key", def.coastBearingDeg()), keyOr(t, w, "latitude_key", def.latitudeDeg()),
                new BreezeTyping(on, off, weak));
    }

    private KeyPath keyOr(JsonNode t, String w, String key, KeyPath def) {
        if (!t.has(key)) {
            return def;
        }
        try {
            return KeyPath.parse(text(w + "." + key, t.get(key)));
        } catch (IllegalArgumentException e) {
            throw err(w + "." + key, Shown.clip(e.getMessage(), 160) + "; give a key path of the scenario, e.g. ambient_wind.from_deg");
        }
    }

    /** The value must have the type of the base scenario's value and lie in the key's physical range. */
    private void checkValue(String where, KeyPath p, JsonNode base, JsonNode v) {
        JsonNode b = p.get(base);
        String want = null;
        if (b.isNumber() && !v.isNumber()) {
            want = "a number";
        } else if (b.isTextual() && !v.isTextual()) {
            want = "a name (text)";
        } else if (b.isBoolean() && !v.isBoolean()) {
            want = "true or false";
        } else if (b.isObject() && !v.isObject()) {
            want = "a set of keys like the base scenario's";
        } else if (b.isArray() && !v.isArray()) {
            want = "a list";
        }
        if (want != null) {
            throw err(where, Shown.value(v) + " is not " + want + "; give " + want + " (the base scenario has " + Shown.value(b)
                    + " at " + p + ")");
        }
        KeyRanges.Range r = KeyRanges.forPath(p);
        if (r != null && v.isNumber()) {
            inRange(where, p, v.asDouble(), r);
        }
    }

    private void inRange(String where, KeyPath p, double v, KeyRanges.Range r) {
        if (!Double.isFinite(v) || !r.contains(v)) {
            throw err(where, KeyRanges.fmt(v) + " is outside the allowed range for " + p + "; give " + r.describe());
        }
    }

    private void requireNumericLeaf(String where, KeyPath p, JsonNode base) {
        JsonNode b = p.get(base);
        if (!b.isNumber()) {
            throw err(where, "uniform and normal draws need a number, but the base scenario has " + Shown.value(b) + " at " + p
                    + "; use {choice: [...]} instead");
        }
    }

    private double number(String where, JsonNode n) {
        if (n == null) {
            throw err(where, "missing; give a number");
        }
        if (!n.isNumber() || !Double.isFinite(n.asDouble())) {
            throw err(where, Shown.value(n) + " is not a number; give a number");
        }
        return n.asDouble();
    }

    private String text(String where, JsonNode n) {
        if (!n.isTextual()) {
            throw err(where, Shown.value(n) + " is not a text; give a text");
        }
        return n.asText();
    }

    private void requireObject(String where, JsonNode n) {
        if (!n.isObject()) {
            throw err(where, Shown.value(n) + " is not a mapping; give its keys as 'key: value' lines indented under it");
        }
    }

    private void onlyKeys(String where, JsonNode n, Set<String> allowed) {
        doc.onlyKeys(n, where, allowed);
    }

    private static List<String> fieldNames(JsonNode n) {
        List<String> l = new ArrayList<>();
        n.fieldNames().forEachRemaining(l::add);
        return l;
    }

    private static List<String> sorted(java.util.Collection<String> c) {
        List<String> l = new ArrayList<>(c);
        java.util.Collections.sort(l);
        return l;
    }
}
