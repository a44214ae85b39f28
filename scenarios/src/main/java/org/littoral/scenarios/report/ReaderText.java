package org.littoral.scenarios.report;

import java.util.Locale;

/**
 * Turns the keys of CSV columns and JSON fields ("max_inland_penetration.km", "temperature_K", "10-100m") into what a
 * reader of a report or a figure sees ("max inland penetration (km)", "temperature", "10-100 m"). Keys stay keys in
 * CSV and JSON; only what is drawn or shown in HTML goes through here.
 */
public final class ReaderText {
    private ReaderText() {
    }

    /** Unit suffixes of our keys, longest first, and how a reader writes them. */
    private static final String[][] UNITS = {
        {"_m_per_s", "m/s"}, {"_g_per_kg", "g/kg"}, {"_W_per_m2", "W/m2"}, {"_per_s", "1/s"}, {"_deg", "deg"},
        {"_km", "km"}, {"_hPa", "hPa"}, {"_K", "K"}, {"_m", "m"}, {"_min", "min"}, {"_percent", "%"},
    };

    /** The unit at the end of a key ("wind_speed_m_per_s" -> "m/s"), or "" when it has none. */
    public static String unitOf(String key) {
        for (String[] u : UNITS) {
            if (key.endsWith(u[0]) || key.endsWith("." + u[0].substring(1))) {
                return u[1];
            }
        }
        return "";
    }

    /** A key without its unit suffix, in words: "wind_speed_m_per_s" -> "wind speed". */
    public static String words(String key) {
        String k = key;
        for (String[] u : UNITS) {
            if (k.endsWith(u[0])) {
                k = k.substring(0, k.length() - u[0].length());
                break;
            }
            if (k.endsWith("." + u[0].substring(1))) {
                k = k.substring(0, k.length() - u[0].length());
                break;
            }
        }
        return k.replace('_', ' ').replace('.', ' ').replaceAll("\\s+", " ").strip();
    }

    /** A key in words with its unit in brackets: "max_inland_penetration.km" -> "max inland penetration (km)". */
    public static String label(String key) {
        String u = unitOf(key);
        return u.isEmpty() ? words(key) : words(key) + " (" + u + ")";
    }

    /** A layer label with a space before its unit: "10-100m" -> "10-100 m". */
    public static String layer(String label) {
        return label == null ? null : label.replaceAll("(\\d)m\\b", "$1 m");
    }

    /** A breeze type as every report writes it: lower case ("CORKSCREW" -> "corkscrew"). */
    public static String breezeType(String type) {
        return type == null ? null : type.toLowerCase(Locale.ROOT);
    }
}
