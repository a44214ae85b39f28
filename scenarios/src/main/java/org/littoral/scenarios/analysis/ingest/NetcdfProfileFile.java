package org.littoral.scenarios.analysis.ingest;

import java.io.IOException;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDateTime;
import java.time.ZoneId;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.littoral.scenarios.input.UserInputException;
import ucar.ma2.Array;
import ucar.ma2.ArrayChar;
import ucar.ma2.DataType;
import ucar.nc2.Attribute;
import ucar.nc2.Variable;
import ucar.nc2.dataset.NetcdfDataset;
import ucar.nc2.time.CalendarDate;
import ucar.nc2.time.CalendarDateUnit;

/**
 * Reads drone or radiosonde profiles from netCDF-3 or netCDF-4 (netCDF-Java; HDF5 read in pure Java) and hands
 * back the tidy table {@link ProfileCsvReader} reads, so netCDF input gets the same checks and QC as CSV.
 * Variables are found by their CF standard_name (CF conventions, standard name table) and converted from their
 * units attribute with udunits, or named by a column map. Fill and missing values are masked by the enhanced
 * dataset; CF time ("seconds since ...", calendar) is decoded. Two layouts:
 * <ul>
 * <li>one flight per file: every variable along one sample dimension; a raw flight, binned like a raw CSV;</li>
 * <li>a CF discrete-sampling-geometry profile collection ({@code featureType = "profile"}, CF 1.8 chapter 9,
 * orthogonal or incomplete multidimensional arrays): binned profiles, one time per profile.</li>
 * </ul>
 */
public final class NetcdfProfileFile {
    private NetcdfProfileFile() {
    }

    /** standard_name(s) per quantity, in order of preference; tidy column; tidy unit; units to suggest. */
    private record Spec(String key, List<String> standardNames, String tidy, String unit, String examples) {
    }

    private static final List<Spec> SPECS = List.of(
            new Spec("height", List.of("height", "altitude", "height_above_ground_level"), ProfileColumns.HEIGHT_M, "m", "m, ft"),
            new Spec("pressure", List.of("air_pressure"), ProfileColumns.PRESSURE_HPA, "hPa", "hPa, Pa"),
            new Spec("temperature", List.of("air_temperature"), ProfileColumns.TEMPERATURE_C, "degC", "K, degC"),
            new Spec("rh", List.of("relative_humidity"), ProfileColumns.RH_PERCENT, "percent", "1, %"),
            new Spec("mixing_ratio", List.of("humidity_mixing_ratio"), ProfileColumns.MIXING_RATIO_G_PER_KG, "g/kg", "kg/kg, g/kg"),
            new Spec("dewpoint", List.of("dew_point_temperature"), ProfileColumns.DEWPOINT_C, "degC", "K, degC"),
            new Spec("wind_speed", List.of("wind_speed"), ProfileColumns.WIND_SPEED_M_PER_S, "m/s", "m s-1, knots"),
            new Spec("wind_direction", List.of("wind_from_direction", "wind_to_direction"), ProfileColumns.WIND_DIRECTION_DEG,
                    "degree", "degree"));

