package org.littoral.model.front;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Random;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * THE front definitions against prescribed (analytic) fronts: a density-current head moving inland at a known
 * speed, X(t) = c (t - t0), with onshore wind and cooler air behind it and the opposing ambient wind ahead.
 */
class FrontTrackTest {
    static final double DX = 1000.0;
    static final double DT_H = 0.25;
    static final SearchZone ZONE = new SearchZone(-40_000, 80_000, "sponge", "reference band");

    /** A prescribed front: behind u = uBehind, ahead u = uAhead (tanh over 1 km); theta-v 1.5 K lower behind. */
    record Prescribed(double t0H, double speedMPerS, double uBehind, double uAhead, double thetaVDeficitK) {
        double frontM(double tH) {
            return tH < t0H ? Double.NaN : speedMPerS * (tH - t0H) * 3600.0;
        }

        NearSurfaceSection section(boolean fronts) {
            int nt = 41;
            int nx = 141;
            double[] t = new double[nt];
            double[] x = new double[nx];
            double[][] u = new double[nt][nx];
            double[][] ub = new double[nt][nx];
            double[][] tv = new double[nt][nx];
            for (int i = 0; i < nx; i++) {
                x[i] = -50_000 + i * DX;
            }
            for (int n = 0; n < nt; n++) {
                t[n] = 7.0 + n * DT_H;
                double xf = frontM(t[n]);
                for (int i = 0; i < nx; i++) {
                    // behind the front (and everywhere offshore of it once it exists) the onshore breeze
                    double s = Double.isNaN(xf) ? 0.0 : 0.5 * (1 - Math.tanh((x[i] - xf) / 1000.0));
                    u[n][i] = uAhead + s * (uBehind - uAhead);
                    ub[n][i] = u[n][i] - uAhead;
                    tv[n][i] = 300.0 - s * thetaVDeficitK;
                }
            }
            return new NearSurfaceSection(t, x, 10.0, u, ub, null, tv, fronts, ZONE);
        }
    }

    static final Prescribed STANDARD = new Prescribed(10.0, 1.5, 3.0, -2.0, 1.5);

    @Test
    void arrivalIsWhenThePrescribedFrontReachesTheSiteToAQuarterOfTheOutputInterval() {
        FrontTrack tr = FrontTracker.track(STANDARD.section(true), FrontCriteria.standard(0.5));
        for (double x : new double[] {3_000, 10_000, 25_000, 35_000}) {
            Arrival a = tr.arrivalAt(x);
            assertTrue(a.exists() && a.front(), "arrival at " + x + ": " + a);
            double expected = STANDARD.t0H() + x / STANDARD.speedMPerS() / 3600.0;
            // the edge is where the convergence peaks; the half-cell offset of the tanh front and the 15-min output
            assertEquals(expected, a.timeH(), 0.25 * DT_H + 1e-9, "at " + x + " m");
            assertEquals(0.5 * DT_H, a.uncertaintyH(), 1e-12);
        }
    }

    @Test
    void onsetAtTheCoastIsTheArrivalAtXZero() {
        FrontTrack tr = FrontTracker.track(STANDARD.section(true), FrontCriteria.standard(0.5));
        assertEquals(tr.arrivalAt(0.0).timeH(), tr.onsetAtCoast().timeH());
        assertEquals(STANDARD.t0H(), tr.onsetAtCoast().timeH(), 0.5 * DT_H + 1e-9);
    }

    @Test
    void impliedSpeedBetweenSitesIsThePrescribedSpeed() {
        FrontTrack tr = FrontTracker.track(STANDARD.section(true), FrontCriteria.standard(0.5));
        ImpliedSpeed s = FrontTrack.impliedSpeed(tr.arrivalAt(10_000), 10_000, tr.arrivalAt(35_000), 35_000);
        assertTrue(s.resolved(), s.note());
        assertEquals(STANDARD.speedMPerS(), s.mPerS(), 0.05 * STANDARD.speedMPerS());
    }

    @Test
    void arrivalsWithinTheirTimingUncertaintyGiveNoSpeed() {
        Arrival a = new Arrival(12.0, 0.125, true, null);
        Arrival b = new Arrival(12.2, 0.125, true, null);
        ImpliedSpeed s = FrontTrack.impliedSpeed(a, 5_000, b, 20_000);
        assertFalse(s.resolved());
        assertTrue(s.note().startsWith("not resolved"), s.note());
        assertTrue(FrontTrack.impliedSpeed(a, 5_000, new Arrival(12.3, 0.125, true, null), 20_000).resolved());
    }

