package org.littoral.model.linear;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.littoral.model.field.Snapshot;
import org.littoral.model.nonlinear.ThetaProfile;

/** The linear model with a height-varying basic state, end to end. */
class StratifiedLinearModelTest {

    private static double maxAbs(double[] a) {
        double m = 0;
        for (double v : a) {
            m = Math.max(m, Math.abs(v));
        }
        return m;
    }

    private static void assertSameFields(LinearConfig cfg, double tolFraction) {
        LinearSolution constant = LinearBreezeModel.solve(cfg);
        // a "layered" profile with no mixed layer and no inversion is the constant-N atmosphere
        LinearSolution layered = LinearBreezeModel.solve(cfg.withStratification(
                new ThetaProfile.Layered(cfg.surfaceThetaK(), 0, 0, 0, cfg.buoyancyFrequencyPerS())));
        for (double hour : new double[] {9, 15, 21}) {
            Snapshot a = constant.snapshotAt(hour * 3600);
            Snapshot b = layered.snapshotAt(hour * 3600);
            double su = maxAbs(a.uMPerS());
            double sw = maxAbs(a.wMPerS());
            for (int i = 0; i < a.uMPerS().length; i++) {
                assertEquals(a.uMPerS()[i], b.uMPerS()[i], tolFraction * su, "u at " + hour + " h, point " + i);
                assertEquals(a.wMPerS()[i], b.wMPerS()[i], tolFraction * sw, "w at " + hour + " h, point " + i);
                assertEquals(a.thetaK()[i], b.thetaK()[i], 1e-6 + tolFraction * 5, "theta at " + hour + " h, point " + i);
            }
        }
    }

    @Test
    void constantNThroughTheBandedSolveMatchesTheClosedFormClassicSolution() {
        // exponential source resolved piecewise linearly on <= 25 m cells: (dz / H)^2 / 12 ~ 5e-5 of the peak
        assertSameFields(LinearTestConfigs.classic45(0.5 / 3600), 1e-3);
    }

    @Test
    void constantNThroughTheBandedSolveMatchesTheGreenSolutionForTheSlabHeating() {
        HeatingSpec slab = new HeatingSpec.SlabMixedLayer(200, 6, 18, 0.01 * 0.01 * 300 / 9.80665, 0.2, 100, 10e3);
        assertSameFields(LinearTestConfigs.config(45, slab, 256, 2000, 31, 3000, 2e-5, 0, true, 8), 1e-3);
    }

    @Test
    void aMixedLayerUnderAnInversionKeepsTheBuoyancyOfTheWindsInsideTheLayerAndTheGroundImpermeable() {
        LinearConfig cfg = LinearTestConfigs.classic45(0.5 / 3600);
        ThetaProfile layered = new ThetaProfile.Layered(300, 800, 3, 100, 0.01);
        LinearSolution s = LinearBreezeModel.solve(cfg.withStratification(layered));
        Snapshot snap = s.snapshotAt(15 * 3600);
        int nx = snap.nx();
        for (int i = 0; i < nx; i++) {
            assertEquals(0.0, snap.wMPerS()[i], 1e-12, "w at the ground, column " + i);
        }
        for (double v : snap.uMPerS()) {
            assertTrue(Double.isFinite(v));
        }
        // the basic state is the layered sounding: neutral mixed layer, warmer above the inversion
        double[] th = s.background().thetaK();
        double[] z = s.background().zM();
        for (int l = 0; l < z.length; l++) {
            assertEquals(layered.thetaK(z[l]), th[l], 1e-9, "background theta at " + z[l] + " m");
        }
        assertTrue(maxAbs(snap.uMPerS()) > 0.05, "a breeze forms: " + maxAbs(snap.uMPerS()));
    }
}
