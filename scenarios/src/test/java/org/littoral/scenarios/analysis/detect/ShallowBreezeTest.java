package org.littoral.scenarios.analysis.detect;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.analysis.SiteDay;
import org.littoral.scenarios.analysis.TestProfiles;

/**
 * Shallow breezes and drift (docs/analysis.md, "Shallow breezes"): a 180 m deep onshore layer under offshore wind is
 * an onshore passage through the low layer; a steady turn inside onshore flow is not a second front, a step is.
 */
class ShallowBreezeTest {
    // Sea to the east: onshore = wind from the east (90 deg).
    static final Coast COAST = new Coast(40, -74, -5, 90, 180);

    /**
     * Flights every 15 min 08-18 h, levels every 10 m to 600 m. Offshore wind from 270 deg at 3 m/s aloft; after
     * {@code shallowAt} an onshore layer (from 100 deg, 3 m/s) below {@code depthM}, with a smooth top 30 m thick.
     */
    static SiteDay shallowBreezeDay(double shallowAt, double depthM, long seed) {
        return shallowBreezeDay(shallowAt, depthM, Double.NaN, seed);
    }

    /** As above, and from {@code deepAt} (NaN: never) onshore wind (from 90 deg, 5 m/s) through the whole column. */
    static SiteDay shallowBreezeDay(double shallowAt, double depthM, double deepAt, long seed) {
        Random r = new Random(seed);
        List<Profile> l = new ArrayList<>();
        for (double t = 8; t <= 18 + 1e-9; t += 0.25) {
            int n = 60;
            double[] z = new double[n];
            double[] p = new double[n];
            double[] temp = new double[n];
            double[] mr = new double[n];
            double[] u = new double[n];
            double[] v = new double[n];
            double[] off = Coast.eastNorthFromDirection(3, 270);
            double[] on = Coast.eastNorthFromDirection(3, 100);
            double ne = 0.3 * r.nextGaussian();
            double nn = 0.3 * r.nextGaussian();
            for (int k = 0; k < n; k++) {
                z[k] = 10.0 * (k + 1);
                p[k] = 100000.0 - 12.0 * z[k];
                temp[k] = 300.0 - 0.0098 * z[k];
                mr[k] = 0.008;
                double w = t > shallowAt ? 0.5 * (1 - Math.tanh((z[k] - depthM) / 30.0)) : 0.0;
                u[k] = (1 - w) * off[0] + w * on[0] + ne;
                v[k] = (1 - w) * off[1] + w * on[1] + nn;
                if (t > deepAt) {
                    double[] sea = Coast.eastNorthFromDirection(5, 90);
                    u[k] = sea[0] + ne;
                    v[k] = sea[1] + nn;
                }
            }
            l.add(Profile.fromState("A", "d", t, z, p, temp, mr, u, v));
        }
        return TestProfiles.siteDay(l);
    }

    static List<Passage> onshore(PassageFinder.Outcome o) {
        return o.passages().stream().filter(Passage::turnsOnshore).toList();
    }

    @Test
    void aShallowOnshoreLayerUnderOffshoreWindIsAnOnshorePassageThroughTheLowLayer() {
        DetectionSettings s = new DetectionSettings();
        SiteDay sd = shallowBreezeDay(10.1, 180, 1);
        List<Passage> on = onshore(PassageFinder.find(sd, COAST, PassageFinder.detectors(s), s));
        assertEquals(1, on.size(), on.toString());
        Passage p = on.get(0);
        assertTrue(p.detectors().contains(PassageFinder.LOW_LAYER_DETECTOR), p.detectors().toString());
        assertTrue(Math.abs(p.timeHours() - 10.1) <= 0.25, "within one 15-min flight interval of 10:06: " + p.timeHours());
        assertTrue(p.crossShoreAfterMPerS() > 2.0, "the low layer's winds describe it: " + p.crossShoreAfterMPerS());
    }

