package org.littoral.scenarios.scenario;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A small declarative schema for scenario files: every key with its type, unit, allowed range,
 * default and meaning. {@link SchemaValidator} checks a parsed file against it and
 * {@link SchemaDoc} renders it as the user documentation, so the two cannot drift apart.
 */
public final class Schema {
    private Schema() {
    }

    /** What a key holds. */
    public sealed interface Type permits Num, Int, Text, Flag, Choice, Section, ListOf, Variant {
        /** Short human description of what is allowed (used in errors and docs). */
        String allowed();
    }

    /** A real number in [min, max] (or open ends), with its unit. */
    public record Num(String unit, double min, double max, boolean minOpen, boolean maxOpen) implements Type {
        public boolean accepts(double v) {
            if (!Double.isFinite(v)) {
                return false;
            }
            boolean lo = minOpen ? v > min : v >= min;
            boolean hi = maxOpen ? v < max : v <= max;
            return lo && hi;
        }

        @Override
        public String allowed() {
            String range;
            if (min == Double.NEGATIVE_INFINITY && max == Double.POSITIVE_INFINITY) {
                range = "any finite number";
            } else if (!minOpen && !maxOpen) {
                range = fmt(min) + " to " + fmt(max);
            } else if (minOpen && !maxOpen) {
                range = "greater than " + fmt(min) + ", up to " + fmt(max);
            } else if (!minOpen) {
                range = fmt(min) + " up to (not including) " + fmt(max);
            } else {
                range = "between " + fmt(min) + " and " + fmt(max) + " (both exclusive)";
            }
            return "a number, " + range + (unit.isEmpty() ? "" : " " + unit);
        }
    }

    /** An integer in [min, max]. */
    public record Int(long min, long max) implements Type {
        @Override
        public String allowed() {
            return "a whole number, " + min + " to " + max;
        }
    }

    /** A text value. */
    public record Text() implements Type {
        @Override
        public String allowed() {
            return "text";
        }
    }

    /** true or false. */
    public record Flag() implements Type {
        @Override
        public String allowed() {
            return "true or false";
        }
    }

    /** One of a fixed set of words. */
    public record Choice(List<String> values) implements Type {
        @Override
        public String allowed() {
            return "one of " + String.join(", ", values);
        }
    }

    /** A mapping with a fixed set of keys. */
    public record Section(List<Field> fields) implements Type {
        public Field field(String key) {
            for (Field f : fields) {
                if (f.key().equals(key)) {
                    return f;
                }
            }
            return null;
        }

        public List<String> keys() {
            List<String> k = new ArrayList<>();
            fields.forEach(f -> k.add(f.key()));
            return k;
        }

        @Override
        public String allowed() {
            return "a mapping with keys " + String.join(", ", keys());
        }
    }

    /** A list of items of one type, with a minimum and maximum length. */
    public record ListOf(Type item, int minItems, int maxItems) implements Type {
        @Override
        public String allowed() {
            return "a list of " + minItems + " to " + maxItems + " items";
        }
    }

    /**
     * A mapping whose allowed keys depend on the value of a discriminator key (e.g. a surface segment
     * of {@code type: water} or {@code type: land}); {@code common} keys are allowed in every form.
     */
    public record Variant(String discriminator, List<Field> common, Map<String, List<Field>> forms) implements Type {
        public Section sectionFor(String form) {
            List<Field> all = new ArrayList<>();
            all.add(new Field(discriminator, new Choice(new ArrayList<>(forms.keySet())), Presence.REQUIRED, null,
                    "which form this item takes"));
            all.addAll(common);
            all.addAll(forms.get(form));
            return new Section(all);
        }

        @Override
        public String allowed() {
            return "a mapping with '" + discriminator + "' one of " + String.join(", ", forms.keySet());
        }
    }

    /** Whether a key must be given. */
    public enum Presence {
        /** Must be given. */
        REQUIRED,
        /** May be omitted; then {@link Field#defaultValue()} is used. */
        DEFAULTED,
        /** May be omitted; {@link Field#doc()} says what omission means (e.g. a derived value). */
        OPTIONAL
    }

    /**
     * One key.
     *
     * @param defaultValue Double, Long, String, Boolean or null
     */
    public record Field(String key, Type type, Presence presence, Object defaultValue, String doc) {
    }

    // ---- compact constructors for the table ----

    public static Field num(String key, String unit, double min, double max, Object dflt, String doc) {
        return new Field(key, new Num(unit, min, max, false, false), presence(dflt), dflt, doc);
    }

    /** A number that must be strictly greater than min. */
    public static Field pos(String key, String unit, double min, double max, Object dflt, String doc) {
        return new Field(key, new Num(unit, min, max, true, false), presence(dflt), dflt, doc);
    }

    public static Field integer(String key, long min, long max, Object dflt, String doc) {
        return new Field(key, new Int(min, max), presence(dflt), dflt == null ? null : ((Number) dflt).longValue(), doc);
    }

    public static Field text(String key, Object dflt, String doc) {
        return new Field(key, new Text(), presence(dflt), dflt, doc);
    }

    public static Field flag(String key, boolean dflt, String doc) {
        return new Field(key, new Flag(), Presence.DEFAULTED, dflt, doc);
    }

    public static Field choice(String key, List<String> values, Object dflt, String doc) {
        return new Field(key, new Choice(values), presence(dflt), dflt, doc);
    }

    public static Field section(String key, Presence p, String doc, Field... fields) {
        return new Field(key, new Section(List.of(fields)), p, null, doc);
    }

    public static Field optional(Field f) {
        return new Field(f.key(), f.type(), Presence.OPTIONAL, null, f.doc());
    }

    private static Presence presence(Object dflt) {
        if (dflt == null) {
            return Presence.REQUIRED;
        }
        return Presence.DEFAULTED;
    }

    static Map<String, List<Field>> forms(Object... keyThenFieldList) {
        Map<String, List<Field>> m = new LinkedHashMap<>();
        for (int i = 0; i < keyThenFieldList.length; i += 2) {
            @SuppressWarnings("unchecked")
            List<Field> l = (List<Field>) keyThenFieldList[i + 1];
            m.put((String) keyThenFieldList[i], l);
        }
        return m;
    }

    static String fmt(double v) {
        if (v == Double.POSITIVE_INFINITY) {
            return "infinity";
        }
        if (v == Double.NEGATIVE_INFINITY) {
            return "-infinity";
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return Double.toString(v);
    }
}
