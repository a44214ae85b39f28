package org.littoral.scenarios.cluster;

import java.io.File;
import java.io.IOException;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.output.AtomicFile;
import org.littoral.scenarios.output.SafeNames;
import org.littoral.scenarios.run.WorkEstimate;
import org.littoral.scenarios.sweep.Member;
import org.littoral.scenarios.sweep.Placement;

/**
 * Hands a sweep's members to Slurm as a job array: one task per shard of the members, each running the same
 * littoral command with {@code --shard K/N} into the shared output folder, and a merge job that waits for every task
 * ({@code afterany}, so it also runs after failures and lists them) and runs the command with {@code --merge}.
 * Writes {@code DIR/cluster/array.sh}, {@code merge.sh} and {@code submit.sh} (the sbatch calls, for a person who
 * wants to submit the scripts by hand after {@code --dry-run}), then submits unless it is a dry run. A resubmission
 * submits only the shards that still have members without a result.
 */
public final class SlurmArray implements Placement.Dispatcher {
    /** JVM memory besides the heap (metaspace, code cache, thread stacks, GC structures), added to --mem. */
    static final long JVM_OUTSIDE_HEAP_MB = 512;
    /** Heap floor: the JVM, the libraries and the figures alone need a few hundred MB. */
    static final long MIN_HEAP_MB = 512;

    private final JobSettings settings;
    private final Integer tasksOption;
    private final boolean dryRun;
    private final List<String> commandArgs;
    private final Path workDir;
    private final PrintStream out;
    private final Scheduler scheduler;

    /**
     * @param commandArgs the littoral command and its arguments as the user gave them, without the options of the
     *                    submission itself (--on, --tasks, --threads, --resume, ...)
     * @param workDir the folder the tasks start in (relative paths in the arguments are read from there)
     * @param out where the result lines go (stdout)
     */
    public SlurmArray(JobSettings settings, Integer tasksOption, boolean dryRun, List<String> commandArgs, Path workDir,
                      PrintStream out) {
        this.settings = settings;
        this.tasksOption = tasksOption;
        this.dryRun = dryRun;
        this.commandArgs = List.copyOf(commandArgs);
        this.workDir = workDir.toAbsolutePath().normalize();
        this.out = out;
        this.scheduler = new Scheduler(settings.schedulerBin);
    }

    /** Number of shards for {@code members}: --tasks, else the settings' tasks or members_per_task, else 4 members per CPU. */
    int shardCount(int members, List<JobLog.Entry> earlier) {
        int n;
        if (tasksOption != null) {
            if (tasksOption < 1) {
                throw new UserInputException("--tasks " + tasksOption + ": give at least 1 array task");
            }
            n = tasksOption;
        } else if (settings.tasks != null) {
            n = settings.tasks;
        } else if (!earlier.isEmpty()) {
            n = earlier.get(earlier.size() - 1).shards(); // a resubmission keeps the shards of the first submission
        } else {
            int per = settings.membersPerTask != null ? settings.membersPerTask : 4 * settings.cpusPerTask;
            n = (members + per - 1) / per;
        }
        return Math.max(1, Math.min(n, members));
    }

    /**
     * Memory per task in MB: the heap the work estimate asks for {@code cpus} members at once, with half again as a
     * margin (the estimate counts the large arrays only), plus what the JVM needs outside its heap.
     */
    static long[] memoryMb(WorkEstimate largest, int cpus, String given) {
        if (given != null) {
            var m = java.util.regex.Pattern.compile("(\\d+)([KMGT]?)").matcher(given);
            if (!m.matches()) {
                throw new IllegalStateException(given);
            }
            long v = Long.parseLong(m.group(1));
            long mb = switch (m.group(2)) {
                case "K" -> Math.max(1, v / 1024);
                case "G" -> v * 1024;
                case "T" -> v * 1024 * 1024;
                default -> v;
            };
            long heap = Math.max(mb - JVM_OUTSIDE_HEAP_MB, mb / 2);
            return new long[] {mb, Math.max(64, heap)};
        }
        long need = largest == null ? 0 : largest.bytesFor(cpus);
        long heap = Math.max(MIN_HEAP_MB, roundUp((long) Math.ceil(1.5 * need / 1048576.0), 64));
        return new long[] {heap + JVM_OUTSIDE_HEAP_MB, heap};
    }

