package org.littoral.scenarios.timing;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.littoral.scenarios.demo.DemoCampaign;
import org.littoral.scenarios.demo.DemoCoast;
import org.littoral.scenarios.demo.DemoDay;
import org.littoral.scenarios.timing.TimingFlag.Kind;
import org.littoral.scenarios.timing.TimingInputs.ArrivalEnvelope;
import org.littoral.scenarios.timing.TimingInputs.DayConditions;
import org.littoral.scenarios.timing.TimingInputs.ObservedPassage;

/** Density-current speeds against Benjamin (1968) and planted timing errors against the flags they should raise. */
class TimingCheckTest {
    private static final double COASTAL_M = 4000.0;
    private static final double INLAND_M = 25000.0;
    /** Contrast 2.5 K, depth 500 m, 2 m/s offshore wind: Simpson & Britter nominal 0.87 sqrt(g'h) - 0.59 * 2. */
    private static final DayConditions DAY = new DayConditions("d1", -2.0, 2.5, 0.5, 300.0, 500.0, 150.0, 1200.0, 9.5);

    /** Benjamin (1968): U/sqrt(g'h) = sqrt((2 - a)(1 - a)/(1 + a)), a = h/H, computed here from the formula. */
    private static double benjaminRatio(double a) {
        return Math.sqrt((2 - a) * (1 - a) / (1 + a));
    }

    @Test
    void benjaminsFroudeNumberTendsToRootTwoForAThinCurrent() {
        assertEquals(Math.sqrt(2.0), DensityCurrent.benjaminFroude(1e-7), 1e-6);
        assertEquals(Math.sqrt(2 * 0.05 * 300.0), DensityCurrent.benjaminSpeedMPerS(0.05, 300.0, Double.POSITIVE_INFINITY), 1e-12);
    }

    @Test
    void benjaminsFroudeNumberIs1point0247AtAQuarterDepth() {
        assertEquals(benjaminRatio(0.25), DensityCurrent.benjaminFroude(0.25), 1e-12);
        assertEquals(1.0247, benjaminRatio(0.25), 5e-5); // docs/references.md section 4 (C)
        // Dimensional: g' = 0.08 m/s2, h = 250 m, H = 1000 m.
        assertEquals(benjaminRatio(0.25) * Math.sqrt(0.08 * 250.0), DensityCurrent.benjaminSpeedMPerS(0.08, 250.0, 1000.0), 1e-12);
    }

    @Test
    void benjaminsHalfDepthCurrentIsTheLockExchangeHalfRootGPrimeH() {
        assertEquals(1.0 / Math.sqrt(2.0), DensityCurrent.benjaminFroude(0.5), 1e-12);
        // Energy-conserving lock exchange: U = 0.5 sqrt(g' H) (Benjamin 1968).
        assertEquals(0.5 * Math.sqrt(0.03 * 800.0), DensityCurrent.benjaminSpeedMPerS(0.03, 400.0, 800.0), 1e-12);
    }

    @Test
    void reducedGravityIsGTimesTheRelativeThetaVContrast() {
        assertEquals(9.80665 * 3.0 / 300.0, DensityCurrent.reducedGravity(3.0, 300.0), 1e-15);
    }

    @Test
    void anOpposingWindSlowsTheFrontBy0point59PerMetrePerSecond() {
        // Simpson & Britter (1980), from memory: U_f = 0.87 sqrt(g'h) - 0.59 U.
        double gp = DensityCurrent.reducedGravity(2.0, 300.0);
        double calm = DensityCurrent.simpsonBritterSpeedMPerS(gp, 500.0, 0.0, 0.87, 0.59);
        assertEquals(0.87 * Math.sqrt(gp * 500.0), calm, 1e-12);
        assertEquals(calm - 0.59 * 3.0, DensityCurrent.simpsonBritterSpeedMPerS(gp, 500.0, -3.0, 0.87, 0.59), 1e-12);
    }

    private static double[] flightsEvery15Min() {
        double[] f = new double[45];
        for (int i = 0; i < f.length; i++) {
            f[i] = 7.0 + 0.25 * i;
        }
        return f;
    }

    private static double[] envelope(double centreHours, double sdHours, long seed) {
        Random r = new Random(seed);
        double[] e = new double[200];
        for (int i = 0; i < e.length; i++) {
            e[i] = centreHours + sdHours * r.nextGaussian();
        }
        return e;
    }

