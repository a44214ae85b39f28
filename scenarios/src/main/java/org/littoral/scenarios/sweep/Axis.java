package org.littoral.scenarios.sweep;

import java.util.List;

/** A swept key path and the values it takes, in the order the sweep file gives them. */
public record Axis(KeyPath path, List<AxisValue> values) {
    public Axis {
        values = List.copyOf(values);
    }
}