    private static long roundUp(long v, long step) {
        return (v + step - 1) / step * step;
    }

    @Override
    public void dispatch(Placement.Request r) {
        Path outDir = r.outDir().toAbsolutePath().normalize();
        Path clusterDir = TaskStates.clusterDir(outDir);
        Path logs = TaskStates.logDir(outDir);
        TaskStates states = new TaskStates(outDir, scheduler);
        List<JobLog.Entry> earlier = JobLog.read(clusterDir);
        if (!dryRun) {
            if (scheduler.find("sbatch") == null) {
                throw new UserInputException("--on slurm: sbatch not found " + scheduler.where() + "; run littoral on the "
                        + "cluster's login node, load the scheduler's module, set scheduler_bin in the job settings, or write "
                        + "the scripts only with --dry-run");
            }
            List<String> active = states.stillActive();
            if (!active.isEmpty()) {
                throw new UserInputException("--on slurm: jobs of an earlier submission into " + outDir + " are still queued "
                        + "or running (" + String.join(", ", active.subList(0, Math.min(4, active.size())))
                        + (active.size() > 4 ? ", ..." : "") + "); wait for them, or cancel them with scancel "
                        + active.get(0).split(" ")[0].replaceAll("_.*", "") + ", then submit again with --resume");
            }
        }
        int shards = shardCount(r.members().size(), earlier);
        TreeSet<Integer> todoShards = new TreeSet<>();
        for (Member m : r.todo()) {
            todoShards.add(m.index() % shards + 1);
        }
        if (!earlier.isEmpty() && !r.todo().isEmpty()) {
            // what became of the tasks that left these members without a result
            List<Member> todo = r.todo();
            for (int k : todoShards) {
                List<Member> mine = todo.stream().filter(m -> m.index() % shards + 1 == k).toList();
                r.log().println(states.describe(k, shards, mine, r.members().size(), earlier).replaceFirst("^merge: ", "slurm: "));
            }
        }
        if (todoShards.isEmpty()) {
            out.println("littoral: every one of the " + r.members().size() + " members has a result in " + outDir
                    + "; nothing to submit: combine them with the same command and --merge (in place of --on slurm)");
            return;
        }
        long[] mem = memoryMb(r.largest(), settings.cpusPerTask, settings.memory);
        String name = settings.jobName != null ? settings.jobName : "littoral-" + SafeNames.fileName(r.spec().name());
        String taskList = JobLog.ranges(todoShards);
        try {
            Files.createDirectories(logs);
            Path array = clusterDir.resolve("array.sh");
            Path merge = clusterDir.resolve("merge.sh");
            Path submit = clusterDir.resolve("submit.sh");
            writeScript(array, arrayScript(name, shards, mem, logs, r));
            writeScript(merge, mergeScript(name, mem, logs, r));
            writeScript(submit, submitScript(array, merge, clusterDir, shards, taskList));
            int own = (r.members().size() + shards - 1) / shards;
            String what = String.format(Locale.ROOT, "%d array task(s) (shards %s of %d, up to %d member(s) each, %d CPU(s) "
                    + "and %d MB each)", todoShards.size(), taskList, shards, own, settings.cpusPerTask, mem[0]);
            if (dryRun) {
                out.println("littoral: --dry-run: wrote " + array + ", " + merge.getFileName() + " and " + submit.getFileName()
                        + " for " + what + " and a merge job; submit them with: bash " + submit);
                return;
            }
            String arrayJob = sbatch(List.of("--parsable", "--array=" + taskList, array.toString()), "the job array",
                    clusterDir);
            String mergeJob;
            try {
                mergeJob = sbatch(List.of("--parsable", "--dependency=afterany:" + arrayJob, merge.toString()), "the merge job",
                        clusterDir);
            } catch (UserInputException e) {
                JobLog.append(clusterDir, arrayJob, shards, taskList, "-");
                throw new UserInputException(e.getMessage() + " (the array itself was submitted as job " + arrayJob
                        + "; when it has run, merge with the same command and --merge in place of --on slurm)", e);
            }
            JobLog.append(clusterDir, arrayJob, shards, taskList, mergeJob);
            out.println("littoral: submitted " + what + " as job " + arrayJob + ", and merge job " + mergeJob
                    + " that runs when they have ended; follow them with: squeue -j " + arrayJob + "," + mergeJob);
            out.println("littoral: task logs: " + logs + "; when the merge job has run, the results are in " + outDir
                    + " (if tasks fail, the merge log lists them: submit again with --resume to run only what is missing)");
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write the job scripts to " + clusterDir, e);
        }
    }

