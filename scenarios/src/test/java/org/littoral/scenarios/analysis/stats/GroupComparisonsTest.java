package org.littoral.scenarios.analysis.stats;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;

class GroupComparisonsTest {
    final StatsSettings s = new StatsSettings();

    static double[] normal(Random r, int n, double mean) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = mean + r.nextGaussian();
        }
        return x;
    }

    static double[] exponential(Random r, int n) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = -Math.log(1 - r.nextDouble());
        }
        return x;
    }

    @Test
    void largeNearNormalSamplesGetTheZTest() {
        Random r = new Random(1);
        ComparisonRow row = GroupComparisons.compare("m", "g", "A", normal(r, 60, 0), "B", normal(r, 50, 0.5), s);
        assertEquals(ComparisonRow.Test.Z_TEST, row.test());
    }

    @Test
    void smallNearNormalSamplesGetTheWelchTest() {
        Random r = new Random(2);
        ComparisonRow row = GroupComparisons.compare("m", "g", "A", normal(r, 12, 0), "B", normal(r, 9, 0.5), s);
        assertEquals(ComparisonRow.Test.WELCH_T, row.test());
        assertTrue(row.degreesOfFreedom() > 0);
    }

    @Test
    void aStronglySkewedSampleGetsTheMannWhitneyTest() {
        Random r = new Random(3);
        double[] skewed = exponential(r, 80);
        skewed[0] = 40; // a far tail, as rain or convective days give
        ComparisonRow row = GroupComparisons.compare("m", "g", "A", skewed, "B", normal(r, 80, 1), s);
        assertEquals(ComparisonRow.Test.MANN_WHITNEY, row.test());
        assertTrue(row.why().startsWith("far from normal"));
    }

    @Test
    void holmAdjustmentMatchesTheStepDownDefinition() {
        // Holm (1979); R p.adjust(c(0.01, 0.04, 0.03, 0.005), "holm") gives 0.03 0.06 0.06 0.02.
        assertArrayEquals(new double[] {0.03, 0.06, 0.06, 0.02}, GroupComparisons.holm(new double[] {0.01, 0.04, 0.03, 0.005}),
                1e-12);
    }

    @Test
    void theNoteCountsTheComparisons() {
        assertTrue(GroupComparisons.note(20, 0.05).startsWith("20 comparisons"));
    }

    @Test
    void jarqueBeraOfOneToFiveFollowsFromTheMoments() {
        // m2 = 2, m4 = 6.8, b2 = 1.7, skew 0: JB = 5/6 (1.7 - 3)^2 / 4 = 0.3520833 (Jarque & Bera 1987).
        NormalityDiagnostics d = NormalityDiagnostics.of(new double[] {1, 2, 3, 4, 5});
        assertEquals(0.0, d.skewness(), 1e-12);
        assertEquals(-1.3, d.excessKurtosis(), 1e-12);
        assertEquals(5.0 / 6.0 * 1.69 / 4.0, d.jarqueBera(), 1e-12);
    }

    @Test
    void mannWhitneyUOfTheTortoisesIsEleven() {
        // Wikipedia, "Mann-Whitney U test", illustration of calculation methods: finishing order
        // T H H H H H T T T T T H; ranking the first home 12 and the last 1, the tortoises' rank sum is
        // 32 and U_T = 32 - 21 = 11, U_H = 25.
        double[] tortoises = {12, 6, 5, 4, 3, 2};
        double[] hares = {11, 10, 9, 8, 7, 1};
        assertEquals(11.0, TwoSampleTests.mannWhitney(tortoises, hares).statistic(), 1e-12);
        assertEquals(25.0, TwoSampleTests.mannWhitney(hares, tortoises).statistic(), 1e-12);
    }
}
