package org.littoral.scenarios.report;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class BoxStatsTest {
    // The ordered 11-value example 6, 7, 15, 36, 39, 40, 41, 42, 43, 47, 49 used for quartile
    // methods in introductory statistics texts (e.g. the "Quartile" article of Wikipedia; from memory).
    // Tukey (1977) hinges by hand: median depth 6 -> 40; hinge depth (6 + 1) / 2 = 3.5 -> (15 + 36) / 2
    // and (42 + 43) / 2. R 4.x fivenum() gives 6.0 25.5 40.0 42.5 49.0 (checked when writing this test).
    private static final double[] ELEVEN = {6, 7, 15, 36, 39, 40, 41, 42, 43, 47, 49};

    @Test
    void tukeyHingesOfTheElevenValueExample() {
        BoxStats s = BoxStats.of(ELEVEN);
        assertEquals(6, s.min(), 0);
        assertEquals(25.5, s.q1(), 1e-12);
        assertEquals(40, s.median(), 1e-12);
        assertEquals(42.5, s.q3(), 1e-12);
        assertEquals(49, s.max(), 0);
        assertEquals(0, s.outliers().length);
    }

    // With 102 appended (n = 12): hinge depth (6 + 1) / 2 = 3.5 -> (15 + 36) / 2 = 25.5 and
    // depth 9.5 -> (43 + 47) / 2 = 45; IQR 19.5, upper fence 45 + 1.5 * 19.5 = 74.25, so 102 is an
    // outlier and the upper whisker stops at 49. R boxplot.stats() gives stats 6, 25.5, 40.5, 45, 49,
    // out 102 (checked when writing this test).
    @Test
    void valueBeyondOnePointFiveIqrIsAnOutlierAndTheWhiskerStopsInside() {
        double[] x = new double[12];
        System.arraycopy(ELEVEN, 0, x, 0, 11);
        x[11] = 102;
        BoxStats s = BoxStats.of(x);
        assertEquals(25.5, s.q1(), 1e-12);
        assertEquals(40.5, s.median(), 1e-12);
        assertEquals(45, s.q3(), 1e-12);
        assertEquals(74.25, s.upperFence(), 1e-12);
        assertEquals(49, s.upperWhisker(), 0);
        assertEquals(6, s.lowerWhisker(), 0);
        assertArrayEquals(new double[] {102}, s.outliers(), 0);
    }

    // Hyndman and Fan (1996) definition 7 on 1..10: h = 9 p + 1 -> Q1 = 3.25, Q3 = 7.75
    // (also R's quantile(1:10) default, checked when writing this test).
    @Test
    void hyndmanFanSevenOnOneToTen() {
        double[] x = {1, 2, 3, 4, 5, 6, 7, 8, 9, 10};
        BoxStats s = BoxStats.of(x, BoxStats.Method.HYNDMAN_FAN_7);
        assertEquals(3.25, s.q1(), 1e-12);
        assertEquals(5.5, s.median(), 1e-12);
        assertEquals(7.75, s.q3(), 1e-12);
        assertEquals(7.75, BoxStats.quantile(x, 0.75), 1e-12);
        assertEquals(1, BoxStats.quantile(x, 0), 0);
        assertEquals(10, BoxStats.quantile(x, 1), 0);
    }

    @Test
    void nanValuesAreDroppedAndCounted() {
        BoxStats s = BoxStats.of(new double[] {1, Double.NaN, 2, 3});
        assertEquals(3, s.n());
        assertEquals(1, s.nDropped());
        assertEquals(2, s.median(), 0);
    }
}