    @Test
    void penetrationIsTheFarthestFrontPositionAndALowerBoundAtTheSearchLimit() {
        FrontTrack tr = FrontTracker.track(STANDARD.section(true), FrontCriteria.standard(0.5));
        Extent p = tr.maxPenetration();
        // 1.5 m/s for the 7 h after 10:00 brings it to 37.8 km, well inside the 80 km search
        assertEquals(1.5 * 7 * 3600, p.value(), 1500);
        assertFalse(p.atSearchLimit());
        Prescribed fast = new Prescribed(9.0, 5.0, 6.0, -1.0, 2.0);
        Extent q = FrontTracker.track(fast.section(true), FrontCriteria.standard(0.5)).maxPenetration();
        assertTrue(q.atSearchLimit(), "5 m/s for 8 h is 144 km, beyond the 80 km search: " + q);
        assertEquals("reference band", q.limit());
    }

    @Test
    void aWindShiftWithoutADensityContrastIsNoFront() {
        FrontTrack tr = FrontTracker.track(new Prescribed(10.0, 1.5, 3.0, -2.0, -0.5).section(true), FrontCriteria.standard(0.5));
        assertFalse(tr.arrivalAt(10_000).exists());
        assertEquals("no front forms", tr.arrivalAt(10_000).note());
        assertFalse(tr.maxPenetration().exists(), "a front that never forms has no penetration");
        assertFalse(tr.onsetAtCoast().exists());
    }

    @Test
    void aGentleTurnBelowTheMinimumJumpIsNoFront() {
        // 0.8 m/s onshore behind a calm: onshore (>= 0.5 m/s) but a drop of only 0.8 m/s across the edge
        FrontTrack tr = FrontTracker.track(new Prescribed(10.0, 1.5, 0.8, 0.0, 1.0).section(true), FrontCriteria.standard(0.5));
        assertFalse(tr.arrivalAt(10_000).exists());
        assertFalse(tr.maxPenetration().exists());
    }

    @ParameterizedTest
    @ValueSource(ints = {1, 2, 3})
    void nearCalmWanderingAndGustsAheadOfTheFrontDoNotArrive(int seed) {
        // before the front forms (10:00) the wind at the sites wanders near calm (+-0.8 m/s), and convective gusts
        // of up to 3 m/s onshore come and go inland: none is connected to the coast, so none is an arrival
        NearSurfaceSection s = STANDARD.section(true);
        Random r = new Random(seed);
        for (int n = 0; n < s.times(); n++) {
            double xf = STANDARD.frontM(s.timeH()[n]);
            for (int i = 0; i < s.columns(); i++) {
                double x = s.xM()[i];
                if (x > 0 && (Double.isNaN(xf) || x > xf + 8_000)) {
                    double gust = r.nextDouble() < 0.05 ? 3.0 : 0.0;
                    double calm = Double.isNaN(xf) ? 0.8 * (2 * r.nextDouble() - 1) - STANDARD.uAhead() : 0.0;
                    s.totalCrossShoreMPerS()[n][i] += calm + gust;
                    s.breezeCrossShoreMPerS()[n][i] += calm + gust;
                }
            }
        }
        FrontTrack tr = FrontTracker.track(s, FrontCriteria.standard(0.5));
        for (double x : new double[] {10_000, 30_000}) {
            double expected = STANDARD.t0H() + x / STANDARD.speedMPerS() / 3600.0;
            assertEquals(expected, tr.arrivalAt(x).timeH(), 0.25 * DT_H + 1e-9, "at " + x + " m, seed " + seed);
        }
    }

    @Test
    void aFrontThatBrieflyFailsACriterionIsFollowedAcrossTheGap() {
        // at 12:00 and 12:15 the contrast is washed out (warmer air behind, as over a convective cell): the front
        // is not identified then, and arrivals in between are interpolated from 11:45 to 12:30
        NearSurfaceSection s = STANDARD.section(true);
        for (int n = 0; n < s.times(); n++) {
            if (Math.abs(s.timeH()[n] - 12.0) < 1e-9 || Math.abs(s.timeH()[n] - 12.25) < 1e-9) {
                java.util.Arrays.fill(s.thetaVK()[n], 300.0);
            }
        }
        FrontTrack tr = FrontTracker.track(s, FrontCriteria.standard(0.5));
        double x = 1.5 * 3600 * 2.1; // reached at 12:06
        Arrival a = tr.arrivalAt(x);
        assertEquals(12.1, a.timeH(), 0.25 * DT_H);
        assertEquals(0.5 * 0.75, a.uncertaintyH(), 1e-9, "half the 45 min it is interpolated across");
    }