    /**
     * @param map optional column map: its quantities name variables (column = variable name, unit overrides the
     *            attribute), its time zone and site apply; without one, standard names and {@code zone} are used
     * @param zone the campaign's local clock when no map is given (the coast's UTC offset)
     */
    public static CsvTable read(Path file, ColumnMap map, ZoneId zone) {
        String name = file.getFileName().toString();
        try (NetcdfDataset ds = NetcdfDataset.openDataset(file.toString())) {
            ZoneId local = map != null ? map.localZone : zone;
            Attribute ft = ds.findGlobalAttributeIgnoreCase("featureType");
            boolean dsg = ft != null && ft.isString() && ft.getStringValue().trim().equalsIgnoreCase("profile");
            Map<Spec, Variable> vars = new LinkedHashMap<>();
            Map<Spec, UnitConversion> conv = new LinkedHashMap<>();
            Map<String, String> origins = new LinkedHashMap<>();
            boolean towards = false;
            for (Spec s : SPECS) {
                Variable v = null;
                String unit = null;
                ColumnMap.Quantity q = map == null ? null : map.quantities.get(s.key());
                if (q != null) {
                    v = ds.findVariable(q.columns().get(0));
                    if (v == null) {
                        throw map.bad("quantities." + s.key() + ".column", q.columns().get(0), "no such variable in " + name
                                + "; its variables: " + names(ds));
                    }
                    unit = q.unit();
                } else {
                    for (String sn : s.standardNames()) {
                        for (Variable c : ds.getVariables()) {
                            Attribute a = c.findAttributeIgnoreCase("standard_name");
                            if (v == null && a != null && a.isString() && a.getStringValue().trim().equals(sn)) {
                                v = c;
                                towards = towards || sn.equals("wind_to_direction");
                            }
                        }
                    }
                    if (v == null) {
                        continue;
                    }
                    unit = v.getUnitsString();
                    if (unit == null || unit.isBlank()) {
                        throw new UserInputException(name + ": variable '" + v.getShortName() + "' (standard_name "
                                + s.standardNames().get(0) + ") has no units attribute; add one (" + s.examples()
                                + ") or name it with its unit in a column map (--columns)");
                    }
                }
                try {
                    conv.put(s, UnitConversion.of(unit, s.unit(), s.examples()));
                } catch (UnitConversion.BadUnit e) {
                    throw new UserInputException(name + ": variable '" + v.getShortName() + "' units '" + unit + "': "
                            + e.getMessage() + "; fix the units attribute or give the unit in a column map (--columns)");
                }
                vars.put(s, v);
                origins.put(s.tidy(), "variable '" + v.getShortName() + "' in " + unit + " of " + name);
            }
            towards = towards || map != null && map.directionTowards;
            for (String need : List.of("height", "pressure", "temperature", "wind_speed", "wind_direction")) {
                if (vars.keySet().stream().noneMatch(s -> s.key().equals(need))) {
                    Spec s = SPECS.stream().filter(x -> x.key().equals(need)).findFirst().orElseThrow();
                    throw new UserInputException(name + ": no variable with standard_name " + s.standardNames()
                            + " (the " + need + "); add the standard_name attribute or name the variable in a column map (--columns)");
                }
            }
            if (vars.keySet().stream().noneMatch(s -> s.key().equals("rh") || s.key().equals("mixing_ratio")
                    || s.key().equals("dewpoint"))) {
                throw new UserInputException(name + ": no humidity variable (standard_name relative_humidity, "
                        + "humidity_mixing_ratio or dew_point_temperature); add one or name it in a column map (--columns)");
            }
            Variable tv = timeVariable(ds, map, name);
            Instant[] times = decodeTimes(tv, name);
            String site = siteOf(ds, map, name);
            return dsg ? profiles(ds, name, vars, conv, towards, tv, times, site, local, origins)
                    : flight(file, vars, conv, towards, times, site, local, origins);
        } catch (IOException e) {
            throw new UserInputException(file + ": cannot be read as netCDF (" + e.getMessage() + "); give a netCDF-3 or netCDF-4 file");
        }
    }

    private static String names(NetcdfDataset ds) {
        List<String> l = new ArrayList<>();
        ds.getVariables().forEach(v -> l.add(v.getShortName()));
        return l.toString();
    }

    private static Variable timeVariable(NetcdfDataset ds, ColumnMap map, String name) {
        if (map != null) {
            Variable v = ds.findVariable(map.timeColumns.get(0));
            if (v == null) {
                throw map.bad("time.column", map.timeColumns.get(0), "no such variable in " + name + "; its variables: " + names(ds));
            }
            return v;
        }
        for (Variable v : ds.getVariables()) {
            Attribute a = v.findAttributeIgnoreCase("standard_name");
            if (a != null && a.isString() && a.getStringValue().trim().equals("time")) {
                return v;
            }
        }
        Variable v = ds.findVariable("time");
        if (v == null) {
            throw new UserInputException(name + ": no time variable (standard_name time, units 'seconds since ...'); add one");
        }
        return v;
    }

