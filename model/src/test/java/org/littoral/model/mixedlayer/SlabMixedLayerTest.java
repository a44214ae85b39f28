package org.littoral.model.mixedlayer;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class SlabMixedLayerTest {
    // docs/references.md section 5 (C): H = 200 W/m2 for 6 h, rho c_p = 1206 J/m3/K, gamma = 5 K/km.
    private static final double RHO_CP = 1206.0;
    private static final double GAMMA = 0.005;
    private static final double FLUX = 200.0 / RHO_CP;
    private static final double SIX_HOURS = 6 * 3600.0;

    private static double integrate(SlabMixedLayer ml, double h0, double dt) {
        double h = h0;
        for (double t = 0; t < SIX_HOURS - 1e-9; t += dt) {
            h = ml.step(h, FLUX, dt);
        }
        return h;
    }

    @Test
    void encroachmentAfterSixHoursOf200WattsIs1197Metres() {
        double closedForm = Math.sqrt(2.0 * 200.0 * SIX_HOURS / (RHO_CP * GAMMA)); // Tennekes (1973), A = 0
        assertEquals(1197.0, closedForm, 0.5);
        assertEquals(closedForm, integrate(new SlabMixedLayer(0.0, GAMMA, 100.0), 0.0, 60.0), 1e-6 * closedForm);
    }

    @Test
    void entrainmentRatioPointTwoGives1416Metres() {
        double closedForm = Math.sqrt(2.0 * 1.4 * 200.0 * SIX_HOURS / (RHO_CP * GAMMA)); // (1 + 2A) = 1.4
        assertEquals(1416.0, closedForm, 0.5);
        assertEquals(closedForm, integrate(new SlabMixedLayer(0.2, GAMMA, 100.0), 0.0, 300.0), 1e-6 * closedForm);
    }

    @Test
    void steppingAVaryingFluxAgreesWithTheClosedFormWithinOnePercent() {
        // Half-sine flux over 12 h; closed form needs only the time integral (ZeroOrderJump).
        SlabMixedLayer ml = new SlabMixedLayer(0.2, GAMMA, 50.0);
        double day = 12 * 3600.0;
        double peak = 300.0 / RHO_CP;
        double dt = 600.0;
        double h = 50.0;
        for (double t = 0; t < day - 1e-9; t += dt) {
            h = ml.step(h, peak * Math.sin(Math.PI * (t + 0.5 * dt) / day), dt);
        }
        double integral = peak * 2.0 * day / Math.PI;
        double closed = ZeroOrderJump.depthM(50.0, 0.2, GAMMA, integral);
        assertEquals(closed, h, 0.01 * closed);
    }

    @Test
    void growthRateIsTheZeroOrderJumpOde() {
        SlabMixedLayer ml = new SlabMixedLayer(0.2, GAMMA, 50.0);
        assertEquals(1.4 * 0.1 / (GAMMA * 500.0), ml.growthRateMPerS(500.0, 0.1), 1e-15);
    }

    @Test
    void layerCollapsesToTheNightDepthWhenTheFluxTurnsDownward() {
        SlabMixedLayer ml = new SlabMixedLayer(0.2, GAMMA, 150.0);
        assertEquals(150.0, ml.step(1400.0, -0.01, 60.0), 0.0);
        assertEquals(150.0, ml.step(1400.0, 0.0, 60.0), 0.0);
    }

    @Test
    void columnHeatingIntegratesToSurfacePlusEntrainmentFlux() {
        // Zero-order jump: the layer gains (1 + A) w'theta'_s per unit area (surface flux plus entrainment).
        SlabMixedLayer ml = new SlabMixedLayer(0.2, GAMMA, 50.0);
        double h = 800.0;
        double dz = 1.0;
        double sum = 0;
        for (double z = 0.5; z < 1000; z += dz) {
            sum += ml.heatingRateKPerS(z, h, 0.15) * dz;
        }
        assertEquals(1.2 * 0.15, sum, 1e-9);
    }

    @Test
    void columnsStepInPlace() {
        SlabMixedLayer ml = new SlabMixedLayer(0.2, GAMMA, 100.0);
        double[] h = {100.0, 500.0};
        double[] f = {0.1, -0.05};
        ml.stepColumns(h, f, 60.0);
        assertEquals(ml.step(100.0, 0.1, 60.0), h[0], 0.0);
        assertEquals(100.0, h[1], 0.0);
    }

    @Test
    void nonPositiveLapseRateIsRejected() {
        assertThrows(IllegalArgumentException.class, () -> new SlabMixedLayer(0.2, 0.0, 100.0));
    }
}
