package org.littoral.scenarios.analysis.ingest;

import java.util.List;

/**
 * The one definition of the tidy profile CSV: one row per sample, units in the column names.
 * The analysis chain reads it and the synthetic-sounding writer of {@code littoral run} writes it,
 * so model output can be re-ingested unchanged. See docs/analysis.md.
 */
public final class ProfileColumns {
    private ProfileColumns() {
    }

    /** Day label: an ISO date (2024-07-15) for observations, any label for synthetic runs. */
    public static final String DAY = "day";
    /** Site name. */
    public static final String SITE = "site";
    /** Local clock time: ISO local date-time (2024-07-15T13:05:00) or decimal hours since local midnight. */
    public static final String TIME_LOCAL = "time_local";
    /** Height above ground, m. */
    public static final String HEIGHT_M = "height_m";
    public static final String PRESSURE_HPA = "pressure_hPa";
    public static final String TEMPERATURE_C = "temperature_C";
    public static final String RH_PERCENT = "rh_percent";
    public static final String MIXING_RATIO_G_PER_KG = "mixing_ratio_g_per_kg";
    public static final String DEWPOINT_C = "dewpoint_C";
    public static final String WIND_SPEED_M_PER_S = "wind_speed_m_per_s";
    /** Meteorological direction the wind blows from, degrees clockwise from north. */
    public static final String WIND_DIRECTION_DEG = "wind_direction_deg";
    public static final String THETA_K = "theta_K";
    public static final String THETA_V_K = "theta_v_K";
    public static final String THETA_E_K = "theta_e_K";

    /** Raw ascents: flight identifier (unique within a site and day). Its presence marks a raw file. */
    public static final String FLIGHT_ID = "flight_id";
    /** Raw ascents: elapsed time of the sample, s (any origin; increasing within a flight). */
    public static final String TIME_S = "time_s";
    /** Raw ascents: prefix of numbered temperature sensor columns temperature_C_1..n (averaged). */
    public static final String TEMPERATURE_C_SENSOR_PREFIX = "temperature_C_";
    /** Raw ascents: prefix of numbered humidity sensor columns rh_percent_1..n (averaged). */
    public static final String RH_PERCENT_SENSOR_PREFIX = "rh_percent_";

    /** Columns of a binned file, in the order the writer uses. */
    public static final List<String> BINNED = List.of(DAY, SITE, TIME_LOCAL, HEIGHT_M, PRESSURE_HPA, TEMPERATURE_C,
            RH_PERCENT, MIXING_RATIO_G_PER_KG, DEWPOINT_C, WIND_SPEED_M_PER_S, WIND_DIRECTION_DEG, THETA_K, THETA_V_K,
            THETA_E_K);

    /** Columns a binned file must have (humidity: at least one of rh_percent, mixing_ratio_g_per_kg, dewpoint_C). */
    public static final List<String> BINNED_REQUIRED = List.of(DAY, SITE, TIME_LOCAL, HEIGHT_M, PRESSURE_HPA,
            WIND_SPEED_M_PER_S, WIND_DIRECTION_DEG);

    /** Columns a raw file must have besides temperature and humidity (single or numbered sensors). */
    public static final List<String> RAW_REQUIRED = List.of(DAY, SITE, FLIGHT_ID, TIME_LOCAL, HEIGHT_M, PRESSURE_HPA,
            WIND_SPEED_M_PER_S, WIND_DIRECTION_DEG);

    /** Humidity columns, any one of which is enough (in order of preference). */
    public static final List<String> HUMIDITY_ANY = List.of(MIXING_RATIO_G_PER_KG, RH_PERCENT, DEWPOINT_C);

    /** Header line of a binned file. */
    public static String binnedHeader() {
        return String.join(",", BINNED);
    }
}
