package org.littoral.scenarios.sensitivity;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The estimators against closed-form indices. Ishigami and Homma (1990) with a = 7, b = 0.1 and the Sobol' g-function
 * (Saltelli and Sobol' 1995); analytic values computed from the variance decompositions in Sobol' and Levitan (1999)
 * and Saltelli et al. (2008), not pasted.
 */
class SobolIndicesTest {
    private static final int ROWS = 2048;

    @Test
    void ishigamiAnalyticIndicesMatchThePublishedRoundedValues() {
        // Saltelli et al. (2008), section 4.1, quote S1 = 0.314, S2 = 0.442, S_T3 = 0.244 (rounded)
        ReferenceFunctions.Analytic a = ReferenceFunctions.ishigamiIndices(7, 0.1);
        assertEquals(0.314, a.first()[0], 5e-4);
        assertEquals(0.442, a.first()[1], 5e-4);
        assertEquals(0.244, a.total()[2], 5e-4);
        assertEquals(0.558, a.total()[0], 5e-4);
    }

    @Test
    void sobolSequenceStudyOfIshigamiFindsTheAnalyticIndices() {
        SampleDesign d = SampleDesign.of(SampleDesign.Points.SOBOL, 4096, 3, 0);
        SobolIndices.Result r = ReferenceFunctions.study(u -> ReferenceFunctions.ishigami(u, 7, 0.1), d, 200, 1);
        ReferenceFunctions.Analytic a = ReferenceFunctions.ishigamiIndices(7, 0.1);
        for (int i = 0; i < 3; i++) {
            assertEquals(a.first()[i], r.indices()[i].first(), 0.03, "S" + (i + 1));
            assertEquals(a.total()[i], r.indices()[i].total(), 0.03, "ST" + (i + 1));
        }
    }

    @Test
    void bootstrapIntervalsOfARandomDesignCoverTheGFunctionIndices() {
        double[] a = {0, 1, 4.5, 9, 99, 99};
        SampleDesign d = SampleDesign.of(SampleDesign.Points.RANDOM, ROWS, a.length, 20261205L);
        SobolIndices.Result r = ReferenceFunctions.study(u -> ReferenceFunctions.gFunction(u, a), d, 300, 2);
        ReferenceFunctions.Analytic an = ReferenceFunctions.gFunctionIndices(a);
        int covered = 0;
        for (int i = 0; i < a.length; i++) {
            SobolIndices.Index x = r.indices()[i];
            covered += (an.first()[i] >= x.firstLow() - 1e-3 && an.first()[i] <= x.firstHigh() + 1e-3) ? 1 : 0;
            covered += (an.total()[i] >= x.totalLow() - 1e-3 && an.total()[i] <= x.totalHigh() + 1e-3) ? 1 : 0;
        }
        assertTrue(covered >= 10, "95 % intervals cover " + covered + " of 12 analytic indices");
    }

    @Test
    void rowsWithAMissingOutputAreLeftOutOfEveryIndex() {
        double[] ya = {1, 2, Double.NaN, 4};
        double[] yb = {2, 1, 3, 3};
        double[][] yab = {{1, 2, 3, 4}, {2, 1, 2, 3}};
        SobolIndices.Result r = SobolIndices.estimate(ya, yb, yab, 0, 0.95, 1);
        assertEquals(3, r.rowsUsed());
    }

    @Test
    void aConstantOutputHasNoIndices() {
        double[] c = {2, 2, 2, 2};
        SobolIndices.Result r = SobolIndices.estimate(c, c, new double[][] {c}, 10, 0.95, 1);
        assertTrue(Double.isNaN(r.indices()[0].first()));
    }

    @Test
    void addingALargeConstantToTheOutputLeavesTheIndicesAlone() {
        // an arrival time near 10 h that varies by minutes: the indices of f + 10 must be those of f
        SampleDesign d = SampleDesign.of(SampleDesign.Points.SOBOL, 256, 3, 0);
        SobolIndices.Result a = ReferenceFunctions.study(u -> 0.05 * ReferenceFunctions.ishigami(u, 7, 0.1), d, 0, 1);
        SobolIndices.Result b = ReferenceFunctions.study(u -> 10 + 0.05 * ReferenceFunctions.ishigami(u, 7, 0.1), d, 0, 1);
        for (int i = 0; i < 3; i++) {
            assertEquals(a.indices()[i].first(), b.indices()[i].first(), 1e-9);
            assertEquals(a.indices()[i].total(), b.indices()[i].total(), 1e-9);
        }
    }
}
