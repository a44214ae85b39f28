package org.littoral.scenarios.analysis.ingest;

import java.util.Locale;
import ucar.units.Converter;
import ucar.units.Unit;
import ucar.units.UnitFormat;
import ucar.units.UnitFormatManager;

/**
 * Converts a user's unit string to the tidy unit of a quantity with the udunits package of netCDF-Java
 * (edu.ucar:udunits), which knows the unit strings of the CF conventions (degC, K, degF, hPa, Pa, mbar, %,
 * 1, g/kg, kg/kg, m/s, knots, km/h, m, ft, degree ...). A few spellings udunits lacks are aliased first.
 */
public final class UnitConversion {
    private final Converter converter;
    private final String from;

    private UnitConversion(Converter converter, String from) {
        this.converter = converter;
        this.from = from;
    }

    /** Thrown for an unknown unit or one of the wrong kind; the message says which and lists good ones. */
    public static final class BadUnit extends Exception {
        private static final long serialVersionUID = 1L;

        BadUnit(String message) {
            super(message);
        }
    }

    /**
     * @param from the user's unit string
     * @param to the tidy unit (a udunits string)
     * @param examples units to suggest when {@code from} is unknown or of the wrong kind
     */
    public static UnitConversion of(String from, String to, String examples) throws BadUnit {
        UnitFormat fmt = UnitFormatManager.instance();
        Unit a;
        Unit b;
        try {
            a = fmt.parse(alias(from));
            b = fmt.parse(alias(to));
        } catch (Exception | LinkageError e) {
            throw new BadUnit(org.littoral.scenarios.input.Shown.text(from) + " is not a unit udunits knows; use one of " + examples);
        }
        if (a == null || !a.isCompatible(b)) {
            throw new BadUnit(org.littoral.scenarios.input.Shown.text(from) + " cannot be converted to " + to + "; use one of " + examples);
        }
        try {
            return new UnitConversion(a.getConverterTo(b), from);
        } catch (Exception e) {
            throw new BadUnit(org.littoral.scenarios.input.Shown.text(from) + " cannot be converted to " + to + " (" + org.littoral.scenarios.input.Shown.clip(String.valueOf(e.getMessage()), 120) + "); use one of " + examples);
        }
    }

    public double convert(double v) {
        return converter.convert(v);
    }

    public String from() {
        return from;
    }

    /** Spellings people use that udunits 4.5 does not parse as meant. */
    static String alias(String u) {
        String s = u.trim();
        return switch (s.toLowerCase(Locale.ROOT)) {
            case "kt", "kts", "knot", "knots" -> "knot";
            case "kmh", "km/h", "kph" -> "km/h";
            case "mbar", "mb" -> "millibar";
            case "degc", "deg c", "°c", "celsius" -> "degC";
            case "degf", "deg f", "°f", "fahrenheit" -> "degF";
            case "deg", "degree", "degrees", "°" -> "degree";
            case "percent", "%" -> "percent";
            case "fraction" -> "1";
            default -> s;
        };
    }
}
