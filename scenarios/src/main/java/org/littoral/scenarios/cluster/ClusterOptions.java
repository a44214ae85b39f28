package org.littoral.scenarios.cluster;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.output.OutputFolder;
import org.littoral.scenarios.sweep.Placement;
import org.littoral.scenarios.sweep.SweepExecutor;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * The options every command that runs members through the {@link SweepExecutor} shares (sweep, plan, check-timing):
 * where the members run ({@code --on here|slurm}), the job settings, a dry run, and the two steps a job array runs
 * ({@code --shard K/N}, {@code --merge}).
 */
public final class ClusterOptions {

    @Option(names = "--on", paramLabel = "PLACE", description = "Where the members run: here (default: this machine's cores) "
            + "or slurm (a job array on a Slurm cluster, one task per shard of the members into the shared --out folder, and "
            + "a merge job after it that writes the tables and figures; see docs/cluster.md).")
    String on;

    @Option(names = "--cluster", paramLabel = "FILE", description = "Job settings for --on slurm (YAML): partition, account, "
            + "time_limit, memory, cpus_per_task, tasks or members_per_task, setup (lines such as module loads), "
            + "sbatch_options, launcher, scheduler_bin, job_name (docs/cluster.md).")
    Path clusterFile;

    @Option(names = "--job", paramLabel = "KEY=VALUE", description = "One job setting for --on slurm, over the --cluster file "
            + "(repeatable), e.g. --job partition=short --job time_limit=02:00:00.")
    List<String> jobSettings = new ArrayList<>();

    @Option(names = "--tasks", paramLabel = "N", description = "Array tasks for --on slurm: the members are dealt out to N "
            + "shards (default: 4 members per CPU of a task).")
    Integer tasks;

    @Option(names = "--dry-run", description = "With --on slurm: write the job scripts (DIR/cluster/array.sh, merge.sh, "
            + "submit.sh) without submitting them.")
    boolean dryRun;

    @Option(names = "--shard", paramLabel = "K/N", description = "Compute only shard K of N of the members into DIR (what "
            + "each array task runs; member i belongs to shard i mod N + 1); no tables or figures.")
    String shard;

    @Option(names = "--merge", description = "Compute no member: combine the results the shards wrote in DIR into the tables, "
            + "figures and report; lists shards that left members without a result, with the scheduler's state and their log.")
    boolean merge;

    @Spec(Spec.Target.MIXEE)
    CommandSpec mixee;

    /** Options that change nothing in the submitted tasks' command line: the submission's own options. */
    private static final Set<String> DROPPED_WITH_VALUE = Set.of("--on", "--cluster", "--job", "--tasks", "--threads", "--shard");
    private static final Set<String> DROPPED_FLAGS = Set.of("--dry-run", "--merge", "--resume", "--overwrite");

    private boolean onSlurm() {
        if (on == null || on.equals("here")) {
            return false;
        }
        if (on.equals("slurm")) {
            return true;
        }
        throw new UserInputException("--on " + org.littoral.scenarios.input.Shown.text(on) + ": give here (this machine) or "
                + "slurm (a job array on a Slurm cluster)");
    }

    /** Refuses combinations that make no sense, one line each. */
    void check(boolean overwrite) {
        boolean slurm = onSlurm();
        if (shard != null && merge) {
            throw new UserInputException("--shard computes one shard and --merge combines all of them; give one of the two");
        }
        if (slurm && (shard != null || merge)) {
            throw new UserInputException("--on slurm submits the tasks that run --shard and the job that runs --merge; give "
                    + "--on slurm alone");
        }
        if (!slurm && (dryRun || tasks != null || clusterFile != null || !jobSettings.isEmpty())) {
            String which = dryRun ? "--dry-run" : tasks != null ? "--tasks" : clusterFile != null ? "--cluster" : "--job";
            throw new UserInputException(which + " is for submitting to a cluster; add --on slurm");
        }
        if ((shard != null || merge) && overwrite) {
            throw new UserInputException((merge ? "--merge" : "--shard") + " works in the folder the submission prepared; "
                    + "--overwrite would remove the other shards' results: leave it out");
        }
    }

    /**
     * Where the members run, after checking the options.
     *
     * @param outDir the command's output folder
     * @param overwrite whether --overwrite was given
     */
    public Placement placement(Path outDir, boolean overwrite) {
        check(overwrite);
        if (shard != null) {
            return Placement.Shard.parse(shard, "--shard");
        }
        if (merge) {
            JobSettings js = clusterFile != null || !jobSettings.isEmpty() ? JobSettings.read(clusterFile, jobSettings) : new JobSettings();
            return new Placement.MergeOnly(new TaskStates(outDir.toAbsolutePath().normalize(), new Scheduler(js.schedulerBin)));
        }
        if (onSlurm()) {
            JobSettings js = JobSettings.read(clusterFile, jobSettings);
            return new Placement.Dispatch(new SlurmArray(js, tasks, dryRun, taskArgs(), Path.of("").toAbsolutePath(), System.out));
        }
        return Placement.ALL_HERE;
    }

    /**
     * Prepares the output folder for this step: as the command's own flags say for a local run or a submission; as a
     * continued run for the merge step; not at all for a shard (the submission prepared it, and the shards share it).
     *
     * @return the folder to finish when the command completes, or null for a shard
     */
    public OutputFolder prepareFolder(Path dir, String command, boolean resume, boolean overwrite, PrintStream log) {
        check(overwrite);
        if (shard != null) {
            OutputFolder.usable(dir);
            return null;
        }
        OutputFolder.Mode mode = merge || resume ? OutputFolder.Mode.RESUME
                : overwrite ? OutputFolder.Mode.OVERWRITE : OutputFolder.Mode.FRESH;
        return OutputFolder.prepare(dir, command, mode, true, log);
    }

    /** The exit code of a step that did not complete the run (a shard, a submission): 1 if members failed now, else 0. */
    public static int exitCode(SweepExecutor.Outcome o) {
        return o.failedNow() > 0 ? 1 : 0;
    }

    /** The user's command line without the submission's own options: what each task and the merge job run. */
    List<String> taskArgs() {
        List<String> original = mixee.root().commandLine().getParseResult().originalArgs();
        return filter(original);
    }

    static List<String> filter(List<String> original) {
        List<String> out = new ArrayList<>();
        for (int i = 0; i < original.size(); i++) {
            String t = original.get(i);
            int eq = t.indexOf('=');
            String name = t.startsWith("--") && eq > 0 ? t.substring(0, eq) : t;
            if (DROPPED_WITH_VALUE.contains(name)) {
                if (eq < 0 || !t.startsWith("--")) {
                    i++; // the value is the next word
                }
                continue;
            }
            if (DROPPED_FLAGS.contains(name)) {
                continue;
            }
            out.add(t);
        }
        return out;
    }
}
