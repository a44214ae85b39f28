package org.littoral.scenarios.analysis.ingest;

import java.nio.file.Path;
import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.time.format.DateTimeParseException;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import org.littoral.model.thermo.Thermo;
import org.littoral.scenarios.input.Shown;
import org.littoral.scenarios.input.UserInputException;

/**
 * Reads the tidy profile CSV defined by {@link ProfileColumns}: already-binned profiles, or raw
 * ascents (a {@code flight_id} column present) which are cut to their ascending part and binned
 * by {@link AscentBinner}. Quality control follows docs/analysis.md; everything it removes goes to
 * the {@link QcLog}. Structural problems (missing columns, bad numbers, time going backwards within
 * a flight, duplicate profiles) are {@link UserInputException}s naming the file and line.
 */
public final class ProfileCsvReader {
    private final IngestSettings settings;

    public ProfileCsvReader(IngestSettings settings) {
        this.settings = settings.validate();
    }

    public IngestResult read(Path file) {
        return read(CsvTable.read(file));
    }

    public IngestResult read(CsvTable t) {
        QcLog sniffed = new QcLog();
        UnitSniffer.check(t, w -> sniffed.add(t.fileName(), 0, "", "", "", ProfileColumns.WIND_SPEED_M_PER_S, "",
                QcLog.Action.FLAGGED, "wind-speed-implausible", w));
        IngestResult r = t.has(ProfileColumns.FLIGHT_ID) ? readRaw(t) : readBinned(t);
        if (!sniffed.isEmpty()) {
            QcLog all = new QcLog();
            all.addAll(sniffed);
            all.addAll(r.qc());
            return new IngestResult(r.profiles(), all, r.raw(), r.dayAttributes());
        }
        return r;
    }

    /**
     * The spike test of every path ({@link WindSpikes}) on a binned profile's wind: spikes become missing (both
     * components) and are logged, with the file line of the bin's row when known ({@code lines}, else {@code line0}).
     */
    void despikeWind(Profile p, String file, int[] lines, int line0, String prof, QcLog log) {
        int n = p.size();
        double[] sp = new double[n];
        for (int k = 0; k < n; k++) {
            sp[k] = p.windSpeed(k);
        }
        for (int k : WindSpikes.find(sp, settings.windSpikeHalfWindowBins, settings.windSpikeMPerS)) {
            log.add(file, lines != null ? lines[k] : line0, p.day(), p.site(), prof, ProfileColumns.WIND_SPEED_M_PER_S,
                    fmt(sp[k]), QcLog.Action.REMOVED_VALUE, "wind-speed-spike",
                    String.format(Locale.ROOT, "wind speed at %.1f m departs from its neighbours' median by more than %.1f m/s "
                            + "(direction removed with it)", p.heightM()[k], settings.windSpikeMPerS));
            p.windEastMPerS()[k] = Double.NaN;
            p.windNorthMPerS()[k] = Double.NaN;
        }
    }

    // ------------------------------------------------------------------ binned

