package org.littoral.model.front;

/**
 * The front (or, in linear theory, the onshore flow) getting to one place: a site, or the coast (onset).
 *
 * @param timeH when, hours on the section's clock; null when it never gets there (see {@code note})
 * @param uncertaintyH half-width of the timing uncertainty, h (half the output interval); NaN without a time
 * @param front true for a front passage, false for the onset of onshore flow (linear theory has no front)
 * @param note why there is no time (null when there is one)
 */
public record Arrival(Double timeH, double uncertaintyH, boolean front, String note) {
    public boolean exists() {
        return timeH != null;
    }

    static Arrival none(boolean front, String note) {
        return new Arrival(null, Double.NaN, front, note);
    }
}
