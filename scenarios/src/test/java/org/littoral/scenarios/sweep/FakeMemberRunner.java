package org.littoral.scenarios.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Function;

/**
 * A deterministic stand-in for the scenario pipeline: the "summary" is a smooth function of a few inputs
 * plus a hash-derived number (so two different members never share bytes), after an optional sleep (to make a
 * sweep slow enough to kill). Members with ambient speed 9 m/s "blow up", to exercise failure records.
 */
final class FakeMemberRunner implements Function<Member, MemberResult> {
    final AtomicInteger calls = new AtomicInteger();
    private final long sleepMillis;

    FakeMemberRunner(long sleepMillis) {
        this.sleepMillis = sleepMillis;
    }

    @Override
    public MemberResult apply(Member m) {
        calls.incrementAndGet();
        if (sleepMillis > 0) {
            try {
                Thread.sleep(sleepMillis);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("interrupted");
            }
        }
        JsonNode d = m.document();
        double speed = d.path("ambient_wind").path("speed_m_per_s").asDouble();
        double from = d.path("ambient_wind").path("from_deg").asDouble();
        if (speed == 9.0) {
            throw new IllegalStateException("model blew up at t = 11.5 h, x = 12 km; try a smaller time step");
        }
        double[] en = org.littoral.model.coast.Coast.eastNorthFromDirection(speed, from);
        double onshore = new org.littoral.model.coast.Coast(40, 0, 0, d.path("coast").path("bearing_land_to_sea_deg").asDouble(), 1)
                .crossShore(en[0], en[1]);
        ObjectNode s = JsonNodeFactory.instance.objectNode();
        s.put("onset_solar_h", 9.0 + 0.2 * onshore);
        s.put("max_penetration_km", Math.max(0, 40.0 - 3.0 * onshore));
        s.put("front_speed_m_per_s", 2.0 + 0.1 * onshore);
        s.put("hash_digits", Long.parseLong(m.inputsSha256().substring(0, 12), 16) / 7.0);
        var sites = s.putArray("sites");
        for (double km : new double[] {5, 20}) {
            ObjectNode site = sites.addObject();
            site.put("name", "S" + (int) km);
            site.put("arrival_solar_h", 12.0 + km / 10.0 - 0.1 * onshore);
            site.put("delta_theta_K", -1.5 - 0.05 * km);
        }
        return new MemberResult(s);
    }
}
