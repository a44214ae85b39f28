package org.littoral.scenarios.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class PlanScorerTest {
    private static final PlanCriteria C = PlanCriteria.defaults();

    @Test
    void wilsonIntervalMatchesNewcombesWorkedExample() {
        // Newcombe (1998), Stat. Med. 17, 857-872, table I: 81/263 -> 0.2553 to 0.3662 (from memory).
        Proportion p = Proportion.of(81, 263);
        assertEquals(0.2553, p.lower(), 5e-4);
        assertEquals(0.3662, p.upper(), 5e-4);
    }

    @Test
    void wilsonIntervalOfZeroSuccessesStartsAtZero() {
        // Newcombe (1998): 0/20 -> 0 to 0.1611 (from memory).
        Proportion p = Proportion.of(0, 20);
        assertEquals(0.0, p.lower(), 1e-12);
        assertEquals(0.1611, p.upper(), 5e-4);
    }

    @Test
    void aPassageIsCapturedOnlyWithEnoughProfilesOnEachSide() {
        assertTrue(new SiteOutcome(13.0, 13.2, 2, 3, false).captured(C));
        assertFalse(new SiteOutcome(13.0, 13.2, 1, 3, false).captured(C));
        assertFalse(new SiteOutcome(13.0, 13.2, 2, 1, false).captured(C));
        assertFalse(new SiteOutcome(13.0, 13.8, 4, 4, false).captured(C), "outside the timing tolerance");
        assertFalse(new SiteOutcome(Double.NaN, 13.0, 4, 4, false).captured(C), "no front arrived: a false passage");
    }

    @Test
    void speedIsResolvedWhenTheImpliedSpeedMatchesTheModel() {
        // front at 10 km/h: 12:00 at 5 km, 14:00 at 25 km; detected 12:10 and 14:05 -> 10.4 km/h
        SiteOutcome[] row = {new SiteOutcome(12.0, 12.1667, 3, 3, false), new SiteOutcome(14.0, 14.0833, 3, 3, false)};
        assertTrue(PlanScorer.speedResolved(row, List.of(5.0, 25.0), C));
        SiteOutcome[] off = {new SiteOutcome(12.0, 12.45, 3, 3, false), new SiteOutcome(14.0, 13.6, 3, 3, false)};
        assertFalse(PlanScorer.speedResolved(off, List.of(5.0, 25.0), C), "20 km in 1.15 h is 17 km/h: 74 % off");
    }

    @Test
    void combinationsCountsBinomially() {
        assertEquals(780, PlanScorer.combinations(40, 2).size()); // C(40, 2)
        assertEquals(1, PlanScorer.combinations(3, 3).size());
        assertEquals(0, PlanScorer.combinations(2, 3).size());
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3, 4, 5})
    void addingASiteNeverLowersAnyScore(long seed) {
        Random rnd = new Random(seed);
        int members = 60;
        int sites = 4;
        SiteOutcome[][] all = new SiteOutcome[members][sites];
        for (int m = 0; m < members; m++) {
            for (int s = 0; s < sites; s++) {
                double truth = rnd.nextDouble() < 0.1 ? Double.NaN : 11 + 4 * rnd.nextDouble();
                double det = rnd.nextDouble() < 0.2 ? Double.NaN : (Double.isNaN(truth) ? 13 : truth + rnd.nextGaussian() * 0.4);
                all[m][s] = new SiteOutcome(truth, det, rnd.nextInt(5), rnd.nextInt(5), rnd.nextDouble() < 0.3);
            }
        }
        List<Double> d = List.of(2.0, 8.0, 15.0, 30.0);
        for (int[] sub : PlanScorer.combinations(sites, 3)) {
            SiteSetScore small = PlanScorer.score(select(all, sub), pick(d, sub), "30", true, 10, C);
            SiteSetScore big = PlanScorer.score(all, d, "30", true, 10, C);
            assertTrue(big.score() >= small.score());
            assertTrue(big.anyCaptured().successes() >= small.anyCaptured().successes());
            assertTrue(big.speedResolved().successes() >= small.speedResolved().successes());
            assertTrue(big.bayAndSeaSeparated().successes() >= small.bayAndSeaSeparated().successes());
            assertTrue(big.expectedSitesCaptured() >= small.expectedSitesCaptured());
        }
    }

    @Test
    void denseWindowSpansTheCentralArrivalsWithAMargin() {
        double[] arrivals = new double[101];
        for (int i = 0; i <= 100; i++) {
            arrivals[i] = 12.0 + i * 0.02; // 12:00 to 14:00 uniformly
        }
        DenseWindow w = DenseWindow.fromArrivals(arrivals, 0.5, 8.0, 18.0);
        assertEquals(12.2 - 0.5, w.startClockH(), 1e-9);
        assertEquals(13.8 + 0.5, w.endClockH(), 1e-9);
        assertEquals(1.0, w.arrivalFraction(), 1e-12);
    }

    private static SiteOutcome[][] select(SiteOutcome[][] all, int[] idx) {
        SiteOutcome[][] out = new SiteOutcome[all.length][idx.length];
        for (int m = 0; m < all.length; m++) {
            for (int j = 0; j < idx.length; j++) {
                out[m][j] = all[m][idx[j]];
            }
        }
        return out;
    }

    private static List<Double> pick(List<Double> d, int[] idx) {
        List<Double> out = new ArrayList<>();
        for (int i : idx) {
            out.add(d.get(i));
        }
        return out;
    }
}
