package org.littoral.scenarios.output;

import java.util.List;

/**
 * The one CSV dialect littoral writes: comma separated, one header line, LF line ends, UTF-8, a text field
 * quoted when it holds a comma, a double quote, CR or LF, with inner quotes doubled (RFC 4180 section 2, rules
 * 5-7), numbers in fixed decimals with a point, and a missing number (NaN) as an empty field. Every CSV file goes
 * through these helpers and {@link AtomicFile}. Fixed-decimal formatting is done by hand because
 * {@code String.format} is too slow for the millions of values of the demo campaign's raw flights.
 */
public final class Csv {
    public static final char SEPARATOR = ',';
    public static final char LINE_END = '\n';
    private static final long[] POW = {1, 10, 100, 1_000, 10_000, 100_000, 1_000_000, 10_000_000, 100_000_000};

    private Csv() {
    }

    /** A text field, quoted if needed; null is an empty field. */
    public static String field(String s) {
        if (s == null) {
            return "";
        }
        if (s.indexOf(',') < 0 && s.indexOf('"') < 0 && s.indexOf('\n') < 0 && s.indexOf('\r') < 0) {
            return s;
        }
        return '"' + s.replace("\"", "\"\"") + '"';
    }

    /** Appends a line of text fields (each quoted if needed) and the line end. */
    public static StringBuilder line(StringBuilder b, List<String> fields) {
        for (int i = 0; i < fields.size(); i++) {
            if (i > 0) {
                b.append(SEPARATOR);
            }
            b.append(field(fields.get(i)));
        }
        return b.append(LINE_END);
    }

    /**
     * Appends v with exactly {@code decimals} decimals (0..8), rounding half away from zero; NaN and infinities
     * append nothing (an empty field). Values beyond about 9e10 / 10^decimals fall back to {@link Double#toString}.
     */
    public static StringBuilder fixed(StringBuilder b, double v, int decimals) {
        if (!Double.isFinite(v)) {
            return b;
        }
        double a = Math.abs(v) * POW[decimals];
        if (a >= 9e17) {
            return b.append(v);
        }
        long scaled = Math.round(a);
        if (v < 0 && scaled != 0) {
            b.append('-');
        }
        b.append(scaled / POW[decimals]);
        if (decimals > 0) {
            b.append('.');
            String frac = Long.toString(scaled % POW[decimals]);
            for (int i = frac.length(); i < decimals; i++) {
                b.append('0');
            }
            b.append(frac);
        }
        return b;
    }

    /** {@link #fixed(StringBuilder, double, int)} as a string. */
    public static String fixed(double v, int decimals) {
        return fixed(new StringBuilder(24), v, decimals).toString();
    }
}
