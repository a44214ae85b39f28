package org.littoral.scenarios.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** The plan benchmark runs the invented coast's plan with the member count and model it says. */
class PlanBenchmarkTest {
    @Test
    void theBenchmarkPlanHasTheRequestedMembersModelAndCandidates() {
        PlanSpec nl = PlanFile.parse("t", PlanBenchmark.planText(200, "nonlinear"), null, "t");
        assertEquals(200, nl.ensemble().memberCount());
        assertEquals("nonlinear", nl.model());
        assertEquals(40, nl.candidatesKm().length);
        PlanSpec lin = PlanFile.parse("t", PlanBenchmark.planText(40, "linear"), null, "t");
        assertEquals(40, lin.ensemble().memberCount());
        assertEquals("linear", lin.model());
    }
}