    @Test
    void aDeepSeaBreezeAfterAShallowBayBreezeStrengthensOnshoreFlow() {
        // the deep turn at 13:06 finds low-layer onshore flow already there: bay breeze, then sea breeze
        DetectionSettings s = new DetectionSettings();
        SiteDay sd = shallowBreezeDay(10.1, 180, 13.1, 5);
        List<Passage> on = onshore(PassageFinder.find(sd, COAST, PassageFinder.detectors(s), s));
        assertEquals(2, on.size(), on.toString());
        assertEquals(PassageKind.INTO_ONSHORE, on.get(0).kind());
        assertEquals(PassageKind.ONSHORE_STRENGTHENING, on.get(1).kind());
        assertTrue(Math.abs(on.get(1).timeHours() - 13.1) <= 0.25, "sea breeze at " + on.get(1).timeHours());
    }

    @Test
    void withoutTheLowLayerTheSameDayHasNoOnshorePassage() {
        DetectionSettings s = new DetectionSettings();
        s.useShallowLayer = false;
        SiteDay sd = shallowBreezeDay(10.1, 180, 1);
        assertEquals(0, onshore(PassageFinder.find(sd, COAST, PassageFinder.detectors(s), s)).size());
    }

    @Test
    void theLowLayerAddsNoConfidenceOfItsOwn() {
        // a deep onshore turn seen by both layers: still one detector of two (the multivariate one sees steady theta)
        DetectionSettings s = new DetectionSettings();
        s.multiVariables = List.of(org.littoral.scenarios.analysis.Variable.THETA);
        s.thetaSdFloorK = 1.0;
        SiteDay sd = shallowBreezeDay(12.1, 2000, 2);
        List<Passage> on = onshore(PassageFinder.find(sd, COAST, PassageFinder.detectors(s), s));
        assertEquals(1, on.size());
        assertEquals(0.5, on.get(0).confidence(), 1e-12);
    }

    /** Onshore flow from 12:00; afterwards the wind veers at {@code veerDegPerH}, or steps by {@code stepDeg} at 15:00. */
    static SiteDay afterFront(double veerDegPerH, double stepDeg, double stepGain, long seed) {
        Random r = new Random(seed);
        List<Profile> l = new ArrayList<>();
        for (double t = 8; t <= 18 + 1e-9; t += 0.5) {
            double[] w = t < 12 ? Coast.eastNorthFromDirection(3, 270)
                    : Coast.eastNorthFromDirection(3 + (t > 15 ? stepGain : 0), 50 + veerDegPerH * (t - 12) + (t > 15 ? stepDeg : 0));
            l.add(TestProfiles.uniform("A", "d", t, 300 + 0.05 * r.nextGaussian(), 0.008, w[0] + 0.3 * r.nextGaussian(),
                    w[1] + 0.3 * r.nextGaussian()));
        }
        return TestProfiles.siteDay(l);
    }

    @Test
    void aSteadyVeerInsideOnshoreFlowIsNotASecondFront() {
        // Haurwitz (1947): the breeze keeps turning clockwise; 12 deg/h from 50 deg through onshore (90 deg)
        DetectionSettings s = new DetectionSettings();
        SiteDay sd = afterFront(12, 0, 0, 3);
        PassageFinder.Outcome o = PassageFinder.find(sd, COAST, PassageFinder.detectors(s), s);
        assertEquals(1, onshore(o).size(), o.passages() + "\n" + o.notes());
    }

    @Test
    void aStepInsideOnshoreFlowStillCountsAsASecondFront() {
        // a second front: 40 deg towards onshore and 3 m/s more at 15:00 on top of the same slow veer
        DetectionSettings s = new DetectionSettings();
        SiteDay sd = afterFront(4, 40, 3, 4);
        PassageFinder.Outcome o = PassageFinder.find(sd, COAST, PassageFinder.detectors(s), s);
        assertEquals(2, onshore(o).size(), o.passages() + "\n" + o.notes());
    }

    @Test
    void aLineFitsADriftAsWellAsAStepButNotAStep() {
        double[] t = new double[12];
        double[][] drift = new double[2][12];
        double[][] step = new double[2][12];
        for (int i = 0; i < 12; i++) {
            t[i] = 12 + 0.5 * i;
            drift[0][i] = 0.5 * i;
            step[0][i] = i < 6 ? 0 : 3;
        }
        assertTrue(PassageFinder.driftFitsAsWell(t, drift, 0, 5, 6, 11, 0.75));
        assertTrue(!PassageFinder.driftFitsAsWell(t, step, 0, 5, 6, 11, 0.75));
    }
}
