package org.littoral.scenarios.analysis;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.lang.reflect.Field;
import java.lang.reflect.Modifier;
import java.lang.reflect.ParameterizedType;
import java.lang.reflect.Type;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;
import org.littoral.scenarios.analysis.detect.Penalty;
import org.littoral.scenarios.analysis.stats.BreezeTyping;
import org.littoral.scenarios.input.UserInputException;

/**
 * Analysis settings from a YAML file ({@code --settings FILE} of observe, compare and plan): the keys are the
 * documented setting names (docs/analysis.md), nested as in {@link AnalysisSettings}, e.g.
 * {@code detection: {windLayer: 150-350, penalty: mbic}}. Layers are written bottom-top in metres, penalties
 * BIC, MBIC or a number, variables by name, enums by name. Unknown keys and values of the wrong kind stop with
 * one line naming the file, the key, the value and the allowed form. {@link #toJson} echoes the resolved settings.
 */
public final class SettingsFile {
    /** Fields that are inputs of a run, not settings: set by the commands themselves. */
    private static final Set<String> NOT_SETTINGS = Set.of("dayAttributes", "localZone", "siteInlandM", "composites");

    private SettingsFile() {
    }

    /** Reads {@code file} into {@code s} (keys absent from the file keep their defaults) and validates the result. */
    public static AnalysisSettings apply(Path file, AnalysisSettings s) {
        if (!Files.isRegularFile(file)) {
            throw new UserInputException("settings file " + file + " does not exist; give a YAML file of analysis settings "
                    + "(docs/analysis.md)");
        }
        JsonNode root;
        // the one strict reader: duplicate keys, a second document and syntax errors are one line with line:column
        root = org.littoral.scenarios.input.InputDocument.read(file, "settings file").root();
        if (root == null) {
            return s.validate();
        }
        if (!root.isObject()) {
            throw new UserInputException("settings file " + file + ": expected a mapping of setting names; see docs/analysis.md");
        }
        fill(file, s, root, "");
        try {
            return s.validate();
        } catch (UserInputException e) {
            throw new UserInputException("settings file " + file + ": " + e.getMessage());
        }
    }

    private static void fill(Path file, Object target, JsonNode node, String prefix) {
        for (Iterator<String> it = node.fieldNames(); it.hasNext(); ) {
            String k = it.next();
            String key = prefix + k;
            Field f = settable(target.getClass(), k);
            if (f == null) {
                throw new UserInputException("settings file " + file + ": " + org.littoral.scenarios.input.Shown.clip(key, 100)
                        + ": unknown setting; allowed here: " + org.littoral.scenarios.input.Shown.clip(String.valueOf(names(target.getClass())), 200)
                        + "; check the spelling or remove it");
            }
            JsonNode v = node.get(k);
            try {
                Object cur = f.get(target);
                if (isGroup(f.getType())) {
                    if (!v.isObject()) {
                        throw bad(file, key, v, "a mapping of its settings " + names(f.getType()));
                    }
                    fill(file, cur, v, key + ".");
                } else {
                    f.set(target, value(file, key, v, f.getType(), f.getGenericType()));
                }
            } catch (IllegalAccessException e) {
                throw new IllegalStateException(e);
            }
        }
    }

    private static boolean isGroup(Class<?> c) {
        return c.getSimpleName().endsWith("Settings");
    }

    private static Field settable(Class<?> c, String name) {
        for (Field f : c.getFields()) {
            int m = f.getModifiers();
            if (f.getName().equals(name) && !Modifier.isStatic(m) && !NOT_SETTINGS.contains(name)
                    && (!Modifier.isFinal(m) || isGroup(f.getType()))) {
                return f;
            }
        }
        return null;
    }

    private static String names(Class<?> c) {
        TreeSet<String> out = new TreeSet<>();
        for (Field f : c.getFields()) {
            if (!Modifier.isStatic(f.getModifiers()) && !NOT_SETTINGS.contains(f.getName())) {
                out.add(f.getName());
            }
        }
        return out.toString();
    }

    private static UserInputException bad(Path file, String key, JsonNode v, String allowed) {
        return new UserInputException("settings file " + file + ": " + key + ": value " + org.littoral.scenarios.input.Shown.value(v)
                + " is not " + allowed + "; give " + allowed);
    }

