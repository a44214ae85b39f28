package org.littoral.scenarios.run;

/**
 * Header of soundings.csv. Until the analysis chain's ProfileColumns lands on main this mirrors its
 * binned column set (day, site, time_local in decimal local clock hours, then units in the names).
 */
final class ProfileCsvColumns {
    static final String HEADER = "day,site,time_local,height_m,pressure_hPa,temperature_C,rh_percent,mixing_ratio_g_per_kg,"
            + "dewpoint_C,wind_speed_m_per_s,wind_direction_deg,theta_K,theta_v_K,theta_e_K";

    private ProfileCsvColumns() {
    }
}
