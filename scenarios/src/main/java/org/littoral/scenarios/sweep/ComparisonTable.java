package org.littoral.scenarios.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import org.littoral.scenarios.report.Table;
import org.littoral.scenarios.report.TableWriter;
import org.littoral.model.coast.Coast;
import java.util.Map;

/**
 * The side-by-side table of a sweep: one row per member, read back from the member files (so a resumed sweep's
 * table covers every member). Columns: member, status, the swept and drawn values (labels), the breeze type and
 * ambient wind components, then every scalar of the member's summary, flattened with dotted names
 * ({@code front.max_penetration_km}; lists of named items such as sites become {@code sites.<name>.<key>}),
 * then the error of a failed member.
 */
public final class ComparisonTable {
    /** Lists of plain numbers longer than this (time series) stay out of the table. */
    private static final int MAX_INLINE_LIST = 8;

    private final List<String> columns;
    private final List<Map<String, Object>> rows;

    private ComparisonTable(List<String> columns, List<Map<String, Object>> rows) {
        this.columns = columns;
        this.rows = rows;
    }

    public List<String> columns() {
        return columns;
    }

    public List<Map<String, Object>> rows() {
        return rows;
    }

    /** Numeric values of one column (NaN where a member lacks it), in member order. */
    public double[] numbers(String column) {
        double[] v = new double[rows.size()];
        for (int i = 0; i < v.length; i++) {
            Object o = rows.get(i).get(column);
            v[i] = o instanceof Number n ? n.doubleValue() : Double.NaN;
        }
        return v;
    }

    /** Text values of one column ("" where missing). */
    public List<String> texts(String column) {
        List<String> out = new ArrayList<>();
        for (Map<String, Object> r : rows) {
            Object o = r.get(column);
            out.add(o == null ? "" : o.toString());
        }
        return out;
    }

    public static ComparisonTable build(SweepSpec spec, List<Member> members, MemberStore store) throws IOException {
        List<Map<String, Object>> rows = new ArrayList<>();
        LinkedHashSet<String> cols = new LinkedHashSet<>(List.of("member", "status"));
        for (SweepSpec.Setting s : members.isEmpty() ? List.<SweepSpec.Setting>of() : members.get(0).settings()) {
            cols.add(s.path().toString());
        }
        cols.addAll(List.of("breeze_type", "ambient_from_deg", "ambient_speed_m_per_s", "ambient_onshore_m_per_s",
                "ambient_alongshore_m_per_s"));
        LinkedHashSet<String> resultCols = new LinkedHashSet<>();
        for (Member m : members) {
            ObjectNode rec = store.read(m.id());
            Map<String, Object> row = new LinkedHashMap<>();
            row.put("member", m.id());
            row.put("status", rec.path("status").asText());
            JsonNode labels = rec.path("labels");
            for (Iterator<Map.Entry<String, JsonNode>> it = labels.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                JsonNode value = rec.path("settings").path(e.getKey());
                row.put(e.getKey(), value.isNumber() ? (Object) value.asDouble() : e.getValue().asText());
            }
            ambient(spec.typing(), rec.path("inputs"), row);
            Map<String, Object> flat = new LinkedHashMap<>();
            flatten("", rec.path("result"), flat);
            row.putAll(flat);
            resultCols.addAll(flat.keySet());
            if (rec.has("error")) {
                row.put("error", rec.get("error").asText());
            }
            rows.add(row);
        }
        cols.addAll(resultCols);
        cols.add("error");
        return new ComparisonTable(new ArrayList<>(cols), rows);
    }

    /** Breeze type and ambient components from the member's resolved inputs; blank when the keys are absent. */
    static void ambient(SweepSpec.Typing t, JsonNode inputs, Map<String, Object> row) {
        double from;
        double speed;
        double bearing;
        double lat;
        try {
            from = t.fromDeg().get(inputs).asDouble();
            speed = t.speedMPerS().get(inputs).asDouble();
            bearing = t.coastBearingDeg().get(inputs).asDouble();
            lat = t.latitudeDeg().get(inputs).asDouble();
        } catch (IllegalArgumentException e) {
            row.put("breeze_type", "undetermined");
            return;
        }
        Coast coast = new Coast(lat, 0, 0, bearing, 1);
        double[] en = Coast.eastNorthFromDirection(speed, from);
        row.put("breeze_type", t.sectors().classify(en[0], en[1], coast).name().toLowerCase(Locale.ROOT));
        row.put("ambient_from_deg", from);
        row.put("ambient_speed_m_per_s", speed);
        row.put("ambient_onshore_m_per_s", round(coast.crossShore(en[0], en[1])));
        row.put("ambient_alongshore_m_per_s", round(coast.alongshore(en[0], en[1])));
    }

    /** Rounds away the 1e-16 residues of sin/cos so that a due-onshore wind shows alongshore 0. */
    private static double round(double v) {
        double r = Math.rint(v * 1e9) / 1e9;
        return r == 0 ? 0.0 : r;
    }

    static void flatten(String prefix, JsonNode n, Map<String, Object> out) {
        if (n == null || n.isMissingNode() || n.isNull()) {
            return;
        }
        if (n.isObject()) {
            for (Iterator<Map.Entry<String, JsonNode>> it = n.fields(); it.hasNext(); ) {
                Map.Entry<String, JsonNode> e = it.next();
                flatten(prefix.isEmpty() ? e.getKey() : prefix + "." + e.getKey(), e.getValue(), out);
            }
        } else if (n.isArray()) {
            boolean named = n.size() > 0;
            for (JsonNode c : n) {
                named &= c.isObject() && (c.hasNonNull("name") || c.hasNonNull("site"));
            }
            if (named) {
                for (JsonNode c : n) {
                    String key = c.hasNonNull("name") ? c.get("name").asText() : c.get("site").asText();
                    ObjectNode rest = ((ObjectNode) c).deepCopy();
                    rest.remove(c.hasNonNull("name") ? "name" : "site");
                    flatten(prefix + "." + key, rest, out);
                }
            } else if (n.size() <= MAX_INLINE_LIST) {
                for (int i = 0; i < n.size(); i++) {
                    flatten(prefix + "[" + i + "]", n.get(i), out);
                }
            }
        } else if (n.isNumber()) {
            out.put(prefix, n.asDouble());
        } else if (n.isBoolean()) {
            out.put(prefix, n.asBoolean());
        } else {
            out.put(prefix, n.asText());
        }
    }

    /** The report library's table (CSV/JSON/HTML); a member without a value in a column gets null. */
    public Table toTable() {
        Table t = Table.of(columns);
        for (Map<String, Object> r : rows) {
            Object[] cells = new Object[columns.size()];
            for (int i = 0; i < cells.length; i++) {
                cells[i] = r.get(columns.get(i));
            }
            t.row(cells);
        }
        return t;
    }

    /** Writes {@code comparison.csv} and {@code comparison.json} (one object per member) atomically. */
    public void write(Path outDir) throws IOException {
        Table t = toTable();
        TableWriter.writeCsv(t, outDir.resolve("comparison.csv"));
        TableWriter.writeJson(t, outDir.resolve("comparison.json"));
    }
}
