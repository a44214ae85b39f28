package org.littoral.scenarios.cluster;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.input.UserInputException;

/** The job settings file and --job options: what a task asks the cluster for. */
class JobSettingsTest {

    @TempDir
    Path tmp;

    @Test
    void theFileSetsTheRequestAndJobOptionsOverrideIt() throws Exception {
        Path f = tmp.resolve("cluster.yaml");
        Files.writeString(f, """
                partition: short
                account: coastal-group
                time_limit: "02:00:00"
                memory: 6G
                cpus_per_task: 2
                members_per_task: 10
                setup:
                  - module load java/17
                sbatch_options: [--qos=normal]
                """);
        JobSettings s = JobSettings.read(f, List.of("partition=long", "setup=echo ready", "tasks=12"));
        assertEquals("long", s.partition);
        assertEquals("coastal-group", s.account);
        assertEquals("02:00:00", s.timeLimit);
        assertEquals("6G", s.memory);
        assertEquals(2, s.cpusPerTask());
        assertEquals(12, s.tasks);
        assertEquals(null, s.membersPerTask, "tasks given last replaces members_per_task");
        assertEquals(List.of("module load java/17", "echo ready"), s.setup, "--job adds a line to a list key");
        assertEquals(List.of("--qos=normal"), s.sbatchOptions);
    }

    @Test
    void badSettingsAreOneLineNamingTheKeyTheValueAndTheFix() throws Exception {
        String[][] cases = {
            {"time_limit: two hours", "time_limit", "02:00:00"},
            {"memory: lots", "memory", "4G"},
            {"cpus_per_task: 0", "cpus_per_task", "1 to 1024"},
            {"partition: \"a b\"", "partition", "letters, digits"},
            {"sbatch_options: [qos=short]", "sbatch_options", "--qos=short"},
            {"tasks: 4\nmembers_per_task: 3", "members_per_task", "not both"},
            {"partiton: short", "partiton", "did you mean 'partition'"},
        };
        for (String[] c : cases) {
            Path f = tmp.resolve("bad.yaml");
            Files.writeString(f, c[0] + "\n");
            UserInputException e = assertThrows(UserInputException.class, () -> JobSettings.read(f, List.of()), c[0]);
            assertTrue(e.getMessage().contains(c[1]) && e.getMessage().contains(c[2]) && !e.getMessage().contains("\n"),
                    c[0] + " -> " + e.getMessage());
        }
        UserInputException e = assertThrows(UserInputException.class, () -> JobSettings.read(null, List.of("partition")));
        assertTrue(e.getMessage().contains("KEY=VALUE"), e.getMessage());
    }

    @Test
    void memoryPerTaskComesFromTheWorkEstimateWithAMarginAndTheJvmsOwnShare() {
        // no estimate: the floor heap; a given memory: the heap leaves the JVM its share outside the heap
        long[] floor = SlurmArray.memoryMb(null, 1, null);
        assertEquals(SlurmArray.MIN_HEAP_MB, floor[1]);
        assertEquals(SlurmArray.MIN_HEAP_MB + SlurmArray.JVM_OUTSIDE_HEAP_MB, floor[0]);
        long[] given = SlurmArray.memoryMb(null, 1, "4G");
        assertEquals(4096, given[0]);
        assertEquals(4096 - SlurmArray.JVM_OUTSIDE_HEAP_MB, given[1]);
    }

    @Test
    void theTasksRunTheUsersCommandWithoutTheSubmissionsOwnOptions() {
        List<String> args = List.of("--debug", "sweep", "s.yaml", "--out", "o", "--on", "slurm", "--tasks=8", "--job",
                "partition=x", "--resume", "--threads", "4", "--no-run-files", "--dry-run", "--cluster", "c.yaml");
        assertEquals(List.of("--debug", "sweep", "s.yaml", "--out", "o", "--no-run-files"), ClusterOptions.filter(args));
    }

    @Test
    void arrayIndexListsAreWrittenAsRanges() {
        assertEquals("1-3,5,7-8", JobLog.ranges(new java.util.TreeSet<>(List.of(1, 2, 3, 5, 7, 8))));
        assertEquals(new java.util.TreeSet<>(List.of(1, 2, 3, 5, 7, 8)), JobLog.ranges("1-3,5,7-8"));
    }
}