    /** Runs sbatch; its job id, or one line saying why the scheduler refused. */
    private String sbatch(List<String> args, String what, Path clusterDir) {
        List<String> a = new ArrayList<>(args);
        Scheduler.Reply rep = scheduler.run("sbatch", a, 60);
        if (!rep.ok()) {
            throw new UserInputException("--on slurm: sbatch refused " + what + ": " + org.littoral.scenarios.input.Shown.clip(
                    rep.firstLine(), 160) + "; check the job settings (partition, account, time_limit, memory, sbatch_options); "
                    + "the scripts are in " + clusterDir + "; fix them and submit again with --resume");
        }
        String id = rep.out().trim();
        int semi = id.indexOf(';'); // "ID;CLUSTER" on federated clusters
        id = semi >= 0 ? id.substring(0, semi) : id;
        if (!id.matches("\\d+")) {
            throw new UserInputException("--on slurm: sbatch answered " + org.littoral.scenarios.input.Shown.text(rep.out().trim())
                    + " instead of a job id for " + what + "; check with squeue whether it was submitted");
        }
        return id;
    }

    private String header(String name, long[] mem, String output) {
        StringBuilder sb = new StringBuilder();
        sb.append("#SBATCH --job-name=").append(name).append('\n');
        sb.append("#SBATCH --output=").append(output).append('\n');
        sb.append("#SBATCH --chdir=").append(workDir).append('\n');
        sb.append("#SBATCH --ntasks=1\n");
        sb.append("#SBATCH --cpus-per-task=").append(settings.cpusPerTask).append('\n');
        sb.append("#SBATCH --mem=").append(mem[0]).append("M\n");
        if (settings.timeLimit != null) {
            sb.append("#SBATCH --time=").append(settings.timeLimit).append('\n');
        }
        if (settings.partition != null) {
            sb.append("#SBATCH --partition=").append(settings.partition).append('\n');
        }
        if (settings.account != null) {
            sb.append("#SBATCH --account=").append(settings.account).append('\n');
        }
        for (String o : settings.sbatchOptions) {
            sb.append("#SBATCH ").append(o).append('\n');
        }
        sb.append("set -eu\n");
        for (String s : settings.setup) {
            sb.append(s).append('\n');
        }
        sb.append("export LITTORAL_JAVA_OPTS=\"-Xmx").append(mem[1]).append("m\"\n");
        return sb.toString();
    }