    /** A self-consistent day: fronts 21 km apart at 60 % of the nominal density-current speed. */
    private static double inlandTime(double coastal) {
        double gp = DensityCurrent.reducedGravity(DAY.thetaVContrastK(), DAY.thetaVK());
        double nominal = DensityCurrent.simpsonBritterSpeedMPerS(gp, DAY.breezeDepthM(), DAY.crossShoreWindMPerS(), 0.87, 0.59);
        return coastal + (INLAND_M - COASTAL_M) / (0.6 * nominal) / 3600.0;
    }

    private TimingCheck.Result run(double coastal, double inland, double envCoastal, double envInland, double sdHours) {
        List<ObservedPassage> obs = List.of(
                new ObservedPassage("d1", "coast", COASTAL_M, "sea_breeze", coastal, 0.125),
                new ObservedPassage("d1", "inland", INLAND_M, "sea_breeze", inland, 0.125));
        List<ArrivalEnvelope> env = List.of(
                new ArrivalEnvelope("coast", "sea_breeze", envelope(envCoastal, sdHours, 1)),
                new ArrivalEnvelope("inland", "sea_breeze", envelope(envInland, sdHours, 2)));
        return new TimingCheck(new TimingInputs.Settings()).check(DAY, obs,
                Map.of("coast", flightsEvery15Min(), "inland", flightsEvery15Min()), env);
    }

    @Test
    void aConsistentDayRaisesNoFlag() {
        double coastal = 11.0;
        double inland = Math.round(inlandTime(coastal) * 4) / 4.0; // at a flight
        TimingCheck.Result r = run(coastal, inland, coastal, inland, 0.4);
        assertTrue(r.flags().isEmpty(), r.flags().toString());
        assertEquals(1, r.pairs().size());
        assertTrue(r.passages().get(0).envelopePercentile() > 25 && r.passages().get(0).envelopePercentile() < 75);
    }

    @Test
    void anInlandPassageBeforeTheCoastalOneIsFlagged() {
        TimingCheck.Result r = run(11.0, 10.75, 11.0, 12.5, 1.0);
        assertTrue(r.flagged(Kind.INLAND_BEFORE_COAST, "inland"), r.flags().toString());
        assertFalse(r.flagged(Kind.IMPLIED_SPEED_IMPLAUSIBLE, "inland"));
    }

    @Test
    void aFrontCrossing21KmIn20MinutesIsAnImplausibleSpeed() {
        TimingCheck.Result r = run(11.0, 11.0 + 1.0 / 3.0, 11.0, 12.5, 1.5);
        assertTrue(r.flagged(Kind.IMPLIED_SPEED_IMPLAUSIBLE, "inland"), r.flags().toString());
        TimingFlag f = r.flags().stream().filter(x -> x.kind() == Kind.IMPLIED_SPEED_IMPLAUSIBLE).findFirst().orElseThrow();
        double implied = 21000.0 / 1200.0;
        assertEquals(implied / r.pairs().get(0).nominalMPerS(), f.value(), 1e-9);
        assertTrue(f.value() > 2.0);
    }

    @Test
    void aPassageAtDawnIsEarlierThanAnyPlausibleOnset() {
        TimingCheck.Result r = run(7.25, inlandTime(11.0), 11.0, inlandTime(11.0), 0.3);
        assertTrue(r.flagged(Kind.EARLIER_THAN_ANY_PLAUSIBLE_ONSET, "coast"), r.flags().toString());
        assertTrue(r.flagged(Kind.OUTSIDE_ENVELOPE, "coast"));
        assertFalse(r.flagged(Kind.EARLIER_THAN_ANY_PLAUSIBLE_ONSET, "inland"));
        assertEquals(0.0, r.passages().get(0).envelopePercentile());
    }

    @Test
    void aPassageOneFlightLateIsFlaggedWithTheEarlierFlightFavoured() {
        double coastal = 11.0;
        double truth = Math.round(inlandTime(coastal) * 4) / 4.0;
        TimingCheck.Result r = run(coastal, truth + 0.25, coastal, truth, 0.04); // tight envelope: 2.4 min spread
        TimingFlag f = r.flags().stream().filter(x -> x.kind() == Kind.ONE_CADENCE_OFF && x.site().equals("inland"))
                .findFirst().orElseThrow(() -> new AssertionError(r.flags().toString()));
        assertEquals("earlier", f.favoured());
        assertEquals(truth, f.suggestedTimeHours(), 1e-9);
        assertTrue(r.flagged(Kind.OUTSIDE_ENVELOPE, "inland"));
        assertFalse(r.flagged(Kind.ONE_CADENCE_OFF, "coast"), r.flags().toString());
    }

