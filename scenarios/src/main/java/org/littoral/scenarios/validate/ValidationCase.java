package org.littoral.scenarios.validate;

/**
 * One check of littoral against a published result.
 *
 * @param id short stable identifier, e.g. "thermo.bolton-es-20C"
 * @param source the publication (author, year, journal, equation/table) or reference library
 * @param quantity what is compared, with units
 * @param expected expected value as text (with units)
 * @param tolerance tolerance as text
 * @param result what littoral gives, as text
 * @param passed whether the result is within tolerance
 * @param fromMemory true when the expected value is marked "from memory" (unverified) in docs/references.md
 * @param note optional remark (how it was measured, why a value differs)
 */
public record ValidationCase(String id, String source, String quantity, String expected, String tolerance,
                             String result, boolean passed, boolean fromMemory, String note) {

    /** Convenience for a numeric comparison with an absolute tolerance. */
    public static ValidationCase absolute(String id, String source, String quantity, double expected,
                                          double tolerance, double result, boolean fromMemory, String note) {
        boolean ok = Math.abs(result - expected) <= tolerance;
        return new ValidationCase(id, source, quantity, fmt(expected), "+/- " + fmt(tolerance), fmt(result), ok,
                fromMemory, note);
    }

    /** Convenience for a numeric comparison with a relative tolerance (fraction, e.g. 0.02 for 2 %). */
    public static ValidationCase relative(String id, String source, String quantity, double expected,
                                          double relTolerance, double result, boolean fromMemory, String note) {
        boolean ok = Math.abs(result - expected) <= relTolerance * Math.abs(expected);
        return new ValidationCase(id, source, quantity, fmt(expected), "+/- " + fmt(100 * relTolerance) + " %",
                fmt(result), ok, fromMemory, note);
    }

    public static String fmt(double v) {
        if (Double.isNaN(v)) {
            return "NaN";
        }
        double a = Math.abs(v);
        if (a != 0 && (a < 1e-3 || a >= 1e6)) {
            return String.format(java.util.Locale.ROOT, "%.4e", v);
        }
        return String.format(java.util.Locale.ROOT, "%.5g", v);
    }
}
