package org.littoral.scenarios.input;

import com.fasterxml.jackson.databind.JsonNode;
import java.util.Locale;

/**
 * How a value from a user's file appears in an error message: quoted, with control characters made visible,
 * and cut to {@link #MAX} characters with the full length stated, so that a 300 KB value never fills a
 * terminal and a message stays one line.
 */
public final class Shown {
    /** Longest value shown whole. */
    public static final int MAX = 40;

    private Shown() {
    }

    /** A text value, quoted: {@code 'abc'}, {@code 'xxxxxxxxx... (300000 characters)'}. */
    public static String text(String s) {
        if (s == null) {
            return "nothing";
        }
        return "'" + bare(s) + "'";
    }

    /** A text value without quotes, control characters escaped, cut to {@link #MAX} characters. */
    public static String bare(String s) {
        if (s == null) {
            return "";
        }
        String cut = s.length() > MAX ? s.substring(0, MAX - 10) : s;
        StringBuilder b = new StringBuilder(cut.length() + 8);
        for (int i = 0; i < cut.length(); i++) {
            char c = cut.charAt(i);
            if (c == '\n') {
                b.append("\\n");
            } else if (c == '\t') {
                b.append("\\t");
            } else if (c == '\r') {
                b.append("\\r");
            } else if (Character.isISOControl(c) || c == '\uFFFD' || Character.isSurrogate(c)) {
                b.append(String.format(Locale.ROOT, "\\u%04X", (int) c));
            } else {
                b.append(c);
            }
        }
        if (s.length() > MAX) {
            b.append("... (").append(s.length()).append(" characters)");
        }
        return b.toString();
    }

    /**
     * A message part that may hold user text (a library's reason, a nested message): control characters escaped
     * and cut to {@code max} characters.
     */
    public static String clip(String s, int max) {
        if (s == null) {
            return "";
        }
        String one = s.replaceAll("\\s*[\\r\\n]+\\s*", " ");
        return one.length() <= max ? one : one.substring(0, max - 3) + "...";
    }

    /** A value of a YAML/JSON tree: numbers as written, texts quoted, containers by kind. */
    public static String value(JsonNode v) {
        if (v == null || v.isMissingNode()) {
            return "nothing";
        }
        if (v.isNull()) {
            return "empty (null)";
        }
        if (v.isTextual()) {
            return text(v.asText());
        }
        if (v.isObject()) {
            return v.isEmpty() ? "an empty mapping {}" : "a mapping of " + v.size() + " key" + (v.size() == 1 ? "" : "s");
        }
        if (v.isArray()) {
            return v.isEmpty() ? "an empty list []" : "a list of " + v.size() + " item" + (v.size() == 1 ? "" : "s");
        }
        if (v.isNumber()) {
            double d = v.doubleValue();
            if (Double.isNaN(d)) {
                return "NaN (not a number)";
            }
            if (Double.isInfinite(d)) {
                return d > 0 ? "infinity" : "-infinity";
            }
        }
        return bare(v.asText());
    }

    /** A number as a reader writes it: whole numbers without ".0", others in the shortest form. */
    public static String number(double v) {
        if (Double.isNaN(v)) {
            return "NaN";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "infinity" : "-infinity";
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return Double.toString(v);
    }
}
