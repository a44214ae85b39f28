package org.littoral.scenarios.analysis.ingest;

import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
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

    public static Map<String, Map<String, String>> read(Path file) {
        return read(CsvTable.read(file));
    }

    public static Map<String, Map<String, String>> read(CsvTable t) {
        if (!t.has(ProfileColumns.DAY)) {
            throw new UserInputException(t.fileName() + " line 1: missing column(s) [day]; a per-day table needs: day, "
                    + "optional site, then attribute columns (e.g. convection, tag)");
        }
        int cDay = t.column(ProfileColumns.DAY);
        int cSite = t.column(ProfileColumns.SITE);
        Map<String, Map<String, String>> out = new LinkedHashMap<>();
        Map<String, Integer> lineOf = new LinkedHashMap<>();
        for (int row = 0; row < t.rowCount(); row++) {
            String day = t.cell(row, cDay);
            if (day.isEmpty()) {
                throw new UserInputException(t.where(row) + ": column 'day' is empty; every row needs a day");
            }
            String site = cSite >= 0 ? t.cell(row, cSite) : "";
            String key = site.isEmpty() ? day : day + "/" + site;
            Integer prev = lineOf.putIfAbsent(key, t.line(row));
            if (prev != null) {
                throw new UserInputException(t.where(row) + ": day " + key + " was already given on line " + prev
                        + "; give each day (or day and site) once");
            }
            Map<String, String> attrs = new LinkedHashMap<>();
            for (int c = 0; c < t.header().size(); c++) {
                if (c == cDay || c == cSite) {
                    continue;
                }
                String v = t.cell(row, c);
                if (!CsvTable.isMissing(v)) {
                    attrs.put(t.header().get(c), v);
                }
            }
            out.put(key, attrs);
        }
        return out;
    }
}
