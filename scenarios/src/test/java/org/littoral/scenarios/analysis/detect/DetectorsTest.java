package org.littoral.scenarios.analysis.detect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.analysis.SiteDay;
import org.littoral.scenarios.analysis.TestProfiles;

class DetectorsTest {
    // Sea to the east: onshore = wind from the east, blowing west.
    static final Coast COAST = new Coast(40, -74, -5, 90, 180);

    /** Flights every 30 min 08-18 h; before `change` one state, after another; small seeded noise. */
    static SiteDay day(double change, double t1, double t2, double[] w1, double[] w2, long seed) {
        Random r = new Random(seed);
        List<Profile> l = new ArrayList<>();
        for (double t = 8; t <= 18; t += 0.5) {
            boolean after = t > change;
            double[] w = after ? w2 : w1;
            l.add(TestProfiles.uniform("A", "d", t, (after ? t2 : t1) + 0.05 * r.nextGaussian(), 0.008,
                    w[0] + 0.3 * r.nextGaussian(), w[1] + 0.3 * r.nextGaussian()));
        }
        return TestProfiles.siteDay(l);
    }

    @Test
    void theUnitVectorCostSeesADirectionChangeAtConstantSpeed() {
        DetectionSettings s = new DetectionSettings();
        s.windRepresentation = WindShiftDetector.Representation.UNIT_VECTOR;
        SiteDay sd = day(12.2, 300, 300, Coast.eastNorthFromDirection(4, 270), Coast.eastNorthFromDirection(4, 90), 1);
        List<ChangeCandidate> c = new WindShiftDetector(s).detect(sd, COAST);
        assertEquals(1, c.size());
        assertEquals(12.25, c.get(0).timeHours(), 1e-9); // midpoint of the 12:00 and 12:30 flights
        assertEquals(0.25, c.get(0).uncertaintyHours(), 1e-9);
    }

    @Test
    void theMultivariateDetectorSeesAThermodynamicChangeWithSteadyWind() {
        double[] w = Coast.eastNorthFromDirection(4, 270);
        SiteDay sd = day(13.2, 301, 298, w, w, 2);
        DetectionSettings s = new DetectionSettings();
        s.multiVariables = List.of(org.littoral.scenarios.analysis.Variable.THETA);
        assertEquals(1, new MultivariateDetector(s).detect(sd, COAST).size());
        assertEquals(0, new WindShiftDetector(new DetectionSettings()).detect(sd, COAST).size());
    }

    @Test
    void aChangeOnlyTheMultivariateDetectorFindsIsListedAsUnconfirmed() {
        double[] w = Coast.eastNorthFromDirection(4, 270);
        DetectionSettings s = new DetectionSettings();
        s.multiVariables = List.of(org.littoral.scenarios.analysis.Variable.THETA);
        PassageFinder.Outcome o = PassageFinder.find(day(13.2, 301, 298, w, w, 3), COAST, PassageFinder.detectors(s), s);
        assertTrue(o.passages().isEmpty());
        assertEquals(1, o.unconfirmed().size());
        assertTrue(o.notes().get(0).contains("not confirmed"), o.notes().toString());
    }

    @Test
    void aWindChangeBelowTheMinimumVectorChangeIsRejectedWithANote() {
        DetectionSettings s = new DetectionSettings();
        s.useMultivariate = false;
        s.minVectorChangeMPerS = 5.0;
        SiteDay sd = day(12.2, 300, 300, Coast.eastNorthFromDirection(2, 270), Coast.eastNorthFromDirection(2, 90), 4);
        PassageFinder.Outcome o = PassageFinder.find(sd, COAST, PassageFinder.detectors(s), s);
        assertTrue(o.passages().isEmpty());
        assertTrue(o.notes().get(0).contains("rejected"), o.notes().toString());
    }

    @Test
    void aTurnFromOffshoreToOnshoreIsIntoOnshoreWithHalfConfidenceFromOneOfTwoDetectors() {
        DetectionSettings s = new DetectionSettings();
        s.multiVariables = List.of(org.littoral.scenarios.analysis.Variable.THETA); // steady theta: (b) finds nothing
        s.thetaSdFloorK = 1.0;
        SiteDay sd = day(12.2, 300, 300, Coast.eastNorthFromDirection(3, 270), Coast.eastNorthFromDirection(4, 90), 5);
        PassageFinder.Outcome o = PassageFinder.find(sd, COAST, PassageFinder.detectors(s), s);
        assertEquals(1, o.passages().size());
        Passage p = o.passages().get(0);
        assertEquals(PassageKind.INTO_ONSHORE, p.kind());
        assertEquals(0.5, p.confidence(), 1e-12);
        assertTrue(p.crossShoreAfterMPerS() > 3.5 && p.crossShoreBeforeMPerS() < -2.5);
    }

    @Test
    void theOnshoreSectorHalfWidthIsASetting() {
        DetectionSettings s = new DetectionSettings();
        double[] oblique = Coast.eastNorthFromDirection(4, 140); // 50 deg off onshore
        assertTrue(PassageFinder.inOnshoreSector(oblique[0], oblique[1], COAST, s));
        s.onshoreHalfWidthDeg = 45;
        assertFalse(PassageFinder.inOnshoreSector(oblique[0], oblique[1], COAST, s));
    }

    @Test
    void calmAirIsNeverInTheOnshoreSector() {
        assertFalse(PassageFinder.inOnshoreSector(-0.2, 0.0, COAST, new DetectionSettings()));
    }
}
