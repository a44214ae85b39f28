package org.littoral.scenarios.sweep;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.input.UserInputException;

/** The executor computes one shard of the members, and a merge step combines the shards (issue 17). */
class ShardedSweepTest {

    @TempDir
    Path tmp;

    private static SweepExecutor.Options placed(Placement where, PrintStream log) {
        return new SweepExecutor.Options(1, false, log, false, 0).placed(where, null);
    }

    private static PrintStream quiet() {
        return new PrintStream(java.io.OutputStream.nullOutputStream());
    }

    @Test
    void theShardsOfASweepTogetherHoldEveryMemberExactlyOnce() throws Exception {
        List<Member> members = MemberExpander.expand(KillableSweepMain.testSweep());
        Set<String> seen = new HashSet<>();
        int total = 0;
        for (int k = 1; k <= 5; k++) {
            for (Member m : new Placement.Shard(k, 5).of(members)) {
                assertTrue(seen.add(m.id()), m.id() + " in two shards");
                total++;
            }
        }
        assertEquals(members.size(), total);
    }

    @Test
    void shardsRunIntoOneFolderAndTheMergeEqualsALocalRunByteForByte() throws Exception {
        SweepSpec spec = KillableSweepMain.testSweep();
        List<Member> members = MemberExpander.expand(spec);
        Path local = tmp.resolve("local");
        SweepExecutor.run(spec, members, local, new FakeMemberRunner(0), KillAndResumeTest.quiet(2, false));

        Path shared = tmp.resolve("shared");
        FakeMemberRunner runner = new FakeMemberRunner(0);
        for (int k = 1; k <= 8; k++) {
            SweepExecutor.Outcome o = SweepExecutor.run(spec, members, shared, runner, placed(new Placement.Shard(k, 8), quiet()));
            assertEquals(3, o.ran(), "24 members in 8 shards");
            assertFalse(o.complete(), "a shard alone does not complete the sweep");
        }
        assertEquals(24, runner.calls.get(), "every member computed once");
        SweepExecutor.Outcome merged = SweepExecutor.run(spec, members, shared, runner,
                placed(new Placement.MergeOnly((missing, n) -> List.of()), quiet()));
        assertTrue(merged.complete());
        assertEquals(0, merged.ran());
        assertEquals(24, runner.calls.get(), "the merge computes nothing");
        for (Member m : members) {
            assertArrayEquals(Files.readAllBytes(local.resolve("members/" + m.id() + ".json")),
                    Files.readAllBytes(shared.resolve("members/" + m.id() + ".json")), m.id());
        }
        assertArrayEquals(Files.readAllBytes(local.resolve("sweep.json")), Files.readAllBytes(shared.resolve("sweep.json")));
    }

    @Test
    void aRerunShardComputesOnlyItsMembersWithoutAResult() throws Exception {
        SweepSpec spec = KillableSweepMain.testSweep();
        List<Member> members = MemberExpander.expand(spec);
        Placement.Shard third = new Placement.Shard(3, 8);
        SweepExecutor.run(spec, members, tmp, new FakeMemberRunner(0), placed(third, quiet()));
        Member lost = third.of(members).get(1);
        Files.delete(new MemberStore(tmp).fileOf(lost.id()));
        FakeMemberRunner again = new FakeMemberRunner(0);
        SweepExecutor.Outcome o = SweepExecutor.run(spec, members, tmp, again, placed(third, quiet()));
        assertEquals(1, again.calls.get());
        assertEquals(1, o.ran());
        assertEquals(2, o.skipped());
    }

    @Test
    void aShardLeavesTheTemporaryFilesOfOtherShardsAlone() throws Exception {
        SweepSpec spec = KillableSweepMain.testSweep();
        List<Member> members = MemberExpander.expand(spec);
        MemberStore store = new MemberStore(tmp);
        store.create();
        Member other = new Placement.Shard(2, 8).of(members).get(0);
        Member mine = new Placement.Shard(1, 8).of(members).get(0);
        Path othersTemp = store.folder().resolve("." + other.id() + ".json.123.tmp");
        Path myTemp = store.folder().resolve("." + mine.id() + ".json.456.tmp");
        Files.writeString(othersTemp, "{\"half");
        Files.writeString(myTemp, "{\"half");
        SweepExecutor.run(spec, members, tmp, new FakeMemberRunner(0), placed(new Placement.Shard(1, 8), quiet()));
        assertTrue(Files.exists(othersTemp), "another shard may be writing it right now");
        assertFalse(Files.exists(myTemp), "what this shard left behind is cleared");
    }

    @Test
    void theMergeStopsAndExplainsWhenMembersHaveNoResult() throws Exception {
        SweepSpec spec = KillableSweepMain.testSweep();
        List<Member> members = MemberExpander.expand(spec);
        for (int k = 1; k <= 8; k++) {
            if (k != 5) {
                SweepExecutor.run(spec, members, tmp, new FakeMemberRunner(0), placed(new Placement.Shard(k, 8), quiet()));
            }
        }
        List<String> asked = new ArrayList<>();
        ByteArrayOutputStream buf = new ByteArrayOutputStream();
        PrintStream log = new PrintStream(buf, true, StandardCharsets.UTF_8);
        IncompleteRunException e = assertThrows(IncompleteRunException.class, () -> SweepExecutor.run(spec, members, tmp,
                new FakeMemberRunner(0), placed(new Placement.MergeOnly((missing, n) -> {
                    missing.forEach(m -> asked.add(m.id()));
                    return List.of("shard 5/8: task 12_5: CANCELLED");
                }), log)));
        assertEquals(List.of("m0004", "m0012", "m0020"), asked, "shard 5 of 8 holds members 4, 12 and 20");
        assertTrue(buf.toString(StandardCharsets.UTF_8).contains("shard 5/8: task 12_5: CANCELLED"));
        assertTrue(e.getMessage().startsWith("3 of 24 members have no result"), e.getMessage());
        assertFalse(Files.exists(tmp.resolve("comparison.csv")));
    }

    @Test
    void aShardIsWrittenAsNumberSlashCount() {
        assertEquals(new Placement.Shard(3, 8), Placement.Shard.parse(" 3/8 ", "--shard"));
        for (String bad : new String[] {"3", "0/8", "9/8", "a/b", "3/0", ""}) {
            UserInputException e = assertThrows(UserInputException.class, () -> Placement.Shard.parse(bad, "--shard"), bad);
            assertTrue(e.getMessage().contains("--shard"), e.getMessage());
        }
    }
}
