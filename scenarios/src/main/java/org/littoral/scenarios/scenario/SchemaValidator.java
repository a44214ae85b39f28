package org.littoral.scenarios.scenario;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import org.littoral.scenarios.input.InputDocument;
import org.littoral.scenarios.input.Shown;
import org.littoral.scenarios.scenario.Schema.Choice;
import org.littoral.scenarios.scenario.Schema.Field;
import org.littoral.scenarios.scenario.Schema.Flag;
import org.littoral.scenarios.scenario.Schema.Int;
import org.littoral.scenarios.scenario.Schema.ListOf;
import org.littoral.scenarios.scenario.Schema.Num;
import org.littoral.scenarios.scenario.Schema.Presence;
import org.littoral.scenarios.scenario.Schema.Section;
import org.littoral.scenarios.scenario.Schema.Text;
import org.littoral.scenarios.scenario.Schema.Type;
import org.littoral.scenarios.scenario.Schema.Variant;

/**
 * Checks a parsed scenario tree against {@link ScenarioSchema} and returns a normalised copy with
 * every defaulted key filled in. Problems are collected as one-line messages that name the file,
 * line and column, the key path, the value found and what is allowed.
 */
final class SchemaValidator {
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    /** Location-map suffix for where a key itself (rather than its value) starts. */
    static final String KEY_SUFFIX = InputDocument.KEY_SUFFIX;
    /** Longest name (site, segment, scenario): names become parts of file names and table cells. */
    static final int MAX_NAME = 120;
    /** Longest description. */
    static final int MAX_DESCRIPTION = 2000;

    private final InputDocument doc;
    private final List<String> problems = new ArrayList<>();

    SchemaValidator(InputDocument doc) {
        this.doc = doc;
    }

    List<String> problems() {
        return problems;
    }

    ObjectNode validate(Section root, JsonNode tree) {
        JsonNode out = check(root, tree, "");
        return out instanceof ObjectNode o ? o : NODES.objectNode();
    }

    /** "file:line:col: " for a key path (or its nearest located parent), or "file: ". */
    String where(String path) {
        return (path.endsWith(KEY_SUFFIX) ? doc.whereKey(path.substring(0, path.length() - KEY_SUFFIX.length()))
                : doc.where(path)) + ": ";
    }

    private void problem(String path, String message) {
        problems.add(where(path) + message);
    }

