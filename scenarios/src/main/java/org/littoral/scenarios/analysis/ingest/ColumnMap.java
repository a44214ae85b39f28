package org.littoral.scenarios.analysis.ingest;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.DateTimeException;
import java.time.ZoneId;
import java.time.format.DateTimeFormatter;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.littoral.scenarios.input.UserInputException;

/**
 * A column map (YAML): how a user's own profile file says what the tidy format says by its column names.
 * For each quantity the user's column (or several sensor columns, averaged) and its unit; the delimiter;
 * the timestamp column(s) and their form; the time zone of the campaign's local clock; the site (a column or a
 * fixed name); the flight (a column, or split at gaps). Format and an example: docs/analysis.md section 1b.
 * Every mistake is one line naming the map file, the key, the value and the fix.
 */
public final class ColumnMap {

    /** One mapped quantity: the user's column(s), averaged when several, and the conversion to the tidy unit. */
    public record Quantity(String key, List<String> columns, String unit, UnitConversion conversion) {
    }

    /** How timestamps are written. */
    public enum TimeForm { ISO, EPOCH_S, DATE_TIME, PATTERN }

    /** The tidy quantities a map can give, with the tidy unit and units to suggest. */
    static final Map<String, String[]> QUANTITIES = new LinkedHashMap<>();

    static {
        QUANTITIES.put("height", new String[] {"m", "m, ft, km"});
        QUANTITIES.put("pressure", new String[] {"hPa", "hPa, Pa, mbar, kPa"});
        QUANTITIES.put("temperature", new String[] {"degC", "degC, K, degF"});
        QUANTITIES.put("rh", new String[] {"percent", "%, 1 (a fraction)"});
        QUANTITIES.put("mixing_ratio", new String[] {"g/kg", "g/kg, kg/kg"});
        QUANTITIES.put("dewpoint", new String[] {"degC", "degC, K, degF"});
        QUANTITIES.put("wind_speed", new String[] {"m/s", "m/s, knots, km/h"});
        QUANTITIES.put("wind_direction", new String[] {"degree", "deg"});
    }

    private static final Set<String> TOP_KEYS = new TreeSet<>(List.of("delimiter", "layout", "time", "site", "flight",
            "flight_gap_s", "wind_direction_convention", "quantities", "attributes"));

    public final Path file;
    public final char delimiter;
    public final boolean raw;
    public final TimeForm timeForm;
    public final List<String> timeColumns;
    public final DateTimeFormatter timePattern;
    /** Zone of timestamps that carry no offset (default: the local zone). */
    public final ZoneId sourceZone;
    /** The campaign's local clock: it defines the day and the local times. */
    public final ZoneId localZone;
    public final String siteColumn;
    public final String fixedSite;
    public final String flightColumn;
    public final double flightGapS;
    /** True when directions are given as where the wind blows TO (converted to the meteorological FROM). */
    public final boolean directionTowards;
    public final Map<String, Quantity> quantities;
    /** User columns passed on as per-day attributes (convection, tags...). */
    public final List<String> attributes;

