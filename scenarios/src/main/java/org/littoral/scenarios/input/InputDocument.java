package org.littoral.scenarios.input;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * One YAML or JSON input file, read the one strict way every littoral reader uses: duplicate keys and a second
 * document are refused, syntax errors become one plain line with line and column, and every value keeps the
 * place where it was written, so that later checks can say {@code file:line:column: key = value: problem; fix}.
 *
 * <p>Typical use in a reader:
 * <pre>{@code
 * InputDocument doc = InputDocument.read(path, "sweep file");
 * ObjectNode root = doc.rootMapping("sweep keys (base, axes, ensemble, ...)");
 * doc.onlyKeys(root, "", List.of("name", "base", "axes"));
 * double v = doc.number(root, "speed_m_per_s", 0, 40, "m/s", Double.NaN);   // NaN: required
 * throw doc.error("axes.x", "... is not ...; give ...");                    // any other rule
 * }</pre>
 * Paths are written as the readers name keys: {@code coast.latitude_deg}, {@code sites[1].name}; a key that is
 * itself a dotted path (sweep axes) simply continues the string.
 */
public final class InputDocument {
    /** Location-map suffix for where a key itself (rather than its value) starts. */
    public static final String KEY_SUFFIX = "#key";

    private final String name;
    private final JsonNode root;
    private final Map<String, JsonLocation> locations;

    private InputDocument(String name, JsonNode root, Map<String, JsonLocation> locations) {
        this.name = name;
        this.root = root;
        this.locations = locations;
    }

