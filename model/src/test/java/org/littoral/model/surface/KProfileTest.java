package org.littoral.model.surface;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.littoral.model.thermo.Thermo;

class KProfileTest {

    @Test
    void convectiveVelocityFollowsDeardorffsScale() {
        // Deardorff (1970): w* = (g/theta w'theta' h)^(1/3); 0.2 K m/s through 1 km at 300 K gives ~1.9 m/s,
        // inside the 1-2 m/s typical of clear convective days (Stull 1988, from memory).
        double ws = KProfile.convectiveVelocityMs(0.2, 300.0, 1000.0);
        assertEquals(Math.cbrt(Thermo.G / 300.0 * 0.2 * 1000.0), ws, 1e-12);
        assertTrue(ws > 1 && ws < 2);
    }

    @Test
    void convectiveDiffusivityPeaksAtOneThirdOfTheDepthWithFourTwentySevenths() {
        // Troen & Mahrt (1986) shape: z (1 - z/h)^2 has its maximum 4h/27 at z = h/3.
        KProfile k = KProfile.of(0.3, 0.2, 300.0, 900.0, 0.0);
        double ws = KProfile.mixedLayerVelocityScaleMs(0.3, KProfile.convectiveVelocityMs(0.2, 300.0, 900.0));
        assertEquals(0.4 * ws * 4.0 * 900.0 / 27.0, k.diffusivityM2s(300.0), 1e-9);
        assertTrue(k.diffusivityM2s(300.0) > k.diffusivityM2s(250.0));
        assertTrue(k.diffusivityM2s(300.0) > k.diffusivityM2s(350.0));
    }

    @Test
    void velocityScaleReducesToFrictionVelocityWithoutConvection() {
        assertEquals(0.4, KProfile.mixedLayerVelocityScaleMs(0.4, 0.0), 1e-12);
    }

    @Test
    void diffusivityIsTheBackgroundValueAboveTheLayerAndAtTheGround() {
        KProfile k = KProfile.of(0.3, 0.1, 300.0, 800.0, 0.5);
        assertEquals(0.5, k.diffusivityM2s(900.0), 0.0);
        assertEquals(0.5, k.diffusivityM2s(0.0), 0.0);
    }

    @Test
    void stableLayerMixesLessThanANeutralOneOfTheSameDepth() {
        KProfile neutral = KProfile.of(0.2, 0.0, 290.0, 200.0, 0.0);
        KProfile stable = KProfile.of(0.2, -0.02, 290.0, 200.0, 0.0);
        assertTrue(stable.obukhovLengthM() > 0);
        assertTrue(stable.diffusivityM2s(50.0) < neutral.diffusivityM2s(50.0));
        // Neutral: K = kappa u* z (1 - z/h)^2 exactly.
        assertEquals(0.4 * 0.2 * 50.0 * 0.75 * 0.75, neutral.diffusivityM2s(50.0), 1e-12);
    }

    @Test
    void fillGivesThePointwiseValues() {
        KProfile k = KProfile.of(0.3, 0.2, 300.0, 900.0, 0.1);
        double[] z = {0, 10, 100, 500, 899, 1000};
        double[] out = new double[z.length];
        k.fill(z, out);
        for (int i = 0; i < z.length; i++) {
            assertEquals(k.diffusivityM2s(z[i]), out[i], 0.0);
        }
    }
}