    private IngestResult readBinned(CsvTable t) {
        List<String> required = new ArrayList<>(ProfileColumns.BINNED_REQUIRED);
        required.add(ProfileColumns.TEMPERATURE_C);
        requireColumns(t, required, "binned", ProfileColumns.BINNED);
        int cHum = humidityColumn(t, ProfileColumns.BINNED);
        String humName = t.header().get(cHum);
        Cols c = new Cols(t);
        int cT = t.column(ProfileColumns.TEMPERATURE_C);
        // RH is checked whenever the file has it, even when another humidity column is the one used (same QC as raw).
        int cRh = humName.equals(ProfileColumns.RH_PERCENT) ? -1 : t.column(ProfileColumns.RH_PERCENT);
        QcLog log = new QcLog();
        List<Profile> out = new ArrayList<>();
        Map<String, int[]> seen = new HashMap<>();
        int start = 0;
        while (start < t.rowCount()) {
            String key = profileKey(t, c, start, c.time);
            int end = start + 1;
            while (end < t.rowCount() && profileKey(t, c, end, c.time).equals(key)) {
                end++;
            }
            int[] prev = seen.get(key);
            if (prev != null) {
                throw new UserInputException(t.where(start) + ": profile (day " + Shown.bare(t.cell(start, c.day)) + ", site "
                        + Shown.bare(t.cell(start, c.site)) + ", time_local " + Shown.bare(t.cell(start, c.time)) + ") was already given on lines "
                        + prev[0] + "-" + prev[1] + "; remove the duplicate or give it its own time_local");
            }
            seen.put(key, new int[] {t.line(start), t.line(end - 1)});
            String day = t.cell(start, c.day);
            String site = t.cell(start, c.site);
            double hours = timeHours(t, start, c.time, day);
            String prof = "time " + t.cell(start, c.time);
            int n = end - start;
            Integer[] order = new Integer[n];
            double[] zRaw = new double[n];
            for (int i = 0; i < n; i++) {
                order[i] = i;
                zRaw[i] = t.number(start + i, c.height);
                if (Double.isNaN(zRaw[i])) {
                    throw new UserInputException(t.where(start + i) + ": column 'height_m' is empty; give every sample its height");
                }
            }
            Arrays.sort(order, (a, b) -> Double.compare(zRaw[a], zRaw[b]));
            double[] z = new double[n];
            double[] p = new double[n];
            double[] tk = new double[n];
            double[] r = new double[n];
            double[] ue = new double[n];
            double[] vn = new double[n];
            int[] lines = new int[n];
            for (int j = 0; j < n; j++) {
                int row = start + order[j];
                lines[j] = t.line(row);
                z[j] = zRaw[order[j]];
                if (j > 0 && z[j] == z[j - 1]) {
                    throw new UserInputException(t.where(row) + ": height_m " + fmt(z[j]) + " appears twice in profile (day "
                            + Shown.bare(day) + ", site " + Shown.bare(site) + ", " + Shown.bare(prof) + ") (also line " + t.line(start + order[j - 1])
                            + "); give each bin once");
                }
                Qc q = new Qc(t, row, day, site, prof, log);
                p[j] = q.pressurePa(c.pressure);
                tk[j] = q.temperatureK(cT);
                r[j] = q.mixingRatio(cHum, humName, tk[j], p[j]);
                if (cRh >= 0) {
                    double rh = q.rhFraction(cRh);
                    if (Double.isNaN(rh) && !Double.isNaN(t.number(row, cRh))) {
                        r[j] = Double.NaN; // a removed RH condemns the humidity of that bin
                    } else if (rh == 1.0 && !Double.isNaN(r[j]) && !Double.isNaN(tk[j]) && !Double.isNaN(p[j])) {
                        r[j] = Math.min(r[j], Thermo.mixingRatioFromRelativeHumidity(1.0, tk[j], p[j]));
                    }
                }
                double[] w = q.wind(c.speed, c.dir);
                ue[j] = w[0];
                vn[j] = w[1];
            }
            Profile built = ProfileDerivation.profile(site, day, hours, z, p, tk, r, ue, vn);
            despikeWind(built, t.fileName(), lines, 0, prof, log);
            out.add(built);
            start = end;
        }
        return new IngestResult(out, log, false, extraAttributes(t, c, log));
    }

    // ------------------------------------------------------------------ raw

