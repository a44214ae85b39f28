package org.littoral.scenarios.observe;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.littoral.model.coast.Coast;
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
        Path p = Path.of(ref);
        if (!Files.isRegularFile(p)) {
            if (BuiltinScenarios.names().contains(ref)) {
                return BuiltinScenarios.resolve(ref).coast();
            }
            throw new UserInputException("coast '" + ref + "': no such file and not a built-in scenario; give a coast file "
                    + "(keys " + KEYS + ") or a scenario file or name");
        }
        JsonNode root;
        try {
            root = new ObjectMapper(new YAMLFactory()).readTree(Files.readString(p));
        } catch (IOException e) {
            throw new UserInputException("coast file " + p + ": cannot be read as YAML/JSON: " + e.getMessage(), e);
        }
        if (root != null && root.has("kind") || root != null && root.has("surface") && root.has("grid")) {
            return ScenarioFile.load(p).coast();
        }
        JsonNode c = root != null && root.has("coast") ? root.get("coast") : root;
        if (c == null || !c.isObject()) {
            throw new UserInputException("coast file " + p + ": expected a mapping with " + KEYS);
        }
        for (Iterator<String> it = c.fieldNames(); it.hasNext(); ) {
            String k = it.next();
            if (!KEYS.contains(k)) {
                throw new UserInputException("coast file " + p + ": coast." + k + ": unknown key; allowed keys are " + KEYS);
            }
        }
        double lat = num(p, c, "latitude_deg", -90, 90, Double.NaN);
        double lon = num(p, c, "longitude_deg", -180, 180, 0.0);
        double utc = num(p, c, "utc_offset_h", -14, 14, Math.rint(lon / 15.0));
        double bearing = num(p, c, "bearing_land_to_sea_deg", 0, 360, Double.NaN);
        int day = (int) num(p, c, "day_of_year", 1, 366, 180);
        return new Coast(lat, lon, utc, bearing, day);
    }

    private static double num(Path p, JsonNode c, String key, double lo, double hi, double dflt) {
        JsonNode v = c.get(key);
        if (v == null) {
            if (Double.isNaN(dflt)) {
                throw new UserInputException("coast file " + p + ": coast." + key + ": missing; give a number in " + lo + ".." + hi);
            }
            return dflt;
        }
        if (!v.isNumber()) {
            throw new UserInputException("coast file " + p + ": coast." + key + ": value " + v + " is not a number; allowed "
                    + lo + ".." + hi);
        }
        double d = v.asDouble();
        if (!(d >= lo && d <= hi)) {
            throw new UserInputException("coast file " + p + ": coast." + key + ": value " + v + " is outside the allowed range "
                    + lo + ".." + hi);
        }
        return d;
    }
}
