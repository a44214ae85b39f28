package org.littoral.scenarios.analysis.metrics;

import java.util.List;
import org.littoral.scenarios.analysis.Layer;
import org.littoral.scenarios.analysis.Variable;
import org.littoral.scenarios.input.UserInputException;

/** Settings of the response metrics. Public fields; defaults and reasons in docs/analysis.md. */
public final class MetricSettings {
    /** What anomalies are measured against. */
    public enum Reference { PRE_PASSAGE, DAILY_MEAN }

    /**
     * Layers, m above ground. Default 10-100 m (near surface, above the take-off bins), 100-300 m
     * (the detection layer) and 300-500 m (upper breeze layer).
     */
    public List<Layer> layers = List.of(new Layer(10, 100), new Layer(100, 300), new Layer(300, 500));
    /** Variables. Default: temperature, theta, mixing ratio, theta-e, wind speed, cross-shore and alongshore wind. */
    public List<Variable> variables = List.of(Variable.TEMPERATURE, Variable.THETA, Variable.MIXING_RATIO,
            Variable.THETA_E, Variable.WIND_SPEED, Variable.CROSS_SHORE_WIND, Variable.ALONGSHORE_WIND);
    /** Window before a passage for the pre-passage state, h. Default 1 h (two flights at a 30-min cadence). */
    public double preWindowHours = 1.0;
    /** Window after a passage, h. Default 2 h: "the two hours after the front passes" (PRODUCT.md). */
    public double postWindowHours = 2.0;
    /** Anomaly reference. Default the pre-passage mean. */
    public Reference reference = Reference.PRE_PASSAGE;
    /** Layer means need at least this fraction of the layer's levels valid. */
    public double minValidFraction = 0.5;

    public MetricSettings validate() {
        if (!(preWindowHours > 0 && postWindowHours > 0)) {
            throw new UserInputException("metrics.preWindowHours = " + preWindowHours + " and metrics.postWindowHours = "
                    + postWindowHours + " must be > 0 h (defaults 1 and 2)");
        }
        if (layers.isEmpty() || variables.isEmpty()) {
            throw new UserInputException("metrics.layers and metrics.variables must not be empty");
        }
        return this;
    }
}
