package org.littoral.model.front;

/**
 * A farthest position or a largest value found by a search, honest about the search's limits: when it lies
 * at an end of the {@link SearchZone} it is only a lower bound ("at least N km (limit of the search)").
 *
 * @param value the position (m) or value found; null when there is none (e.g. no front forms)
 * @param timeH when, hours on the section's clock (null without a value)
 * @param xM where, m (null without a value)
 * @param atSearchLimit true when it lies at an end of the search zone: {@code value} is then a lower bound
 * @param limit what lies beyond that end (null unless at the limit)
 * @param note why there is no value (null when there is one)
 */
public record Extent(Double value, Double timeH, Double xM, boolean atSearchLimit, String limit, String note) {
    public boolean exists() {
        return value != null;
    }

    static Extent none(String note) {
        return new Extent(null, null, null, false, null, note);
    }
}
