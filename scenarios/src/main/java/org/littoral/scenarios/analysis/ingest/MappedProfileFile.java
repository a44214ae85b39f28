package org.littoral.scenarios.analysis.ingest;

import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.time.OffsetDateTime;
import java.time.ZonedDateTime;
import java.time.temporal.TemporalAccessor;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.littoral.scenarios.input.UserInputException;

/**
 * Reads a user's own profile file through a {@link ColumnMap} and hands back the tidy table that
 * {@link ProfileCsvReader} reads, so a mapped file gets exactly the checks, QC and binning of a tidy one.
 * Units are converted here (udunits), sensors kept apart (raw) or averaged (binned), timestamps turned into
 * the campaign's local clock: the local calendar date is the day.
 */
public final class MappedProfileFile {
    private MappedProfileFile() {
    }

    /**
     * A user's passage table (site, time[, uncertainty_min, label]) through a column map: its delimiter, timestamp
     * form and time zone, its site; gives the tidy table check-timing reads (site, date, passage_time_local).
     */
    public static CsvTable passageTable(Path file, ColumnMap map) {
        CsvTable src = CsvTable.read(file, map.delimiter);
        List<String> need = new ArrayList<>(map.timeColumns);
        if (map.siteColumn != null) {
            need.add(map.siteColumn);
        }
        for (String col : need) {
            if (!src.has(col)) {
                throw map.bad(map.keyOf(col), col, "no such column in " + src.fileName() + " (its columns: " + src.header()
                        + "); give the column's exact name");
            }
        }
        List<String> header = new ArrayList<>(List.of("site", "date", "passage_time_local"));
        for (String extra : List.of("uncertainty_min", "label")) {
            if (src.has(extra)) {
                header.add(extra);
            }
        }
        List<String[]> rows = new ArrayList<>();
        int[] lines = new int[src.rowCount()];
        for (int r = 0; r < src.rowCount(); r++) {
            LocalDateTime t = LocalDateTime.ofInstant(instant(src, r, map), map.localZone);
            String[] c = new String[header.size()];
            c[0] = map.fixedSite != null ? map.fixedSite : src.cell(r, src.column(map.siteColumn));
            c[1] = t.toLocalDate().toString();
            c[2] = t.toLocalTime().withNano(0).toString();
            for (int k = 3; k < c.length; k++) {
                c[k] = src.cell(r, src.column(header.get(k)));
            }
            rows.add(c);
            lines[r] = src.line(r);
        }
        return CsvTable.of(src.fileName(), header, rows, lines, Map.of("passage_time_local", "from " + map.timeColumns
                + ", local clock " + map.localZone + ", " + map.file.getFileName()), "line");
    }

    public static CsvTable read(Path file, ColumnMap map) {
        return toTidy(CsvTable.read(file, map.delimiter), map);
    }