    private static String child(String path, String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    private static String shown(JsonNode v) {
        return Shown.value(v);
    }

    private JsonNode check(Type type, JsonNode v, String path) {
        String label = path.isEmpty() ? "the file" : path;
        if (type instanceof Num n) {
            if (!v.isNumber()) {
                problem(path, label + " = " + shown(v) + ": not a number; give " + n.allowed());
                return v;
            }
            if (!n.accepts(v.doubleValue())) {
                problem(path, label + " = " + shown(v) + ": outside the allowed range; give " + n.allowed());
            }
            return NODES.numberNode(v.doubleValue());
        }
        if (type instanceof Int i) {
            if (!v.isNumber() || v.doubleValue() != Math.rint(v.doubleValue())) {
                problem(path, label + " = " + shown(v) + ": not a whole number; give " + i.allowed());
                return v;
            }
            if (v.doubleValue() < i.min() || v.doubleValue() > i.max()) {
                problem(path, label + " = " + shown(v) + ": outside the allowed range; give " + i.allowed());
            }
            return NODES.numberNode(v.longValue());
        }
        if (type instanceof Text) {
            if (!v.isTextual() && !v.isNumber()) {
                problem(path, label + " = " + shown(v) + ": not a text; give a text (in quotes if it holds ': ' or starts with "
                        + "a special character)");
                return v;
            }
            if (v.asText().isBlank()) {
                problem(path, label + " is blank; give a non-empty text");
            }
            int max = path.endsWith("description") ? MAX_DESCRIPTION : MAX_NAME;
            if (v.asText().length() > max) {
                problem(path, label + " = " + shown(v) + ": longer than " + max + " characters; shorten it");
            }
            return NODES.textNode(v.asText());
        }
        if (type instanceof Flag) {
            if (!v.isBoolean()) {
                problem(path, label + " = " + shown(v) + ": not true or false; write true or false");
            }
            return v;
        }
        if (type instanceof Choice c) {
            if (!v.isTextual() || !c.values().contains(v.asText())) {
                problem(path, label + " = " + shown(v) + ": not allowed; use " + c.allowed());
            }
            return v;
        }
        if (type instanceof Section s) {
            return checkSection(s, v, path);
        }
        if (type instanceof ListOf l) {
            if (!v.isArray()) {
                problem(path, label + " = " + shown(v) + ": not a list; write its items as lines starting with '- '");
                return v;
            }
            if (v.size() < l.minItems() || v.size() > l.maxItems()) {
                problem(path, label + " has " + v.size() + " items; give " + l.minItems() + " to " + l.maxItems());
            }
            ArrayNode out = NODES.arrayNode();
            for (int k = 0; k < v.size(); k++) {
                out.add(check(l.item(), v.get(k), path + "[" + k + "]"));
            }
            return out;
        }
        if (type instanceof Variant var) {
            if (!v.isObject()) {
                problem(path, label + " = " + shown(v) + ": not a mapping; give " + var.allowed());
                return v;
            }
            JsonNode d = v.get(var.discriminator());
            if (d == null) {
                problem(path, label + " needs '" + var.discriminator() + "'; add it: one of " + String.join(", ", var.forms().keySet()));
                return v;
            }
            if (!d.isTextual() || !var.forms().containsKey(d.asText())) {
                problem(child(path, var.discriminator()), child(path, var.discriminator()) + " = " + shown(d)
                        + ": not allowed; use one of " + String.join(", ", var.forms().keySet()));
                return v;
            }
            return checkSection(var.sectionFor(d.asText()), v, path);
        }
        throw new IllegalStateException("unhandled schema type " + type);
    }

    private JsonNode checkSection(Section s, JsonNode v, String path) {
        String label = path.isEmpty() ? "the file" : path;
        if (!v.isObject()) {
            problem(path, label + " = " + shown(v) + ": not a mapping; write its keys as 'key: value' lines indented under '"
                    + label + ":'");
            return v;
        }
        ObjectNode out = NODES.objectNode();
        for (Iterator<String> it = v.fieldNames(); it.hasNext(); ) {
            String key = it.next();
            if (s.field(key) == null) {
                String near = nearest(key, s.keys());
                problem(child(path, key) + KEY_SUFFIX, "unknown key " + Shown.text(child(path, key)) + (near == null ? "" : " (did you mean '" + near + "'?)")
                        + "; valid keys " + (path.isEmpty() ? "at the top level" : "in '" + path + "'") + ": " + String.join(", ", s.keys())
                        + "; check the spelling or remove it");
            }
        }
        for (Field f : s.fields()) {
            String p = child(path, f.key());
            JsonNode given = v.get(f.key());
            if (given == null || given.isNull()) {
                if (f.presence() == Presence.REQUIRED) {
                    problem(path, "missing key '" + p + "'; add it: " + f.type().allowed()
                            + (f.type() instanceof Section || f.type() instanceof ListOf ? "" : " (" + firstSentence(f.doc()) + ")"));
                } else if (f.presence() == Presence.DEFAULTED) {
                    JsonNode d = defaultNode(f);
                    if (d != null) {
                        out.set(f.key(), check(f.type(), d, p));
                    }
                }
                continue;
            }
            out.set(f.key(), check(f.type(), given, p));
        }
        return out;
    }

    private static JsonNode defaultNode(Field f) {
        Object d = f.defaultValue();
        if (d instanceof Double x) {
            return NODES.numberNode(x);
        }
        if (d instanceof Long x) {
            return NODES.numberNode(x);
        }
        if (d instanceof Boolean b) {
            return NODES.booleanNode(b);
        }
        if (d instanceof String str) {
            return NODES.textNode(str);
        }
        if (f.type() instanceof Section) {
            return NODES.objectNode();
        }
        if (f.type() instanceof Variant var) {
            ObjectNode o = NODES.objectNode();
            o.put(var.discriminator(), var.forms().keySet().iterator().next());
            return o;
        }
        return null;
    }

    private static String firstSentence(String doc) {
        int dot = doc.indexOf(". ");
        return dot < 0 ? doc.replaceAll("\\.$", "") : doc.substring(0, dot);
    }

    /** The valid key closest to a misspelt one (edit distance at most 3), or null. */
    static String nearest(String key, List<String> keys) {
        return InputDocument.nearest(key, keys);
    }
}
