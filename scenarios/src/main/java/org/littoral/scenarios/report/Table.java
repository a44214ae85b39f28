package org.littoral.scenarios.report;

import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

/**
 * A rectangular table with named columns in a fixed order (put units in the names:
 * {@code "arrival_local_h"}, {@code "dT_K"}) and rows of numbers, strings, booleans or null. The one
 * table type behind CSV, JSON and HTML output.
 *
 * <pre>
 * Table t = Table.of("site", "distance_km", "arrival_local_h")
 *     .row("A", 5.0, 12.75)
 *     .row("B", 12.0, Double.NaN);   // NaN: empty in CSV, null in JSON, a dash in HTML
 * </pre>
 */
public final class Table {
    private final List<String> columns;
    private final List<List<Object>> rows = new ArrayList<>();
    private final Map<String, Integer> decimals = new LinkedHashMap<>();

    private Table(List<String> columns) {
        if (columns.isEmpty()) {
            throw new IllegalArgumentException("a table needs at least one column");
        }
        if (columns.stream().distinct().count() != columns.size()) {
            throw new IllegalArgumentException("table column names must be unique, got " + columns);
        }
        this.columns = List.copyOf(columns);
    }

    public static Table of(String... columns) {
        return new Table(Arrays.asList(columns));
    }

    public static Table of(List<String> columns) {
        return new Table(columns);
    }

    /** One row per record, one column per record component, in declaration order. */
    public static Table fromRecords(List<? extends Record> records) {
        if (records.isEmpty()) {
            throw new IllegalArgumentException("fromRecords needs at least one record to learn the columns");
        }
        return fromRecords(records.get(0).getClass(), records);
    }

    /** As {@link #fromRecords(List)}, with the record type given so an empty list still has columns. */
    public static <R extends Record> Table fromRecords(Class<?> type, List<? extends Record> records) {
        RecordComponent[] comps = type.getRecordComponents();
        if (comps == null) {
            throw new IllegalArgumentException(type.getName() + " is not a record");
        }
        List<String> names = new ArrayList<>();
        for (RecordComponent c : comps) {
            names.add(c.getName());
        }
        Table t = new Table(names);
        for (Record r : records) {
            Object[] row = new Object[comps.length];
            for (int i = 0; i < comps.length; i++) {
                try {
                    comps[i].getAccessor().setAccessible(true);
                    row[i] = comps[i].getAccessor().invoke(r);
                } catch (ReflectiveOperationException e) {
                    throw new IllegalStateException("cannot read " + comps[i].getName() + " of " + type.getName(), e);
                }
            }
            t.row(row);
        }
        return t;
    }

    /** One row per map; columns from the first map's key order (use LinkedHashMap). */
    public static Table fromMaps(List<? extends Map<String, ?>> maps) {
        if (maps.isEmpty()) {
            throw new IllegalArgumentException("fromMaps needs at least one row to learn the columns");
        }
        Table t = new Table(new ArrayList<>(maps.get(0).keySet()));
        for (Map<String, ?> m : maps) {
            Object[] row = new Object[t.columns.size()];
            for (int i = 0; i < row.length; i++) {
                row[i] = m.get(t.columns.get(i));
            }
            t.row(row);
        }
        return t;
    }

    public Table row(Object... values) {
        if (values.length != columns.size()) {
            throw new IllegalArgumentException("table row has " + values.length + " values but the table has "
                    + columns.size() + " columns " + columns);
        }
        List<Object> r = new ArrayList<>(values.length);
        for (Object v : values) {
            if (v != null && !(v instanceof Number || v instanceof CharSequence || v instanceof Boolean
                    || v instanceof Enum || v instanceof Character || v instanceof java.time.temporal.TemporalAccessor)) {
                throw new IllegalArgumentException("table cell of type " + v.getClass().getSimpleName()
                        + " is not supported; give a number, string, boolean, enum, date or null");
            }
            r.add(v);
        }
        rows.add(Collections.unmodifiableList(r));
        return this;
    }

    /** Fixed decimals for a numeric column in HTML (CSV and JSON keep full precision). */
    public Table decimals(String column, int digits) {
        if (!columns.contains(column)) {
            throw new IllegalArgumentException("no column '" + column + "' in " + columns);
        }
        decimals.put(column, digits);
        return this;
    }

    public List<String> columns() {
        return columns;
    }

    public List<List<Object>> rows() {
        return Collections.unmodifiableList(rows);
    }

    public int rowCount() {
        return rows.size();
    }

    /** Decimals for HTML display of column j: given, or about four significant digits of its largest value. */
    int displayDecimals(int j) {
        Integer d = decimals.get(columns.get(j));
        if (d != null) {
            return d;
        }
        double maxAbs = 0;
        boolean allIntegral = true;
        for (List<Object> r : rows) {
            Object v = r.get(j);
            if (v instanceof Double || v instanceof Float) {
                double x = ((Number) v).doubleValue();
                if (Double.isFinite(x)) {
                    maxAbs = Math.max(maxAbs, Math.abs(x));
                    allIntegral &= x == Math.rint(x) && Math.abs(x) < 1e15;
                }
            }
        }
        if (allIntegral || maxAbs == 0) {
            return 0;
        }
        return Math.max(0, Math.min(4, 3 - (int) Math.floor(Math.log10(maxAbs))));
    }

    /** Plain, locale-independent text for CSV: integral numbers without ".0", NaN and null empty. */
    static String csvText(Object v) {
        if (v == null) {
            return "";
        }
        if (v instanceof Double || v instanceof Float) {
            double x = ((Number) v).doubleValue();
            if (!Double.isFinite(x)) {
                return "";
            }
            if (x == Math.rint(x) && Math.abs(x) < 1e15) {
                return Long.toString((long) x);
            }
            return v instanceof Float ? Float.toString((Float) v) : Double.toString(x);
        }
        return v.toString();
    }

    /** Display text for HTML. */
    static String displayText(Object v, int decimals) {
        if (v == null) {
            return "\u2013";
        }
        if (v instanceof Double || v instanceof Float) {
            double x = ((Number) v).doubleValue();
            if (!Double.isFinite(x)) {
                return "\u2013";
            }
            double a = Math.abs(x);
            if (a != 0 && (a >= 1e6 || a < 1e-4)) {
                return String.format(Locale.ROOT, "%.3e", x).replace('-', '\u2212');
            }
            return NiceTicks.format(x, decimals);
        }
        if (v instanceof Number) {
            return v.toString().replace('-', '\u2212');
        }
        if (v instanceof Boolean) {
            return (Boolean) v ? "yes" : "no";
        }
        return v.toString();
    }
}