    public static CsvTable toTidy(CsvTable src, ColumnMap map) {
        map.requireProfileQuantities();
        for (String col : map.referencedColumns()) {
            if (!src.has(col)) {
                throw map.bad(map.keyOf(col), col, "no such column in " + src.fileName() + " (its columns: " + src.header()
                        + "); give the column's exact name" + (src.header().size() == 1 ? ", and check the delimiter" : ""));
            }
        }
        String mapName = map.file.getFileName().toString();
        int n = src.rowCount();
        Instant[] when = new Instant[n];
        for (int r = 0; r < n; r++) {
            when[r] = instant(src, r, map);
        }
        String[] site = new String[n];
        for (int r = 0; r < n; r++) {
            site[r] = map.fixedSite != null ? map.fixedSite : src.cell(r, src.column(map.siteColumn));
            if (CsvTable.isMissing(site[r])) {
                throw new UserInputException(src.where(r) + ": column '" + map.siteColumn + "' (site.column in " + mapName
                        + ") is empty; every row needs its site");
            }
        }
        // Flights (raw): the user's flight column, else a new flight where the site changes or the clock jumps.
        String[] flight = new String[n];
        LocalDate[] day = new LocalDate[n];
        int first = 0;
        for (int r = 0; r < n; r++) {
            boolean newFlight;
            if (map.flightColumn != null) {
                newFlight = r == 0 || !src.cell(r, src.column(map.flightColumn)).equals(src.cell(r - 1, src.column(map.flightColumn)))
                        || !site[r].equals(site[r - 1]);
            } else {
                newFlight = r == 0 || !site[r].equals(site[r - 1])
                        || Math.abs(when[r].toEpochMilli() - when[r - 1].toEpochMilli()) > map.flightGapS * 1000.0;
            }
            if (newFlight) {
                first = r;
            }
            LocalDateTime local0 = LocalDateTime.ofInstant(when[first], map.localZone);
            flight[r] = map.flightColumn != null ? src.cell(r, src.column(map.flightColumn))
                    : site[r] + "-" + local0.toLocalDate() + "T" + local0.toLocalTime().withNano(0);
            // A flight belongs to the local calendar day of its first sample; a binned row to its own.
            day[r] = (map.raw ? local0 : LocalDateTime.ofInstant(when[r], map.localZone)).toLocalDate();
        }
        List<String> header = new ArrayList<>(List.of(ProfileColumns.DAY, ProfileColumns.SITE));
        Map<String, String> origins = new LinkedHashMap<>();
        if (map.raw) {
            header.add(ProfileColumns.FLIGHT_ID);
            header.add(ProfileColumns.TIME_S);
        }
        header.add(ProfileColumns.TIME_LOCAL);
        String timeOrigin = "from " + String.join(" + ", map.timeColumns) + ", " + map.timeForm.name().toLowerCase(Locale.ROOT)
                + ", local clock " + map.localZone + ", " + mapName;
        origins.put(ProfileColumns.TIME_LOCAL, timeOrigin);
        List<Out> outs = new ArrayList<>();
        addQuantity(map, "height", ProfileColumns.HEIGHT_M, false, src, header, origins, outs, mapName);
        addQuantity(map, "pressure", ProfileColumns.PRESSURE_HPA, false, src, header, origins, outs, mapName);
        addQuantity(map, "temperature", map.raw ? ProfileColumns.TEMPERATURE_C_SENSOR_PREFIX : ProfileColumns.TEMPERATURE_C,
                map.raw, src, header, origins, outs, mapName);
        addQuantity(map, "rh", map.raw ? ProfileColumns.RH_PERCENT_SENSOR_PREFIX : ProfileColumns.RH_PERCENT, map.raw, src, header,
                origins, outs, mapName);
        addQuantity(map, "mixing_ratio", ProfileColumns.MIXING_RATIO_G_PER_KG, false, src, header, origins, outs, mapName);
        addQuantity(map, "dewpoint", ProfileColumns.DEWPOINT_C, false, src, header, origins, outs, mapName);
        addQuantity(map, "wind_speed", ProfileColumns.WIND_SPEED_M_PER_S, false, src, header, origins, outs, mapName);
        addQuantity(map, "wind_direction", ProfileColumns.WIND_DIRECTION_DEG, false, src, header, origins, outs, mapName);
        for (String a : map.attributes) {
            header.add(a);
        }
        List<String[]> rows = new ArrayList<>(n);
        int[] lines = new int[n];
        for (int r = 0; r < n; r++) {
            String[] c = new String[header.size()];
            int k = 0;
            c[k++] = day[r].toString();
            c[k++] = site[r];
            if (map.raw) {
                c[k++] = flight[r];
                c[k++] = String.format(Locale.ROOT, "%.3f", when[r].toEpochMilli() / 1000.0);
            }
            c[k++] = LocalDateTime.ofInstant(when[r], map.localZone).toString();
            for (Out o : outs) {
                double v = o.value(src, r, map, mapName);
                c[k++] = Double.isNaN(v) ? "" : Double.toString(v);
            }
            for (String a : map.attributes) {
                c[k++] = src.cell(r, src.column(a));
            }
            rows.add(c);
            lines[r] = src.line(r);
        }
        return CsvTable.of(src.fileName(), header, rows, lines, origins, "line");
    }

    /** One tidy output column: a user column converted, or the mean of several (binned), or one sensor (raw). */
    private record Out(ColumnMap.Quantity q, int[] cols, boolean direction) {
        double value(CsvTable src, int r, ColumnMap map, String mapName) {
            double sum = 0;
            int c = 0;
            for (int col : cols) {
                String s = src.cell(r, col);
                if (CsvTable.isMissing(s)) {
                    continue;
                }
                double v;
                try {
                    v = Double.parseDouble(s);
                } catch (NumberFormatException e) {
                    throw new UserInputException(src.where(r) + ": column '" + src.header().get(col) + "' (quantities." + q.key()
                            + " in " + mapName + ") value '" + s + "' is not a number; write a decimal number with a point, "
                            + "or leave the cell empty for missing");
                }
                sum += q.conversion().convert(v);
                c++;
            }
            if (c == 0) {
                return Double.NaN;
            }
            double v = sum / c;
            if (direction && map.directionTowards) {
                v = (v + 180.0) % 360.0; // "blowing towards" to the meteorological "blowing from"
            }
            return v;
        }
    }

