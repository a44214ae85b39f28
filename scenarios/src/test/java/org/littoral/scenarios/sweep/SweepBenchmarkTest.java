package org.littoral.scenarios.sweep;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;

/**
 * The nonlinear sweep benchmark's quick form runs its members through the real pipeline on 1 and 2 threads
 * and finds the member files identical (the speed-up it prints is not checked here: timing belongs to the
 * benchmark, not to a unit test).
 */
class SweepBenchmarkTest {
    @Test
    void quickNonlinearSweepBenchmarkRunsEveryMemberAndGetsIdenticalFilesOnOneAndTwoThreads() throws Exception {
        SweepBenchmark b = SweepBenchmark.nonlinear();
        assertEquals("sweep-nonlinear", b.name());
        ByteArrayOutputStream buf = new ByteArrayOutputStream();
        b.run(new PrintStream(buf, true, StandardCharsets.UTF_8), true);
        String out = buf.toString(StandardCharsets.UTF_8);
        assertTrue(out.contains("4 members of nl-offshore-2ms (nonlinear model, 200 x 33 grid"), out);
        assertTrue(out.contains("member files identical: yes"), out);
    }
}
