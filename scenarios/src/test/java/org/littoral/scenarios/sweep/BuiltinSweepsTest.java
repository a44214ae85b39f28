package org.littoral.scenarios.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.cli.Main;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.run.Solver;

class BuiltinSweepsTest {

    @TempDir
    Path tmp;

    @Test
    void everyMemberOfEveryBuiltInSweepIsAValidScenario() {
        for (String name : SweepFile.BUILTINS) {
            SweepSpec s = SweepFile.readBuiltin(name, ScenarioMemberRunner.scenarioSource());
            List<Member> members = MemberExpander.expand(s);
            new ScenarioMemberRunner(s.source(), null, Solver.standard()).checkAll(members);
            assertTrue(members.size() >= 12, name);
        }
    }

    @Test
    void theAmbientFlowSweepCoversTheFourBreezeTypesOnItsCoast() throws Exception {
        SweepSpec s = SweepFile.readBuiltin("ambient-flow", ScenarioMemberRunner.scenarioSource());
        List<Member> members = MemberExpander.expand(s);
        java.util.Map<String, Object> row = new java.util.LinkedHashMap<>();
        java.util.Set<String> types = new java.util.TreeSet<>();
        for (Member m : members) {
            ComparisonTable.ambient(s.typing(), m.document(), row);
            types.add((String) row.get("breeze_type"));
        }
        // bearing 270 (sea to the west): from 90 offshore, 270 onshore, 0 corkscrew, 180 backdoor (NH)
        assertEquals(java.util.Set.of("pure", "synoptic", "corkscrew", "backdoor"), types);
    }

    @Test
    void theHypothesesSweepRunsTheNonlinearModelOverTheFourBreezeTypes() {
        SweepSpec s = SweepFile.readBuiltin("hypotheses", ScenarioMemberRunner.scenarioSource());
        List<Member> members = MemberExpander.expand(s);
        java.util.Map<String, Object> row = new java.util.LinkedHashMap<>();
        java.util.Set<String> types = new java.util.TreeSet<>();
        ScenarioMemberRunner r = new ScenarioMemberRunner(s.source(), null, Solver.standard());
        for (Member m : members) {
            ComparisonTable.ambient(s.typing(), m.document(), row);
            types.add((String) row.get("breeze_type"));
            assertEquals(org.littoral.scenarios.scenario.Scenario.Kind.NONLINEAR, r.scenarioOf(m).kind());
        }
        // bearing 135 (sea to the south-east): from 315 offshore, 135 onshore, 225 corkscrew, 45 backdoor (NH)
        assertEquals(java.util.Set.of("pure", "synoptic", "corkscrew", "backdoor"), types);
        assertEquals(12, members.size());
    }

    @Test
    void aMemberTheScenarioReaderRejectsIsNamedBeforeAnythingRuns() throws Exception {
        Path f = tmp.resolve("bad.yaml");
        // each value is in its own range; only the whole member breaks a rule (the ascent ceiling above the model top)
        Files.writeString(f, "base: offshore-ambient\naxes:\n  grid.top_m: [4000, 300]\n");
        SweepSpec s = SweepFile.read(f, ScenarioMemberRunner.scenarioSource());
        ScenarioMemberRunner r = new ScenarioMemberRunner(s.source(), null, Solver.standard());
        String e = assertThrows(UserInputException.class, () -> r.checkAll(MemberExpander.expand(s))).getMessage();
        assertTrue(e.contains("member m0001") && e.contains("grid.top_m=300") && e.contains("flights.ceiling_m"), e);
    }

    @Test
    void theSweepCommandExitsWithCode2AndOneLineForABadSweepFile() throws Exception {
        Path f = tmp.resolve("typo.yaml");
        Files.writeString(f, "base: offshore-ambient\naxes:\n  ambient_wind.from_degrees: [0, 90]\n");
        java.io.ByteArrayOutputStream err = new java.io.ByteArrayOutputStream();
        java.io.PrintStream old = System.err;
        int code;
        try {
            System.setErr(new java.io.PrintStream(err, true));
            code = Main.execute("sweep", f.toString(), "--out", tmp.resolve("o").toString());
        } finally {
            System.setErr(old);
        }
        assertEquals(2, code);
        String msg = err.toString();
        assertTrue(msg.contains("typo.yaml:3:30: axes.ambient_wind.from_degrees") && msg.contains("from_deg"), msg);
    }
}
