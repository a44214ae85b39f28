package org.littoral.scenarios.netcdf;

import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.ZonedDateTime;
import java.time.format.DateTimeFormatter;
import java.util.List;
import java.util.Locale;
import org.littoral.model.coast.Coast;
import org.littoral.scenarios.LittoralVersion;
import ucar.ma2.DataType;
import ucar.nc2.Attribute;
import ucar.nc2.Dimension;
import ucar.nc2.NetcdfFileWriter;
import ucar.nc2.Variable;

/**
 * What the CF-1.8 files littoral writes have in common: the time axis, the global attributes and small helpers
 * for declaring variables with netCDF-Java. Conventions: CF Metadata Conventions 1.8 (Eaton et al. 2020),
 * sections 2.6 (attributes), 3 (units, standard_name, _FillValue), 4.3-4.4 (vertical and time coordinates).
 *
 * <p>Time is stored in UTC: "seconds since" the UTC midnight that begins the scenario's day. The model knows the
 * day of the year only (for the sun), so the year is nominal ({@link #NOMINAL_YEAR}, a common year); the
 * {@code time} variable says so in its comment. Local clock time is UTC plus the coast's offset.
 */
public final class CfFile {
    /** The calendar year given to a model day (the model knows only the day of the year). */
    public static final int NOMINAL_YEAR = 2001;
    /** netCDF's default fill value for floats (NC_FILL_FLOAT of the netCDF C library's netcdf.h; common practice). */
    public static final float FILL_FLOAT = 9.9692099683868690e+36f;
    public static final double FILL_DOUBLE = 9.9692099683868690e+36;

    private CfFile() {
    }

    /** Who wrote a file and from what: goes into the global attributes. */
    public record Provenance(String title, String scenarioName, String modelName, String scenarioEcho, Coast coast,
                             String command) {
    }

    /** The UTC date of model day 0: day {@code coast.dayOfYear()} of {@link #NOMINAL_YEAR}. */
    public static LocalDate dayZeroDate(Coast coast) {
        return LocalDate.ofYearDay(NOMINAL_YEAR, 1).plusDays(coast.dayOfYear() - 1L);
    }

    /** CF time units: seconds since the UTC midnight of model day 0's date. */
    public static String timeUnits(Coast coast) {
        return "seconds since " + dayZeroDate(coast) + " 00:00:00";
    }

    /** Seconds since {@link #timeUnits} for a local clock time (hours since local midnight of model day 0). */
    public static double secondsFromClockHours(Coast coast, double clockHours) {
        return (clockHours - coast.utcOffsetHours()) * 3600.0;
    }

    /** Declares a 1-D time coordinate variable on dimension {@code dim} with its CF attributes. */
    public static Variable timeVariable(NetcdfFileWriter w, String name, Dimension dim, Coast coast, String longName) {
        Variable t = w.addVariable(null, name, DataType.DOUBLE, List.of(dim));
        t.addAttribute(new Attribute("standard_name", "time"));
        t.addAttribute(new Attribute("long_name", longName));
        t.addAttribute(new Attribute("units", timeUnits(coast)));
        t.addAttribute(new Attribute("calendar", "standard"));
        t.addAttribute(new Attribute("axis", "T"));
        t.addAttribute(new Attribute("comment", String.format(Locale.ROOT, "UTC; local clock time is UTC %+.2f h; the model knows "
                + "only the day of the year (%d), so the year %d is nominal", coast.utcOffsetHours(), coast.dayOfYear(), NOMINAL_YEAR)));
        return t;
    }

    /**
     * Declares a variable with units, long_name, an optional standard_name (null when the CF standard name table
     * has none) and the float fill value.
     */
    public static Variable floatVariable(NetcdfFileWriter w, String name, List<Dimension> dims, String units, String standardName,
                                         String longName) {
        Variable v = w.addVariable(null, name, DataType.FLOAT, dims);
        if (standardName != null) {
            v.addAttribute(new Attribute("standard_name", standardName));
        }
        v.addAttribute(new Attribute("long_name", longName));
        v.addAttribute(new Attribute("units", units));
        v.addAttribute(new Attribute("_FillValue", FILL_FLOAT));
        return v;
    }

    /** Declares a double coordinate-like variable without fill (coordinates are never missing). */
    public static Variable doubleVariable(NetcdfFileWriter w, String name, List<Dimension> dims, String units, String standardName,
                                          String longName) {
        Variable v = w.addVariable(null, name, DataType.DOUBLE, dims);
        if (standardName != null) {
            v.addAttribute(new Attribute("standard_name", standardName));
        }
        v.addAttribute(new Attribute("long_name", longName));
        if (units != null) {
            v.addAttribute(new Attribute("units", units));
        }
        return v;
    }

    /** The global attributes of CF 1.8 section 2.6.2 plus the coast and the scenario as run. */
    public static void globalAttributes(NetcdfFileWriter w, Provenance p, String comment) {
        String now = ZonedDateTime.now(ZoneOffset.UTC).withNano(0).format(DateTimeFormatter.ISO_OFFSET_DATE_TIME);
        w.addGroupAttribute(null, new Attribute("Conventions", "CF-1.8"));
        w.addGroupAttribute(null, new Attribute("title", p.title()));
        w.addGroupAttribute(null, new Attribute("institution", "written by littoral (idealised coastal-circulation simulator)"));
        w.addGroupAttribute(null, new Attribute("source", LittoralVersion.LABEL + ", " + p.modelName() + " model"));
        w.addGroupAttribute(null, new Attribute("history", now + " " + LittoralVersion.LABEL + " " + p.command()));
        w.addGroupAttribute(null, new Attribute("references", "docs/references.md of the littoral repository"));
        w.addGroupAttribute(null, new Attribute("comment", comment + " Idealised model output: not a forecast; never use it for "
                + "aviation, marine or public-safety decisions."));
        w.addGroupAttribute(null, new Attribute("scenario_name", p.scenarioName()));
        w.addGroupAttribute(null, new Attribute("scenario", p.scenarioEcho()));
        Coast c = p.coast();
        w.addGroupAttribute(null, new Attribute("coast_latitude_deg", c.latitudeDeg()));
        w.addGroupAttribute(null, new Attribute("coast_longitude_deg", c.longitudeDeg()));
        w.addGroupAttribute(null, new Attribute("coast_bearing_land_to_sea_deg", c.bearingLandToSeaDeg()));
        w.addGroupAttribute(null, new Attribute("local_clock_utc_offset_h", c.utcOffsetHours()));
        w.addGroupAttribute(null, new Attribute("day_of_year", c.dayOfYear()));
    }

    static float toFloat(double v) {
        return Double.isFinite(v) ? (float) v : FILL_FLOAT;
    }
}
