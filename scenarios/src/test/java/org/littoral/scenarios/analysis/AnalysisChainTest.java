package org.littoral.scenarios.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.analysis.detect.Passage;
import org.littoral.scenarios.analysis.detect.PassageKind;
import org.littoral.scenarios.analysis.ingest.AscentBinner;
import org.littoral.scenarios.analysis.ingest.IngestSettings;
import org.littoral.scenarios.analysis.ingest.QcLog;
import org.littoral.scenarios.analysis.ingest.RawFlight;
import org.littoral.scenarios.analysis.stats.BreezeType;
import org.littoral.scenarios.bench.SyntheticAscents;
import org.littoral.scenarios.input.UserInputException;

/** End-to-end behaviour of the façade on invented days (SyntheticAscents; not data). */
class AnalysisChainTest {
    // Sea to the east, Northern Hemisphere.
    static final Coast COAST = new Coast(40, -74, -5, 90, 180);

    static List<Profile> profiles(SyntheticAscents.DaySpec d) {
        List<Profile> out = new ArrayList<>();
        QcLog log = new QcLog();
        for (RawFlight f : SyntheticAscents.day(d)) {
            out.add(AscentBinner.bin(f, new IngestSettings(), log));
        }
        return out;
    }

    static SiteDayResult analyse(SyntheticAscents.DaySpec d) {
        return AnalysisChain.run(profiles(d), COAST, new AnalysisSettings()).siteDays().get(0);
    }

    @Test
    void aSeaBreezeDayGivesOneOnshorePassageWithinOneFlightInterval() {
        double[] offshore = Coast.eastNorthFromDirection(3, 270);
        SiteDayResult r = analyse(SyntheticAscents.DaySpec.typical("A", "2024-07-01", COAST, offshore, 13.1, Double.NaN, 1));
        assertEquals(1, r.passages().size(), r.notes().toString());
        Passage p = r.passages().get(0);
        assertEquals(PassageKind.INTO_ONSHORE, p.kind());
        assertEquals(13.1, p.timeHours(), 0.5);
    }

    @Test
    void theBayBreezeAndTheSeaBreezeComeOutAsTwoOrderedOnshorePassages() {
        double[] offshore = Coast.eastNorthFromDirection(3, 270);
        SiteDayResult r = analyse(SyntheticAscents.DaySpec.typical("A", "2024-07-01", COAST, offshore, 14.6, 11.1, 2));
        assertEquals(2, r.passages().size(), r.notes().toString());
        assertEquals(PassageKind.INTO_ONSHORE, r.passages().get(0).kind());
        assertEquals(PassageKind.ONSHORE_STRENGTHENING, r.passages().get(1).kind());
        assertEquals(11.1, r.passages().get(0).timeHours(), 0.5);
        assertEquals(14.6, r.passages().get(1).timeHours(), 0.5);
        assertEquals(1, r.passages().get(0).ordinal());
        assertEquals(2, r.passages().get(1).ordinal());
    }

    @Test
    void aPassageTimeLiesBetweenTheFlightsAroundItWithAtLeastHalfTheIntervalAsUncertainty() {
        double[] offshore = Coast.eastNorthFromDirection(3, 270);
        SiteDayResult r = analyse(SyntheticAscents.DaySpec.typical("A", "2024-07-01", COAST, offshore, 13.1, Double.NaN, 3));
        Passage p = r.passages().get(0);
        double a = r.siteDay().timeHours()[p.lastBefore()];
        double b = r.siteDay().timeHours()[p.firstAfter()];
        assertTrue(p.timeHours() >= a && p.timeHours() <= b, a + " <= " + p.timeHours() + " <= " + b);
        assertTrue(p.uncertaintyHours() >= 0.5 * (b - a));
    }

    @Test
    void withoutHalfWayTimingAPassageIsAtTheMidpointOfTheFlightsAroundIt() {
        double[] offshore = Coast.eastNorthFromDirection(3, 270);
        AnalysisSettings s = new AnalysisSettings();
        s.detection.halfTurnTiming = false;
        s.detection.useShallowLayer = false;
        SiteDayResult r = AnalysisChain.run(profiles(SyntheticAscents.DaySpec.typical("A", "2024-07-01", COAST, offshore, 13.1,
                Double.NaN, 3)), COAST, s).siteDays().get(0);
        Passage p = r.passages().get(0);
        double a = r.siteDay().timeHours()[p.lastBefore()];
        double b = r.siteDay().timeHours()[p.firstAfter()];
        assertEquals(0.5 * (a + b), p.timeHours(), 1e-12);
    }

