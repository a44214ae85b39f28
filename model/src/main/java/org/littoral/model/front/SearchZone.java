package org.littoral.model.front;

/**
 * The cross-shore stretch the diagnostics may search: clear of everything that is not the breeze of this
 * coast (far-field sponges, the landward reference band of a nonlinear run, the periodic images of the coast
 * in a periodic domain). A result that reaches one of its ends is a lower bound, reported as "at least".
 *
 * @param fromM seaward end, m (x positive inland)
 * @param toM landward end, m
 * @param seawardLimit what lies beyond the seaward end, in words (e.g. "far-field sponge")
 * @param landwardLimit what lies beyond the landward end (e.g. "reference band", "periodic image of the coast")
 */
public record SearchZone(double fromM, double toM, String seawardLimit, String landwardLimit) {
    public SearchZone {
        if (!(toM > fromM) || !(fromM <= 0) || !(toM >= 0)) {
            throw new IllegalArgumentException("search zone must contain the coast (x = 0) and have to > from; got " + fromM + " .. "
                    + toM + " m");
        }
    }

    /**
     * For a periodic domain of length L with its coast at x = 0: the wrapped coast (the image of the coast with
     * land and sea swapped) lies at x = +-L/2, so the search keeps to |x| &lt;= L/4, half-way to it.
     */
    public static SearchZone periodic(double domainLengthM) {
        return new SearchZone(-0.25 * domainLengthM, 0.25 * domainLengthM, "half-way to the periodic image of the coast",
                "half-way to the periodic image of the coast");
    }

    public boolean contains(double xM) {
        return xM >= fromM && xM <= toM;
    }
}
