package org.littoral.scenarios.timing;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeSet;
import org.littoral.scenarios.analysis.ingest.CsvTable;
import org.littoral.scenarios.input.Shown;
import org.littoral.scenarios.input.UserInputException;

/**
 * Reads observed passage times for one day from either of two tables (docs/timing-checks.md):
 * <ul>
 * <li>the {@code passages.csv} that {@code littoral observe} writes (day, site, ordinal, time_local_h,
 *     uncertainty_h, turns_onshore, kind, ...): onshore passages only; at a site where an onshore passage is
 *     followed by an {@code ONSHORE_STRENGTHENING} one, the first is taken as a bay breeze and the strengthening
 *     as the sea breeze, otherwise the first onshore passage is the sea breeze;</li>
 * <li>a user table with columns {@code site}, {@code date} and {@code passage_time_local} (HH:MM, HH:MM:SS or
 *     decimal hours), optionally {@code uncertainty_min} and {@code label}.</li>
 * </ul>
 * Inland distances come from the day file's sites. The data are never changed, only read.
 */
public final class PassageTable {
    private PassageTable() {
    }

    /** What was read: the day's passages and notes about rows left out. */
    public record Read(String format, List<TimingInputs.ObservedPassage> passages, List<String> notes, int rowsOfDay) {
    }

    public static Read read(Path file, DaySpec day) {
        return read(file, day, null);
    }

    /** As above; with a column map ({@code columns}, may be null) a user table in its own form (delimiter, time zone). */
    public static Read read(Path file, DaySpec day, Path columns) {
        if (!Files.isRegularFile(file)) {
            throw new UserInputException("passage table " + file + " does not exist; give the passages.csv of littoral observe "
                    + "or a CSV with columns site, date, passage_time_local");
        }
        CsvTable t = columns == null ? CsvTable.read(file)
                : org.littoral.scenarios.analysis.ingest.MappedProfileFile.passageTable(file,
                        org.littoral.scenarios.analysis.ingest.ColumnMap.load(columns));
        if (t.has("time_local_h") && t.has("turns_onshore") && t.has("day")) {
            if (!t.has("site")) {
                throw new UserInputException("passage table " + file + " line 1: missing column(s) [site]; add it to the header "
                        + "line (littoral observe's passages.csv has day, site, time_local_h, uncertainty_h, turns_onshore, kind)");
            }
            return readObserve(t, day);
        }
        if (t.has("site") && (t.has("date") || t.has("day")) && (t.has("passage_time_local") || t.has("time_local"))) {
            return readUser(t, day);
        }
        throw new UserInputException("passage table " + file + " line 1: columns " + Shown.text(String.join(",", t.header()))
                + " are neither littoral observe's passages.csv (day, site, time_local_h, uncertainty_h, turns_onshore, kind) nor a "
                + "user table; give the columns site, date, passage_time_local[, uncertainty_min, label] (docs/timing-checks.md)");
    }

    private static Read readObserve(CsvTable t, DaySpec day) {
        int cDay = t.column("day");
        int cSite = t.column("site");
        int cTime = t.column("time_local_h");
        int cUnc = t.column("uncertainty_h");
        int cOn = t.column("turns_onshore");
        int cKind = t.column("kind");
        List<String> notes = new ArrayList<>();
        Map<String, List<double[]>> bySite = new LinkedHashMap<>(); // {time, unc, strengthening}
        int rows = 0;
        int offshore = 0;
        TreeSet<String> days = new TreeSet<>();
        for (int r = 0; r < t.rowCount(); r++) {
            days.add(t.cell(r, cDay));
            if (!t.cell(r, cDay).equals(day.date())) {
                continue;
            }
            rows++;
            if (!Boolean.parseBoolean(t.cell(r, cOn))) {
                offshore++;
                continue;
            }
            String site = t.cell(r, cSite);
            double time = t.number(r, cTime);
            if (!(time >= 0 && time <= 48)) {
                throw new UserInputException(t.where(r) + ": column 'time_local_h' value " + Shown.text(t.cell(r, cTime))
                        + " is not a clock time; give hours from 0 to 48");
            }
            double unc = cUnc >= 0 ? t.number(r, cUnc) : Double.NaN;
            boolean strengthening = cKind >= 0 && t.cell(r, cKind).equals("ONSHORE_STRENGTHENING");
            bySite.computeIfAbsent(site, k -> new ArrayList<>()).add(new double[] {time, unc, strengthening ? 1 : 0});
        }
        noRows(t, day, rows, days);
        if (offshore > 0) {
            notes.add(offshore + " passage(s) that do not turn the wind onshore are not checked");
        }
        List<TimingInputs.ObservedPassage> out = new ArrayList<>();
        for (Map.Entry<String, List<double[]>> e : bySite.entrySet()) {
            DaySpec.Site s = site(t, day, e.getKey());
            if (s == null) {
                notes.add("site " + e.getKey() + " is not in the day file's sites; its passages are not checked");
                continue;
            }
            List<double[]> ps = e.getValue();
            ps.sort((a, b) -> Double.compare(a[0], b[0]));
            int sea = 0;
            for (int i = 1; i < ps.size(); i++) {
                if (ps.get(i)[2] == 1) {
                    sea = i;
                    break;
                }
            }
            for (int i = 0; i < ps.size(); i++) {
                String label = i == sea ? "sea_breeze" : i < sea ? "bay_breeze" : "later_onshore";
                double unc = Double.isNaN(ps.get(i)[1]) ? defaultUnc(day, s) : ps.get(i)[1];
                out.add(new TimingInputs.ObservedPassage(day.date(), s.name(), s.inlandKm() * 1000.0, label, ps.get(i)[0], unc));
            }
        }
        return new Read("littoral observe passages.csv", out, notes, rows);
    }