    private IngestResult readRaw(CsvTable t) {
        requireColumns(t, ProfileColumns.RAW_REQUIRED, "raw", rawExpected());
        Cols c = new Cols(t);
        int[] tSensors = sensorColumns(t, ProfileColumns.TEMPERATURE_C_SENSOR_PREFIX, ProfileColumns.TEMPERATURE_C);
        if (tSensors.length == 0) {
            throw new UserInputException(t.fileName() + " line 1: missing column(s) [temperature_C or temperature_C_1..n]; add it to "
                    + "the header line (a raw file needs: " + String.join(", ", rawExpected()) + ")");
        }
        int[] hSensors = sensorColumns(t, ProfileColumns.RH_PERCENT_SENSOR_PREFIX, ProfileColumns.RH_PERCENT);
        int cHumAlt = -1;
        String humAltName = null;
        if (hSensors.length == 0) {
            cHumAlt = humidityColumn(t, rawExpected());
            humAltName = t.header().get(cHumAlt);
        }
        int cTimeS = t.column(ProfileColumns.TIME_S);
        QcLog log = new QcLog();
        List<Profile> out = new ArrayList<>();
        Map<String, int[]> seen = new HashMap<>();
        Map<String, Integer> launchSeen = new HashMap<>();
        int start = 0;
        while (start < t.rowCount()) {
            String key = profileKey(t, c, start, c.flight);
            int end = start + 1;
            while (end < t.rowCount() && profileKey(t, c, end, c.flight).equals(key)) {
                end++;
            }
            int[] prev = seen.get(key);
            if (prev != null) {
                throw new UserInputException(t.where(start) + ": flight " + Shown.bare(t.cell(start, c.flight)) + " (day " + Shown.bare(t.cell(start, c.day))
                        + ", site " + Shown.bare(t.cell(start, c.site)) + ") was already given on lines " + prev[0] + "-" + prev[1]
                        + "; keep each flight's rows together and give each flight its own flight_id");
            }
            seen.put(key, new int[] {t.line(start), t.line(end - 1)});
            String day = t.cell(start, c.day);
            String site = t.cell(start, c.site);
            String flight = t.cell(start, c.flight);
            String prof = "flight " + flight;
            int n = end - start;
            double h0 = timeHours(t, start, c.time, day);
            double[] ts = new double[n];
            double[] z = new double[n];
            double[] p = new double[n];
            double[][] tk = new double[tSensors.length][n];
            double[][] rh = hSensors.length > 0 ? new double[hSensors.length][n] : null;
            double[] r = hSensors.length > 0 ? null : new double[n];
            double[] ue = new double[n];
            double[] vn = new double[n];
            for (int i = 0; i < n; i++) {
                int row = start + i;
                double ti = cTimeS >= 0 ? t.number(row, cTimeS) : (timeHours(t, row, c.time, day) - h0) * 3600.0;
                if (Double.isNaN(ti)) {
                    throw new UserInputException(t.where(row) + ": column '" + (cTimeS >= 0 ? "time_s" : "time_local")
                            + "' is empty; give every raw sample a time");
                }
                if (i > 0 && ti < ts[i - 1]) {
                    throw new UserInputException(t.where(row) + ": time " + fmt(ti) + " s is earlier than " + fmt(ts[i - 1])
                            + " s on line " + t.line(row - 1) + " within flight " + Shown.bare(flight) + " (day " + Shown.bare(day) + ", site " + Shown.bare(site)
                            + "); sort the samples of each flight by time");
                }
                ts[i] = ti;
                z[i] = t.number(row, c.height);
                Qc q = new Qc(t, row, day, site, prof, log);
                p[i] = q.pressurePa(c.pressure);
                for (int s = 0; s < tSensors.length; s++) {
                    tk[s][i] = q.temperatureK(tSensors[s]);
                }
                if (rh != null) {
                    for (int s = 0; s < hSensors.length; s++) {
                        rh[s][i] = q.rhFraction(hSensors[s]);
                    }
                } else {
                    r[i] = q.mixingRatio(cHumAlt, humAltName, mean(tk, i), p[i]);
                }
                double[] w = q.wind(c.speed, c.dir);
                ue[i] = w[0];
                vn[i] = w[1];
            }
            if (cTimeS >= 0) {
                // time_s may have any origin: the clock time of the first row anchors it.
                double t0 = ts[0];
                for (int i = 0; i < n; i++) {
                    ts[i] -= t0;
                }
            }
            RawFlight f = new RawFlight(site, day, flight, h0, ts, z, p, tk, rh, r, ue, vn, t.fileName(), t.line(start));
            Profile prof2 = AscentBinner.bin(f, settings, log);
            if (prof2 != null) {
                despikeWind(prof2, t.fileName(), null, t.line(start), prof, log);
                String lk = day + "\u0000" + site + "\u0000" + String.format(Locale.ROOT, "%.6f", prof2.timeHours());
                Integer other = launchSeen.putIfAbsent(lk, t.line(start));
                if (other != null) {
                    throw new UserInputException(t.where(start) + ": flight " + Shown.bare(flight) + " (day " + Shown.bare(day) + ", site " + Shown.bare(site)
                            + ") starts its ascent at the same time as the flight on line " + other
                            + "; this looks like a duplicate profile: remove one of them");
                }
                out.add(prof2);
            }
            if (settings.useDescent) {
                Profile down = AscentBinner.binDescent(f, settings, log);
                if (down != null) {
                    despikeWind(down, t.fileName(), null, t.line(start), prof + " descent", log);
                    out.add(down);
                }
            }
            start = end;
        }
        return new IngestResult(out, log, true, extraAttributes(t, c, log));
    }

