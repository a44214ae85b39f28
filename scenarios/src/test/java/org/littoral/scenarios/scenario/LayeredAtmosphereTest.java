package org.littoral.scenarios.scenario;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.littoral.model.nonlinear.ThetaProfile;
import org.littoral.scenarios.input.UserInputException;

class LayeredAtmosphereTest {
    private static final String LAYERS = "  buoyancy_frequency_per_s: 0.01\n  mixed_layer_depth_m: 800\n  inversion_K: 2\n  inversion_depth_m: 50\n";

    @Test
    void mixedLayerKeysGiveBothModelsTheSameLayeredSounding() {
        String yaml = BuiltinScenarios.text("classic-45N").replace("  buoyancy_frequency_per_s: 0.01\n", LAYERS);
        Scenario s = ScenarioFile.parse("layered", yaml, false);
        ThetaProfile p = s.toLinearConfig().stratification();
        ThetaProfile.Layered l = assertInstanceOf(ThetaProfile.Layered.class, p);
        assertEquals(800, l.mixedLayerDepthM());
        assertEquals(2, l.inversionJumpK());
        assertEquals(50, l.inversionDepthM());
        assertEquals(0.01, l.freeBuoyancyFrequencyPerS());
        assertEquals(p, s.toNonlinearConfig().theta());
        // neutral below 800 m, 2 K warmer above 850 m
        assertEquals(0.0, p.buoyancyFrequencySquared(400), 0.0);
        assertEquals(s.atmosphere().surfaceThetaK() + 2, p.thetaK(850), 1e-12);
    }

    @Test
    void withoutMixedLayerKeysTheLinearModelKeepsConstantN() {
        Scenario s = ScenarioFile.parse("plain", BuiltinScenarios.text("classic-45N"), false);
        assertNull(s.toLinearConfig().stratification());
        assertInstanceOf(ThetaProfile.ConstantN.class, s.toNonlinearConfig().theta());
    }

    @Test
    void anInversionWithoutAMixedLayerIsRefusedNamingTheKey() {
        String yaml = BuiltinScenarios.text("classic-45N").replace("  buoyancy_frequency_per_s: 0.01\n",
                "  buoyancy_frequency_per_s: 0.01\n  inversion_K: 2\n");
        UserInputException e = assertThrows(UserInputException.class, () -> ScenarioFile.parse("bad", yaml, false));
        assertTrue(e.getMessage().contains("atmosphere.mixed_layer_depth_m"), e.getMessage());
    }
}