    private static Read readUser(CsvTable t, DaySpec day) {
        int cDay = t.has("date") ? t.column("date") : t.column("day");
        int cSite = t.column("site");
        int cTime = t.has("passage_time_local") ? t.column("passage_time_local") : t.column("time_local");
        int cUnc = t.column("uncertainty_min");
        int cLabel = t.has("label") ? t.column("label") : t.column("kind");
        List<String> notes = new ArrayList<>();
        List<TimingInputs.ObservedPassage> out = new ArrayList<>();
        TreeSet<String> days = new TreeSet<>();
        int rows = 0;
        Map<String, Integer> seen = new LinkedHashMap<>();
        for (int r = 0; r < t.rowCount(); r++) {
            days.add(t.cell(r, cDay));
            if (!t.cell(r, cDay).equals(day.date())) {
                continue;
            }
            rows++;
            String site = t.cell(r, cSite);
            DaySpec.Site s = site(t, day, site);
            if (s == null) {
                notes.add("site " + site + " (" + t.where(r) + ") is not in the day file's sites; not checked");
                continue;
            }
            double time = clock(t, r, cTime);
            double unc = cUnc >= 0 && !CsvTable.isMissing(t.cell(r, cUnc)) ? t.number(r, cUnc) / 60.0 : defaultUnc(day, s);
            if (!(unc >= 0 && unc <= 3)) {
                throw new UserInputException(t.where(r) + ": column 'uncertainty_min' value " + Shown.text(t.cell(r, cUnc))
                        + " is outside the allowed range; give 0 to 180 min");
            }
            String label = cLabel >= 0 && !CsvTable.isMissing(t.cell(r, cLabel)) ? t.cell(r, cLabel) : "sea_breeze";
            String key = site + "|" + label;
            if (seen.containsKey(key)) {
                throw new UserInputException(t.where(r) + ": a second " + Shown.text(label) + " passage at " + Shown.text(site) + " on " + day.date()
                        + " (the first is on line " + seen.get(key) + "); give one passage per site and label, or label the "
                        + "other one (e.g. bay_breeze)");
            }
            seen.put(key, t.line(r));
            out.add(new TimingInputs.ObservedPassage(day.date(), s.name(), s.inlandKm() * 1000.0, label, time, unc));
        }
        noRows(t, day, rows, days);
        return new Read("user passage table", out, notes, rows);
    }

    private static void noRows(CsvTable t, DaySpec day, int rows, TreeSet<String> days) {
        if (rows == 0) {
            String list = days.size() <= 6 ? days.toString() : days.first() + " .. " + days.last() + " (" + days.size() + " days)";
            throw new UserInputException("passage table " + t.fileName() + ": no passages on " + day.date() + " (the day file's "
                    + "date); the table has " + Shown.clip(list, 120) + "; give the day file of one of those days");
        }
    }

    private static DaySpec.Site site(CsvTable t, DaySpec day, String name) {
        return day.site(name);
    }

    private static double defaultUnc(DaySpec day, DaySpec.Site s) {
        // Without a stated uncertainty: a quarter of the site's flight interval (our choice), unless the day file says.
        return Double.isNaN(day.defaultUncertaintyH()) ? s.flightIntervalMin() / 60.0 / 4.0 : day.defaultUncertaintyH();
    }

    /** HH:MM, HH:MM:SS or decimal hours. */
    static double clock(CsvTable t, int r, int c) {
        String v = t.cell(r, c).trim();
        try {
            if (v.contains(":")) {
                String[] p = v.split(":");
                if (p.length < 2 || p.length > 3) {
                    throw new NumberFormatException();
                }
                double h = Integer.parseInt(p[0]) + Integer.parseInt(p[1]) / 60.0 + (p.length == 3 ? Double.parseDouble(p[2]) / 3600.0 : 0);
                if (Integer.parseInt(p[1]) >= 60 || h < 0 || h > 48) {
                    throw new NumberFormatException();
                }
                return h;
            }
            double h = Double.parseDouble(v);
            if (!(h >= 0 && h <= 48)) {
                throw new NumberFormatException();
            }
            return h;
        } catch (NumberFormatException e) {
            throw new UserInputException(String.format(Locale.ROOT, "%s: column %s value %s is not a local clock time; write "
                    + "HH:MM, HH:MM:SS or decimal hours in 0..48", t.where(r), Shown.text(t.header().get(c)), Shown.text(v)));
        }
    }
}
