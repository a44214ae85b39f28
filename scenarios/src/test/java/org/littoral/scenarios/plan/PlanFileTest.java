package org.littoral.scenarios.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.littoral.scenarios.input.UserInputException;

class PlanFileTest {
    private static final String OK = "base: classic-45N\nensemble: {members: 4, seed: 1, draws: {ambient_wind.speed_m_per_s: {uniform: {from: 0, to: 5}}}}\n"
            + "plan:\n  candidates_km: {from: 5, to: 20, step: 5}\n  sites_per_set: 2\n";

    private static String error(String yaml) {
        return assertThrows(UserInputException.class, () -> PlanFile.parse("p.yaml", yaml, null, "p")).getMessage();
    }

    @Test
    void aMinimalPlanGetsTheDocumentedDefaults() {
        PlanSpec p = PlanFile.parse("p.yaml", OK, null, "p");
        assertEquals(4, p.candidatesKm().length);
        assertEquals(2, p.cadences().size(), "default: 30 min, and 30 min with 15 min in an automatic window");
        assertTrue(p.cadences().get(1).autoWindow());
        assertEquals(0.5, p.criteria().timingToleranceH(), 1e-12, "one base interval");
        assertEquals(7.0, p.operatingStartH());
    }

    @Test
    void anUnknownPlanKeyIsRejectedWithTheValidKeys() {
        String m = error(OK + "  cadense: 3\n");
        assertTrue(m.startsWith("plan file p.yaml:6:3: unknown key 'plan.cadense' (did you mean 'cadences'?)") && m.contains("allowed in 'plan'"), m);
    }

    @Test
    void anOutOfRangeValueNamesKeyValueAndRange() {
        String m = error(OK + "  altitude_ceiling_m: 20000\n");
        assertTrue(m.contains("p.yaml:6:23: plan.altitude_ceiling_m: 20000 is outside the allowed range") && m.contains("50 to 3000"), m);
    }

    @Test
    void aDenseIntervalMustDivideTheBaseInterval() {
        String m = error(OK + "  cadences: [{interval_min: 30, dense_interval_min: 20}]\n");
        assertTrue(m.contains("plan.cadences[0].dense_interval_min") && m.contains("divide"), m);
    }

    @Test
    void candidatesMustBeInland() {
        String m = error(OK.replace("{from: 5, to: 20, step: 5}", "[-3, 5]"));
        assertTrue(m.contains("plan.candidates_km[0]") && m.contains("inland"), m);
    }

    @Test
    void moreSitesThanCandidatesIsRejected() {
        String m = error(OK.replace("sites_per_set: 2", "sites_per_set: 5"));
        assertTrue(m.contains("plan.sites_per_set") && m.contains("candidate"), m);
    }

    @Test
    void aMissingPlanSectionSaysWhatToGive() {
        String m = error("base: classic-45N\n");
        assertTrue(m.contains("plan") && m.contains("candidates_km"), m);
    }
}