    @Test
    void aFrontSeenAtOneOutputTimeOnlyIsNoFront() {
        // the prescribed front exists from 10:00, but its contrast is there only at 11:00: a passing blip, not a front
        NearSurfaceSection s = STANDARD.section(true);
        for (int n = 0; n < s.times(); n++) {
            if (Math.abs(s.timeH()[n] - 11.0) > 1e-9) {
                java.util.Arrays.fill(s.thetaVK()[n], 300.0);
            }
        }
        FrontTrack tr = FrontTracker.track(s, FrontCriteria.standard(0.5));
        assertFalse(tr.maxPenetration().exists(), tr.maxPenetration().toString());
    }

    @Test
    void arrivalTimesNeverDecreaseWithDistanceInland() {
        FrontTrack tr = FrontTracker.track(STANDARD.section(true), FrontCriteria.standard(0.5));
        double prev = Double.NEGATIVE_INFINITY;
        for (double x = 0; x <= 37_000; x += 500) {
            double t = tr.arrivalAt(x).timeH();
            assertTrue(t >= prev, "at " + x + " m: " + t + " < " + prev);
            prev = t;
        }
    }

    @Test
    void linearTheoryArrivalIsTheOnshoreFlowReachingTheSiteAndSaysSo() {
        // without fronts the edge is the onshore reach: here the same prescribed flow (no contrast needed)
        FrontTrack tr = FrontTracker.track(new Prescribed(10.0, 1.5, 3.0, -2.0, 0.0).section(false), FrontCriteria.standard(0.5));
        Arrival a = tr.arrivalAt(10_000);
        assertTrue(a.exists());
        assertFalse(a.front());
        // the reach is where the tanh profile passes 0.5 m/s: at its centre
        assertEquals(10.0 + 10_000 / 1.5 / 3600.0, a.timeH(), 0.25 * DT_H);
        assertTrue(tr.definitions().contains("linear theory has no front"), tr.definitions());
    }

    @Test
    void inLinearTheoryAStrongAlongshoreWindKeepsTheFlowOutOfTheOnshoreSector() {
        // 3 m/s onshore behind the edge, but 6 m/s alongshore: 63 deg from the inland direction, outside the 60 deg
        // sector of the analysis chain (DetectionSettings.onshoreHalfWidthDeg), so no onshore flow and no arrival
        NearSurfaceSection p = new Prescribed(10.0, 1.5, 3.0, -2.0, 0.0).section(false);
        double[][] v = new double[p.times()][p.columns()];
        for (double[] row : v) {
            java.util.Arrays.fill(row, 6.0);
        }
        NearSurfaceSection s = new NearSurfaceSection(p.timeH(), p.xM(), 10.0, p.totalCrossShoreMPerS(), p.breezeCrossShoreMPerS(), v,
                null, false, ZONE);
        FrontTrack tr = FrontTracker.track(s, FrontCriteria.standard(0.5));
        assertFalse(tr.arrivalAt(10_000).exists());
        assertTrue(tr.definitions().contains("within 60 deg"), tr.definitions());
    }

    @Test
    void aPlaceOnshoreFromTheStartHasNoArrival() {
        // ambient onshore 3 m/s everywhere and no breeze: never a breeze wind, never an edge
        NearSurfaceSection s = new Prescribed(100.0, 1.5, 3.0, 3.0, 0.0).section(false);
        for (int n = 0; n < s.times(); n++) {
            java.util.Arrays.fill(s.breezeCrossShoreMPerS()[n], 1.0);
        }
        Arrival a = FrontTracker.track(s, FrontCriteria.standard(0.5)).arrivalAt(5_000);
        assertNull(a.timeH());
        assertEquals("already onshore at the first output time", a.note());
    }

    @Test
    void thePeakAtTheEdgeOfTheSearchIsALowerBound() {
        NearSurfaceSection s = STANDARD.section(true);
        int last = s.columns() - 1;
        while (s.xM()[last] > ZONE.toM()) {
            last--;
        }
        s.breezeCrossShoreMPerS()[20][last] = 20.0;
        s.breezeCrossShoreMPerS()[20][last + 1] = 30.0; // beyond the search: ignored
        Extent p = FrontTracker.track(s, FrontCriteria.standard(0.5)).peakBreeze();
        assertEquals(20.0, p.value(), 1e-12);
        assertTrue(p.atSearchLimit());
        assertEquals(ZONE.toM(), p.xM(), 1e-9);
    }

    @Test
    void thePeriodicSearchStopsHalfWayToTheWrappedCoast() {
        SearchZone z = SearchZone.periodic(2_048_000);
        assertEquals(-512_000, z.fromM(), 1e-9);
        assertEquals(512_000, z.toM(), 1e-9);
    }
}
