package org.littoral.scenarios.analysis.metrics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.analysis.Layer;
import org.littoral.scenarios.analysis.SiteDay;
import org.littoral.scenarios.analysis.TestProfiles;
import org.littoral.scenarios.analysis.Variable;
import org.littoral.scenarios.analysis.detect.Passage;
import org.littoral.scenarios.analysis.detect.PassageKind;

class ResponseMetricsTest {
    static final Coast COAST = new Coast(40, -74, -5, 90, 180);

    static Passage at(double t) {
        return new Passage("A", "d", 1, t, 0.25, 1, List.of("x"), 0, 1, new double[2], new double[2], 0, 0, 0, 0,
                PassageKind.INTO_ONSHORE);
    }

    static MetricSettings settings(Variable v) {
        MetricSettings s = new MetricSettings();
        s.layers = List.of(new Layer(10, 100));
        s.variables = List.of(v);
        return s;
    }

    /** Temperature 300 K before 12 h, 298 K after; flights at uneven times. */
    static SiteDay stepDay() {
        List<Profile> l = new ArrayList<>();
        double[] times = {10.0, 10.5, 11.0, 11.5, 11.75, 12.25, 12.5, 13.0, 13.5, 14.5};
        for (double t : times) {
            l.add(TestProfiles.uniform("A", "d", t, t < 12 ? 300.0 : 298.0, 0.008, 0, 0));
        }
        return TestProfiles.siteDay(l);
    }

    @Test
    void aStepInTemperatureGivesAChangeOfTheStepSize() {
        PassageResponse r = ResponseMetrics.responses(stepDay(), List.of(at(12.0)), COAST, settings(Variable.TEMPERATURE)).get(0);
        assertEquals(-2.0, r.change(), 1e-9);
        assertEquals(3, r.nPre()); // [11, 12): 11.0, 11.5, 11.75
        assertEquals(4, r.nPost()); // (12, 14]: 12.25, 12.5, 13.0, 13.5
    }

    @Test
    void aLinearRampGivesItsSlopeAsTendency() {
        List<Profile> l = new ArrayList<>();
        double[] times = {10.0, 10.4, 11.0, 11.3, 12.2, 12.5, 13.1, 13.9};
        for (double t : times) {
            l.add(TestProfiles.uniform("A", "d", t, 290.0 + 0.8 * t, 0.008, 0, 0));
        }
        MetricSettings s = settings(Variable.TEMPERATURE);
        PassageResponse r = ResponseMetrics.responses(TestProfiles.siteDay(l), List.of(at(11.7)), COAST, s).get(0);
        assertEquals(0.8, r.tendencyPerHour(), 1e-9);
    }

    @Test
    void dailyMeanReferenceMeasuresTheAnomalyAgainstTheWholeDay() {
        MetricSettings s = settings(Variable.TEMPERATURE);
        s.reference = MetricSettings.Reference.DAILY_MEAN;
        PassageResponse r = ResponseMetrics.responses(stepDay(), List.of(at(12.0)), COAST, s).get(0);
        double daily = (5 * 300.0 + 5 * 298.0) / 10;
        assertEquals(298.0 - daily, r.anomaly(), 1e-9);
    }

    @Test
    void mixingRatioIsReportedInGramsPerKilogram() {
        PassageResponse r = ResponseMetrics.responses(stepDay(), List.of(at(12.0)), COAST, settings(Variable.MIXING_RATIO)).get(0);
        assertEquals(8.0, r.preMean(), 1e-9);
    }

    @Test
    void standardisedChangesHaveZeroMeanAndUnitSpread() {
        List<PassageResponse> rows = new ArrayList<>();
        MetricSettings s = settings(Variable.TEMPERATURE);
        rows.addAll(ResponseMetrics.responses(stepDay(), List.of(at(12.0), at(11.25), at(13.25)), COAST, s));
        List<PassageResponse> z = ResponseMetrics.standardise(rows);
        double[] v = z.stream().mapToDouble(PassageResponse::changeStandardised).toArray();
        Moments m = Moments.of(v);
        assertEquals(0.0, m.mean(), 1e-12);
        assertEquals(1.0, m.sd(), 1e-12);
    }
}
