package org.littoral.scenarios.analysis.detect;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class DetectionScoreTest {
    final double[] flights = {10.0, 10.5, 11.0, 11.25, 11.5, 12.0};

    @Test
    void aDetectionWithinOneLocalFlightIntervalIsAHit() {
        DetectionScore s = DetectionScore.score(new double[] {10.6}, new double[] {10.2}, flights);
        assertEquals(1, s.hits());
        assertEquals(0, s.falseDetections());
    }

    @Test
    void theToleranceShrinksWhereFlightsAreDenser() {
        // Around 11.3 h flights are 15 min apart: 0.3 h away is a miss and a false detection.
        DetectionScore s = DetectionScore.score(new double[] {11.3}, new double[] {11.6}, flights);
        assertEquals(0, s.hits());
        assertEquals(1, s.falseDetections());
        assertEquals(0.0, s.hitRate());
    }

    @Test
    void oneDetectionCannotMatchTwoTruths() {
        DetectionScore s = DetectionScore.score(new double[] {10.4, 10.6}, new double[] {10.5}, flights);
        assertEquals(1, s.hits());
        assertEquals(2, s.truths());
    }
}