    private static Object value(Path file, String key, JsonNode v, Class<?> type, Type generic) {
        try {
            if (type == double.class) {
                if (!v.isNumber()) {
                    throw bad(file, key, v, "a number");
                }
                return v.asDouble();
            }
            if (type == int.class) {
                if (!v.isIntegralNumber()) {
                    throw bad(file, key, v, "a whole number");
                }
                return v.asInt();
            }
            if (type == boolean.class) {
                if (!v.isBoolean()) {
                    throw bad(file, key, v, "true or false");
                }
                return v.asBoolean();
            }
            if (type == String.class) {
                return v.asText();
            }
            if (type == Layer.class) {
                return Layer.parse(v.asText());
            }
            if (type == Penalty.class) {
                return Penalty.parse(v.asText());
            }
            if (type == Variable.class) {
                return Variable.parse(v.asText());
            }
            if (type == BreezeTyping.class) {
                if (!v.isObject() || !v.has("onshoreHalfWidthDeg") || !v.has("offshoreHalfWidthDeg") || !v.has("weakWindMPerS")) {
                    throw bad(file, key, v, "{onshoreHalfWidthDeg: N, offshoreHalfWidthDeg: N, weakWindMPerS: N}");
                }
                return new BreezeTyping(v.get("onshoreHalfWidthDeg").asDouble(), v.get("offshoreHalfWidthDeg").asDouble(),
                        v.get("weakWindMPerS").asDouble());
            }
            if (type.isEnum()) {
                String name = v.asText().trim().toUpperCase(Locale.ROOT).replace('-', '_');
                for (Object c : type.getEnumConstants()) {
                    if (((Enum<?>) c).name().equals(name)) {
                        return c;
                    }
                }
                throw bad(file, key, v, "one of " + java.util.Arrays.toString(type.getEnumConstants()));
            }
            if (type == List.class && generic instanceof ParameterizedType pt) {
                if (!v.isArray()) {
                    throw bad(file, key, v, "a list, e.g. [a, b]");
                }
                Type el = pt.getActualTypeArguments()[0];
                List<Object> out = new ArrayList<>();
                for (int i = 0; i < v.size(); i++) {
                    out.add(value(file, key + "[" + i + "]", v.get(i), (Class<?>) el, el));
                }
                return List.copyOf(out);
            }
        } catch (UserInputException u) {
            throw new UserInputException(u.getMessage().startsWith("settings file") ? u.getMessage()
                    : "settings file " + file + ": " + key + ": " + u.getMessage());
        } catch (IllegalArgumentException e) {
            throw new UserInputException("settings file " + file + ": " + key + ": value " + org.littoral.scenarios.input.Shown.value(v)
                    + ": " + org.littoral.scenarios.input.Shown.clip(e.getMessage(), 160) + "; write it in the allowed form (docs/analysis.md)");
        }
        throw new UserInputException("settings file " + file + ": " + key + ": this setting cannot be set from a file");
    }

    /** The resolved settings as JSON (for analysis.json): every setting a file can give, with its value. */
    public static ObjectNode toJson(AnalysisSettings s) {
        ObjectNode root = new ObjectMapper().createObjectNode();
        dump(s, root);
        return root;
    }

    private static void dump(Object o, ObjectNode node) {
        for (Field f : o.getClass().getFields()) {
            if (Modifier.isStatic(f.getModifiers()) || NOT_SETTINGS.contains(f.getName())) {
                continue;
            }
            try {
                Object v = f.get(o);
                if (isGroup(f.getType())) {
                    dump(v, node.putObject(f.getName()));
                } else if (v instanceof List<?> l) {
                    ArrayNode a = node.putArray(f.getName());
                    l.forEach(x -> a.add(text(x)));
                } else if (v instanceof Double d) {
                    node.put(f.getName(), d);
                } else if (v instanceof Integer i) {
                    node.put(f.getName(), i);
                } else if (v instanceof Boolean b) {
                    node.put(f.getName(), b);
                } else if (v instanceof BreezeTyping bt) {
                    ObjectNode b = node.putObject(f.getName());
                    b.put("onshoreHalfWidthDeg", bt.onshoreHalfWidthDeg);
                    b.put("offshoreHalfWidthDeg", bt.offshoreHalfWidthDeg);
                    b.put("weakWindMPerS", bt.weakWindMPerS);
                } else {
                    node.put(f.getName(), text(v));
                }
            } catch (IllegalAccessException e) {
                throw new IllegalStateException(e);
            }
        }
    }

    private static String text(Object x) {
        if (x instanceof Layer l) {
            return l.label().replace("m", "");
        }
        if (x instanceof Penalty p) {
            return p.kind() == Penalty.Kind.MANUAL ? Double.toString(p.manualValue()) : p.kind().name();
        }
        return String.valueOf(x);
    }
}
