package org.littoral.scenarios.analysis.detect;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.RepeatedTest;
import org.junit.jupiter.api.Test;

class PeltTest {
    // docs/references.md section 8 worked example (C): Killick et al. (2012) normal mean cost, sigma = 1.
    static final double[] EXAMPLE = {1.0, 1.2, 0.8, 1.1, 0.9, 3.0, 3.2, 2.8, 3.1, 2.9};

    static double ss(double[] y, int a, int b) {
        double m = 0;
        for (int i = a; i < b; i++) {
            m += y[i];
        }
        m /= (b - a);
        double s = 0;
        for (int i = a; i < b; i++) {
            s += (y[i] - m) * (y[i] - m);
        }
        return s;
    }

    @Test
    void workedExampleHasOneChangeAfterTheFifthValue() {
        Segmentation s = Pelt.segment(new NormalMeanCost(new double[][] {EXAMPLE}), Penalty.bic(), 1);
        assertArrayEquals(new int[] {5}, s.changeEnds());
    }

    @Test
    void workedExampleCostIsSegmentSumsOfSquaresPlusOnePenalty() {
        Segmentation s = Pelt.segment(new NormalMeanCost(new double[][] {EXAMPLE}), Penalty.bic(), 1);
        double expected = ss(EXAMPLE, 0, 5) + ss(EXAMPLE, 5, 10) + 2 * Math.log(10); // = 4.8052
        assertEquals(expected, s.totalCost(), 1e-12);
        assertEquals(4.8052, s.totalCost(), 5e-5);
    }

    @Test
    void workedExampleWithoutChangeCostsTheWholeSumOfSquares() {
        NormalMeanCost c = new NormalMeanCost(new double[][] {EXAMPLE});
        assertEquals(ss(EXAMPLE, 0, 10), c.cost(0, 10), 1e-12);
        assertEquals(10.20, c.cost(0, 10), 5e-3);
    }

    static double[][] randomSeries(Random r, int dims, int n) {
        double[][] y = new double[dims][n];
        for (int d = 0; d < dims; d++) {
            double level = 0;
            for (int i = 0; i < n; i++) {
                if (r.nextDouble() < 0.08) {
                    level += 3 * r.nextGaussian();
                }
                y[d][i] = level + r.nextGaussian();
            }
        }
        return y;
    }

    @RepeatedTest(40)
    void peltEqualsOptimalPartitioningOnRandomSeries(org.junit.jupiter.api.RepetitionInfo info) {
        Random r = new Random(1000 + info.getCurrentRepetition());
        int dims = 1 + r.nextInt(3);
        int minSeg = 1 + r.nextInt(4);
        Penalty pen = r.nextBoolean() ? Penalty.bic() : Penalty.mbic();
        NormalMeanCost c = new NormalMeanCost(randomSeries(r, dims, 30 + r.nextInt(120)));
        Segmentation a = Pelt.segment(c, pen, minSeg);
        Segmentation b = OptimalPartitioning.segment(c, pen, minSeg);
        assertArrayEquals(b.changeEnds(), a.changeEnds());
        assertEquals(b.totalCost(), a.totalCost(), 0.0);
    }

    /** Exhaustive search over all 2^(n-1) segmentations: the definition of the optimum. */
    static double bruteForce(NormalMeanCost c, Penalty p, int minSeg) {
        int n = c.length();
        double best = Double.POSITIVE_INFINITY;
        double beta = p.perChange(n, c.dimensions());
        for (int mask = 0; mask < (1 << (n - 1)); mask++) {
            double total = 0;
            int start = 0;
            boolean ok = true;
            for (int i = 1; i <= n; i++) {
                if (i == n || (mask & (1 << (i - 1))) != 0) {
                    if (i - start < minSeg) {
                        ok = false;
                        break;
                    }
                    total += c.cost(start, i) + p.perSegment(i - start, n) + (start > 0 ? beta : 0);
                    start = i;
                }
            }
            if (ok && total < best) {
                best = total;
            }
        }
        return best;
    }

    @RepeatedTest(20)
    void peltReachesTheExhaustiveOptimumOnShortSeries(org.junit.jupiter.api.RepetitionInfo info) {
        Random r = new Random(7 + info.getCurrentRepetition());
        NormalMeanCost c = new NormalMeanCost(randomSeries(r, 1 + r.nextInt(2), 13));
        int minSeg = 1 + r.nextInt(3);
        Penalty p = Penalty.manual(0.5 + 4 * r.nextDouble());
        assertEquals(bruteForce(c, p, minSeg), Pelt.segment(c, p, minSeg).totalCost(), 1e-9);
    }

    @Test
    void segmentsAreNeverShorterThanTheMinimumLength() {
        Random r = new Random(3);
        NormalMeanCost c = new NormalMeanCost(randomSeries(r, 1, 200));
        int[] ends = Pelt.segment(c, Penalty.manual(1.0), 4).changeEnds();
        int prev = 0;
        for (int e : ends) {
            assertTrue(e - prev >= 4);
            prev = e;
        }
        assertTrue(200 - prev >= 4);
    }

    @Test
    void segmentNeighbourhoodWithTheChangesPeltFoundGivesTheSameLocations() {
        Random r = new Random(11);
        NormalMeanCost c = new NormalMeanCost(randomSeries(r, 2, 80));
        Segmentation p = Pelt.segment(c, Penalty.bic(), 2);
        Segmentation sn = OptimalPartitioning.segmentWithChanges(c, p.changes(), 2);
        assertArrayEquals(p.changeEnds(), sn.changeEnds());
    }

    @Test
    void bicPenaltyCountsTheChangingMeansPlusTheLocation() {
        // Schwarz (1978): (p + 1) ln n; p = 1 gives the 2 ln n of Killick et al. (2012).
        assertEquals(2 * Math.log(10), Penalty.bic().perChange(10, 1), 1e-15);
        assertEquals(3 * Math.log(10), Penalty.bic().perChange(10, 2), 1e-15);
    }

    @Test
    void mbicPenaltyIsThreeLogNPerChangeForOneMean() {
        // Zhang & Siegmund (2007): 3 ln n per change plus ln(n_j / n) per segment.
        assertEquals(3 * Math.log(50), Penalty.mbic().perChange(50, 1), 1e-15);
        assertEquals(Math.log(10.0 / 50), Penalty.mbic().perSegment(10, 50), 1e-15);
    }
}
