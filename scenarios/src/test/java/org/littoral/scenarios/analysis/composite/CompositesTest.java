package org.littoral.scenarios.analysis.composite;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.analysis.Layer;
import org.littoral.scenarios.analysis.SiteDay;
import org.littoral.scenarios.analysis.SiteDayResult;
import org.littoral.scenarios.analysis.TestProfiles;
import org.littoral.scenarios.analysis.Variable;
import org.littoral.scenarios.analysis.detect.Passage;
import org.littoral.scenarios.analysis.detect.PassageKind;
import org.littoral.scenarios.analysis.stats.BreezeType;

class CompositesTest {
    static final Coast COAST = new Coast(40, -74, -5, 90, 180);

    /** A day cooling by `cooling` K at `front`; flights every 15 min. */
    static SiteDayResult day(String d, double front, double cooling, String group) {
        List<Profile> l = new ArrayList<>();
        for (double t = 9; t <= 17; t += 0.25) {
            l.add(TestProfiles.uniform("A", d, t, t < front ? 300 : 300 - cooling, 0.008, 0, 0));
        }
        SiteDay sd = TestProfiles.siteDay(l);
        Passage p = new Passage("A", d, 1, front, 0.125, 1, List.of("x"), 0, 1, new double[2], new double[2], 0, 1, 0, 0,
                PassageKind.INTO_ONSHORE);
        return new SiteDayResult(sd, List.of(p), List.of(), List.of(), new double[2], "user", BreezeType.PURE,
                Map.of("convection", group));
    }

    @Test
    void relativeCompositeGroupsDaysAndGivesOneValuePerDayPerBin() {
        List<SiteDayResult> days = List.of(day("d1", 12.1, 2, "no"), day("d2", 13.6, 4, "no"), day("d3", 11.1, 1, "yes"));
        CompositeSpec spec = CompositeSpec.relative(Variable.THETA, new Layer(10, 100), "convection");
        List<CompositeRow> rows = Composites.compute(days, COAST, spec, 1.0, 0.5, new ArrayList<>());
        CompositeRow after = rows.stream().filter(r -> r.group().equals("no") && r.binCentreHours() == 0.75).findFirst().get();
        assertEquals(2, after.box().n()); // two 15-min profiles per day in the bin, one value per day
        // Theta anomalies scale with temperature by (P0/p)^kappa: -2 K and -4 K near 1000 hPa.
        assertEquals(-3.0, after.box().mean(), 0.05);
        assertTrue(rows.stream().anyMatch(r -> r.group().equals("yes")));
    }

    @Test
    void hourOfDayCompositeBinsByClockTime() {
        List<SiteDayResult> days = List.of(day("d1", 12.1, 2, "no"), day("d2", 13.6, 4, "no"));
        CompositeSpec spec = CompositeSpec.hourOfDay(Variable.TEMPERATURE, new Layer(10, 100), "convection");
        List<CompositeRow> rows = Composites.compute(days, COAST, spec, 1.0, 0.5, new ArrayList<>());
        CompositeRow h9 = rows.stream().filter(r -> r.binCentreHours() == 9.5).findFirst().get();
        assertEquals(300.0, h9.box().median(), 1e-9);
        CompositeRow h14 = rows.stream().filter(r -> r.binCentreHours() == 14.5).findFirst().get();
        assertEquals(297.0, h14.box().mean(), 1e-9);
    }

    @Test
    void daysWithoutAnOnshorePassageAreLeftOutAndNoted() {
        SiteDayResult d = day("d1", 12.1, 2, "no");
        SiteDayResult none = new SiteDayResult(d.siteDay(), List.of(), List.of(), List.of(), new double[2], "user",
                BreezeType.PURE, Map.of());
        List<String> skipped = new ArrayList<>();
        Composites.compute(List.of(none), COAST, CompositeSpec.relative(Variable.THETA, new Layer(10, 100), "x"), 1.0, 0.5,
                skipped);
        assertEquals(1, skipped.size());
    }
}
