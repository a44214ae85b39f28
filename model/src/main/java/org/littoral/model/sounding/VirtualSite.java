package org.littoral.model.sounding;

/**
 * A profiling site on the cross-shore line.
 *
 * @param name short site label (appears in soundings and plots)
 * @param inlandDistanceM distance inland from the main coastline, m (model x; negative means offshore)
 */
public record VirtualSite(String name, double inlandDistanceM) {
    public VirtualSite {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("every virtual site needs a non-blank name");
        }
        if (!Double.isFinite(inlandDistanceM)) {
            throw new IllegalArgumentException("site '" + name + "': inland distance must be a finite number of metres; got "
                    + inlandDistanceM);
        }
    }
}
