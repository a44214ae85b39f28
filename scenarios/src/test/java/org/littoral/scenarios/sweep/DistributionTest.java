package org.littoral.scenarios.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/** Moments of the draws against their textbook values, within 5 Monte-Carlo standard errors. */
class DistributionTest {
    static final int N = 20_000;

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3})
    void uniformDrawsHaveMeanHalfwayAndVarianceWidthSquaredOverTwelve(long seed) {
        // Uniform(a, b): mean (a + b) / 2, variance (b - a)^2 / 12 (any probability text).
        var d = new Distribution.Uniform(2, 8, false);
        double[] m = moments(d, seed);
        double sdv = Math.sqrt(3.0);
        assertEquals(5.0, m[0], 5 * sdv / Math.sqrt(N));
        assertEquals(3.0, m[1], 5 * Math.sqrt(0.8 * 9.0 / N)); // var of s^2 for uniform: (mu4 - sigma^4)/N, mu4 = 9 sigma^4 / 5
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3})
    void untruncatedNormalDrawsHaveTheirMeanAndStandardDeviation(long seed) {
        var d = new Distribution.Normal(4, 2, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, false);
        double[] m = moments(d, seed);
        assertEquals(4.0, m[0], 5 * 2 / Math.sqrt(N));
        assertEquals(4.0, m[1], 5 * 4 * Math.sqrt(2.0 / N)); // var of s^2 for a normal: 2 sigma^4 / N
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3})
    void aNormalTruncatedAtItsMeanHasTheHalfNormalMean(long seed) {
        // Half-normal: E[X - mu | X > mu] = sigma sqrt(2 / pi) (Johnson, Kotz and Balakrishnan 1994, ch. 13).
        var d = new Distribution.Normal(0, 1, 0, Double.POSITIVE_INFINITY, false);
        double[] m = moments(d, seed);
        assertEquals(Math.sqrt(2 / Math.PI), m[0], 5 * Math.sqrt(1 - 2 / Math.PI) / Math.sqrt(N));
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2})
    void directionsWrapIntoZeroTo360(long seed) {
        var d = new Distribution.Normal(350, 30, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, true);
        SplittableRandom r = new SplittableRandom(seed);
        for (int i = 0; i < 1000; i++) {
            double v = d.draw(r).value().asDouble();
            assertTrue(v >= 0 && v < 360, "wrapped direction " + v);
        }
    }

    private static double[] moments(Distribution d, long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        double s = 0;
        double s2 = 0;
        for (int i = 0; i < N; i++) {
            double v = d.draw(r).value().asDouble();
            s += v;
            s2 += v * v;
        }
        double mean = s / N;
        return new double[] {mean, s2 / N - mean * mean};
    }
}
