package org.littoral.scenarios.sweep;

import java.io.InputStream;
import java.nio.file.Path;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * A small program the kill-and-resume test starts in its own JVM: runs the test sweep with the fake runner.
 * Arguments: output folder, sleep per member (ms), threads, "resume" or "fresh".
 */
public final class KillableSweepMain {
    private KillableSweepMain() {
    }

    static SweepSpec testSweep() throws Exception {
        try (InputStream in = KillableSweepMain.class.getResourceAsStream("test-sweep.yaml")) {
            ObjectNode root = (ObjectNode) ScenarioSource.yaml().readTree(in);
            return SweepFile.parse("test-sweep.yaml", root, null, ScenarioSource.filesAndBuiltins(), "test-sweep");
        }
    }

    public static void main(String[] args) throws Exception {
        SweepSpec spec = testSweep();
        SweepExecutor.run(spec, MemberExpander.expand(spec), Path.of(args[0]), new FakeMemberRunner(Long.parseLong(args[1])),
                new SweepExecutor.Options(Integer.parseInt(args[2]), args[3].equals("resume"), System.err, false, 0));
    }
}