    /** CF time: value x units "UNIT since REF" in the variable's calendar (CF 1.8 section 4.4). */
    private static Instant[] decodeTimes(Variable tv, String name) throws IOException {
        String units = tv.getUnitsString();
        if (units == null || !units.contains("since")) {
            throw new UserInputException(name + ": time variable '" + tv.getShortName() + "' units '" + units
                    + "' are not CF time units; write e.g. 'seconds since 2026-12-05 00:00:00 UTC'");
        }
        Attribute cal = tv.findAttributeIgnoreCase("calendar");
        CalendarDateUnit cdu;
        try {
            cdu = CalendarDateUnit.of(cal == null ? null : cal.getStringValue(), units);
        } catch (IllegalArgumentException e) {
            throw new UserInputException(name + ": time variable '" + tv.getShortName() + "' units '" + units + "': "
                    + e.getMessage() + "; write e.g. 'seconds since 2026-12-05 00:00:00 UTC'");
        }
        Array a = tv.read();
        Instant[] out = new Instant[(int) a.getSize()];
        for (int i = 0; i < out.length; i++) {
            double x = a.getDouble(i);
            if (Double.isNaN(x)) {
                out[i] = null;
                continue;
            }
            CalendarDate d = cdu.makeCalendarDate(x);
            out[i] = Instant.ofEpochMilli(d.getMillis());
        }
        return out;
    }

    /** Site of a one-flight file: the map's fixed site, a global attribute, else the file name. DSG: null (per profile). */
    private static String siteOf(NetcdfDataset ds, ColumnMap map, String name) {
        if (map != null && map.fixedSite != null) {
            return map.fixedSite;
        }
        for (String a : List.of("site", "site_name", "station", "station_name")) {
            Attribute g = ds.findGlobalAttributeIgnoreCase(a);
            if (g != null && g.isString()) {
                return g.getStringValue().trim();
            }
        }
        return null;
    }