    @Test
    void aPassageOneFlightEarlyFavoursTheLaterFlight() {
        double coastal = 11.0;
        double truth = Math.round(inlandTime(coastal) * 4) / 4.0;
        TimingCheck.Result r = run(coastal, truth - 0.25, coastal, truth, 0.04);
        TimingFlag f = r.flags().stream().filter(x -> x.kind() == Kind.ONE_CADENCE_OFF && x.site().equals("inland"))
                .findFirst().orElseThrow(() -> new AssertionError(r.flags().toString()));
        assertEquals("later", f.favoured());
    }

    @Test
    void aPassageBeforeTheFirstFlightBetweenFlightsIsNotCalledOneFlightOff() {
        // 06:40 lies before the first flight (07:00) and not at it: there is no earlier flight to move to.
        TimingCheck.Result r = run(6.0 + 40.0 / 60.0, inlandTime(11.0), 11.0, inlandTime(11.0), 0.04);
        assertFalse(r.flagged(Kind.ONE_CADENCE_OFF, "coast"), r.flags().toString());
        assertTrue(r.flagged(Kind.OUTSIDE_ENVELOPE, "coast"));
    }

    /** Every true passage pair of the invented demo campaign is consistent with its own day's density current. */
    @Test
    void theDemoCampaignsTruePassagesAreNotFlagged() {
        DemoCampaign campaign = DemoCampaign.generate(DemoCampaign.DEFAULT_SEED);
        int pairs = 0;
        for (DemoDay d : campaign.days()) {
            List<ObservedPassage> obs = new ArrayList<>();
            for (DemoDay.Front f : d.fronts()) {
                if (f.kind().equals("sea_breeze")) {
                    DemoCoast.Site s = DemoCoast.SITES.get(f.siteIndex());
                    obs.add(new ObservedPassage(d.date().toString(), s.name(), s.inlandDistanceM(), f.kind(), f.arrivalHours(), 0.125));
                }
            }
            DayConditions c = new DayConditions(d.date().toString(), d.ambientCrossShoreMPerS(), d.thetaVContrastK(), 0.5,
                    300.0, d.breezeDepthM(), 150.0, Double.POSITIVE_INFINITY, Double.NaN);
            TimingCheck.Result r = new TimingCheck(new TimingInputs.Settings()).check(c, obs, Map.of(), List.of());
            pairs += r.pairs().size();
            assertTrue(r.flags().isEmpty(), d.date() + ": " + r.flags());
        }
        assertTrue(pairs >= 20);
    }

    @Test
    void onlyTheFirstPassageAtASiteIsComparedWithTheFirstArrivalEnvelope() {
        // a bay breeze at 09:30 then a sea breeze at 12:00 at the coastal site; the model's arrival (docs/fronts.md) is the
        // first front there, centred on 09:30: the bay breeze is within it, the later sea breeze has no counterpart
        double inland = Math.round(inlandTime(12.0) * 4) / 4.0;
        List<ObservedPassage> obs = List.of(
                new ObservedPassage("d1", "coast", COASTAL_M, "bay_breeze", 9.5, 0.125),
                new ObservedPassage("d1", "coast", COASTAL_M, "sea_breeze", 12.0, 0.125),
                new ObservedPassage("d1", "inland", INLAND_M, "sea_breeze", inland, 0.125));
        List<ArrivalEnvelope> env = List.of(
                new ArrivalEnvelope("coast", "sea_breeze", envelope(9.5, 0.4, 1)),
                new ArrivalEnvelope("inland", "sea_breeze", envelope(inland, 0.4, 2)));
        TimingCheck.Result r = new TimingCheck(new TimingInputs.Settings()).check(DAY, obs,
                Map.of("coast", flightsEvery15Min(), "inland", flightsEvery15Min()), env);
        assertTrue(r.flags().stream().noneMatch(f -> f.kind() == TimingFlag.Kind.OUTSIDE_ENVELOPE), r.flags().toString());
        assertTrue(r.passages().get(0).envelopeMembers() > 0, "the bay breeze, first at the site, is compared");
        assertEquals(0, r.passages().get(1).envelopeMembers(), "the later sea breeze is not");
        // the same sea breeze alone at the site (no bay breeze before it) is compared, and falls outside
        TimingCheck.Result alone = new TimingCheck(new TimingInputs.Settings()).check(DAY, obs.subList(1, 3),
                Map.of("coast", flightsEvery15Min(), "inland", flightsEvery15Min()), env);
        assertTrue(alone.flagged(TimingFlag.Kind.OUTSIDE_ENVELOPE, "coast"), alone.flags().toString());
    }
}