    /** Reads a file (JSON when the name ends in .json, YAML otherwise); {@code label} says what it is ("plan file"). */
    public static InputDocument read(Path file, String label) {
        String text = InputText.read(file, label, InputText.SETTINGS_MAX_BYTES);
        boolean json = file.getFileName() != null && file.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".json");
        return parse(InputText.prefix(file, label), text, json);
    }

    /** Parses text; {@code name} starts every message ("plan file /a/b.yaml", "built-in sweep x"). */
    public static InputDocument parse(String name, String text, boolean json) {
        JsonFactory factory = json ? new JsonFactory() : new YAMLFactory();
        Map<String, JsonLocation> locations = new HashMap<>();
        JsonNode tree;
        try {
            try (JsonParser p = factory.createParser(text)) {
                if (p.nextToken() != null) {
                    locate(p, "", locations, name);
                    JsonToken next = p.nextToken();
                    if (next != null) {
                        JsonLocation at = p.currentTokenLocation();
                        throw new UserInputException(name + ":" + at.getLineNr() + ":" + at.getColumnNr() + ": a second "
                                + (json ? "JSON value" : "YAML document ('---')") + " starts here; a littoral file holds one: "
                                + "remove it, or put it in a file of its own");
                    }
                }
            }
            try (JsonParser p = factory.createParser(text)) {
                tree = new ObjectMapper(factory).readTree(p);
            }
        } catch (JsonProcessingException e) {
            throw syntax(name, e, json);
        } catch (IOException e) {
            throw new UserInputException(name + ": cannot be read (" + Shown.bare(e.getMessage()) + "); check the file", e);
        } catch (RuntimeException e) {
            if (e instanceof UserInputException u) {
                throw u;
            }
            // the YAML library's own errors outside its marked ones (limits on size, nesting, aliases)
            throw new UserInputException(name + ": " + (json ? "JSON" : "YAML") + " the reader cannot take: "
                    + Shown.bare(firstLine(e.getMessage())) + "; simplify the file (a littoral file is a few plain 'key: value' "
                    + "lines)", e);
        }
        return new InputDocument(name, tree, locations);
    }

    /** A tree built in memory (no places known): messages name the source only. */
    public static InputDocument of(String name, JsonNode root) {
        return new InputDocument(name, root, Map.of());
    }

    public String name() {
        return name;
    }

    /** The whole tree; null when the file holds nothing. */
    public JsonNode root() {
        return root;
    }

    /**
     * The top level as a mapping, or one line saying it is not one (without echoing the content: the file may
     * not be the one meant, e.g. a system file named by mistake).
     *
     * @param what what the keys are, for the message ("scenario keys (name, coast, sites, ...)")
     */
    public ObjectNode rootMapping(String what) {
        if (root == null || root.isMissingNode() || root.isNull()) {
            throw new UserInputException(name + ": the file is empty; write the " + what + " as 'key: value' lines");
        }
        if (!root.isObject()) {
            String kind = root.isArray() ? "a list" : root.isTextual() ? "plain text" : "a single value";
            throw new UserInputException(name + ":1:1: the file holds " + kind + ", not 'key: value' lines; check that this "
                    + "is the right file and write the " + what + " as 'key: value' lines");
        }
        return (ObjectNode) root;
    }

    /** "name:line:col" for a key path (the nearest enclosing key that has a place), or just the name. */
    public String where(String path) {
        JsonLocation loc = locate(path);
        return loc == null ? name : name + ":" + loc.getLineNr() + ":" + loc.getColumnNr();
    }

    /** Where the key itself is written (for unknown keys), else where its value is. */
    public String whereKey(String path) {
        JsonLocation loc = locations.get(path + KEY_SUFFIX);
        return loc == null ? where(path) : name + ":" + loc.getLineNr() + ":" + loc.getColumnNr();
    }

    private JsonLocation locate(String path) {
        String p = path;
        while (p != null) {
            JsonLocation loc = locations.get(p);
            if (loc != null && !p.isEmpty()) {
                return loc;
            }
            if (p.isEmpty()) {
                return null;
            }
            int cut = Math.max(p.lastIndexOf('.'), p.lastIndexOf('['));
            p = cut < 0 ? "" : p.substring(0, cut);
        }
        return null;
    }

    /** The error {@code where(path): message}; the message should say what is wrong and what to do. */
    public UserInputException error(String path, String message) {
        return new UserInputException(where(path) + ": " + message);
    }

    // ------------------------------------------------------------------ typed reading

    /** Refuses keys of {@code o} that are not allowed, naming the nearest allowed one. */
    public void onlyKeys(JsonNode o, String path, Collection<String> allowed) {
        for (var it = o.fieldNames(); it.hasNext(); ) {
            String k = it.next();
            if (!allowed.contains(k)) {
                String full = child(path, k);
                String near = nearest(k, allowed);
                throw new UserInputException(whereKey(full) + ": unknown key " + Shown.text(full)
                        + (near == null ? "" : " (did you mean '" + near + "'?)") + "; allowed "
                        + (path.isEmpty() ? "at the top level" : "in '" + path + "'") + ": " + String.join(", ", sorted(allowed))
                        + "; check the spelling or remove it");
            }
        }
    }

    /** A mapping under {@code key}, null when absent (or null); anything else is an error. */
    public ObjectNode mapping(JsonNode parent, String path, String key, String form) {
        JsonNode n = parent.get(key);
        String full = child(path, key);
        if (n == null || n.isNull()) {
            return null;
        }
        if (!n.isObject()) {
            throw error(full, full + " = " + Shown.value(n) + ": not a mapping; give " + form);
        }
        return (ObjectNode) n;
    }

    /**
     * A number under {@code key} in {@code lo..hi} (inclusive).
     *
     * @param dflt the value when absent; NaN makes the key required
     */
    public double number(JsonNode parent, String path, String key, double lo, double hi, String unit, double dflt) {
        return number(parent, path, key, lo, hi, unit, dflt, false);
    }

    /** As {@link #number} for a whole number. */
    public long integer(JsonNode parent, String path, String key, long lo, long hi, String unit, Long dflt) {
        double d = number(parent, path, key, lo, hi, unit, dflt == null ? Double.NaN : dflt, true);
        return (long) d;
    }

    /** A number that may be absent (NaN then). */
    public double optionalNumber(JsonNode parent, String path, String key, double lo, double hi, String unit) {
        JsonNode v = parent.get(key);
        if (v == null || v.isNull()) {
            return Double.NaN;
        }
        return number(parent, path, key, lo, hi, unit, Double.NaN, false);
    }

    private double number(JsonNode parent, String path, String key, double lo, double hi, String unit, double dflt,
                          boolean whole) {
        JsonNode v = parent.get(key);
        String full = child(path, key);
        String range = range(lo, hi, unit, whole);
        if (v == null || v.isNull()) {
            if (Double.isNaN(dflt)) {
                throw error(path, "missing key " + Shown.text(full) + "; add it: " + range);
            }
            return dflt;
        }
        if (!v.isNumber()) {
            throw error(full, full + " = " + Shown.value(v) + ": not a number; give " + range);
        }
        double d = v.doubleValue();
        if (!Double.isFinite(d)) {
            throw error(full, full + " = " + Shown.value(v) + ": not a finite number; give " + range);
        }
        if (whole && d != Math.rint(d)) {
            throw error(full, full + " = " + Shown.value(v) + ": not a whole number; give " + range);
        }
        if (!(d >= lo && d <= hi)) {
            throw error(full, full + " = " + Shown.value(v) + ": outside the allowed range; give " + range);
        }
        return d;
    }

    /** "a number, 0 to 40 m/s" / "a whole number, 1 to 5000". */
    public static String range(double lo, double hi, String unit, boolean whole) {
        String u = unit == null || unit.isEmpty() ? "" : " " + unit;
        String r;
        if (lo == Double.NEGATIVE_INFINITY && hi == Double.POSITIVE_INFINITY) {
            r = "any finite value";
        } else if (hi == Double.POSITIVE_INFINITY) {
            r = "at least " + Shown.number(lo);
        } else if (lo == Double.NEGATIVE_INFINITY) {
            r = "at most " + Shown.number(hi);
        } else {
            r = Shown.number(lo) + " to " + Shown.number(hi);
        }
        return (whole ? "a whole number, " : "a number, ") + r + u;
    }

    /** A non-blank text under {@code key}; null when absent and not required. */
    public String text(JsonNode parent, String path, String key, boolean required, String form) {
        JsonNode v = parent.get(key);
        String full = child(path, key);
        if (v == null || v.isNull()) {
            if (required) {
                throw error(path, "missing key " + Shown.text(full) + "; add it: " + form);
            }
            return null;
        }
        if (!v.isTextual() && !v.isNumber()) {
            throw error(full, full + " = " + Shown.value(v) + ": not a text; give " + form);
        }
        if (v.asText().isBlank()) {
            throw error(full, full + " is blank; give " + form);
        }
        return v.asText();
    }

    public static String child(String path, String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    // ------------------------------------------------------------------ syntax

    /** Records where each value (and each key, with {@link #KEY_SUFFIX}) starts. */
    private static void locate(JsonParser p, String path, Map<String, JsonLocation> out, String name) throws IOException {
        JsonToken t = p.currentToken();
        out.putIfAbsent(path, p.currentTokenLocation());
        if (t == JsonToken.START_OBJECT) {
            Map<String, JsonLocation> seen = new HashMap<>();
            while (p.nextToken() == JsonToken.FIELD_NAME) {
                String key = p.currentName();
                String c = child(path, key);
                JsonLocation at = p.currentTokenLocation();
                JsonLocation first = seen.putIfAbsent(key, at);
                if (first != null) {
                    throw new UserInputException(name + ":" + at.getLineNr() + ":" + at.getColumnNr() + ": key " + Shown.text(key)
                            + " appears twice " + (path.isEmpty() ? "at the top level" : "in '" + path + "'") + " (first on line "
                            + first.getLineNr() + "; only one would count); keep one of them");
                }
                out.putIfAbsent(c + KEY_SUFFIX, at);
                p.nextToken();
                locate(p, c, out, name);
            }
        } else if (t == JsonToken.START_ARRAY) {
            int k = 0;
            while (p.nextToken() != JsonToken.END_ARRAY) {
                locate(p, path + "[" + k + "]", out, name);
                k++;
            }
        }
    }

    private static final Pattern DUPLICATE = Pattern.compile("Duplicate field '(.*)'", Pattern.DOTALL);
    private static final Pattern UNEXPECTED_CHAR = Pattern.compile("Unexpected character \\('(.+?)' \\(code \\d+\\)\\)", Pattern.DOTALL);
    private static final Pattern TOKEN = Pattern.compile("Unrecognized token '(.*?)'", Pattern.DOTALL);

    /** One line for a syntax error: where, what, and what to do. */
    static UserInputException syntax(String name, JsonProcessingException e, boolean json) {
        int line = -1;
        int col = -1;
        String problem = null;
        String context = null;
        for (Throwable c = e; c != null; c = c.getCause()) {
            if (c instanceof org.yaml.snakeyaml.error.MarkedYAMLException m) {
                problem = m.getProblem();
                context = m.getContext();
                if (m.getProblemMark() != null) {
                    line = m.getProblemMark().getLine() + 1;
                    col = m.getProblemMark().getColumn() + 1;
                }
                break;
            }
        }
        if (line < 0 && e.getLocation() != null && e.getLocation().getLineNr() > 0) {
            line = e.getLocation().getLineNr();
            col = e.getLocation().getColumnNr();
        }
        String where = name + (line > 0 ? ":" + line + (col > 0 ? ":" + col : "") : "");
        String orig = e.getOriginalMessage() == null ? "" : e.getOriginalMessage();
        Matcher dup = DUPLICATE.matcher(orig);
        if (dup.find()) {
            return new UserInputException(where + ": key " + Shown.text(dup.group(1)) + " appears twice in the same mapping "
                    + "(only one would count); keep one of them", e);
        }
        String what = problem != null ? yamlProblem(problem, context) : jsonProblem(orig, json);
        return new UserInputException(where + ": " + (json ? "JSON" : "YAML") + " syntax error: " + what, e);
    }

    /** The YAML library's problem in plain words, with the fix. */
    static String yamlProblem(String problem, String context) {
        String p = problem == null ? "" : problem;
        String c = context == null ? "" : context;
        if (p.contains("(TAB)") || p.contains("\\t") || p.contains("tab character")) {
            return "a tab character; YAML indents with spaces only, so replace the tab with spaces";
        }
        if (p.contains("mapping values are not allowed")) {
            return "a ':' where no key may start; quote a value that holds ': ', or fix the indentation of this line";
        }
        if (p.contains("could not find expected ':'")) {
            return "a line without 'key: value' (a ':' is missing, or the line before continues wrongly); write 'key: value' "
                    + "or quote the text";
        }
        if (p.contains("expected <block end>") || p.contains("did not find expected key")) {
            return "the indentation does not match the lines above; indent keys of one mapping by the same number of spaces";
        }
        if (p.contains("did not find expected '-' indicator")) {
            return "a list item out of line with the list; start every item of a list with '- ' at the same indentation";
        }
        if (c.contains("quoted scalar") || p.contains("end of stream") && c.contains("scalar")) {
            return "a quote is not closed; close it on the same line";
        }
        if (c.contains("flow sequence") || p.contains("expected ',' or ']'")) {
            return "a list in [ ] is not closed or its items are not separated by ','; close it with ']'";
        }
        if (c.contains("flow mapping") || p.contains("expected ',' or '}'")) {
            return "a mapping in { } is not closed or its entries are not separated by ','; close it with '}'";
        }
        if (p.contains("found undefined alias") || c.contains("alias")) {
            return "'*' starts an alias to an anchor that is not defined; quote the value if the '*' is meant as text";
        }
        if (c.contains("anchor") || p.contains("anchor")) {
            return "'&' starts an anchor name; quote the value if the '&' is meant as text";
        }
        if (p.contains("that cannot start any token")) {
            Matcher m = Pattern.compile("found character '(.)'").matcher(p);
            String ch = m.find() ? m.group(1) : "this character";
            return "a value cannot start with '" + ch + "' in YAML; quote the value";
        }
        if (p.contains("special characters are not allowed") || p.contains("control")) {
            return "a control character in the text; save the file as plain UTF-8 text without it";
        }
        if (p.contains("escape character")) {
            return "an unknown backslash escape in a double-quoted text; use single quotes or write '\\\\'";
        }
        if (c.contains("directive") || p.contains("directive")) {
            return "'%' at the start of a line starts a YAML directive; quote the value or remove the line";
        }
        if (c.contains("block scalar") || p.contains("block scalar")) {
            return "'|' or '>' starts a block of text that is not laid out as YAML expects; write the value on one line, "
                    + "quoted";
        }
        if (p.contains("tag") || c.contains("tag")) {
            return "'!' starts a YAML tag, which littoral files do not use; quote the value";
        }
        if (p.contains("end of stream") || p.contains("end of the stream")) {
            return "the file ends in the middle of a value; complete or remove the last line";
        }
        if (p.contains("exceeds the limit")) {
            return "the file is far larger than a settings file; check that it is the right file";
        }
        return Shown.bare(p.replaceAll("<[^>]*>", "").replaceAll("\\s+", " ").trim())
                + "; fix the file there (indent with spaces, write 'key: value', start list items with '- ', quote texts "
                + "with special characters)";
    }

    /** The JSON library's complaint in plain words, with the fix. */
    static String jsonProblem(String orig, boolean json) {
        String o = orig == null ? "" : orig;
        Matcher m = UNEXPECTED_CHAR.matcher(o);
        if (m.find()) {
            String ch = Shown.bare(m.group(1));
            if (o.contains("double-quote to start field name")) {
                return "unexpected '" + ch + "' where a key should start; write keys in double quotes, e.g. \"name\": ...";
            }
            if (o.contains("comma")) {
                return "unexpected '" + ch + "'; separate items with ',' and close every { and [";
            }
            return "unexpected '" + ch + "'; check the brackets, quotes and commas there";
        }
        Matcher t = TOKEN.matcher(o);
        if (t.find()) {
            return "unrecognised word " + Shown.text(t.group(1)) + "; write texts in double quotes and numbers as plain decimals";
        }
        if (o.contains("end-of-input")) {
            return "the file ends inside a { } or [ ]; close every bracket";
        }
        if (o.contains("close marker")) {
            return "a closing bracket does not match the opening one; check the { } and [ ] pairs";
        }
        if (o.contains("numeric value") || o.contains("Non-standard token") || o.contains("Leading zeroes")
                || o.contains("Numeric value")) {
            return "a number in a form that cannot be read; write a plain decimal number such as 0.5 or 1e-5";
        }
        if (o.contains("unquoted character") || o.contains("control character") || o.contains("CTRL-CHAR")) {
            return "a control character (e.g. a line break) inside a quoted text; remove it or write it as \\n";
        }
        if (o.contains("base64") || o.contains("Base64")) {
            return "a '!!binary' value, which littoral files do not use; write the value as plain text";
        }
        if (o.contains("exceeds") || o.contains("maximum")) {
            return "a value or nesting far beyond what a settings file holds; check that it is the right file";
        }
        return "the " + (json ? "JSON" : "YAML") + " cannot be read here; check the brackets, quotes, commas and indentation";
    }

    private static String firstLine(String s) {
        return s == null ? "" : s.lines().findFirst().orElse("");
    }

    /** The allowed key closest to a misspelt one (edit distance at most 3), or null. */
    public static String nearest(String key, Collection<String> keys) {
        String best = null;
        int bestD = 4;
        for (String k : keys) {
            int d = levenshtein(key.toLowerCase(Locale.ROOT), k.toLowerCase(Locale.ROOT));
            if (d < bestD) {
                bestD = d;
                best = k;
            }
        }
        return best;
    }

    private static int levenshtein(String a, String b) {
        if (a.length() > 200 || b.length() > 200) {
            return Integer.MAX_VALUE;
        }
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int c = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                cur[j] = Math.min(Math.min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + c);
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }

    private static List<String> sorted(Collection<String> c) {
        List<String> l = new ArrayList<>(c);
        java.util.Collections.sort(l);
        return l;
    }
}
