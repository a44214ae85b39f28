package org.littoral.scenarios.sweep;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.File;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 3, "done when": a sweep killed mid-run and resumed has every member exactly once, with results
 * byte-identical to an uninterrupted run.
 */
class KillAndResumeTest {

    @TempDir
    Path tmp;

    @Test
    void aKilledSweepResumesToResultsIdenticalToAnUninterruptedRun() throws Exception {
        SweepSpec spec = KillableSweepMain.testSweep();
        List<Member> members = MemberExpander.expand(spec);
        assertEquals(24, members.size());

        Path reference = tmp.resolve("reference");
        SweepExecutor.run(spec, members, reference, new FakeMemberRunner(0), quiet(2, false));

        // The interrupted run, in its own JVM, killed (SIGKILL: no shutdown hooks) once a few members are written.
        Path killed = tmp.resolve("killed");
        Path membersDir = killed.resolve("members");
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        String cp = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        Process p = new ProcessBuilder(java, "-cp", cp, KillableSweepMain.class.getName(),
                killed.toString(), "250", "2", "fresh")
                .redirectErrorStream(true).redirectOutput(tmp.resolve("child.log").toFile()).start();
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
        while (countResults(membersDir) < 4 && p.isAlive() && System.nanoTime() < deadline) {
            Thread.sleep(10);
        }
        p.destroyForcibly();
        p.waitFor(30, TimeUnit.SECONDS);
        int before = countResults(membersDir);
        assertTrue(before >= 4 && before < 24, "the kill should land mid-run; results before kill: " + before
                + "; child log: " + Files.readString(tmp.resolve("child.log")));

        // Nothing written so far is partial: every result file parses and matches its member's inputs.
        MemberStore store = new MemberStore(killed);
        for (String id : store.presentIds()) {
            Member m = members.get(Integer.parseInt(id.substring(1)));
            MemberStore.State st = store.check(m);
            assertTrue(st == MemberStore.State.VALID || st == MemberStore.State.VALID_FAILED, id + ": " + st);
        }

        FakeMemberRunner resumedRunner = new FakeMemberRunner(0);
        SweepExecutor.Outcome o = SweepExecutor.run(spec, members, killed, resumedRunner, quiet(2, true));
        assertEquals(24 - before, resumedRunner.calls.get(), "a resumed run runs only the missing members");
        assertEquals(before, o.skipped());

        List<String> ids = new MemberStore(killed).presentIds();
        assertEquals(members.stream().map(Member::id).toList(), ids, "every member exactly once");
        try (Stream<Path> s = Files.list(membersDir)) {
            assertEquals(24, s.count(), "no temporary files left");
        }
        for (String id : ids) {
            assertArrayEquals(Files.readAllBytes(reference.resolve("members").resolve(id + ".json")),
                    Files.readAllBytes(membersDir.resolve(id + ".json")), id);
        }
        assertArrayEquals(Files.readAllBytes(reference.resolve("sweep.json")), Files.readAllBytes(killed.resolve("sweep.json")));
    }

    static SweepExecutor.Options quiet(int threads, boolean resume) {
        return new SweepExecutor.Options(threads, resume, new java.io.PrintStream(java.io.OutputStream.nullOutputStream()), false, 0);
    }

    private static int countResults(Path dir) {
        File[] fs = dir.toFile().listFiles((d, n) -> n.endsWith(".json") && !n.startsWith("."));
        return fs == null ? 0 : fs.length;
    }

    @SuppressWarnings("unused")
    private static List<String> names(Path dir) throws Exception {
        List<String> out = new ArrayList<>();
        try (Stream<Path> s = Files.list(dir)) {
            s.forEach(x -> out.add(x.getFileName().toString()));
        }
        return out;
    }
}
