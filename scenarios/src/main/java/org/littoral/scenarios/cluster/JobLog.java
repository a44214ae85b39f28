package org.littoral.scenarios.cluster;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;

/**
 * {@code DIR/cluster/jobs.txt}: one line per submission, {@code array=ID shards=N tasks=LIST merge=ID submitted=TIME},
 * appended by littoral when it submits and by the written {@code submit.sh} when a person does. The merge step and a
 * resubmission read it to ask the scheduler about the tasks.
 */
final class JobLog {
    static final String FILE = "jobs.txt";

    /** One submission. */
    record Entry(String arrayJob, int shards, TreeSet<Integer> tasks, String mergeJob) {
    }

    private JobLog() {
    }

    static Path file(Path clusterDir) {
        return clusterDir.resolve(FILE);
    }

    static void append(Path clusterDir, String arrayJob, int shards, String tasks, String mergeJob) throws IOException {
        String line = "array=" + arrayJob + " shards=" + shards + " tasks=" + tasks + " merge=" + mergeJob + " submitted="
                + java.time.Instant.now().truncatedTo(java.time.temporal.ChronoUnit.SECONDS) + "\n";
        Files.createDirectories(clusterDir);
        Files.writeString(file(clusterDir), line, StandardCharsets.UTF_8, StandardOpenOption.CREATE, StandardOpenOption.APPEND);
    }

    /** The submissions, oldest first; lines that cannot be read are skipped. */
    static List<Entry> read(Path clusterDir) {
        List<Entry> out = new ArrayList<>();
        Path f = file(clusterDir);
        if (!Files.isRegularFile(f)) {
            return out;
        }
        List<String> lines;
        try {
            lines = Files.readAllLines(f, StandardCharsets.UTF_8);
        } catch (IOException e) {
            return out;
        }
        for (String l : lines) {
            String array = null;
            String merge = null;
            int shards = 0;
            TreeSet<Integer> tasks = null;
            for (String part : l.trim().split("\\s+")) {
                int eq = part.indexOf('=');
                if (eq < 0) {
                    continue;
                }
                String k = part.substring(0, eq);
                String v = part.substring(eq + 1);
                try {
                    switch (k) {
                        case "array" -> array = v;
                        case "merge" -> merge = v;
                        case "shards" -> shards = Integer.parseInt(v);
                        case "tasks" -> tasks = ranges(v);
                        default -> { }
                    }
                } catch (RuntimeException e) {
                    tasks = null;
                }
            }
            if (array != null && !array.isEmpty() && shards > 0 && tasks != null) {
                out.add(new Entry(array, shards, tasks, merge));
            }
        }
        return out;
    }

    /** {@code 1-3,5,7-8} to the numbers. */
    static TreeSet<Integer> ranges(String s) {
        TreeSet<Integer> out = new TreeSet<>();
        for (String p : s.split(",")) {
            int dash = p.indexOf('-');
            if (dash > 0) {
                int a = Integer.parseInt(p.substring(0, dash));
                int b = Integer.parseInt(p.substring(dash + 1));
                for (int i = a; i <= b; i++) {
                    out.add(i);
                }
            } else {
                out.add(Integer.parseInt(p));
            }
        }
        return out;
    }

    /** The numbers as {@code 1-3,5,7-8} (sbatch --array's form). */
    static String ranges(java.util.SortedSet<Integer> xs) {
        StringBuilder sb = new StringBuilder();
        Integer start = null;
        Integer prev = null;
        for (int x : xs) {
            if (start == null) {
                start = x;
            } else if (x != prev + 1) {
                sb.append(sb.length() > 0 ? "," : "").append(start.equals(prev) ? "" + start : start + "-" + prev);
                start = x;
            }
            prev = x;
        }
        if (start != null) {
            sb.append(sb.length() > 0 ? "," : "").append(start.equals(prev) ? "" + start : start + "-" + prev);
        }
        return sb.toString();
    }
}
