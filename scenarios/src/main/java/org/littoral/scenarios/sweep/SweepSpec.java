package org.littoral.scenarios.sweep;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import org.littoral.scenarios.analysis.stats.BreezeTyping;

/**
 * A parsed sweep file: a base scenario document, fixed settings, swept axes (cartesian product or zipped) and
 * optionally an ensemble of drawn uncertain inputs. Members are every axis point times every ensemble draw.
 *
 * @param source where the sweep came from (file path or built-in name), for messages
 * @param name short name (defaults to the file name without extension)
 * @param description free text
 * @param baseLabel the base scenario as the file named it
 * @param base the base scenario document (never modified)
 * @param fixed overrides applied to every member before the axes
 * @param zip true when the axes advance together (all the same length) instead of forming a product
 * @param axes swept key paths in file order; the first axis varies slowest
 * @param ensemble drawn inputs, or null for a plain sweep
 * @param typing how the breeze type of a member is worked out
 */
public record SweepSpec(String source, String name, String description, String baseLabel, ObjectNode base,
                        List<Setting> fixed, boolean zip, List<Axis> axes, Ensemble ensemble, Typing typing) {

    public SweepSpec {
        fixed = List.copyOf(fixed);
        axes = List.copyOf(axes);
    }

    /** A key path set to one value. */
    public record Setting(KeyPath path, AxisValue value) {
    }

    /** One uncertain input. */
    public record Draw(KeyPath path, Distribution distribution) {
    }

    /**
     * @param members number of draws per axis point
     * @param seed base seed; draw k uses a generator seeded from (seed, k) alone, so any member can be redrawn
     *             on its own (a resumed run draws identical members) and every axis point sees the same draws
     *             (common random numbers, which sharpen comparisons between axis points)
     * @param draws uncertain inputs, drawn in this order
     */
    public record Ensemble(int members, long seed, List<Draw> draws) {
        public Ensemble {
            draws = List.copyOf(draws);
        }
    }

    /**
     * Where the ambient wind and coast live in the scenario document, and the sectors of the analysis chain's
     * {@link BreezeTyping} (the same classifier the observed days go through).
     */
    public record Typing(KeyPath fromDeg, KeyPath speedMPerS, KeyPath coastBearingDeg, KeyPath latitudeDeg,
                         BreezeTyping sectors) {
        public static Typing defaults() {
            return new Typing(KeyPath.parse("ambient_wind.from_deg"), KeyPath.parse("ambient_wind.speed_m_per_s"),
                    KeyPath.parse("coast.bearing_land_to_sea_deg"), KeyPath.parse("coast.latitude_deg"),
                    BreezeTyping.defaults());
        }
    }

    /** Number of axis points (1 when there are no axes). */
    public int axisPoints() {
        if (axes.isEmpty()) {
            return 1;
        }
        if (zip) {
            return axes.get(0).values().size();
        }
        int n = 1;
        for (Axis a : axes) {
            n = Math.multiplyExact(n, a.values().size());
        }
        return n;
    }

    public int memberCount() {
        return Math.multiplyExact(axisPoints(), ensemble == null ? 1 : ensemble.members());
    }
}
