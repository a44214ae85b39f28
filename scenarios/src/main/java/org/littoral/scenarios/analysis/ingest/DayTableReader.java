package org.littoral.scenarios.analysis.ingest;

import java.nio.file.Path;
import java.util.Locale;
import java.util.LinkedHashMap;
import java.util.Map;
import org.littoral.scenarios.analysis.stats.BreezeType;
import org.littoral.scenarios.input.Shown;
import org.littoral.scenarios.input.UserInputException;

/**
 * Reads a per-day attribute table: CSV with a {@code day} column, an optional {@code site} column,
 * and any attribute columns (convection, tag, breeze_type, ambient_wind_speed_m_per_s,
 * ambient_wind_direction_deg, ...). Rows without a site apply to every site of that day. Keys of
 * the result are "day" or "day/site", as {@link org.littoral.scenarios.analysis.AnalysisSettings#dayAttributes} expects.
 */
public final class DayTableReader {
    private DayTableReader() {
    }

    /**
     * The attributes the analysis chain reads as numbers or types are checked where they are written, so that a
     * bad value is named with its file and line: breeze_type, ambient_wind_speed_m_per_s, ambient_wind_direction_deg.
     *
     * @param where "file line N"
     */
    public static void checkAttribute(String where, String name, String value) {
        switch (name) {
            case "breeze_type" -> {
                try {
                    BreezeType.valueOf(value.trim().toUpperCase(Locale.ROOT));
                } catch (IllegalArgumentException e) {
                    throw new UserInputException(where + ": column 'breeze_type' value " + Shown.text(value) + " is not a breeze "
                            + "type; use one of " + String.join(", ", names()) + " or leave the cell empty");
                }
            }
            case "ambient_wind_speed_m_per_s" -> number(where, name, value, 0, 100, "m/s");
            case "ambient_wind_direction_deg" -> number(where, name, value, 0, 360, "deg");
            default -> { }
        }
    }

    private static void number(String where, String name, String value, double lo, double hi, String unit) {
        double v;
        try {
            v = Double.parseDouble(value.trim());
        } catch (NumberFormatException e) {
            v = Double.NaN;
        }
        if (!(v >= lo && v <= hi)) {
            throw new UserInputException(where + ": column " + Shown.text(name) + " value " + Shown.text(value)
                    + " is not a number from " + Shown.number(lo) + " to " + Shown.number(hi) + " " + unit
                    + "; write one, or leave the cell empty");
        }
    }

    private static java.util.List<String> names() {
        java.util.List<String> l = new java.util.ArrayList<>();
        for (BreezeType b : BreezeType.values()) {
            l.add(b.name().toLowerCase(Locale.ROOT));
        }
        return l;
    }

    public static Map<String, Map<String, String>> read(Path file) {
        return read(CsvTable.read(file));
    }

    public static Map<String, Map<String, String>> read(CsvTable t) {
        if (!t.has(ProfileColumns.DAY)) {
            throw new UserInputException(t.fileName() + " line 1: missing column(s) [day]; add it to the header line (a per-day "
                    + "table needs: day, optional site, then attribute columns, e.g. convection, tag)");
        }
        int cDay = t.column(ProfileColumns.DAY);
        int cSite = t.column(ProfileColumns.SITE);
        Map<String, Map<String, String>> out = new LinkedHashMap<>();
        Map<String, Integer> lineOf = new LinkedHashMap<>();
        for (int row = 0; row < t.rowCount(); row++) {
            String day = t.cell(row, cDay);
            if (day.isEmpty()) {
                throw new UserInputException(t.where(row) + ": column 'day' is empty; give every row a day");
            }
            String site = cSite >= 0 ? t.cell(row, cSite) : "";
            String key = site.isEmpty() ? day : day + "/" + site;
            Integer prev = lineOf.putIfAbsent(key, t.line(row));
            if (prev != null) {
                throw new UserInputException(t.where(row) + ": day " + Shown.text(key) + " was already given on line " + prev
                        + "; give each day (or day and site) once");
            }
            Map<String, String> attrs = new LinkedHashMap<>();
            for (int c = 0; c < t.header().size(); c++) {
                if (c == cDay || c == cSite) {
                    continue;
                }
                String v = t.cell(row, c);
                if (!CsvTable.isMissing(v)) {
                    checkAttribute(t.where(row), t.header().get(c), v);
                    attrs.put(t.header().get(c), v);
                }
            }
            out.put(key, attrs);
        }
        return out;
    }
}