    /**
     * Columns that are not profile columns carry per-day attributes (convection, tag, ...). A value
     * must be constant within a site-day: the first is kept and any other is logged.
     */
    private static Map<String, Map<String, String>> extraAttributes(CsvTable t, Cols c, QcLog log) {
        List<Integer> extra = new ArrayList<>();
        for (int i = 0; i < t.header().size(); i++) {
            String h = t.header().get(i);
            if (!KNOWN.contains(h) && !h.startsWith(ProfileColumns.TEMPERATURE_C_SENSOR_PREFIX)
                    && !h.startsWith(ProfileColumns.RH_PERCENT_SENSOR_PREFIX)) {
                extra.add(i);
            }
        }
        Map<String, Map<String, String>> out = new java.util.LinkedHashMap<>();
        if (extra.isEmpty()) {
            return out;
        }
        for (int row = 0; row < t.rowCount(); row++) {
            String day = t.cell(row, c.day);
            String site = t.cell(row, c.site);
            Map<String, String> m = out.computeIfAbsent(day + "/" + site, k -> new java.util.LinkedHashMap<>());
            for (int col : extra) {
                String v = t.cell(row, col);
                if (CsvTable.isMissing(v)) {
                    continue;
                }
                String name = t.header().get(col);
                DayTableReader.checkAttribute(t.where(row), name, v);
                String old = m.putIfAbsent(name, v);
                if (old != null && !old.equals(v)) {
                    log.add(t.fileName(), t.line(row), day, site, "", name, v, QcLog.Action.FLAGGED,
                            "attribute-varies-within-day", "per-day attribute '" + name + "' changes within the day; kept '" + old + "'");
                }
            }
        }
        return out;
    }

    private static final Set<String> KNOWN = new java.util.HashSet<>(ProfileColumns.BINNED);

    static {
        KNOWN.add(ProfileColumns.FLIGHT_ID);
        KNOWN.add(ProfileColumns.TIME_S);
    }

    private static double mean(double[][] a, int i) {
        double s = 0;
        int c = 0;
        for (double[] x : a) {
            if (!Double.isNaN(x[i])) {
                s += x[i];
                c++;
            }
        }
        return c > 0 ? s / c : Double.NaN;
    }

    private static List<String> rawExpected() {
        List<String> l = new ArrayList<>(ProfileColumns.RAW_REQUIRED);
        l.add("temperature_C or temperature_C_1..n");
        l.add("rh_percent or rh_percent_1..n or mixing_ratio_g_per_kg or dewpoint_C");
        l.add("optional time_s");
        return l;
    }

    // ------------------------------------------------------------------ helpers

    private static final class Cols {
        final int day;
        final int site;
        final int time;
        final int height;
        final int pressure;
        final int speed;
        final int dir;
        final int flight;

        Cols(CsvTable t) {
            day = t.column(ProfileColumns.DAY);
            site = t.column(ProfileColumns.SITE);
            time = t.column(ProfileColumns.TIME_LOCAL);
            height = t.column(ProfileColumns.HEIGHT_M);
            pressure = t.column(ProfileColumns.PRESSURE_HPA);
            speed = t.column(ProfileColumns.WIND_SPEED_M_PER_S);
            dir = t.column(ProfileColumns.WIND_DIRECTION_DEG);
            flight = t.column(ProfileColumns.FLIGHT_ID);
        }
    }

    private static String profileKey(CsvTable t, Cols c, int row, int third) {
        return t.cell(row, c.day) + "\u0000" + t.cell(row, c.site) + "\u0000" + t.cell(row, third);
    }