    private String arrayScript(String name, int shards, long[] mem, Path logs, Placement.Request r) {
        String cmd = launcher() + " " + shellWords(commandArgs) + " --shard \"$shard/" + shards + "\" --threads \"${SLURM_CPUS_PER_TASK:-"
                + settings.cpusPerTask + "}\"";
        return "#!/bin/bash\n"
                + "# Written by littoral: one task of this job array per shard of the " + r.members().size() + " members of "
                + r.spec().name() + ".\n# Each task computes its shard into " + r.outDir().toAbsolutePath().normalize()
                + " (member files are written atomically);\n# merge.sh combines them. Submit both with submit.sh.\n"
                + header(name, mem, logs.resolve("%A-task-%a.log").toString())
                + "shard=\"${SLURM_ARRAY_TASK_ID:?submit this script as a job array: sbatch --array=1-" + shards + "}\"\n"
                + "echo \"littoral: shard $shard/" + shards + " starts on $(hostname) at $(date -u +%FT%TZ)\"\n"
                + "status=0\n"
                + cmd + " || status=$?\n"
                + "echo \"littoral: shard $shard/" + shards + " ended with exit status $status at $(date -u +%FT%TZ)\"\n"
                + "exit $status\n";
    }

    private String mergeScript(String name, long[] mem, Path logs, Placement.Request r) {
        return "#!/bin/bash\n"
                + "# Written by littoral: combines what the array tasks wrote into the tables and figures of "
                + r.spec().name() + ";\n# lists the tasks that left members without a result.\n"
                + header(name + "-merge", mem, logs.resolve("%j-merge.log").toString())
                + launcher() + " " + shellWords(commandArgs) + " --merge --threads \"${SLURM_CPUS_PER_TASK:-"
                + settings.cpusPerTask + "}\"\n";
    }

    private String submitScript(Path array, Path merge, Path clusterDir, int shards, String taskList) {
        return "#!/usr/bin/env bash\n"
                + "# Written by littoral: submits the job array (tasks " + taskList + " by default; give another list as the\n"
                + "# first argument) and the merge job that waits for it (afterany: it runs after failed tasks too).\n"
                + "set -euo pipefail\n"
                + "tasks=\"${1:-" + taskList + "}\"\n"
                + "array=$(sbatch --parsable --array=\"$tasks\" " + quote(array.toString()) + ")\n"
                + "array=${array%%;*}\n"
                + "merge=$(sbatch --parsable --dependency=afterany:\"$array\" " + quote(merge.toString()) + ")\n"
                + "merge=${merge%%;*}\n"
                + "echo \"array=$array shards=" + shards + " tasks=$tasks merge=$merge submitted=$(date -u +%FT%TZ)\" >> "
                + quote(JobLog.file(clusterDir).toString()) + "\n"
                + "echo \"submitted job array $array (tasks $tasks) and merge job $merge; follow them with: squeue -j $array,$merge\"\n";
    }

    private static void writeScript(Path p, String text) throws IOException {
        AtomicFile.writeString(p, text);
        if (p.getFileSystem().supportedFileAttributeViews().contains("posix")) {
            Files.setPosixFilePermissions(p, PosixFilePermissions.fromString("rwxr-xr-x"));
        }
    }

    /**
     * The command that starts littoral on the nodes: the job settings' launcher, else this very Java and class path
     * (the cluster's nodes see the same file system).
     */
    String launcher() {
        if (settings.launcher != null) {
            return settings.launcher;
        }
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        List<String> cp = new ArrayList<>();
        for (String e : System.getProperty("java.class.path").split(File.pathSeparator)) {
            if (!e.isEmpty()) {
                cp.add(Path.of(e).toAbsolutePath().normalize().toString());
            }
        }
        return quote(java) + " -Djava.awt.headless=true -Xss8m ${LITTORAL_JAVA_OPTS:-} -cp "
                + quote(String.join(File.pathSeparator, cp)) + " org.littoral.scenarios.cli.Main";
    }

    static String shellWords(List<String> words) {
        StringBuilder sb = new StringBuilder();
        for (String w : words) {
            sb.append(sb.length() > 0 ? " " : "").append(quote(w));
        }
        return sb.toString();
    }

    /** A word for the shell, single-quoted unless it is plain. */
    static String quote(String w) {
        if (w.matches("[A-Za-z0-9_./:=,+@%-]+")) {
            return w;
        }
        return "'" + w.replace("'", "'\\''") + "'";
    }
}
