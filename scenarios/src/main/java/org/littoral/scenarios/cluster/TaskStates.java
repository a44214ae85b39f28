package org.littoral.scenarios.cluster;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.littoral.scenarios.sweep.Member;
import org.littoral.scenarios.sweep.Placement;

/**
 * What became of the array tasks whose members have no result: the scheduler's state of each task, asked in turn of
 * the accounting database (sacct), the controller's memory of recent jobs (scontrol), the queue (squeue) and, when
 * none of them knows the task any more, the task's own log. Used by the merge step and by a resubmission.
 */
final class TaskStates implements Placement.MissingReport {
    private static final Pattern TASK_LOG = Pattern.compile("(\\d+)-task-(\\d+)\\.log");
    private final Path outDir;
    private final Scheduler scheduler;

    TaskStates(Path outDir, Scheduler scheduler) {
        this.outDir = outDir;
        this.scheduler = scheduler;
    }

    static Path clusterDir(Path outDir) {
        return outDir.resolve("cluster");
    }

    static Path logDir(Path outDir) {
        return clusterDir(outDir).resolve("logs");
    }

    @Override
    public List<String> explain(List<Member> missing, int memberCount) {
        List<String> lines = new ArrayList<>();
        List<JobLog.Entry> jobs = JobLog.read(clusterDir(outDir));
        if (jobs.isEmpty()) {
            lines.add("merge: no submission is recorded in " + JobLog.file(clusterDir(outDir)) + "; members without a result: "
                    + ids(missing, 12));
            return lines;
        }
        int shards = jobs.get(jobs.size() - 1).shards();
        Map<Integer, List<Member>> byShard = new LinkedHashMap<>();
        for (Member m : missing) {
            byShard.computeIfAbsent(m.index() % shards + 1, k -> new ArrayList<>()).add(m);
        }
        for (Map.Entry<Integer, List<Member>> e : byShard.entrySet()) {
            lines.add(describe(e.getKey(), shards, e.getValue(), memberCount, jobs));
        }
        return lines;
    }

    /** One line: which shard, how many of its members lack a result, the task's state and its log. */
    String describe(int shard, int shards, List<Member> missing, int memberCount, List<JobLog.Entry> jobs) {
        int own = (memberCount - shard + shards) / shards; // members m with m mod shards == shard - 1
        String task = null;
        for (JobLog.Entry j : jobs) {
            if (j.shards() == shards && j.tasks().contains(shard)) {
                task = j.arrayJob() + "_" + shard;
            }
        }
        Path log = latestLog(shard);
        String state = task == null ? "never submitted" : stateOf(task, log);
        return "merge: shard " + shard + "/" + shards + ": " + missing.size() + " of its " + own + " members without a result ("
                + ids(missing, 6) + "); task " + (task == null ? "-" : task) + ": " + state + "; log: "
                + (log == null ? "none (the task never started)" : log);
    }

    /** The newest log of a shard's task (highest job id), or null. */
    Path latestLog(int shard) {
        Path dir = logDir(outDir);
        if (!Files.isDirectory(dir)) {
            return null;
        }
        Path best = null;
        long bestJob = -1;
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(dir, "*-task-" + shard + ".log")) {
            for (Path p : ds) {
                Matcher m = TASK_LOG.matcher(p.getFileName().toString());
                if (m.matches() && Integer.parseInt(m.group(2)) == shard && Long.parseLong(m.group(1)) > bestJob) {
                    bestJob = Long.parseLong(m.group(1));
                    best = p;
                }
            }
        } catch (IOException | NumberFormatException e) {
            return best;
        }
        return best;
    }

    /** The state of one array task ({@code JOB_TASK}) as the scheduler reports it, or what its log says. */
    String stateOf(String task, Path log) {
        Scheduler.Reply acct = scheduler.run("sacct", List.of("-n", "-P", "-X", "-j", task, "-o", "State,ExitCode"), 20);
        if (acct.ok() && !acct.out().isBlank()) {
            String[] f = acct.out().lines().filter(l -> !l.isBlank()).findFirst().orElse("").split("\\|");
            return f[0].trim() + (f.length > 1 ? " (exit " + f[1].trim() + ")" : "") + " (sacct)";
        }
        Scheduler.Reply ctl = scheduler.run("scontrol", List.of("show", "job", "-o", task), 20);
        if (ctl.ok()) {
            String s = field(ctl.out(), "JobState");
            if (s != null) {
                String exit = field(ctl.out(), "ExitCode");
                String reason = field(ctl.out(), "Reason");
                return s + (exit != null ? " (exit " + exit + ")" : "") + (reason != null && !reason.equals("None")
                        ? " reason " + reason : "") + " (scontrol)";
            }
        }
        Scheduler.Reply q = scheduler.run("squeue", List.of("-h", "-j", task, "-o", "%T %r"), 20);
        if (q.ok() && !q.out().isBlank()) {
            return q.out().trim() + " (squeue)";
        }
        return "no longer known to the scheduler (no accounting); " + lastLine(log);
    }

    private static String field(String text, String key) {
        Matcher m = Pattern.compile("\\b" + key + "=(\\S+)").matcher(text);
        return m.find() ? m.group(1) : null;
    }

    /** What the end of a task's log says: its last line, or that it has none. */
    static String lastLine(Path log) {
        if (log == null || !Files.isRegularFile(log)) {
            return "the task wrote no log";
        }
        try {
            List<String> lines = Files.readAllLines(log, StandardCharsets.UTF_8);
            for (int i = lines.size() - 1; i >= 0; i--) {
                if (!lines.get(i).isBlank()) {
                    String l = lines.get(i).trim();
                    return "its log ends: " + (l.length() > 160 ? l.substring(0, 157) + "..." : l);
                }
            }
            return "its log is empty";
        } catch (IOException e) {
            return "its log cannot be read";
        }
    }

    /** Jobs of earlier submissions that are still queued or running, as {@code ID (STATE)} texts. */
    List<String> stillActive() {
        List<String> out = new ArrayList<>();
        for (JobLog.Entry j : JobLog.read(clusterDir(outDir))) {
            for (String id : new String[] {j.arrayJob(), j.mergeJob()}) {
                if (id == null || id.isEmpty() || id.equals("-")) {
                    continue;
                }
                Scheduler.Reply q = scheduler.run("squeue", List.of("-h", "-j", id, "-o", "%i %T"), 20);
                if (q.ok()) {
                    q.out().lines().filter(l -> !l.isBlank()).forEach(l -> out.add(l.trim()));
                }
            }
        }
        return out;
    }

    static String ids(List<Member> ms, int max) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < ms.size() && i < max; i++) {
            sb.append(i > 0 ? ", " : "").append(ms.get(i).id());
        }
        if (ms.size() > max) {
            sb.append(", ... ").append(ms.size() - max).append(" more");
        }
        return sb.toString();
    }
}