    private static void requireColumns(CsvTable t, List<String> required, String kind, List<String> expected) {
        Set<String> missing = new LinkedHashSet<>();
        for (String col : required) {
            if (!t.has(col)) {
                missing.add(col);
            }
        }
        if (!missing.isEmpty()) {
            throw new UserInputException(t.fileName() + " line 1: missing column(s) " + missing + "; a " + kind
                    + " profile file needs: " + String.join(", ", expected) + "; add them to the header line (units in the names; "
                    + "see docs/analysis.md)");
        }
    }

    private static int humidityColumn(CsvTable t, List<String> expected) {
        for (String h : ProfileColumns.HUMIDITY_ANY) {
            if (t.has(h)) {
                return t.column(h);
            }
        }
        throw new UserInputException(t.fileName() + " line 1: missing column(s) [one of " + ProfileColumns.HUMIDITY_ANY
                + "]; add one to the header line (the file needs: " + String.join(", ", expected) + ")");
    }

    /** Numbered sensor columns prefix1..prefixN in numeric order, or the single column, or none. */
    private static int[] sensorColumns(CsvTable t, String prefix, String single) {
        TreeMap<Integer, Integer> found = new TreeMap<>();
        for (int i = 0; i < t.header().size(); i++) {
            String h = t.header().get(i);
            if (h.startsWith(prefix)) {
                String suffix = h.substring(prefix.length());
                if (!suffix.isEmpty() && suffix.chars().allMatch(Character::isDigit)) {
                    found.put(Integer.parseInt(suffix), i);
                }
            }
        }
        if (!found.isEmpty()) {
            return found.values().stream().mapToInt(Integer::intValue).toArray();
        }
        return t.has(single) ? new int[] {t.column(single)} : new int[0];
    }

    /** Local clock hours since midnight of the day (ISO local date-time, HH:MM[:SS] or decimal hours). */
    static double timeHours(CsvTable t, int row, int col, String day) {
        String s = t.cell(row, col);
        if (CsvTable.isMissing(s)) {
            throw new UserInputException(t.where(row) + ": column 'time_local' is empty; give an ISO local date-time or decimal hours");
        }
        try {
            if (s.indexOf('T') > 0) {
                LocalDateTime dt = LocalDateTime.parse(s);
                double h = dt.toLocalTime().toNanoOfDay() / 3.6e12;
                try {
                    LocalDate d = LocalDate.parse(day);
                    h += 24.0 * ChronoUnit.DAYS.between(d, dt.toLocalDate());
                } catch (DateTimeParseException ignore) {
                    // day is a free label (synthetic runs): time of day only
                }
                return h;
            }
            if (s.indexOf(':') > 0) {
                return LocalTime.parse(s).toNanoOfDay() / 3.6e12;
            }
            double h = Double.parseDouble(s);
            if (!Double.isFinite(h)) {
                throw new NumberFormatException();
            }
            return h;
        } catch (DateTimeParseException | NumberFormatException e) {
            throw new UserInputException(t.where(row) + ": column 'time_local' value " + Shown.text(s)
                    + " is neither an ISO local date-time (2024-07-15T13:05:00), HH:MM[:SS] nor decimal hours; fix the time");
        }
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }

    /** Range checks on one row; removals are NaN plus a log entry. */
    private final class Qc {
        final CsvTable t;
        final int row;
        final String day;
        final String site;
        final String prof;
        final QcLog log;

        Qc(CsvTable t, int row, String day, String site, String prof, QcLog log) {
            this.t = t;
            this.row = row;
            this.day = day;
            this.site = site;
            this.prof = prof;
            this.log = log;
        }

        void note(int col, double v, QcLog.Action a, String what, String reason) {
            log.add(t.fileName(), t.line(row), day, site, prof, t.header().get(col), fmt(v), a, what, reason);
        }

        double pressurePa(int col) {
            double v = t.number(row, col);
            if (!Double.isNaN(v) && (v < settings.pressureMinHPa || v > settings.pressureMaxHPa)) {
                note(col, v, QcLog.Action.REMOVED_VALUE, "pressure-out-of-range",
                        "pressure outside " + settings.pressureMinHPa + "-" + settings.pressureMaxHPa + " hPa (Pa given instead of hPa?)");
                return Double.NaN;
            }
            return v * 100.0;
        }