    private ColumnMap(Path file, JsonNode root) {
        this.file = file;
        for (Iterator<String> it = root.fieldNames(); it.hasNext(); ) {
            String k = it.next();
            if (!TOP_KEYS.contains(k)) {
                throw new UserInputException("column map " + file + ": unknown key " + org.littoral.scenarios.input.Shown.text(k) + "; allowed keys are " + TOP_KEYS
                        + "; check the spelling or remove it");
            }
        }
        String d = text(root, "delimiter", ",");
        delimiter = switch (d.toLowerCase(Locale.ROOT)) {
            case ",", "comma" -> ',';
            case ";", "semicolon" -> ';';
            case "\t", "tab", "\\t" -> '\t';
            default -> throw bad("delimiter", d, "use comma, semicolon or tab");
        };
        String layout = text(root, "layout", "raw");
        if (!layout.equals("raw") && !layout.equals("binned")) {
            throw bad("layout", layout, "use raw (samples of whole flights, ascent and descent) or binned (one row per height bin)");
        }
        raw = layout.equals("raw");
        JsonNode time = root.get("time");
        if (time == null || !time.isObject()) {
            throw bad("time", String.valueOf(time), "give time: {column: NAME, form: iso|epoch_s|date_time|pattern, zone: IANA name or offset}");
        }
        checkKeys(time, "time", Set.of("column", "columns", "form", "pattern", "zone", "source_zone"));
        String form = text(time, "form", "iso", "time.form");
        timeForm = switch (form) {
            case "iso" -> TimeForm.ISO;
            case "epoch_s" -> TimeForm.EPOCH_S;
            case "date_time" -> TimeForm.DATE_TIME;
            case "pattern" -> TimeForm.PATTERN;
            default -> throw bad("time.form", form, "use iso (2026-12-05T13:05:00Z, with Z or +11:00 or none), epoch_s, "
                    + "date_time (two columns: date and time) or pattern (with time.pattern)");
        };
        timeColumns = columns(time, "time", timeForm == TimeForm.DATE_TIME ? 2 : 1);
        String pat = text(time, "pattern", null, "time.pattern");
        if (timeForm == TimeForm.PATTERN) {
            if (pat == null) {
                throw bad("time.pattern", "(missing)", "give a java.time pattern, e.g. \"dd/MM/yyyy HH:mm:ss\"");
            }
            try {
                timePattern = DateTimeFormatter.ofPattern(pat, Locale.ROOT);
            } catch (IllegalArgumentException e) {
                throw bad("time.pattern", pat, "not a valid date-time pattern (" + e.getMessage() + "); e.g. \"dd/MM/yyyy HH:mm:ss\"");
            }
        } else {
            timePattern = null;
        }
        String zone = text(time, "zone", null, "time.zone");
        if (zone == null) {
            throw bad("time.zone", "(missing)", "give the campaign's local clock as an IANA name (Pacific/Auckland) or a fixed offset (+11:00)");
        }
        localZone = zone(zone, "time.zone");
        String src = text(time, "source_zone", null, "time.source_zone");
        sourceZone = src == null ? localZone : zone(src, "time.source_zone");
        JsonNode site = root.get("site");
        if (site == null || !site.isObject() || site.has("column") == site.has("fixed")) {
            throw bad("site", String.valueOf(site), "give site: {column: NAME} or site: {fixed: SITE-NAME}");
        }
        siteColumn = text(site, "column", null, "site.column");
        fixedSite = text(site, "fixed", null, "site.fixed");
        JsonNode flight = root.get("flight");
        if (flight != null && !(flight.isObject() && flight.has("column") && flight.get("column").isTextual())) {
            throw bad("flight", flight.toString(), "give flight: {column: NAME}, or leave it out to split flights at time gaps");
        }
        flightColumn = flight == null ? null : flight.get("column").asText();
        JsonNode gap = root.get("flight_gap_s");
        if (gap != null && !(gap.isNumber() && gap.asDouble() > 0)) {
            throw bad("flight_gap_s", gap.toString(), "give a number of seconds > 0 (default 120)");
        }
        flightGapS = gap == null ? 120.0 : gap.asDouble();
        String conv = text(root, "wind_direction_convention", "from");
        if (!conv.equals("from") && !conv.equals("towards")) {
            throw bad("wind_direction_convention", conv, "use from (meteorological: where the wind blows from) or towards");
        }
        directionTowards = conv.equals("towards");
        JsonNode qs = root.get("quantities");
        if (qs == null) {
            qs = new ObjectMapper().createObjectNode();
        }
        if (!qs.isObject()) {
            throw bad("quantities", String.valueOf(qs), "give quantities: {temperature: {column: T, unit: degC}, ...}; keys "
                    + QUANTITIES.keySet());
        }
        Map<String, Quantity> q = new LinkedHashMap<>();
        for (Iterator<String> it = qs.fieldNames(); it.hasNext(); ) {
            String k = it.next();
            String[] spec = QUANTITIES.get(k);
            if (spec == null) {
                throw new UserInputException("column map " + file + ": unknown quantity " + org.littoral.scenarios.input.Shown.text("quantities." + k)
                        + "; allowed are " + QUANTITIES.keySet() + "; check the spelling or remove it");
            }
            JsonNode n = qs.get(k);
            if (!n.isObject()) {
                throw bad("quantities." + k, n.toString(), "give {column: NAME, unit: UNIT} or {columns: [A, B], unit: UNIT}");
            }
            checkKeys(n, "quantities." + k, Set.of("column", "columns", "unit"));
            List<String> cols = columns(n, "quantities." + k, 0);
            String unit = text(n, "unit", null, "quantities." + k + ".unit");
            if (unit == null) {
                throw bad("quantities." + k + ".unit", "(missing)", "give the unit of the column; one of " + spec[1]);
            }
            try {
                q.put(k, new Quantity(k, cols, unit, UnitConversion.of(unit, spec[0], spec[1])));
            } catch (UnitConversion.BadUnit e) {
                throw bad("quantities." + k + ".unit", unit, e.getMessage());
            }
        }
        quantities = q;
        List<String> attrs = new ArrayList<>();
        JsonNode a = root.get("attributes");
        if (a != null) {
            if (!a.isArray()) {
                throw bad("attributes", a.toString(), "give a list of column names, e.g. [convection, tag]");
            }
            a.forEach(x -> attrs.add(x.asText()));
        }
        attributes = attrs;
    }

