package org.littoral.scenarios.cluster;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.net.ServerSocket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 17 on a real scheduler: a throw-away single-node Slurm (slurmctld, slurmd and munged with its own key, all
 * under a temporary folder, started and stopped here by src/test/slurm/local-slurm.sh) runs a 24-member linear sweep
 * as an array of 8 tasks. One task is cancelled (scancel) while it runs; the merge job that waits for the array
 * names it with the scheduler's state and its log; the sweep is submitted again with --resume, which runs only that
 * shard; the merged results then hold every member exactly once and are byte-identical to a run of the same sweep on
 * this machine. Skipped, with the reason, only where Slurm cannot be started (not root, packages missing).
 */
class LocalSlurmClusterTest {
    static final String SWEEP = """
            name: slurm-ci
            description: 24 linear members for the job-array test (4 directions x 6 speeds on a coarse grid)
            base: offshore-ambient
            set:
              grid.points: 256
              grid.spacing_km: 6
              grid.levels: 31
              output.step_min: 30
            axes:
              ambient_wind.from_deg: [90, 0, 180, 270]
              ambient_wind.speed_m_per_s: [1, 2, 3, 4, 5, 6]
            """;
    static final Path SCRIPT = Path.of("src", "test", "slurm", "local-slurm.sh").toAbsolutePath();

    @TempDir
    static Path tmp;
    static Path clusterDir;
    static Path bin;
    static boolean started;

    @BeforeAll
    static void startCluster() throws Exception {
        clusterDir = tmp.resolve("slurm");
        int ctl;
        int slurmd;
        try (ServerSocket a = new ServerSocket(0); ServerSocket b = new ServerSocket(0)) {
            ctl = a.getLocalPort();
            slurmd = b.getLocalPort();
        }
        Process p = new ProcessBuilder("bash", SCRIPT.toString(), "start", clusterDir.toString(), Integer.toString(ctl),
                Integer.toString(slurmd)).redirectErrorStream(true).start();
        String said = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
        boolean ended = p.waitFor(60, TimeUnit.SECONDS);
        started = true; // stop whatever part of it came up
        Assumptions.assumeTrue(ended && p.exitValue() == 0, "skipped: a local Slurm cannot be started here: " + said);
        // littoral finds the scheduler's tools through the job settings' scheduler_bin: wrappers that point them (and
        // the jobs they submit) at this cluster's configuration
        bin = Files.createDirectories(tmp.resolve("bin"));
        for (String tool : new String[] {"sbatch", "squeue", "sacct", "scontrol", "scancel"}) {
            Path w = bin.resolve(tool);
            Files.writeString(w, "#!/bin/sh\nSLURM_CONF='" + said + "'\nexport SLURM_CONF\nexec " + tool + " \"$@\"\n");
            Files.setPosixFilePermissions(w, PosixFilePermissions.fromString("rwxr-xr-x"));
        }
    }

    @AfterAll
    static void stopCluster() throws Exception {
        if (!started) {
            return;
        }
        if (bin != null) {
            run(List.of(bin.resolve("scancel").toString(), "--user=" + System.getProperty("user.name")));
        }
        new ProcessBuilder("bash", SCRIPT.toString(), "stop", clusterDir.toString()).redirectErrorStream(true)
                .redirectOutput(ProcessBuilder.Redirect.DISCARD).start().waitFor(30, TimeUnit.SECONDS);
    }

