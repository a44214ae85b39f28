package org.littoral.scenarios.cluster;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.regex.Pattern;
import org.littoral.scenarios.input.InputDocument;
import org.littoral.scenarios.input.Shown;
import org.littoral.scenarios.input.UserInputException;

/**
 * What a batch job asks the cluster for and runs before littoral: read from a small YAML file ({@code --cluster FILE})
 * and single {@code --job KEY=VALUE} options, which override the file (list keys add a line). Every key is optional;
 * without them the cluster's defaults apply (its default partition and account, its default time limit), memory is
 * worked out from the run's own work estimate and each task gets one CPU. The keys are described in docs/cluster.md.
 */
public final class JobSettings {
    static final Set<String> KEYS = Set.of("partition", "account", "time_limit", "memory", "cpus_per_task", "tasks",
            "members_per_task", "setup", "sbatch_options", "launcher", "scheduler_bin", "job_name");

    /** Names the scheduler accepts for partitions, accounts and jobs, and nothing a shell would read specially. */
    private static final Pattern NAME = Pattern.compile("[A-Za-z0-9_.+-]{1,64}");
    /** Slurm's time forms: minutes, minutes:seconds, hours:minutes:seconds, days-hours[:minutes[:seconds]]. */
    private static final Pattern TIME = Pattern.compile("\\d{1,6}(:\\d{1,2}){0,2}|\\d{1,3}-\\d{1,2}(:\\d{1,2}){0,2}");
    /** Slurm's memory form: a whole number with an optional unit K, M (the default), G or T. */
    private static final Pattern MEMORY = Pattern.compile("(\\d{1,9})([KkMmGgTt]?)");

    String partition;
    String account;
    String timeLimit;
    /** As given ("4G"), or null: worked out from the work estimate. */
    String memory;
    int cpusPerTask = 1;
    Integer tasks;
    Integer membersPerTask;
    final List<String> setup = new ArrayList<>();
    final List<String> sbatchOptions = new ArrayList<>();
    String launcher;
    Path schedulerBin;
    String jobName;

    /**
     * Reads the file (may be null) and then the overrides.
     *
     * @param overrides {@code KEY=VALUE} texts from {@code --job}
     */
    public static JobSettings read(Path file, List<String> overrides) {
        JobSettings s = new JobSettings();
        if (file != null) {
            InputDocument doc = InputDocument.read(file, "job settings file");
            if (doc.root() != null && !doc.root().isNull()) {
                s.apply(doc, doc.rootMapping("job settings (partition, account, time_limit, memory, ...)"), false);
            }
        }
        for (String kv : overrides == null ? List.<String>of() : overrides) {
            int eq = kv.indexOf('=');
            if (eq <= 0) {
                throw new UserInputException("--job " + Shown.text(kv) + ": give KEY=VALUE, e.g. --job partition=short; keys: "
                        + String.join(", ", new java.util.TreeSet<>(KEYS)));
            }
            String key = kv.substring(0, eq).trim();
            String value = kv.substring(eq + 1).trim();
            ObjectNode one = com.fasterxml.jackson.databind.node.JsonNodeFactory.instance.objectNode();
            if (value.matches("-?\\d+")) {
                one.put(key, Long.parseLong(value));
            } else {
                one.put(key, value);
            }
            s.apply(InputDocument.of("--job " + Shown.bare(kv), one), one, true);
        }
        return s;
    }