    public static ColumnMap load(Path file) {
        if (!Files.isRegularFile(file)) {
            throw new UserInputException("column map " + file + " does not exist; give a YAML column map (docs/analysis.md section 1b)");
        }
        JsonNode root;
        // the one strict reader: duplicate keys, a second document and syntax errors are one line with line:column
        root = org.littoral.scenarios.input.InputDocument.read(file, "column map").root();
        if (root == null || !root.isObject()) {
            throw new UserInputException("column map " + file + ": expected a YAML mapping with keys " + TOP_KEYS
                    + "; write the column map as 'key: value' lines (docs/analysis.md section 1b)");
        }
        return new ColumnMap(file, root);
    }

    /** A profile file's map must give every quantity a profile needs (a passage table's map needs none). */
    void requireProfileQuantities() {
        for (String need : List.of("height", "pressure", "temperature", "wind_speed", "wind_direction")) {
            if (!quantities.containsKey(need)) {
                throw bad("quantities." + need, "(missing)", "every profile needs height, pressure, temperature, wind_speed, "
                        + "wind_direction and one of rh, mixing_ratio, dewpoint");
            }
        }
        if (!quantities.containsKey("rh") && !quantities.containsKey("mixing_ratio") && !quantities.containsKey("dewpoint")) {
            throw bad("quantities.rh", "(missing)", "give one humidity quantity: rh, mixing_ratio or dewpoint");
        }
    }

    /** The user's column names the map refers to (for the missing-column check). */
    List<String> referencedColumns() {
        List<String> l = new ArrayList<>(timeColumns);
        if (siteColumn != null) {
            l.add(siteColumn);
        }
        if (flightColumn != null) {
            l.add(flightColumn);
        }
        for (Quantity q : quantities.values()) {
            l.addAll(q.columns());
        }
        l.addAll(attributes);
        return l;
    }

    /** The map key that names a user column (for messages). */
    String keyOf(String column) {
        if (timeColumns.contains(column)) {
            return timeColumns.size() > 1 ? "time.columns" : "time.column";
        }
        if (column.equals(siteColumn)) {
            return "site.column";
        }
        if (column.equals(flightColumn)) {
            return "flight.column";
        }
        for (Quantity q : quantities.values()) {
            if (q.columns().contains(column)) {
                return "quantities." + q.key() + (q.columns().size() > 1 ? ".columns" : ".column");
            }
        }
        return "attributes";
    }

    UserInputException bad(String key, String value, String fix) {
        return new UserInputException("column map " + file + ": " + org.littoral.scenarios.input.Shown.clip(key, 100) + ": "
                + org.littoral.scenarios.input.Shown.text(value) + ": " + fix);
    }

    private String text(JsonNode n, String key, String dflt) {
        return text(n, key, dflt, key);
    }

    private String text(JsonNode n, String key, String dflt, String path) {
        JsonNode v = n.get(key);
        if (v == null || v.isNull()) {
            return dflt;
        }
        if (!v.isValueNode()) {
            throw bad(path, v.toString(), "give a single value");
        }
        return v.asText();
    }

    private void checkKeys(JsonNode n, String path, Set<String> allowed) {
        for (Iterator<String> it = n.fieldNames(); it.hasNext(); ) {
            String k = it.next();
            if (!allowed.contains(k)) {
                throw new UserInputException("column map " + file + ": unknown key " + org.littoral.scenarios.input.Shown.text(path + "." + k) + "; allowed keys are "
                        + new TreeSet<>(allowed) + "; check the spelling or remove it");
            }
        }
    }

    private List<String> columns(JsonNode n, String path, int exactly) {
        List<String> l = new ArrayList<>();
        if (n.has("column") && n.has("columns")) {
            throw bad(path, n.toString(), "give column or columns, not both");
        }
        if (n.has("column")) {
            l.add(n.get("column").asText());
        } else if (n.has("columns") && n.get("columns").isArray()) {
            n.get("columns").forEach(x -> l.add(x.asText()));
        }
        if (l.isEmpty() || exactly > 0 && l.size() != exactly) {
            throw bad(path + (exactly == 2 ? ".columns" : ".column"), n.toString(), exactly == 2
                    ? "date_time needs two columns: columns: [DATE, TIME]" : "give column: NAME (or columns: [A, B, C] for sensors to average)");
        }
        return l;
    }

    private ZoneId zone(String z, String key) {
        try {
            return ZoneId.of(z.trim());
        } catch (DateTimeException e) {
            throw bad(key, z, "not a time zone; give an IANA name (Pacific/Auckland, Europe/Lisbon, UTC) or a fixed offset (+11:00)");
        }
    }
}
