package org.littoral.scenarios.cluster;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.cli.Main;

/** --on slurm without a scheduler: the dry run's scripts, and the errors of a missing or refusing sbatch. */
class SubmissionTest {
    static final String SWEEP = """
            name: four
            base: offshore-ambient
            set:
              grid.points: 128
              grid.spacing_km: 8
              grid.levels: 21
              output.step_min: 60
            axes:
              ambient_wind.speed_m_per_s: [1, 2, 3, 4]
            """;

    @TempDir
    Path tmp;

    /** Runs the command line; exit code, stdout and stderr. */
    static String[] run(String... args) {
        PrintStream out0 = System.out;
        PrintStream err0 = System.err;
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        try {
            System.setOut(new PrintStream(out, true, StandardCharsets.UTF_8));
            System.setErr(new PrintStream(err, true, StandardCharsets.UTF_8));
            int code = Main.execute(args);
            return new String[] {Integer.toString(code), out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8)};
        } finally {
            System.setOut(out0);
            System.setErr(err0);
        }
    }

    @Test
    void aDryRunWritesTheArrayMergeAndSubmitScriptsWithTheJobSettings() throws Exception {
        Path sweep = tmp.resolve("four.yaml");
        Files.writeString(sweep, SWEEP);
        Path settings = tmp.resolve("cluster.yaml");
        Files.writeString(settings, "partition: short\naccount: coastal\ntime_limit: \"00:30:00\"\nsetup: [module load java]\n");
        Path out = tmp.resolve("out");
        String[] r = run("sweep", sweep.toString(), "--out", out.toString(), "--on", "slurm", "--cluster", settings.toString(),
                "--tasks", "2", "--dry-run", "--job", "cpus_per_task=2");
        assertEquals("0", r[0], r[2]);
        String array = Files.readString(out.resolve("cluster/array.sh"));
        for (String line : new String[] {"#SBATCH --partition=short", "#SBATCH --account=coastal", "#SBATCH --time=00:30:00",
            "#SBATCH --cpus-per-task=2", "module load java", "--shard \"$shard/2\"", "sweep " + sweep}) {
            assertTrue(array.contains(line), line + " in\n" + array);
        }
        assertFalse(array.contains("--dry-run") || array.contains("--on slurm") || array.contains("--tasks"), array);
        assertTrue(Files.readString(out.resolve("cluster/merge.sh")).contains("--merge"));
        assertTrue(Files.readString(out.resolve("cluster/submit.sh")).contains("--dependency=afterany:"));
        assertTrue(r[1].contains("submit them with: bash " + out.resolve("cluster/submit.sh")), r[1]);
        assertFalse(Files.exists(out.resolve("members/m0000.json")), "nothing computed");
    }

    @Test
    void noSbatchIsOneLineWithExitTwo() throws Exception {
        Path sweep = tmp.resolve("four.yaml");
        Files.writeString(sweep, SWEEP);
        Path empty = Files.createDirectories(tmp.resolve("no-tools"));
        String[] r = run("sweep", sweep.toString(), "--out", tmp.resolve("out").toString(), "--on", "slurm", "--job",
                "scheduler_bin=" + empty);
        assertEquals("2", r[0]);
        assertEquals(1, r[2].strip().lines().count(), r[2]);
        assertTrue(r[2].contains("sbatch not found in scheduler_bin") && r[2].contains("--dry-run"), r[2]);
    }

    @Test
    void aRefusedSubmissionIsOneLineWithTheSchedulersReasonAndExitTwo() throws Exception {
        Path sweep = tmp.resolve("four.yaml");
        Files.writeString(sweep, SWEEP);
        Path bin = Files.createDirectories(tmp.resolve("bin"));
        Path sbatch = bin.resolve("sbatch");
        Files.writeString(sbatch, "#!/bin/sh\necho 'sbatch: error: invalid partition specified: nowhere' >&2\n"
                + "echo 'sbatch: error: Batch job submission failed: Invalid partition name specified' >&2\nexit 1\n");
        Files.setPosixFilePermissions(sbatch, PosixFilePermissions.fromString("rwxr-xr-x"));
        Path out = tmp.resolve("out");
        String[] r = run("sweep", sweep.toString(), "--out", out.toString(), "--on", "slurm", "--job", "scheduler_bin=" + bin,
                "--job", "partition=nowhere");
        assertEquals("2", r[0]);
        assertEquals(1, r[2].strip().lines().count(), r[2]);
        assertTrue(r[2].contains("sbatch refused the job array: sbatch: error: invalid partition specified: nowhere"), r[2]);
        assertTrue(Files.exists(out.resolve("cluster/array.sh")), "the scripts stay for a look");
    }

    @Test
    void clusterOptionsWithoutOnSlurmAreRefused() throws Exception {
        Path sweep = tmp.resolve("four.yaml");
        Files.writeString(sweep, SWEEP);
        String[] r = run("sweep", sweep.toString(), "--out", tmp.resolve("o").toString(), "--dry-run");
        assertEquals("2", r[0]);
        assertTrue(r[2].contains("--dry-run is for submitting to a cluster; add --on slurm"), r[2]);
        r = run("sweep", sweep.toString(), "--out", tmp.resolve("o").toString(), "--on", "moon");
        assertEquals("2", r[0]);
        assertTrue(r[2].contains("give here (this machine) or slurm"), r[2]);
    }
}
