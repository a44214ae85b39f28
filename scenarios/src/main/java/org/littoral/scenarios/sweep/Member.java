package org.littoral.scenarios.sweep;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;

/**
 * One run of a sweep: the base scenario document with the member's settings applied.
 *
 * @param index position in the sweep, 0-based (axis points outer, ensemble draws inner)
 * @param id file-safe identifier, {@code m0007}
 * @param settings the swept and drawn values of this member, in axis-then-draw order
 * @param document the resolved scenario document; treat as read-only
 * @param inputsSha256 hash of the canonical form of {@code document}, checked on resume
 */
public record Member(int index, String id, List<SweepSpec.Setting> settings, ObjectNode document, String inputsSha256) {
    public Member {
        settings = List.copyOf(settings);
    }

    /** {@code ambient_wind.from_deg=270, ambient_wind.speed_m_per_s=4}, for messages. */
    public String describe() {
        StringBuilder sb = new StringBuilder();
        for (SweepSpec.Setting s : settings) {
            if (sb.length() > 0) {
                sb.append(", ");
            }
            sb.append(s.path()).append('=').append(s.value().label());
        }
        return sb.toString();
    }
}