    private static void addQuantity(ColumnMap map, String key, String tidy, boolean perSensor, CsvTable src, List<String> header,
                                    Map<String, String> origins, List<Out> outs, String mapName) {
        ColumnMap.Quantity q = map.quantities.get(key);
        if (q == null) {
            return;
        }
        boolean dir = key.equals("wind_direction");
        String conv = dir && map.directionTowards ? ", turned 180 deg (given as blowing towards)" : "";
        if (perSensor) {
            for (int s = 0; s < q.columns().size(); s++) {
                String name = tidy + (s + 1);
                header.add(name);
                origins.put(name, "your column '" + q.columns().get(s) + "' in " + q.unit() + conv + ", " + mapName);
                outs.add(new Out(q, new int[] {src.column(q.columns().get(s))}, dir));
            }
        } else {
            header.add(tidy);
            origins.put(tidy, (q.columns().size() > 1 ? "mean of your columns " + q.columns() : "your column '" + q.columns().get(0) + "'")
                    + " in " + q.unit() + conv + ", " + mapName);
            int[] cols = new int[q.columns().size()];
            for (int s = 0; s < cols.length; s++) {
                cols[s] = src.column(q.columns().get(s));
            }
            outs.add(new Out(q, cols, dir));
        }
    }

    /** The instant of row r from the map's timestamp column(s). */
    public static Instant instant(CsvTable src, int r, ColumnMap map) {
        String s0 = src.cell(r, src.column(map.timeColumns.get(0))).trim();
        String shown = s0;
        try {
            switch (map.timeForm) {
                case EPOCH_S -> {
                    double sec = Double.parseDouble(s0);
                    if (!Double.isFinite(sec)) {
                        throw new NumberFormatException();
                    }
                    return Instant.ofEpochMilli(Math.round(sec * 1000.0));
                }
                case DATE_TIME -> {
                    String s1 = src.cell(r, src.column(map.timeColumns.get(1))).trim();
                    shown = s0 + " " + s1;
                    return LocalDate.parse(s0).atTime(LocalTime.parse(s1)).atZone(map.sourceZone).toInstant();
                }
                case PATTERN -> {
                    TemporalAccessor ta = map.timePattern.parse(s0);
                    if (ta.isSupported(java.time.temporal.ChronoField.OFFSET_SECONDS)) {
                        return OffsetDateTime.from(ta).toInstant();
                    }
                    return LocalDateTime.from(ta).atZone(map.sourceZone).toInstant();
                }
                default -> {
                    String s = s0.indexOf('T') < 0 && s0.length() > 10 && s0.charAt(10) == ' ' ? s0.substring(0, 10) + "T" + s0.substring(11) : s0;
                    if (s.endsWith("Z") || s.endsWith("z") || hasOffset(s)) {
                        return OffsetDateTime.parse(s.endsWith("z") ? s.substring(0, s.length() - 1) + "Z" : s).toInstant();
                    }
                    return LocalDateTime.parse(s).atZone(map.sourceZone).toInstant();
                }
            }
        } catch (java.time.DateTimeException | NumberFormatException e) {
            String form = switch (map.timeForm) {
                case ISO -> "an ISO-8601 time such as 2026-12-05T02:05:00Z, 2026-12-05T13:05:00+11:00 or 2026-12-05T13:05:00";
                case EPOCH_S -> "seconds since 1970-01-01T00:00Z";
                case DATE_TIME -> "a date 2026-12-05 and a time 13:05:00";
                case PATTERN -> "the pattern given in time.pattern";
            };
            throw new UserInputException(src.where(r) + ": time '" + shown + "' (column " + map.timeColumns + ", time.form: "
                    + map.timeForm.name().toLowerCase(Locale.ROOT) + " in " + map.file.getFileName() + ") is not " + form
                    + "; fix the value or the map's time.form");
        }
    }

    private static boolean hasOffset(String s) {
        int t = s.indexOf('T');
        if (t < 0) {
            return false;
        }
        String time = s.substring(t + 1);
        return time.indexOf('+') >= 0 || time.indexOf('-') >= 0;
    }

    /** Local clock of an instant in the map's zone (for reports that show UTC beside local time). */
    static ZonedDateTime local(Instant i, ColumnMap map) {
        return i.atZone(map.localZone);
    }
}
