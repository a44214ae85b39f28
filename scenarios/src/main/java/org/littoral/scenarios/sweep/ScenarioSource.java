package org.littoral.scenarios.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import org.littoral.scenarios.input.InputDocument;
import org.littoral.scenarios.input.Shown;
import org.littoral.scenarios.input.UserInputException;

/** Finds the base scenario document a sweep file names: a file path, or a built-in scenario by name. */
@FunctionalInterface
public interface ScenarioSource {

    /**
     * @param ref what the sweep file says under {@code base}
     * @param relativeTo folder of the sweep file (relative paths are resolved against it), may be null
     */
    ObjectNode load(String ref, Path relativeTo);

    /**
     * A base scenario written inline in a sweep, plan or day file, as this source would hand it back for a named one
     * (the real source fills in every default, so every key can be swept); {@code label} starts messages. The
     * default returns the tree unchanged.
     */
    default ObjectNode inline(ObjectNode tree, String label) {
        return tree;
    }

    /** Built-in scenarios live here as {@code <name>.yaml}. */
    String BUILTIN_FOLDER = "/org/littoral/scenarios/builtin/";

    /** Files first, then built-in resources under {@link #BUILTIN_FOLDER}. */
    static ScenarioSource filesAndBuiltins() {
        return (ref, relativeTo) -> {
            Path p = resolveFile(ref, relativeTo);
            if (p != null) {
                return readDocument(p);
            }
            for (String ext : ref.matches("[A-Za-z0-9_-][A-Za-z0-9._-]*") ? new String[] {".yaml", ".yml", ".json"} : new String[0]) {
                String res = BUILTIN_FOLDER + ref + ext;
                try (InputStream in = ScenarioSource.class.getResourceAsStream(res)) {
                    if (in != null) {
                        return asObject(yaml().readTree(in), "built-in scenario '" + ref + "'");
                    }
                } catch (IOException e) {
                    throw new UserInputException("built-in scenario '" + ref + "' cannot be read: " + e.getMessage(), e);
                }
            }
            throw new UserInputException("base scenario " + Shown.text(ref) + " is neither a file nor a built-in scenario name; "
                    + "give a path to a scenario file or a built-in name");
        };
    }

    /**
     * The scenario file a reference names (relative to {@code relativeTo} first), or null when there is none. A
     * file must be named .yaml, .yml or .json: a reference to any other file (a system file, a data table) is
     * refused without reading it, so its contents can never appear in a message.
     */
    static Path resolveFile(String ref, Path relativeTo) {
        return resolveFile(ref, relativeTo, "base scenario");
    }

    /** As {@link #resolveFile(String, Path)}; {@code what} names the reference in messages ("coast"). */
    static Path resolveFile(String ref, Path relativeTo, String what) {
        if (ref.isEmpty() || ref.indexOf('\u0000') >= 0) {
            throw new UserInputException(what + " " + Shown.text(ref) + " is not a name or path; give a scenario file or a "
                    + "built-in name");
        }
        Path p;
        try {
            p = Path.of(ref);
            if (!p.isAbsolute() && relativeTo != null && Files.exists(relativeTo.resolve(p))) {
                p = relativeTo.resolve(p);
            }
        } catch (java.nio.file.InvalidPathException e) {
            throw new UserInputException(what + " " + Shown.text(ref) + " is not a valid path; give a scenario file or a "
                    + "built-in name");
        }
        if (!Files.exists(p)) {
            return null;
        }
        String fn = p.getFileName() == null ? "" : p.getFileName().toString().toLowerCase(java.util.Locale.ROOT);
        if (Files.isDirectory(p) || !(fn.endsWith(".yaml") || fn.endsWith(".yml") || fn.endsWith(".json"))) {
            throw new UserInputException(what + " " + Shown.text(ref) + " is not a scenario file (not read: a scenario file "
                    + "is named .yaml, .yml or .json); give a scenario file or a built-in name");
        }
        return p;
    }

    static ObjectMapper yaml() {
        return new ObjectMapper(new YAMLFactory());
    }

    /** Reads a YAML or JSON file into a tree (JSON when the name ends in .json), strictly (see {@link InputDocument}). */
    static ObjectNode readDocument(Path p) {
        return InputDocument.read(p, "").rootMapping("scenario keys (name, coast, sites, ...)");
    }

    private static ObjectNode asObject(JsonNode n, String where) {
        if (n == null || !n.isObject()) {
            throw new UserInputException(where + ": expected a set of keys at the top level; write 'key: value' lines");
        }
        return (ObjectNode) n;
    }
}
