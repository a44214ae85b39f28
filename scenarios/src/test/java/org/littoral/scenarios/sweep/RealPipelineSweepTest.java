package org.littoral.scenarios.sweep;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.model.linear.LinearBreezeModel;
import org.littoral.scenarios.run.Solver;

/**
 * The sweep through the real run pipeline and the real linear model, on a coarse grid: members run
 * concurrently give the same bytes as members run one at a time (no shared mutable state in the pipeline),
 * and the comparison table carries the run diagnostics.
 */
class RealPipelineSweepTest {
    static final String SWEEP = """
            base: offshore-ambient
            set:
              grid.points: 256
              grid.spacing_km: 8
              grid.levels: 21
              output.step_min: 60
            axes:
              ambient_wind.from_deg: [90, 270]
              ambient_wind.speed_m_per_s: [2, 5]
            """;

    @TempDir
    Path tmp;

    @Test
    void membersRunConcurrentlyThroughTheLinearModelMatchMembersRunOneByOne() throws Exception {
        SweepSpec spec = SweepFile.parse("test", (ObjectNode) ScenarioSource.yaml().readTree(SWEEP), null,
                ScenarioMemberRunner.scenarioSource(), "real");
        List<Member> members = MemberExpander.expand(spec);
        Solver linear = s -> LinearBreezeModel.solve(s.toLinearConfig());
        ScenarioMemberRunner runner = new ScenarioMemberRunner(spec.source(), null, linear);
        runner.checkAll(members);
        SweepExecutor.Outcome one = SweepExecutor.run(spec, members, tmp.resolve("one"), runner, KillAndResumeTest.quiet(1, false));
        SweepExecutor.Outcome two = SweepExecutor.run(spec, members, tmp.resolve("two"), runner, KillAndResumeTest.quiet(2, false));
        assertEquals(0, one.failed(), () -> firstError(tmp.resolve("one"), members));
        assertEquals(0, two.failed());
        for (Member m : members) {
            assertArrayEquals(Files.readAllBytes(tmp.resolve("one/members/" + m.id() + ".json")),
                    Files.readAllBytes(tmp.resolve("two/members/" + m.id() + ".json")), m.id());
        }
        ComparisonTable t = ComparisonTable.build(spec, members, new MemberStore(tmp.resolve("two")));
        assertTrue(t.columns().contains("diagnostics.max_inland_penetration.km"), t.columns().toString());
        assertTrue(t.columns().contains("diagnostics.sites.coast-5km.onshore_arrival.time_local_h"), t.columns().toString());
        assertEquals(List.of("pure", "pure", "synoptic", "synoptic"), t.texts("breeze_type"));
    }

    @Test
    void aMemberRunAgainLeavesNoTemporaryFileOfAKilledEarlierRunInItsRunFolder() throws Exception {
        SweepSpec spec = SweepFile.parse("test", (ObjectNode) ScenarioSource.yaml().readTree(SWEEP), null,
                ScenarioMemberRunner.scenarioSource(), "real");
        Member m = MemberExpander.expand(spec).get(0);
        Path runs = tmp.resolve("runs");
        // what a task cancelled while writing soundings.nc leaves behind
        Path leftover = Files.createDirectories(runs.resolve(m.id())).resolve(".soundings.nc.8472194596.tmp");
        Files.writeString(leftover, "half a file");
        new ScenarioMemberRunner(spec.source(), runs, s -> LinearBreezeModel.solve(s.toLinearConfig())).apply(m);
        assertTrue(Files.exists(runs.resolve(m.id()).resolve("soundings.nc")));
        assertTrue(!Files.exists(leftover), "the leftover is removed when the member runs again");
    }

    private static String firstError(Path dir, List<Member> members) {
        try {
            return new MemberStore(dir).read(members.get(0).id()).path("error").asText();
        } catch (Exception e) {
            return e.toString();
        }
    }
}
