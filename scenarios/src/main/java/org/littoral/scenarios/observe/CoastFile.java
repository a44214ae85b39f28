package org.littoral.scenarios.observe;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.littoral.model.coast.Coast;
import org.littoral.scenarios.input.InputDocument;
import org.littoral.scenarios.input.Shown;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.scenario.BuiltinScenarios;
import org.littoral.scenarios.scenario.ScenarioFile;

/**
 * Where the observations were made: a built-in scenario name, a scenario file (its {@code coast}
 * section is used), or a coast file holding the same keys as a scenario's {@code coast} section
 * (at the top level or under {@code coast:}; other top-level keys, e.g. a site list, are ignored).
 */
public final class CoastFile {
    private static final Set<String> KEYS = new TreeSet<>(List.of("latitude_deg", "longitude_deg", "utc_offset_h",
            "bearing_land_to_sea_deg", "day_of_year"));

    private CoastFile() {
    }

    public static Coast load(String ref) {
        Path p;
        try {
            p = Path.of(ref);
        } catch (java.nio.file.InvalidPathException e) {
            throw new UserInputException("coast " + Shown.text(ref) + " is not a valid path; give a coast file or a scenario file or name");
        }
        if (!Files.exists(p)) {
            if (BuiltinScenarios.names().contains(ref)) {
                return BuiltinScenarios.resolve(ref).coast();
            }
            throw new UserInputException("coast " + Shown.text(ref) + ": no such file and not a built-in scenario; give a coast file "
                    + "(keys " + String.join(", ", KEYS) + ") or a scenario file or name");
        }
        InputDocument doc = InputDocument.read(p, "coast file");
        ObjectNode root = doc.rootMapping("coast keys (" + String.join(", ", KEYS) + ")");
        if (root.has("kind") || root.has("surface") && root.has("grid")) {
            return ScenarioFile.load(p).coast();
        }
        boolean nested = root.has("coast");
        String path = nested ? "coast" : "";
        JsonNode c = nested ? root.get("coast") : root;
        if (!c.isObject()) {
            throw doc.error("coast", "coast = " + Shown.value(c) + ": not a mapping; give the keys " + String.join(", ", KEYS)
                    + " indented under coast:");
        }
        doc.onlyKeys(c, path, KEYS);
        double lat = doc.number(c, path, "latitude_deg", -90, 90, "deg", Double.NaN);
        double lon = doc.number(c, path, "longitude_deg", -180, 180, "deg", 0.0);
        double utc = doc.number(c, path, "utc_offset_h", -12, 14, "h", Math.rint(lon / 15.0));
        double bearing = doc.number(c, path, "bearing_land_to_sea_deg", 0, 360, "deg", Double.NaN);
        int day = (int) doc.integer(c, path, "day_of_year", 1, 366, "", 180L);
        return new Coast(lat, lon, utc, bearing, day);
    }
}
