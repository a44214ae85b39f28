package org.littoral.scenarios.scenario;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.littoral.model.linear.LinearBreezeModel;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.scenario.Schema.Field;
import org.littoral.scenarios.scenario.Schema.Num;
import org.littoral.scenarios.scenario.Schema.Section;

/**
 * Every number the scenario schema allows is a number the model accepts: each numeric key at each end of its
 * schema range (just inside an open end), in a small scenario of each heating form and model kind, is either read
 * or refused by a rule that ties keys together, but never by the model's own checks (which would name Java
 * fields). The linear cases are also solved on a tiny grid.
 */
class SchemaModelLimitsTest {
    private static final ObjectMapper YAML = new ObjectMapper(new YAMLFactory());

    /** Small valid scenarios, one per model kind and heating form. */
    private static final String[] BASES = {
        "kind: linear\nheating: {shape: classic}\nphysics: {friction_per_s: 1.0e-5, harmonics: 2}\n",
        "kind: linear\nheating: {shape: slab}\nphysics: {friction_per_s: 1.0e-5, harmonics: 2}\n",
        "kind: nonlinear\nheating: {shape: energy_balance}\n",
        "kind: nonlinear\nheating: {shape: slab}\n",
        "kind: nonlinear\nheating: {shape: classic}\n",
    };

    private static final String COMMON = "name: t\ndescription: limits\ncoast: {latitude_deg: 45, bearing_land_to_sea_deg: 270}\n"
            + "sites: [{name: a, inland_km: 10}]\n"
            + "surface: [{name: sea, type: water, ends_at_km: 0}, {name: land, type: land}]\n";

    static Stream<Arguments> boundaries() throws Exception {
        List<Arguments> out = new ArrayList<>();
        for (String base : BASES) {
            boolean nonlinear = base.contains("nonlinear");
            String grid = nonlinear ? "grid: {points: 250, spacing_km: 1, levels: 8}\n" : "grid: {points: 16, spacing_km: 20, levels: 4}\n";
            ObjectNode doc = (ObjectNode) YAML.readTree(COMMON + grid + base);
            String shape = doc.path("heating").path("shape").asText();
            List<String[]> keys = new ArrayList<>();
            collect(ScenarioSchema.ROOT, "", shape, keys);
            for (String[] k : keys) {
                out.add(Arguments.of(base.lines().findFirst().orElse("") + " " + shape + ": " + k[0] + " = " + k[1], doc, k[0],
                        Double.parseDouble(k[1])));
            }
        }
        return out.stream();
    }

    /** Numeric leaves under sections (lists and other variants skipped: surface and sites are tested by their own rules). */
    private static void collect(Section s, String path, String shape, List<String[]> out) {
        for (Field f : s.fields()) {
            String p = path.isEmpty() ? f.key() : path + "." + f.key();
            if (f.type() instanceof Section sub) {
                collect(sub, p, shape, out);
            } else if (f.type() instanceof Schema.Variant v && f.key().equals("heating")) {
                collect(v.sectionFor(shape), p, shape, out);
            } else if (f.key().equals("surface") && f.type() instanceof Schema.ListOf l && l.item() instanceof Schema.Variant v) {
                collect(new Section(v.forms().get("water")), "surface[0]", shape, out);
                collect(new Section(v.forms().get("land")), "surface[1]", shape, out);
            } else if (f.type() instanceof Num n) {
                for (double b : new double[] {n.min(), n.max()}) {
                    if (!Double.isFinite(b)) {
                        continue;
                    }
                    boolean open = b == n.min() ? n.minOpen() : n.maxOpen();
                    double v = open ? (b == n.min() ? b + Math.max(1e-9, Math.abs(b) * 1e-6) : b - Math.max(1e-9, Math.abs(b) * 1e-6)) : b;
                    out.add(new String[] {p, Double.toString(v)});
                }
            } else if (f.type() instanceof Schema.Int i && !p.startsWith("flights.noise")) {
                out.add(new String[] {p, Double.toString(i.min())});
                out.add(new String[] {p, Double.toString(i.max())});
            }
        }
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("boundaries")
    void aValueAtTheEndOfItsSchemaRangeIsNeverRefusedByTheModelItself(String label, ObjectNode base, String path, double v) {
        ObjectNode doc = base.deepCopy();
        String[] parts = path.split("\\.");
        ObjectNode o = doc;
        for (int i = 0; i < parts.length - 1; i++) {
            if (parts[i].startsWith("surface[")) {
                o = (ObjectNode) doc.get("surface").get(Integer.parseInt(parts[i].substring(8, parts[i].length() - 1)));
                continue;
            }
            JsonNode c = o.get(parts[i]);
            o = c instanceof ObjectNode on ? on : o.putObject(parts[i]);
        }
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            o.put(parts[parts.length - 1], (long) v);
        } else {
            o.put(parts[parts.length - 1], v);
        }
        Scenario s;
        try {
            s = ScenarioFile.fromTree("limits.yaml", doc);
        } catch (UserInputException e) {
            assertFalse(e.getMessage().contains("model refuses"), label + ": " + e.getMessage());
            assertFalse(e.getMessage().matches(".*\\b[a-z]+[A-Z][A-Za-z]*\\b.*"), "a Java name in: " + e.getMessage());
            return;
        }
        boolean big = path.equals("grid.points") || path.equals("grid.levels") || path.equals("physics.harmonics");
        if (s.kind() == Scenario.Kind.LINEAR && !big) {
            try {
                LinearBreezeModel.solve(s.toLinearConfig());
            } catch (IllegalArgumentException e) {
                assertTrue(false, label + ": the linear model refuses a value the schema allows: " + e.getMessage());
            }
        }
    }
}