    private static CsvTable flight(Path file, Map<Spec, Variable> vars, Map<Spec, UnitConversion> conv, boolean towards,
                                   Instant[] times, String site, ZoneId local, Map<String, String> origins) throws IOException {
        String name = file.getFileName().toString();
        String stem = name.replaceFirst("\\.(nc|nc4|cdf|h5)$", "");
        String siteName = site != null ? site : stem;
        int n = times.length;
        List<String> header = new ArrayList<>(List.of(ProfileColumns.DAY, ProfileColumns.SITE, ProfileColumns.FLIGHT_ID,
                ProfileColumns.TIME_S, ProfileColumns.TIME_LOCAL));
        List<double[]> data = new ArrayList<>();
        for (Map.Entry<Spec, Variable> e : vars.entrySet()) {
            Array a = e.getValue().read();
            if (a.getSize() != n) {
                throw new UserInputException(name + ": variable '" + e.getValue().getShortName() + "' has " + a.getSize()
                        + " values but time has " + n + "; a one-flight file needs every variable along the time dimension "
                        + "(or write a CF profile collection with featureType = \"profile\")");
            }
            header.add(e.getKey().tidy());
            data.add(convert(a, conv.get(e.getKey()), e.getKey().key().equals("wind_direction") && towards));
        }
        Instant t0 = null;
        for (Instant t : times) {
            if (t != null) {
                t0 = t;
                break;
            }
        }
        if (t0 == null) {
            throw new UserInputException(name + ": every time value is missing; the flight needs its times");
        }
        String day = LocalDateTime.ofInstant(t0, local).toLocalDate().toString();
        List<String[]> rows = new ArrayList<>();
        List<Integer> recs = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            if (times[i] == null) {
                continue;
            }
            String[] c = new String[header.size()];
            c[0] = day;
            c[1] = siteName;
            c[2] = stem;
            c[3] = String.format(Locale.ROOT, "%.3f", times[i].toEpochMilli() / 1000.0);
            c[4] = LocalDateTime.ofInstant(times[i], local).toString();
            for (int k = 0; k < data.size(); k++) {
                double v = data.get(k)[i];
                c[5 + k] = Double.isNaN(v) ? "" : Double.toString(v);
            }
            rows.add(c);
            recs.add(i + 1);
        }
        return CsvTable.of(name, header, rows, recs.stream().mapToInt(Integer::intValue).toArray(), origins, "record");
    }

    private static CsvTable profiles(NetcdfDataset ds, String name, Map<Spec, Variable> vars, Map<Spec, UnitConversion> conv,
                                     boolean towards, Variable tv, Instant[] times, String fixedSite, ZoneId local,
                                     Map<String, String> origins) throws IOException {
        int np = times.length;
        if (tv.getRank() != 1) {
            throw new UserInputException(name + ": featureType profile needs one time per profile (time(profile)); '"
                    + tv.getShortName() + "' has rank " + tv.getRank() + " (ragged arrays are not read; write the orthogonal "
                    + "or incomplete multidimensional form of CF 1.8 section 9.3)");
        }
        String[] sites = new String[np];
        Variable sv = null;
        for (String cand : List.of("site", "station_name", "station")) {
            if (sv == null) {
                sv = ds.findVariable(cand);
            }
        }
        if (sv == null) {
            for (Variable v : ds.getVariables()) {
                Attribute r = v.findAttributeIgnoreCase("cf_role");
                if (r != null && r.isString() && r.getStringValue().equals("profile_id")) {
                    sv = v;
                }
            }
        }
        for (int p = 0; p < np; p++) {
            sites[p] = fixedSite != null ? fixedSite : sv != null ? stringAt(sv, p) : name.replaceFirst("\\.(nc|nc4|cdf)$", "");
        }
        Spec hs = SPECS.get(0);
        Variable hv = vars.get(hs);
        Array ha = hv.read();
        int nl = hv.getRank() == 1 ? (int) ha.getSize() : hv.getShape()[1];
        double[] h = convert(ha, conv.get(hs), false);
        List<String> header = new ArrayList<>(List.of(ProfileColumns.DAY, ProfileColumns.SITE, ProfileColumns.TIME_LOCAL));
        List<double[]> data = new ArrayList<>();
        List<Spec> specs = new ArrayList<>();
        for (Map.Entry<Spec, Variable> e : vars.entrySet()) {
            Array a = e.getValue().read();
            if (a.getSize() != (long) np * nl && !(e.getKey() == hs && hv.getRank() == 1)) {
                throw new UserInputException(name + ": variable '" + e.getValue().getShortName() + "' has shape "
                        + java.util.Arrays.toString(e.getValue().getShape()) + "; a profile collection needs (profile, level) = ("
                        + np + ", " + nl + ")");
            }
            header.add(e.getKey().tidy());
            specs.add(e.getKey());
            data.add(e.getKey() == hs ? h : convert(a, conv.get(e.getKey()), e.getKey().key().equals("wind_direction") && towards));
        }
        List<String[]> rows = new ArrayList<>();
        List<Integer> recs = new ArrayList<>();
        for (int p = 0; p < np; p++) {
            if (times[p] == null) {
                continue;
            }
            LocalDateTime lt = LocalDateTime.ofInstant(times[p], local);
            for (int k = 0; k < nl; k++) {
                double z = hv.getRank() == 1 ? h[k] : h[p * nl + k];
                if (Double.isNaN(z)) {
                    continue;
                }
                String[] c = new String[header.size()];
                c[0] = lt.toLocalDate().toString();
                c[1] = sites[p];
                c[2] = lt.toString();
                for (int j = 0; j < specs.size(); j++) {
                    double v = specs.get(j) == hs ? z : data.get(j)[p * nl + k];
                    c[3 + j] = Double.isNaN(v) ? "" : Double.toString(v);
                }
                rows.add(c);
                recs.add(p * nl + k + 1);
            }
        }
        return CsvTable.of(name, header, rows, recs.stream().mapToInt(Integer::intValue).toArray(), origins, "record");
    }

    private static double[] convert(Array a, UnitConversion c, boolean towards) {
        double[] out = new double[(int) a.getSize()];
        for (int i = 0; i < out.length; i++) {
            double v = a.getDouble(i);
            v = Double.isNaN(v) ? v : c.convert(v);
            if (towards && !Double.isNaN(v)) {
                v = (v + 180.0) % 360.0;
            }
            out[i] = v;
        }
        return out;
    }

    private static String stringAt(Variable v, int p) throws IOException {
        if (v.getDataType() == DataType.CHAR) {
            ArrayChar a = (ArrayChar) v.read();
            return a.getString(p).trim();
        }
        Array a = v.read();
        return String.valueOf(a.getObject(p)).trim();
    }
}
