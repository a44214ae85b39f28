package org.littoral.scenarios.compare;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import org.littoral.model.sounding.VirtualSite;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.scenario.BuiltinScenarios;

/**
 * The observed sites' inland distances, when the coast reference lists them (a {@code sites:} list
 * of {name, inland_km} in a coast or scenario file, or a built-in scenario's sites); empty otherwise.
 */
public final class ObservedSites {
    private ObservedSites() {
    }

    /** Site name to inland distance, m. */
    public static Map<String, Double> inlandM(String coastRef) {
        Map<String, Double> out = new LinkedHashMap<>();
        if (coastRef == null) {
            return out;
        }
        Path p = Path.of(coastRef);
        if (!Files.isRegularFile(p)) {
            if (BuiltinScenarios.names().contains(coastRef)) {
                for (VirtualSite v : BuiltinScenarios.resolve(coastRef).sites()) {
                    out.put(v.name(), v.inlandDistanceM());
                }
            }
            return out;
        }
        JsonNode root;
        // the one strict reader: duplicate keys, a second document and syntax errors are one line with line:column
        root = org.littoral.scenarios.input.InputDocument.read(p, "coast file").root();
        JsonNode sites = root == null ? null : root.get("sites");
        if (sites == null || !sites.isArray()) {
            return out;
        }
        for (int k = 0; k < sites.size(); k++) {
            JsonNode s = sites.get(k);
            JsonNode name = s.get("name");
            JsonNode km = s.get("inland_km");
            if (name == null || !name.isTextual() || km == null || !km.isNumber()) {
                throw new UserInputException("coast file " + p + ": sites[" + k + "] = " + s
                        + ": give {name: TEXT, inland_km: NUMBER}");
            }
            out.put(name.asText(), km.asDouble() * 1000.0);
        }
        return out;
    }
}
