package org.littoral.scenarios.sweep;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.input.UserInputException;

class SweepExecutorTest {

    @TempDir
    Path tmp;

    @Test
    void aFailingMemberIsRecordedWithItsReasonAndTheSweepGoesOn() throws Exception {
        SweepSpec spec = KillableSweepMain.testSweep();
        List<Member> members = MemberExpander.expand(spec);
        SweepExecutor.Outcome o = SweepExecutor.run(spec, members, tmp, new FakeMemberRunner(0), KillAndResumeTest.quiet(2, false));
        // speed 9 m/s blows up in the fake runner: one per direction, 4 of 24
        assertEquals(4, o.failed());
        assertEquals(24, new MemberStore(tmp).presentIds().size());
        Member bad = members.stream().filter(m -> m.describe().contains("speed_m_per_s=9")).findFirst().orElseThrow();
        ObjectNode rec = new MemberStore(tmp).read(bad.id());
        assertEquals("failed", rec.get("status").asText());
        assertTrue(rec.get("error").asText().contains("blew up at t = 11.5 h"), rec.toString());
        assertEquals(9, rec.get("inputs").get("ambient_wind").get("speed_m_per_s").asInt(), "resolved inputs are kept");
    }

    @Test
    void resultsDoNotDependOnTheNumberOfThreads() throws Exception {
        SweepSpec spec = KillableSweepMain.testSweep();
        List<Member> members = MemberExpander.expand(spec);
        SweepExecutor.run(spec, members, tmp.resolve("one"), new FakeMemberRunner(0), KillAndResumeTest.quiet(1, false));
        SweepExecutor.run(spec, members, tmp.resolve("three"), new FakeMemberRunner(0), KillAndResumeTest.quiet(3, false));
        for (Member m : members) {
            assertArrayEquals(Files.readAllBytes(tmp.resolve("one/members/" + m.id() + ".json")),
                    Files.readAllBytes(tmp.resolve("three/members/" + m.id() + ".json")));
        }
    }

    @Test
    void aFolderWithResultsIsNotOverwrittenWithoutResume() throws Exception {
        SweepSpec spec = KillableSweepMain.testSweep();
        List<Member> members = MemberExpander.expand(spec);
        SweepExecutor.run(spec, members, tmp, new FakeMemberRunner(0), KillAndResumeTest.quiet(2, false));
        UserInputException e = assertThrows(UserInputException.class,
                () -> SweepExecutor.run(spec, members, tmp, new FakeMemberRunner(0), KillAndResumeTest.quiet(2, false)));
        assertTrue(e.getMessage().contains("--resume"), e.getMessage());
    }

    @Test
    void resumingAfterTheSweepFileChangedRefusesToMixResults() throws Exception {
        SweepSpec spec = KillableSweepMain.testSweep();
        SweepExecutor.run(spec, MemberExpander.expand(spec), tmp, new FakeMemberRunner(0), KillAndResumeTest.quiet(2, false));
        ObjectNode changedBase = spec.base().deepCopy();
        ((ObjectNode) changedBase.get("heating")).put("peak_flux_difference_W_per_m2", 300.0);
        SweepSpec changed = new SweepSpec(spec.source(), spec.name(), spec.description(), spec.baseLabel(), changedBase,
                spec.fixed(), spec.zip(), spec.axes(), spec.ensemble(), spec.typing());
        UserInputException e = assertThrows(UserInputException.class, () -> SweepExecutor.run(changed,
                MemberExpander.expand(changed), tmp, new FakeMemberRunner(0), KillAndResumeTest.quiet(2, true)));
        assertTrue(e.getMessage().contains("m0000.json") && e.getMessage().contains("other inputs"), e.getMessage());
    }

    @Test
    void anUnreadableResultIsRunAgainOnResume() throws Exception {
        SweepSpec spec = KillableSweepMain.testSweep();
        List<Member> members = MemberExpander.expand(spec);
        SweepExecutor.run(spec, members, tmp, new FakeMemberRunner(0), KillAndResumeTest.quiet(2, false));
        byte[] good = Files.readAllBytes(tmp.resolve("members/m0005.json"));
        Files.writeString(tmp.resolve("members/m0005.json"), "{\"member\": \"m00");
        Files.writeString(tmp.resolve("members/.m0007.json.123.tmp"), "{\"mem");
        FakeMemberRunner r = new FakeMemberRunner(0);
        SweepExecutor.run(spec, members, tmp, r, KillAndResumeTest.quiet(2, true));
        assertEquals(1, r.calls.get());
        assertArrayEquals(good, Files.readAllBytes(tmp.resolve("members/m0005.json")));
        assertTrue(Files.notExists(tmp.resolve("members/.m0007.json.123.tmp")));
    }

    @Test
    void failedMembersAreKeptOnResumeUnlessAskedToRetryThem() throws Exception {
        SweepSpec spec = KillableSweepMain.testSweep();
        List<Member> members = MemberExpander.expand(spec);
        SweepExecutor.run(spec, members, tmp, new FakeMemberRunner(0), KillAndResumeTest.quiet(2, false));
        FakeMemberRunner keep = new FakeMemberRunner(0);
        SweepExecutor.run(spec, members, tmp, keep, KillAndResumeTest.quiet(2, true));
        assertEquals(0, keep.calls.get());
        FakeMemberRunner retry = new FakeMemberRunner(0);
        SweepExecutor.run(spec, members, tmp, retry, new SweepExecutor.Options(2, true,
                new java.io.PrintStream(java.io.OutputStream.nullOutputStream()), false, 0, true));
        assertEquals(4, retry.calls.get(), "the four 9 m/s members that blew up");
    }
}
