package org.littoral.scenarios.analysis.metrics;

import org.littoral.scenarios.analysis.Layer;
import org.littoral.scenarios.analysis.Variable;

/** Distribution over passages of one metric ("change", "tendency_per_h", "anomaly") of one layer-mean variable. */
public record DistributionRow(Layer layer, Variable variable, String metric, Moments moments) {
}
