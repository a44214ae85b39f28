package org.littoral.scenarios.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import org.littoral.scenarios.input.UserInputException;

/** Finds the base scenario document a sweep file names: a file path, or a built-in scenario by name. */
@FunctionalInterface
public interface ScenarioSource {

    /**
     * @param ref what the sweep file says under {@code base}
     * @param relativeTo folder of the sweep file (relative paths are resolved against it), may be null
     */
    ObjectNode load(String ref, Path relativeTo);

    /** Built-in scenarios live here as {@code <name>.yaml}. */
    String BUILTIN_FOLDER = "/org/littoral/scenarios/builtin/";

    /** Files first, then built-in resources under {@link #BUILTIN_FOLDER}. */
    static ScenarioSource filesAndBuiltins() {
        return (ref, relativeTo) -> {
            Path p = Path.of(ref);
            if (!p.isAbsolute() && relativeTo != null) {
                p = relativeTo.resolve(p);
            }
            if (Files.isRegularFile(p)) {
                return readDocument(p);
            }
            for (String ext : new String[] {".yaml", ".yml", ".json"}) {
                String res = BUILTIN_FOLDER + ref + ext;
                try (InputStream in = ScenarioSource.class.getResourceAsStream(res)) {
                    if (in != null) {
                        return asObject(yaml().readTree(in), "built-in scenario '" + ref + "'");
                    }
                } catch (IOException e) {
                    throw new UserInputException("built-in scenario '" + ref + "' cannot be read: " + e.getMessage(), e);
                }
            }
            throw new UserInputException("base scenario '" + ref + "' is neither a file (looked for " + p
                    + ") nor a built-in scenario name; give a path to a scenario file or a built-in name");
        };
    }

    static ObjectMapper yaml() {
        return new ObjectMapper(new YAMLFactory());
    }

    /** Reads a YAML or JSON file into a tree (JSON when the name ends in .json). */
    static ObjectNode readDocument(Path p) {
        ObjectMapper m = p.getFileName().toString().toLowerCase(java.util.Locale.ROOT).endsWith(".json")
                ? new ObjectMapper() : yaml();
        try {
            return asObject(m.readTree(p.toFile()), p.toString());
        } catch (IOException e) {
            String msg = e.getMessage() == null ? e.toString() : e.getMessage().lines().findFirst().orElse("");
            throw new UserInputException(p + ": not valid " + (m.getFactory() instanceof YAMLFactory ? "YAML" : "JSON")
                    + " (" + msg + "); fix the syntax", e);
        }
    }

    private static ObjectNode asObject(JsonNode n, String where) {
        if (n == null || !n.isObject()) {
            throw new UserInputException(where + ": expected a set of keys at the top level, found "
                    + (n == null ? "nothing" : n.getNodeType().toString().toLowerCase(java.util.Locale.ROOT)));
        }
        return (ObjectNode) n;
    }
}
