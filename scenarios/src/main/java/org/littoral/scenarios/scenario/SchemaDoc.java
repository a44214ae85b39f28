package org.littoral.scenarios.scenario;

import java.util.List;
import java.util.Map;
import org.littoral.scenarios.scenario.Schema.Field;
import org.littoral.scenarios.scenario.Schema.ListOf;
import org.littoral.scenarios.scenario.Schema.Num;
import org.littoral.scenarios.scenario.Schema.Presence;
import org.littoral.scenarios.scenario.Schema.Section;
import org.littoral.scenarios.scenario.Schema.Variant;

/** Renders {@link ScenarioSchema} as docs/scenario-schema.md (a test keeps the file in step). */
public final class SchemaDoc {
    private SchemaDoc() {
    }

    public static String markdown() {
        StringBuilder sb = new StringBuilder();
        sb.append("# Scenario file schema\n\n");
        sb.append("<!-- Generated from ScenarioSchema.java by SchemaDoc; edit the schema, not this file. "
                + "Regenerate: mvn -B -o -q -pl model,scenarios test -Dtest=SchemaDocTest -Dlittoral.updateDocs=true -->\n\n");
        sb.append("A scenario is one YAML file (or JSON, when the name ends in `.json`). Units are in the key names; "
                + "times you read or write are local **clock** hours unless the key says `solar`. Unknown keys are rejected "
                + "with the list of valid keys; a wrong type or an out-of-range value is reported with file:line:column, the key "
                + "path, the value and the allowed range, and `littoral` exits with code 2.\n\n");
        sb.append("Print a built-in scenario to start your own: `littoral scenarios --show classic-45N > my.yaml`.\n\n");
        sb.append("Axes: x is cross-shore, 0 at the main coastline, positive inland; the coast's orientation is "
                + "`coast.bearing_land_to_sea_deg`. A cross-shore wind > 0 is onshore.\n\n");
        sb.append("Columns: **key**, **type and allowed values**, **default** (`required` must be given; `derived` is "
                + "explained in the meaning), **meaning**.\n\n");
        section(sb, "", ScenarioSchema.ROOT.fields(), 2);
        return sb.toString();
    }

    private static void section(StringBuilder sb, String path, List<Field> fields, int level) {
        sb.append("| key | type and allowed values | default | meaning |\n|---|---|---|---|\n");
        for (Field f : fields) {
            sb.append("| `").append(f.key()).append("` | ").append(type(f)).append(" | ").append(dflt(f)).append(" | ")
                    .append(f.doc().replace("|", "\\|")).append(" |\n");
        }
        sb.append('\n');
        for (Field f : fields) {
            String p = path.isEmpty() ? f.key() : path + "." + f.key();
            if (f.type() instanceof Section s) {
                sb.append("#".repeat(level + 1)).append(" `").append(p).append("`\n\n").append(f.doc()).append("\n\n");
                section(sb, p, s.fields(), level + 1);
            } else if (f.type() instanceof Variant v) {
                variant(sb, p, f.doc(), v, level);
            } else if (f.type() instanceof ListOf l) {
                String item = p + "[]";
                sb.append("#".repeat(level + 1)).append(" `").append(item).append("`\n\n").append(f.doc()).append(" ")
                        .append(l.minItems()).append(" to ").append(l.maxItems()).append(" items.\n\n");
                if (l.item() instanceof Section s) {
                    section(sb, item, s.fields(), level + 1);
                } else if (l.item() instanceof Variant v) {
                    variantBody(sb, item, v, level + 1);
                }
            }
        }
    }

    private static void variant(StringBuilder sb, String p, String doc, Variant v, int level) {
        sb.append("#".repeat(level + 1)).append(" `").append(p).append("`\n\n").append(doc).append("\n\n");
        variantBody(sb, p, v, level + 1);
    }

    private static void variantBody(StringBuilder sb, String p, Variant v, int level) {
        if (!v.common().isEmpty()) {
            sb.append("Keys of every form (`").append(v.discriminator()).append("` is required: ")
                    .append(String.join(" or ", v.forms().keySet())).append("):\n\n");
            section(sb, p, v.common(), level);
        }
        for (Map.Entry<String, List<Field>> e : v.forms().entrySet()) {
            sb.append("#".repeat(level + 1)).append(" `").append(p).append("` with `").append(v.discriminator()).append(": ")
                    .append(e.getKey()).append("`\n\n");
            section(sb, p, e.getValue(), level + 1);
        }
    }

    private static String type(Field f) {
        if (f.type() instanceof Num n) {
            return n.allowed().replaceFirst("^a number, ", "number, ");
        }
        if (f.type() instanceof Section) {
            return "mapping (below)";
        }
        if (f.type() instanceof ListOf) {
            return "list (below)";
        }
        if (f.type() instanceof Variant v) {
            return "mapping with `" + v.discriminator() + "`: " + String.join(" or ", v.forms().keySet()) + " (below)";
        }
        return f.type().allowed();
    }

    private static String dflt(Field f) {
        if (f.presence() == Presence.REQUIRED) {
            return "required";
        }
        if (f.presence() == Presence.OPTIONAL) {
            return "optional / derived";
        }
        Object d = f.defaultValue();
        if (d == null) {
            return "all defaults";
        }
        if (d instanceof Double x) {
            return Schema.fmt(x);
        }
        return d.toString();
    }
}
