package org.littoral.scenarios.sweep;

import java.util.Map;

/**
 * Physical ranges of the scenario keys that sweeps most often vary, keyed by the last key of the path, so a
 * sweep or ensemble is rejected before anything runs instead of failing member by member. The scenario
 * loader checks every member again in full; these ranges only catch the common slips early.
 */
final class KeyRanges {

    /** Allowed closed interval; {@code circular} values (directions) wrap instead of clipping. */
    record Range(double min, double max, String unit, boolean circular) {
        boolean contains(double v) {
            return v >= min && v <= max;
        }

        String describe() {
            return fmt(min) + ".." + fmt(max) + (unit.isEmpty() ? "" : " " + unit);
        }
    }

    private static final Map<String, Range> BY_LEAF = Map.ofEntries(
            Map.entry("from_deg", new Range(0, 360, "deg (direction the wind blows from)", true)),
            Map.entry("speed_m_per_s", new Range(0, 40, "m/s", false)),
            Map.entry("latitude_deg", new Range(-90, 90, "deg", false)),
            Map.entry("buoyancy_frequency_per_s", new Range(0, 0.05, "1/s", false)),
            Map.entry("peak_flux_difference_W_per_m2", new Range(0, 1500, "W/m2", false)),
            Map.entry("sst_K", new Range(250, 320, "K", false)),
            Map.entry("bearing_land_to_sea_deg", new Range(0, 360, "deg", true)),
            Map.entry("cloud_fraction", new Range(0, 1, "", false)));

    private KeyRanges() {
    }

    static Range forPath(KeyPath p) {
        String leaf = p.leafKey();
        return leaf == null ? null : BY_LEAF.get(leaf);
    }

    static String fmt(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return Double.toString(v);
    }
}