        double temperatureK(int col) {
            double v = t.number(row, col);
            if (Double.isNaN(v)) {
                return v;
            }
            if (v > settings.kelvinLookingAboveC) {
                note(col, v, QcLog.Action.REMOVED_VALUE, "temperature-looks-like-kelvin",
                        "value in a Celsius column above " + settings.kelvinLookingAboveC + " looks like kelvin; convert it to deg C");
                return Double.NaN;
            }
            if (v < settings.temperatureMinC || v > settings.temperatureMaxC) {
                note(col, v, QcLog.Action.REMOVED_VALUE, "temperature-out-of-range",
                        "temperature outside " + settings.temperatureMinC + ".." + settings.temperatureMaxC + " C");
                return Double.NaN;
            }
            return v + Thermo.T0;
        }

        double rhFraction(int col) {
            double v = t.number(row, col);
            if (Double.isNaN(v)) {
                return v;
            }
            if (v < 0 || v > settings.rhRemoveAbovePercent) {
                note(col, v, QcLog.Action.REMOVED_VALUE, "rh-out-of-range",
                        "RH outside 0.." + settings.rhRemoveAbovePercent + " %");
                return Double.NaN;
            }
            if (v > 100.0) {
                note(col, v, QcLog.Action.CAPPED_VALUE, "rh-above-100",
                        "RH above 100 % capped at 100 % (sensor overshoot or wetting)");
                return 1.0;
            }
            return v / 100.0;
        }

        /** Mixing ratio (kg/kg) from the humidity column that the file has. */
        double mixingRatio(int col, String name, double tK, double pPa) {
            if (name.equals(ProfileColumns.MIXING_RATIO_G_PER_KG)) {
                double v = t.number(row, col);
                if (!Double.isNaN(v) && (v < 0 || v > settings.mixingRatioMaxGPerKg)) {
                    note(col, v, QcLog.Action.REMOVED_VALUE, "mixing-ratio-out-of-range",
                            "mixing ratio outside 0.." + settings.mixingRatioMaxGPerKg + " g/kg");
                    return Double.NaN;
                }
                return v / 1000.0;
            }
            if (name.equals(ProfileColumns.RH_PERCENT)) {
                double rh = rhFraction(col);
                return Double.isNaN(rh) || Double.isNaN(tK) || Double.isNaN(pPa) ? Double.NaN
                        : Thermo.mixingRatioFromRelativeHumidity(rh, tK, pPa);
            }
            double td = t.number(row, col);
            if (Double.isNaN(td) || Double.isNaN(pPa)) {
                return Double.NaN;
            }
            if (td > settings.kelvinLookingAboveC) {
                note(col, td, QcLog.Action.REMOVED_VALUE, "dewpoint-looks-like-kelvin",
                        "value in a Celsius column above " + settings.kelvinLookingAboveC + " looks like kelvin; convert it to deg C");
                return Double.NaN;
            }
            // Bolton (1980), eq. 10 at the dewpoint gives the vapour pressure.
            return Thermo.mixingRatio(Thermo.saturationVapourPressurePa(td + Thermo.T0), pPa);
        }

        /** {east, north} from speed and meteorological direction. */
        double[] wind(int cSpeed, int cDir) {
            double s = t.number(row, cSpeed);
            double d = t.number(row, cDir);
            if (s == 0.0 && Double.isNaN(d)) {
                return new double[] {0.0, 0.0}; // calm: direction undefined, vector known
            }
            if (Double.isNaN(s) || Double.isNaN(d)) {
                return new double[] {Double.NaN, Double.NaN};
            }
            if (s < 0 || s > settings.windSpeedMaxMPerS) {
                note(cSpeed, s, QcLog.Action.REMOVED_VALUE, "wind-speed-out-of-range",
                        "wind speed outside 0.." + settings.windSpeedMaxMPerS + " m/s (direction removed with it)");
                return new double[] {Double.NaN, Double.NaN};
            }
            if (d < 0 || d > 360) {
                note(cDir, d, QcLog.Action.REMOVED_VALUE, "wind-direction-out-of-range",
                        "wind direction outside 0..360 deg (speed removed with it)");
                return new double[] {Double.NaN, Double.NaN};
            }
            return Coast.eastNorthFromDirection(s, d);
        }
    }
}
