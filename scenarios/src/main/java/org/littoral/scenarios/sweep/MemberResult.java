package org.littoral.scenarios.sweep;

import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * What running one member gives back: the run's summary (front diagnostics, site metrics; whatever the
 * pipeline writes to its summary), as a JSON object. A runner signals failure (a model blow-up, a bad value)
 * by throwing; the sweep records the error for that member and goes on.
 */
public record MemberResult(ObjectNode summary) {
}
