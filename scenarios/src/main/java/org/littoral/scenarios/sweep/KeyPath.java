package org.littoral.scenarios.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;

/**
 * A dotted path into a scenario document: {@code ambient_wind.from_deg}, {@code surface.segments[2].sst_K}
 * or {@code surface.segments[name=bay].sst_K} (the element of a list whose {@code name} field is {@code bay}).
 * A path only ever addresses a key that the base document already has: a sweep changes values, it never
 * invents keys, so a misspelt key is an error rather than a silently ignored setting.
 */
public final class KeyPath {

    /** One step: an object field, a list index, or a list element selected by a field value. */
    private record Step(String field, int index, String selectKey, String selectValue) {
        boolean isField() {
            return field != null;
        }

        @Override
        public String toString() {
            if (field != null) {
                return field;
            }
            return index >= 0 ? "[" + index + "]" : "[" + selectKey + "=" + selectValue + "]";
        }
    }

    private final String text;
    private final List<Step> steps;

    private KeyPath(String text, List<Step> steps) {
        this.text = text;
        this.steps = steps;
    }

    /** Parses a path; throws IllegalArgumentException with the reason when it is malformed. */
    public static KeyPath parse(String text) {
        if (text == null || text.isBlank()) {
            throw new IllegalArgumentException("empty key path");
        }
        List<Step> steps = new ArrayList<>();
        int i = 0;
        int n = text.length();
        boolean expectField = true;
        while (i < n) {
            char c = text.charAt(i);
            if (c == '[') {
                int close = text.indexOf(']', i);
                if (close < 0) {
                    throw new IllegalArgumentException("'[' without ']' in key path '" + text + "'");
                }
                String inner = text.substring(i + 1, close).trim();
                int eq = inner.indexOf('=');
                if (eq >= 0) {
                    String k = inner.substring(0, eq).trim();
                    String v = inner.substring(eq + 1).trim();
                    if (k.isEmpty() || v.isEmpty()) {
                        throw new IllegalArgumentException("selector '[" + inner + "]' in key path '" + text
                                + "' needs the form [field=value], e.g. [name=bay]");
                    }
                    steps.add(new Step(null, -1, k, v));
                } else {
                    try {
                        int idx = Integer.parseInt(inner);
                        if (idx < 0) {
                            throw new NumberFormatException();
                        }
                        steps.add(new Step(null, idx, null, null));
                    } catch (NumberFormatException e) {
                        throw new IllegalArgumentException("list index '[" + inner + "]' in key path '" + text
                                + "' must be a whole number >= 0 or a selector like [name=bay]");
                    }
                }
                i = close + 1;
                expectField = false;
            } else if (c == '.') {
                if (expectField) {
                    throw new IllegalArgumentException("empty key between dots in key path '" + text + "'");
                }
                i++;
                expectField = true;
            } else {
                int j = i;
                while (j < n && text.charAt(j) != '.' && text.charAt(j) != '[') {
                    j++;
                }
                if (!expectField) {
                    throw new IllegalArgumentException("missing '.' before '" + text.substring(i, j) + "' in key path '" + text + "'");
                }
                steps.add(new Step(text.substring(i, j).trim(), -1, null, null));
                i = j;
                expectField = false;
            }
        }
        if (expectField) {
            throw new IllegalArgumentException("key path '" + text + "' ends with '.'");
        }
        return new KeyPath(text, List.copyOf(steps));
    }

    /** The last object key of the path (e.g. {@code sst_K}), or null if the path ends in a list element. */
    /** The object keys along the path, without list indices or selectors: {@code surface[name=bay].sst_K} gives [surface, sst_K]. */
    public List<String> fieldNames() {
        List<String> out = new ArrayList<>();
        for (Step st : steps) {
            if (st.isField()) {
                out.add(st.field);
            }
        }
        return out;
    }

    public String leafKey() {
        Step last = steps.get(steps.size() - 1);
        return last.isField() ? last.field : null;
    }

    /**
     * The node at this path in {@code root}.
     *
     * @throws IllegalArgumentException naming the first step that does not exist and what is there instead
     */
    public JsonNode get(JsonNode root) {
        JsonNode node = root;
        StringBuilder walked = new StringBuilder();
        for (Step s : steps) {
            node = step(node, s, walked);
            append(walked, s);
        }
        return node;
    }

    /** Replaces the value at this path in {@code root} (which is modified); the key must already exist. */
    public void set(JsonNode root, JsonNode value) {
        JsonNode parent = root;
        StringBuilder walked = new StringBuilder();
        for (int k = 0; k < steps.size() - 1; k++) {
            parent = step(parent, steps.get(k), walked);
            append(walked, steps.get(k));
        }
        Step last = steps.get(steps.size() - 1);
        step(parent, last, walked); // throws when absent
        if (last.isField()) {
            ((ObjectNode) parent).set(last.field, value.deepCopy());
        } else {
            ArrayNode arr = (ArrayNode) parent;
            arr.set(indexIn(arr, last, walked), value.deepCopy());
        }
    }

    private JsonNode step(JsonNode node, Step s, StringBuilder walked) {
        String where = walked.length() == 0 ? "the top level" : "'" + walked + "'";
        if (s.isField()) {
            if (!node.isObject()) {
                throw new IllegalArgumentException("'" + s.field + "' is asked for under " + where + ", which is "
                        + kind(node) + ", not a set of keys");
            }
            JsonNode child = node.get(s.field);
            if (child == null) {
                throw new IllegalArgumentException("no key '" + s.field + "' under " + where + "; keys there: "
                        + keysOf(node));
            }
            return child;
        }
        if (!node.isArray()) {
            throw new IllegalArgumentException(s + " is asked for under " + where + ", which is " + kind(node) + ", not a list");
        }
        return node.get(indexIn((ArrayNode) node, s, walked));
    }

    private int indexIn(ArrayNode arr, Step s, StringBuilder walked) {
        if (s.index >= 0) {
            if (s.index >= arr.size()) {
                throw new IllegalArgumentException("index " + s + " is past the end of '" + walked + "', which has "
                        + arr.size() + " elements (0.." + (arr.size() - 1) + ")");
            }
            return s.index;
        }
        List<String> seen = new ArrayList<>();
        int found = -1;
        for (int k = 0; k < arr.size(); k++) {
            JsonNode v = arr.get(k).get(s.selectKey);
            if (v != null && v.isValueNode()) {
                seen.add(v.asText());
                if (v.asText().equals(s.selectValue)) {
                    if (found >= 0) {
                        throw new IllegalArgumentException("selector " + s + " matches more than one element of '" + walked + "'");
                    }
                    found = k;
                }
            }
        }
        if (found < 0) {
            throw new IllegalArgumentException("no element of '" + walked + "' has " + s.selectKey + " = '" + s.selectValue
                    + "'; values there: " + seen);
        }
        return found;
    }

    private static void append(StringBuilder walked, Step s) {
        if (s.isField() && walked.length() > 0) {
            walked.append('.');
        }
        walked.append(s);
    }

    private static String kind(JsonNode n) {
        if (n.isArray()) {
            return "a list";
        }
        if (n.isObject()) {
            return "a set of keys";
        }
        return "the value " + n;
    }

    private static String keysOf(JsonNode n) {
        List<String> keys = new ArrayList<>();
        for (Iterator<String> it = n.fieldNames(); it.hasNext(); ) {
            keys.add(it.next());
        }
        return keys.isEmpty() ? "(none)" : String.join(", ", keys);
    }

    @Override
    public String toString() {
        return text;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof KeyPath k && k.text.equals(text);
    }

    @Override
    public int hashCode() {
        return text.hashCode();
    }
}
