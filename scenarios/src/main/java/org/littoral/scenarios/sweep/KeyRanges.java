package org.littoral.scenarios.sweep;

import java.util.Set;
import org.littoral.scenarios.scenario.Schema;
import org.littoral.scenarios.scenario.ScenarioSchema;

/**
 * The allowed range of a swept key, taken from the scenario schema itself (so a sweep, a plan and a day file
 * refuse exactly what a scenario file refuses), so that a sweep or ensemble is rejected before anything runs
 * instead of failing member by member. The scenario reader checks every member again in full.
 */
final class KeyRanges {
    /** Directions: values wrap around the circle instead of clipping. */
    private static final Set<String> CIRCULAR = Set.of("from_deg", "bearing_land_to_sea_deg");

    /** Allowed interval; {@code circular} values (directions) wrap instead of clipping. */
    record Range(Schema.Num num, boolean circular) {
        boolean contains(double v) {
            return num.accepts(v);
        }

        double min() {
            return num.min();
        }

        double max() {
            return num.max();
        }

        String describe() {
            return num.allowed().replaceFirst("^a number, ", "");
        }
    }

    private KeyRanges() {
    }

    static Range forPath(KeyPath p) {
        Schema.Num n = ScenarioSchema.numberAt(p.fieldNames());
        String leaf = p.leafKey();
        return n == null ? null : new Range(n, leaf != null && CIRCULAR.contains(leaf));
    }

    static String fmt(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return Double.toString(v);
    }
}
