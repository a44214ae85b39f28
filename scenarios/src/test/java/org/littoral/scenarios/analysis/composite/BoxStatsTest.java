package org.littoral.scenarios.analysis.composite;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class BoxStatsTest {
    @Test
    void quartilesFollowHyndmanAndFanType7AsInR() {
        // R: quantile(1:10) gives 3.25, 5.5, 7.75 (type 7, the R default).
        BoxStats b = BoxStats.of(new double[] {10, 9, 8, 7, 6, 5, 4, 3, 2, 1});
        assertEquals(3.25, b.q1(), 1e-12);
        assertEquals(5.5, b.median(), 1e-12);
        assertEquals(7.75, b.q3(), 1e-12);
    }

    @Test
    void valuesBeyondOneAndAHalfIqrAreOutliersAndTheWhiskersStopAtTheLastValueInside() {
        // R: quantile(c(2,4,4,5,7,9,30)) gives q1 4 and q3 8; IQR 4, upper fence 14 (Tukey 1977).
        BoxStats b = BoxStats.of(new double[] {2, 4, 4, 5, 7, 9, 30});
        assertEquals(4.0, b.q1(), 1e-12);
        assertEquals(8.0, b.q3(), 1e-12);
        assertEquals(1, b.outliers());
        assertEquals(9.0, b.whiskerHigh(), 0);
        assertEquals(2.0, b.whiskerLow(), 0);
        assertEquals(30.0, b.max(), 0);
    }

    @Test
    void missingValuesAreIgnored() {
        assertEquals(3, BoxStats.of(new double[] {1, Double.NaN, 2, 3}).n());
    }
}
