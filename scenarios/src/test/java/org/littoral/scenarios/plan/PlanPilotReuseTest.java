package org.littoral.scenarios.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicInteger;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.run.Solver;

/** A pilot member (whose arrivals set the dense windows) is solved once: its flights are kept for its scoring run. */
class PlanPilotReuseTest {
    private static final String PLAN = """
            base: classic-45N
            set: {grid.points: 256, grid.spacing_km: 2, grid.levels: 24, physics.harmonics: 6}
            ensemble: {members: 4, seed: 5, draws: {ambient_wind.speed_m_per_s: {uniform: {from: 0, to: 4}}}}
            plan:
              candidates_km: [5, 10, 20]
              sites_per_set: 2
              model: linear
              pilot_members: 2
            """;

    @Test
    void everyMemberIsSolvedOnceEvenWhenItIsAPilot(@TempDir Path out) throws Exception {
        AtomicInteger solves = new AtomicInteger();
        Solver counting = s -> {
            solves.incrementAndGet();
            return Solver.standard().solve(s);
        };
        PlanSpec p = PlanFile.parse("p.yaml", PLAN, null, "p");
        PlanRun.PlanOutcome o = PlanRun.run(p, p.model(), out, 2, false, new PrintStream(OutputStream.nullOutputStream()),
                counting);
        assertEquals(4, solves.get(), "4 members, 2 of them pilots: 4 solves, not 6");
        assertEquals(4, o.result().members);
        assertTrue(Files.size(out.resolve("recommendations.csv")) > 0);
    }
}
