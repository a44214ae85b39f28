package org.littoral.scenarios.analysis;

import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;

/**
 * A profile quantity whose layer mean the analysis tracks, in the units people read
 * (K, g/kg, m/s). Wind components are layer means of the vector, so speed is that of the mean vector.
 */
public enum Variable {
    TEMPERATURE("temperature_K", "K"),
    THETA("theta_K", "K"),
    MIXING_RATIO("mixing_ratio_g_per_kg", "g/kg"),
    THETA_E("theta_e_K", "K"),
    WIND_SPEED("wind_speed_m_per_s", "m/s"),
    CROSS_SHORE_WIND("cross_shore_wind_m_per_s", "m/s"),
    ALONGSHORE_WIND("alongshore_wind_m_per_s", "m/s"),
    WIND_EAST("wind_east_m_per_s", "m/s"),
    WIND_NORTH("wind_north_m_per_s", "m/s");

    private final String column;
    private final String unit;

    Variable(String column, String unit) {
        this.column = column;
        this.unit = unit;
    }

    /** Column name used in output tables (units in the name). */
    public String column() {
        return column;
    }

    public String unit() {
        return unit;
    }

    /**
     * Layer mean over the levels inside the layer, NaN when fewer than minValidFraction of the levels
     * in the layer are valid or the profile has no level in it.
     */
    public double layerMean(Profile p, Layer layer, Coast coast, double minValidFraction) {
        switch (this) {
            case TEMPERATURE:
                return LayerMeans.mean(p, p.temperatureK(), layer, minValidFraction);
            case THETA:
                return LayerMeans.mean(p, p.thetaK(), layer, minValidFraction);
            case MIXING_RATIO:
                return 1000.0 * LayerMeans.mean(p, p.mixingRatioKgPerKg(), layer, minValidFraction);
            case THETA_E:
                return LayerMeans.mean(p, p.thetaEK(), layer, minValidFraction);
            default:
                break;
        }
        double e = LayerMeans.mean(p, p.windEastMPerS(), layer, minValidFraction);
        double n = LayerMeans.mean(p, p.windNorthMPerS(), layer, minValidFraction);
        return switch (this) {
            case WIND_SPEED -> Math.hypot(e, n);
            case CROSS_SHORE_WIND -> coast.crossShore(e, n);
            case ALONGSHORE_WIND -> coast.alongshore(e, n);
            case WIND_EAST -> e;
            case WIND_NORTH -> n;
            default -> throw new IllegalStateException(name());
        };
    }

    /** Parses a name like "theta_e", "THETA_E" or "mixing-ratio". */
    public static Variable parse(String s) {
        String t = s.trim().toUpperCase(java.util.Locale.ROOT).replace('-', '_');
        for (Variable v : values()) {
            if (v.name().equals(t) || v.column.equalsIgnoreCase(s.trim())) {
                return v;
            }
        }
        throw new org.littoral.scenarios.input.UserInputException("unknown variable '" + s + "'; choose one of "
                + java.util.Arrays.toString(values()).toLowerCase(java.util.Locale.ROOT));
    }
}