    @Test
    void anArrayWithACancelledTaskResubmittedGivesEveryMemberOnceAndTheLocalResultsByteForByte() throws Exception {
        Path sweep = tmp.resolve("slurm-ci.yaml");
        Files.writeString(sweep, SWEEP);
        Path local = tmp.resolve("local");
        String[] r = SubmissionTest.run("sweep", sweep.toString(), "--out", local.toString(), "--threads", "2");
        assertEquals("0", r[0], r[2]);

        Path out = tmp.resolve("array");
        List<String> submit = List.of("sweep", sweep.toString(), "--out", out.toString(), "--on", "slurm", "--tasks", "8",
                "--job", "scheduler_bin=" + bin);
        r = SubmissionTest.run(submit.toArray(String[]::new));
        assertEquals("0", r[0], r[1] + r[2]);
        assertTrue(r[1].contains("submitted 8 array task(s) (shards 1-8 of 8, up to 3 member(s) each"), r[1]);
        JobLog.Entry first = JobLog.read(out.resolve("cluster")).get(0);

        // cancel the last shard's task while it runs: as soon as it has written its first member (or has been running
        // for a while without one)
        int victim = 8;
        String task = first.arrayJob() + "_" + victim;
        List<String> victimIds = List.of("m0007", "m0015", "m0023"); // i mod 8 == 7
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(90);
        while (!run(List.of(bin.resolve("squeue").toString(), "-h", "-j", task, "-o", "%T")).strip().equals("RUNNING")) {
            assertTrue(System.nanoTime() < deadline, "task " + task + " never ran");
            Thread.sleep(20);
        }
        long runningSince = System.nanoTime();
        while (victimIds.stream().noneMatch(id -> Files.exists(out.resolve("members/" + id + ".json")))
                && System.nanoTime() - runningSince < TimeUnit.SECONDS.toNanos(4)) {
            Thread.sleep(10);
        }
        run(List.of(bin.resolve("scancel").toString(), task));
        waitFor(first.arrayJob(), first.mergeJob());
        int keptFromCancelled = (int) victimIds.stream().filter(id -> Files.exists(out.resolve("members/" + id + ".json"))).count();
        assertTrue(keptFromCancelled < 3, "the cancel should land before the task finished its 3 members");

        // the merge job ran after the cancelled task (afterany), refused to merge and named the task, its state and log
        String mergeLog = Files.readString(out.resolve("cluster/logs/" + first.mergeJob() + "-merge.log"));
        Path victimLog = out.resolve("cluster/logs/" + first.arrayJob() + "-task-" + victim + ".log");
        assertTrue(mergeLog.contains("shard 8/8: " + (3 - keptFromCancelled) + " of its 3 members without a result")
                && mergeLog.contains("task " + task + ": CANCELLED") && mergeLog.contains("log: " + victimLog), mergeLog);
        assertTrue(mergeLog.contains("littoral: failed: " + (3 - keptFromCancelled) + " of 24 members have no result"), mergeLog);
        assertFalse(Files.exists(out.resolve("comparison.csv")), "nothing merged from an incomplete sweep");

        // resubmitted: only the cancelled shard runs, then the merge
        List<String> again = new ArrayList<>(submit);
        again.add("--resume");
        r = SubmissionTest.run(again.toArray(String[]::new));
        assertEquals("0", r[0], r[1] + r[2]);
        assertTrue(r[1].contains("submitted 1 array task(s) (shards 8 of 8"), r[1]);
        assertTrue(r[2].contains("task " + task + ": CANCELLED"), "the resubmission says what became of the task: " + r[2]);
        List<JobLog.Entry> jobs = JobLog.read(out.resolve("cluster"));
        JobLog.Entry second = jobs.get(jobs.size() - 1);
        assertEquals(new TreeSet<>(List.of(victim)), second.tasks());
        waitFor(second.arrayJob(), second.mergeJob());
        String merged = Files.readString(out.resolve("cluster/logs/" + second.mergeJob() + "-merge.log"));
        assertTrue(merged.contains("sweep: merged 24 members (0 failed)"), merged);

        // every member exactly once: each computed by one task (the kept ones by the cancelled task), 24 files, no temps
        int ran = keptFromCancelled;
        Pattern done = Pattern.compile("sweep: shard (\\d)/8: 3 members: (\\d) run");
        for (int k = 1; k <= 8; k++) {
            String job = k == victim ? second.arrayJob() : first.arrayJob();
            Matcher m = done.matcher(Files.readString(out.resolve("cluster/logs/" + job + "-task-" + k + ".log")));
            assertTrue(m.find(), "task log of shard " + k);
            ran += Integer.parseInt(m.group(2));
        }
        assertEquals(24, ran, "members computed and kept over all tasks");
        try (Stream<Path> s = Files.list(out.resolve("members"))) {
            assertEquals(24, s.count(), "24 member files and no temporary ones");
        }
        List<String> rows = Files.readAllLines(out.resolve("comparison.csv"));
        assertEquals(25, rows.size());
        assertEquals(24, rows.stream().skip(1).map(l -> l.substring(0, l.indexOf(','))).distinct().count());

        // byte-identical to the local run, except what records when and where it ran
        List<String> differ = compareTrees(local, out);
        assertEquals(List.of(), differ, "files that differ between the local and the merged array run");
    }

    /**
     * Relative paths of files that differ. Left out as legitimately different: littoral-run.json (times, and the list
     * of files, which includes the job scripts and logs), cluster/ (only the array run has it), and in soundings.nc
     * the CF history attribute (it starts with the time the file was written); the rest of each netCDF file is
     * compared as ncdump prints it.
     */
    static List<String> compareTrees(Path a, Path b) throws IOException, InterruptedException {
        List<String> differ = new ArrayList<>();
        TreeSet<String> names = new TreeSet<>(files(a));
        TreeSet<String> other = new TreeSet<>(files(b));
        other.removeIf(n -> n.startsWith("cluster/"));
        if (!names.equals(other)) {
            TreeSet<String> onlyLocal = new TreeSet<>(names);
            onlyLocal.removeAll(other);
            TreeSet<String> onlyArray = new TreeSet<>(other);
            onlyArray.removeAll(names);
            differ.add("only in the local run: " + onlyLocal + "; only in the array run: " + onlyArray);
            return differ;
        }
        assertTrue(names.size() > 100, "runs/, members/, tables and figures: " + names.size());
        for (String n : names) {
            if (n.equals("littoral-run.json")) {
                continue;
            }
            if (n.endsWith(".nc")) {
                if (!withoutHistory(a.resolve(n)).equals(withoutHistory(b.resolve(n)))) {
                    differ.add(n);
                }
            } else if (!java.util.Arrays.equals(Files.readAllBytes(a.resolve(n)), Files.readAllBytes(b.resolve(n)))) {
                differ.add(n);
            }
        }
        return differ;
    }

    static List<String> files(Path dir) throws IOException {
        try (Stream<Path> s = Files.walk(dir)) {
            return s.filter(Files::isRegularFile).map(p -> dir.relativize(p).toString()).sorted().toList();
        }
    }

    /** ncdump's text of a netCDF file without its history attribute (netcdf-bin, which .ci/run installs). */
    static String withoutHistory(Path nc) throws IOException, InterruptedException {
        String text = run(List.of("ncdump", nc.toString()));
        assertTrue(text.contains("variables:"), "ncdump " + nc + ": " + text);
        return text.lines().filter(l -> !l.strip().startsWith(":history = ")).skip(1)
                .collect(java.util.stream.Collectors.joining("\n"));
    }

    static void waitFor(String... jobs) throws Exception {
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(150);
        String ids = String.join(",", jobs);
        while (!run(List.of(bin.resolve("squeue").toString(), "-h", "-j", ids, "-o", "%i")).isBlank()) {
            assertTrue(System.nanoTime() < deadline, "jobs " + ids + " still queued or running after 150 s");
            Thread.sleep(100);
        }
    }

    static String run(List<String> cmd) throws IOException, InterruptedException {
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        p.waitFor(60, TimeUnit.SECONDS);
        return out;
    }
}
