package org.littoral.scenarios.analysis.metrics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class CentredDifferenceTest {
    // f = 3 x^2 - 2 x + 1, f' = 6 x - 2: three-point formulas are exact on quadratics (Fornberg 1988).
    static double f(double x) {
        return 3 * x * x - 2 * x + 1;
    }

    @Test
    void unevenSpacingIsExactOnAQuadraticEverywhereIncludingTheEnds() {
        double[] x = {0.0, 0.3, 1.0, 1.25, 2.5, 2.6};
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = f(x[i]);
        }
        double[] d = CentredDifference.derivative(x, y);
        for (int i = 0; i < x.length; i++) {
            assertEquals(6 * x[i] - 2, d[i], 1e-11);
        }
    }

    @Test
    void missingSamplesAreSkippedAndStayMissing() {
        double[] x = {0.0, 0.5, 1.0, 2.0, 3.5};
        double[] y = {f(0.0), Double.NaN, f(1.0), f(2.0), f(3.5)};
        double[] d = CentredDifference.derivative(x, y);
        assertTrue(Double.isNaN(d[1]));
        assertEquals(6 * 1.0 - 2, d[2], 1e-11);
        assertEquals(6 * 3.5 - 2, d[4], 1e-11);
    }

    @Test
    void twoSamplesGiveTheirSlope() {
        double[] d = CentredDifference.derivative(new double[] {1, 3}, new double[] {2, 6});
        assertEquals(2.0, d[0], 1e-15);
        assertEquals(2.0, d[1], 1e-15);
    }
}