    @Test
    void whenBothDetectorsAgreeTheConfidenceIsOne() {
        double[] offshore = Coast.eastNorthFromDirection(3, 270);
        SiteDayResult r = analyse(SyntheticAscents.DaySpec.typical("A", "2024-07-01", COAST, offshore, 13.1, Double.NaN, 4));
        assertEquals(1.0, r.passages().get(0).confidence(), 1e-12);
        // the wind-shift detector on the low layer is the same detector: listed, but no agreement of its own
        assertEquals(List.of("pelt-wind", "pelt-multi", "pelt-wind-low"), r.passages().get(0).detectors());
    }

    @Test
    void aDayWithoutABreezeHasNoPassage() {
        double[] offshore = Coast.eastNorthFromDirection(3, 270);
        SiteDayResult r = analyse(SyntheticAscents.DaySpec.typical("A", "2024-07-01", COAST, offshore, Double.NaN, Double.NaN, 5));
        assertEquals(0, r.passages().size(), r.passages().toString());
    }

    @Test
    void theMorningAmbientWindTypesTheDay() {
        double[] fromSouth = Coast.eastNorthFromDirection(5, 180);
        SiteDayResult r = analyse(SyntheticAscents.DaySpec.typical("A", "2024-07-01", COAST, fromSouth, 13.1, Double.NaN, 6));
        assertEquals("profiles", r.ambientSource());
        assertEquals(BreezeType.CORKSCREW, r.breezeType());
        assertEquals("07", r.attributes().get("month"));
    }

    @Test
    void aUserSuppliedBreezeTypeOverridesTheClassifier() {
        double[] offshore = Coast.eastNorthFromDirection(3, 270);
        AnalysisSettings s = new AnalysisSettings();
        s.dayAttributes.put("2024-07-01", java.util.Map.of("breeze_type", "backdoor", "convection", "yes"));
        SiteDayResult r = AnalysisChain.run(profiles(SyntheticAscents.DaySpec.typical("A", "2024-07-01", COAST, offshore,
                13.1, Double.NaN, 7)), COAST, s).siteDays().get(0);
        assertEquals(BreezeType.BACKDOOR, r.breezeType());
        assertEquals("yes", r.attributes().get("convection"));
    }

    @Test
    void twoProfilesAtTheSameTimeAtOneSiteAreRejected() {
        double[] offshore = Coast.eastNorthFromDirection(3, 270);
        List<Profile> p = profiles(SyntheticAscents.DaySpec.typical("A", "2024-07-01", COAST, offshore, 13.1, Double.NaN, 8));
        p.add(p.get(0));
        assertThrows(UserInputException.class, () -> AnalysisChain.group(p));
    }

    @Test
    void aSmallCampaignGivesResponsesCompositesAndGroupComparisons() {
        List<Profile> all = new ArrayList<>();
        for (int d = 0; d < 8; d++) {
            double[] amb = Coast.eastNorthFromDirection(4, d < 4 ? 270 : 180);
            all.addAll(profiles(SyntheticAscents.DaySpec.typical("A", "2024-07-0" + (d + 1), COAST, amb, 12.0 + 0.3 * d,
                    Double.NaN, 100 + d)));
        }
        AnalysisResult r = AnalysisChain.run(all, COAST, new AnalysisSettings());
        assertEquals(8, r.passages().size());
        // The invented front moistens by 1.5 g/kg x (1 - z / 500 m), 1.335 g/kg on average over 10-100 m
        // (the generator has no diurnal trend in mixing ratio).
        double meanChange = r.responses().stream().filter(x -> x.variable() == Variable.MIXING_RATIO
                && x.layer().bottomM() == 10).mapToDouble(x -> x.change()).average().orElse(Double.NaN);
        assertEquals(1.5 * (1 - 55.0 / 500), meanChange, 0.1);
        assertTrue(!r.composites().isEmpty());
        assertTrue(r.comparisons().stream().allMatch(c -> c.groupA().equals("CORKSCREW") && c.groupB().equals("PURE")),
                r.comparisons().toString());
        assertEquals(3 * 7, r.comparisons().size()); // 3 layers x 7 variables, one pair
        assertTrue(r.comparisonNote().startsWith("21 comparisons"));
    }
}
