package org.littoral.scenarios.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.littoral.scenarios.analysis.detect.Penalty;
import org.littoral.scenarios.input.UserInputException;

class SettingsTest {
    @Test
    void defaultSettingsAreValid() {
        new AnalysisSettings().validate();
    }

    @Test
    void aBadSettingNamesItsKeyAndDefault() {
        AnalysisSettings s = new AnalysisSettings();
        s.detection.minSegmentProfiles = 0;
        String m = assertThrows(UserInputException.class, s::validate).getMessage();
        assertTrue(m.contains("detection.minSegmentProfiles") && m.contains("default 2"), m);
    }

    @Test
    void aLayerIsWrittenBottomDashTop() {
        assertEquals(new Layer(100, 300), Layer.parse("100-300"));
        assertThrows(UserInputException.class, () -> Layer.parse("300-100"));
        assertThrows(UserInputException.class, () -> Layer.parse("low"));
    }

    @Test
    void aPenaltyIsBicMbicOrANumber() {
        assertEquals(Penalty.Kind.BIC, Penalty.parse("BIC").kind());
        assertEquals(Penalty.Kind.MBIC, Penalty.parse("mbic").kind());
        assertEquals(7.5, Penalty.parse("7.5").perChange(100, 3), 0);
        assertThrows(IllegalArgumentException.class, () -> Penalty.parse("aic"));
    }

    @Test
    void variablesParseFromTheirNamesOrColumns() {
        assertEquals(Variable.THETA_E, Variable.parse("theta-e"));
        assertEquals(Variable.MIXING_RATIO, Variable.parse("mixing_ratio_g_per_kg"));
        assertThrows(UserInputException.class, () -> Variable.parse("vorticity"));
    }
}
