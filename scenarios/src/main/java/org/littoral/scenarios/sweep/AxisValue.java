package org.littoral.scenarios.sweep;

import com.fasterxml.jackson.databind.JsonNode;

/**
 * One value a key path takes in a member, with the short label used in tables, plots and member listings
 * (the number itself for scalars, the choice name for a named layout).
 */
public record AxisValue(String label, JsonNode value) {
    static AxisValue of(JsonNode value) {
        return new AxisValue(value.isTextual() ? value.asText() : value.toString(), value);
    }
}
