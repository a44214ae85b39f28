package org.littoral.scenarios.analysis.composite;

/** One box of a composite: the values of one group in one time bin (bin centre in hours on the spec's axis). */
public record CompositeRow(CompositeSpec spec, String group, double binCentreHours, BoxStats box) {
}
