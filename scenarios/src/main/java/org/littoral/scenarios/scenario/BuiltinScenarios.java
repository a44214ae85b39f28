package org.littoral.scenarios.scenario;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.littoral.scenarios.input.UserInputException;

/** The scenarios shipped inside littoral (resources under org/littoral/scenarios/builtin). */
public final class BuiltinScenarios {
    private static final String DIR = "/org/littoral/scenarios/builtin/";
    private static final List<String> NAMES = List.of("classic-45N", "classic-45N-capped", "classic-20N", "critical-30N-friction",
            "offshore-ambient", "onshore-ambient", "sea-barrier-bay", "quillmarsh-reach",
            "nl-offshore-2ms", "nl-offshore-4ms", "nl-corkscrew-4ms", "nl-corkscrew-8ms", "nl-backdoor-4ms", "nl-backdoor-8ms",
            "nl-onshore-2ms", "nl-onshore-5ms");

    private BuiltinScenarios() {
    }

    public static List<String> names() {
        return NAMES;
    }

    /** The YAML text of a built-in scenario. */
    public static String text(String name) {
        try (InputStream in = BuiltinScenarios.class.getResourceAsStream(DIR + name + ".yaml")) {
            if (in == null) {
                throw new UserInputException("no built-in scenario '" + name + "'; choose one of " + String.join(", ", NAMES));
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    /** The first comment block of a built-in scenario: what it shows. */
    public static String headline(String name) {
        StringBuilder sb = new StringBuilder();
        for (String line : text(name).lines().toList()) {
            if (!line.startsWith("#")) {
                break;
            }
            sb.append(sb.length() == 0 ? "" : " ").append(line.replaceFirst("^#+\\s?", "").trim());
        }
        return sb.toString().trim();
    }

    /** A built-in name or a path to a YAML/JSON file. */
    public static Scenario resolve(String nameOrPath) {
        if (NAMES.contains(nameOrPath)) {
            return ScenarioFile.parse("builtin:" + nameOrPath, text(nameOrPath), false);
        }
        Path p;
        try {
            p = Path.of(nameOrPath);
        } catch (java.nio.file.InvalidPathException e) {
            throw new UserInputException(org.littoral.scenarios.input.Shown.text(nameOrPath) + " is neither a built-in scenario "
                    + "nor a valid path; give a scenario file or a built-in name (list them with: littoral scenarios)");
        }
        if (!Files.exists(p) && !nameOrPath.contains("/") && !nameOrPath.contains(".")) {
            throw new UserInputException(org.littoral.scenarios.input.Shown.text(nameOrPath) + " is neither a built-in scenario "
                    + "nor an existing file; give a scenario file or one of " + String.join(", ", NAMES));
        }
        return ScenarioFile.load(p);
    }
}
