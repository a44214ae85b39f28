package org.littoral.scenarios.compare;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Bias and RMSE as defined by Wilks (2011), section 8.3 (mean error, root-mean-square error). */
class ErrorStatsTest {

    @Test
    void biasAndRmseOfAHandWorkedSample() {
        // differences 1, -1, 3: bias 1, RMSE sqrt((1 + 1 + 9) / 3) = sqrt(11/3)
        ErrorStats s = new ErrorStats();
        s.add(11, 10);
        s.add(9, 10);
        s.add(13, 10);
        assertEquals(3, s.n());
        assertEquals(1.0, s.bias(), 1e-12);
        assertEquals(Math.sqrt(11.0 / 3.0), s.rmse(), 1e-12);
        assertEquals(10.0, s.meanObserved(), 1e-12);
        assertEquals(11.0, s.meanModel(), 1e-12);
    }

    @Test
    void missingDifferencesAreSkippedAndAnEmptySampleIsNaN() {
        ErrorStats s = new ErrorStats();
        s.add(Double.NaN, 3);
        assertEquals(0, s.n());
        assertTrue(Double.isNaN(s.bias()) && Double.isNaN(s.rmse()));
    }

    @Test
    void directionsUseTheWrappedDifferenceAndAVectorMean() {
        ErrorStats s = new ErrorStats(true);
        s.add(10, 350, Angles.differenceDeg(10, 350));
        s.add(350, 10, Angles.differenceDeg(350, 10));
        assertEquals(0.0, s.bias(), 1e-12);
        assertEquals(20.0, s.rmse(), 1e-12);
        // the vector mean of 350 and 10 deg is north, not the arithmetic 180
        double m = s.meanObserved();
        assertTrue(m < 1e-9 || m > 360 - 1e-9, "mean " + m);
    }
}
