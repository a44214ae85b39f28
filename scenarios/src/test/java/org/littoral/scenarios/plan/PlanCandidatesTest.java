package org.littoral.scenarios.plan;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.littoral.scenarios.analysis.AnalysisSettings;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.scenario.Scenario;
import org.littoral.scenarios.sweep.MemberExpander;

/** The planner never ranks a site that could not stand where it is: over water, or inside a far-field sponge. */
class PlanCandidatesTest {

    private static Scenario baseOf(PlanSpec p) {
        return new PlanMemberRunner(p, Solver.standard(), null, new AnalysisSettings())
                .scenarioOf(MemberExpander.expand(p.ensemble()).get(0));
    }

    @Test
    void candidatesInTheBayBehindTheBarrierAreLeftOutWithAMessage() {
        PlanSpec p = PlanFile.load("quillmarsh-plan");
        List<String> why = new ArrayList<>();
        PlanSpec kept = PlanRun.usableCandidates(p, baseOf(p), why);
        // the invented coast: barrier 0-1.2 km (land), bay 1.2-3.7 km (water), mainland beyond
        assertEquals(p.candidatesKm().length - 2, kept.candidatesKm().length);
        assertEquals(1.0, kept.candidatesKm()[0], 0, "1 km is on the barrier strip: land");
        assertEquals(4.0, kept.candidatesKm()[1], 0);
        assertEquals(1, why.size(), why.toString());
        assertTrue(why.get(0).contains("2, 3 km") && why.get(0).contains("bay (water, 1.2-3.7 km)"), why.get(0));
    }

    @Test
    void candidatesInsideTheNonlinearSpongeAreLeftOut() {
        // 200 x 2 km: the domain ends near 198 km inland; the outer 50 km are sponge
        PlanSpec p = PlanFile.parse("p.yaml", "base: nl-offshore-2ms\nset: {grid.points: 200, grid.spacing_km: 2}\n"
                + "ensemble: {members: 2, seed: 1, draws: {ambient_wind.speed_m_per_s: {uniform: {from: 0, to: 5}}}}\n"
                + "plan:\n  candidates_km: [10, 40, 150, 160]\n  sites_per_set: 2\n  model: nonlinear\n", null, "p");
        List<String> why = new ArrayList<>();
        PlanSpec kept = PlanRun.usableCandidates(p, baseOf(p), why);
        assertArrayEquals(new double[] {10, 40}, kept.candidatesKm(), 0);
        assertTrue(why.get(0).contains("150, 160 km") && why.get(0).contains("sponge"), why.toString());
    }

    @Test
    void aPlanWithEveryCandidateOverWaterIsAnInputError() {
        PlanSpec p = PlanFile.parse("p.yaml", "base: quillmarsh-reach\n"
                + "ensemble: {members: 2, seed: 1, draws: {ambient_wind.speed_m_per_s: {uniform: {from: 0, to: 5}}}}\n"
                + "plan:\n  candidates_km: [2, 3]\n  sites_per_set: 1\n", null, "p");
        String m = assertThrows(UserInputException.class, () -> PlanRun.usableCandidates(p, baseOf(p), new ArrayList<>()))
                .getMessage();
        assertTrue(m.contains("p.yaml") && m.contains("plan.candidates_km") && m.contains("bay"), m);
    }
}