    private void apply(InputDocument doc, ObjectNode root, boolean adding) {
        doc.onlyKeys(root, "", KEYS);
        if (root.has("partition")) {
            partition = name(doc, root, "partition");
        }
        if (root.has("account")) {
            account = name(doc, root, "account");
        }
        if (root.has("job_name")) {
            jobName = name(doc, root, "job_name");
        }
        if (root.has("time_limit")) {
            String t = doc.text(root, "", "time_limit", true, "a time limit such as 90 (minutes), 02:00:00 or 1-12:00:00");
            if (!TIME.matcher(t).matches()) {
                throw doc.error("time_limit", "time_limit = " + Shown.text(t) + ": not a time the scheduler reads; give minutes "
                        + "(90), hours:minutes:seconds (02:00:00) or days-hours:minutes:seconds (1-12:00:00)");
            }
            timeLimit = t;
        }
        if (root.has("memory")) {
            String m = doc.text(root, "", "memory", true, "memory per task such as 4G or 3500M, or auto");
            if (!m.equalsIgnoreCase("auto") && !MEMORY.matcher(m).matches()) {
                throw doc.error("memory", "memory = " + Shown.text(m) + ": give memory per task as a whole number with M or G "
                        + "(4G, 3500M), or auto (worked out from the run's work estimate)");
            }
            memory = m.equalsIgnoreCase("auto") ? null : m.toUpperCase(java.util.Locale.ROOT);
        }
        if (root.has("cpus_per_task")) {
            cpusPerTask = (int) doc.integer(root, "", "cpus_per_task", 1, 1024, "CPUs", null);
        }
        if (root.has("tasks")) {
            tasks = (int) doc.integer(root, "", "tasks", 1, 1_000_000, "tasks", null);
            membersPerTask = null;
        }
        if (root.has("members_per_task")) {
            membersPerTask = (int) doc.integer(root, "", "members_per_task", 1, 1_000_000, "members", null);
            tasks = null;
        }
        if (root.has("tasks") && root.has("members_per_task")) {
            throw doc.error("members_per_task", "give tasks or members_per_task, not both (either sets how the members are "
                    + "split into array tasks)");
        }
        if (root.has("setup")) {
            lines(doc, root, "setup", setup, adding, false);
        }
        if (root.has("sbatch_options")) {
            lines(doc, root, "sbatch_options", sbatchOptions, adding, true);
        }
        if (root.has("launcher")) {
            launcher = doc.text(root, "", "launcher", true, "the command that starts littoral on the cluster's nodes, e.g. "
                    + "/home/me/littoral/littoral");
            if (launcher.contains("\n")) {
                throw doc.error("launcher", "launcher: one line, the command that starts littoral on the nodes");
            }
        }
        if (root.has("scheduler_bin")) {
            String b = doc.text(root, "", "scheduler_bin", true, "the folder that holds sbatch, squeue, sacct and scontrol");
            Path p = Path.of(b);
            if (!Files.isDirectory(p)) {
                throw doc.error("scheduler_bin", "scheduler_bin = " + Shown.text(b) + ": no such folder; give the folder that "
                        + "holds sbatch, or leave the key out to use the PATH");
            }
            schedulerBin = p;
        }
    }

    private static String name(InputDocument doc, ObjectNode root, String key) {
        String v = doc.text(root, "", key, true, "a name of letters, digits, . _ + -");
        if (!NAME.matcher(v).matches()) {
            throw doc.error(key, key + " = " + Shown.text(v) + ": give a name of letters, digits, . _ + - (at most 64), as the "
                    + "cluster's documentation or 'sinfo'/'sacctmgr show assoc' list it");
        }
        return v;
    }

    private static void lines(InputDocument doc, ObjectNode root, String key, List<String> into, boolean adding,
                              boolean options) {
        JsonNode v = root.get(key);
        List<String> got = new ArrayList<>();
        if (v.isArray()) {
            for (int i = 0; i < v.size(); i++) {
                JsonNode e = v.get(i);
                if (!e.isTextual() && !e.isNumber()) {
                    throw doc.error(key + "[" + i + "]", key + "[" + i + "] = " + Shown.value(e) + ": give one line of text");
                }
                got.add(e.asText());
            }
        } else if (v.isTextual()) {
            got.add(v.asText());
        } else if (!v.isNull()) {
            throw doc.error(key, key + " = " + Shown.value(v) + ": give a list of lines");
        }
        for (int i = 0; i < got.size(); i++) {
            String line = got.get(i);
            if (line.contains("\n") || line.contains("\r")) {
                throw doc.error(key, key + "[" + i + "]: one command per line; give several lines as a list");
            }
            if (options && !(line.startsWith("--") && line.length() > 2)) {
                throw doc.error(key, key + "[" + i + "] = " + Shown.text(line) + ": give an sbatch option as written on its "
                        + "command line, e.g. --qos=short or --constraint=avx2");
            }
        }
        if (!adding) {
            into.clear();
        }
        into.addAll(got);
    }

    public int cpusPerTask() {
        return cpusPerTask;
    }
}
