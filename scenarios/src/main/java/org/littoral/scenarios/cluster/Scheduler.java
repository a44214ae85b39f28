package org.littoral.scenarios.cluster;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * The cluster scheduler's own command-line tools (sbatch, squeue, sacct, scontrol), found in the job settings'
 * {@code scheduler_bin} folder or on the PATH, and run with a time limit. littoral distributes nothing itself: the
 * scheduler does; these tools are how littoral talks to it.
 */
final class Scheduler {
    /** What a tool printed and how it ended; exit -1 when it could not be started or did not end in time. */
    record Reply(int exit, String out, String err) {
        boolean ok() {
            return exit == 0;
        }

        /** The first non-blank line of what the tool said on stderr (else stdout), for one-line messages. */
        String firstLine() {
            for (String s : new String[] {err, out}) {
                for (String l : s.split("\\R")) {
                    if (!l.isBlank()) {
                        return l.trim();
                    }
                }
            }
            return "(no message)";
        }
    }

    private final Path bin;

    /** @param bin folder holding the tools, or null for the PATH */
    Scheduler(Path bin) {
        this.bin = bin;
    }

    /** The tool's path, or null when it is not there. */
    Path find(String tool) {
        if (bin != null) {
            Path p = bin.resolve(tool);
            return Files.isExecutable(p) ? p : null;
        }
        String path = System.getenv("PATH");
        if (path == null) {
            return null;
        }
        for (String d : path.split(File.pathSeparator)) {
            if (d.isEmpty()) {
                continue;
            }
            Path p = Path.of(d, tool);
            if (Files.isRegularFile(p) && Files.isExecutable(p)) {
                return p;
            }
        }
        return null;
    }

    /** Where the tools were looked for, for messages. */
    String where() {
        return bin != null ? "in scheduler_bin " + bin : "on the PATH";
    }

    /** Runs a tool; a tool that is missing gives exit -1 and says so. */
    Reply run(String tool, List<String> args, long timeoutSeconds) {
        Path exe = find(tool);
        if (exe == null) {
            return new Reply(-1, "", tool + " not found " + where());
        }
        List<String> cmd = new ArrayList<>();
        cmd.add(exe.toString());
        cmd.addAll(args);
        try {
            Path outF = Files.createTempFile("littoral-" + tool, ".out");
            Path errF = Files.createTempFile("littoral-" + tool, ".err");
            try {
                Process p = new ProcessBuilder(cmd).redirectOutput(outF.toFile()).redirectError(errF.toFile())
                        .redirectInput(ProcessBuilder.Redirect.from(new File("/dev/null"))).start();
                if (!p.waitFor(timeoutSeconds, TimeUnit.SECONDS)) {
                    p.destroyForcibly();
                    return new Reply(-1, "", tool + " did not answer in " + timeoutSeconds + " s");
                }
                return new Reply(p.exitValue(), Files.readString(outF, StandardCharsets.UTF_8),
                        Files.readString(errF, StandardCharsets.UTF_8));
            } finally {
                Files.deleteIfExists(outF);
                Files.deleteIfExists(errF);
            }
        } catch (IOException e) {
            return new Reply(-1, "", "cannot run " + exe + ": " + e.getMessage());
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return new Reply(-1, "", tool + " interrupted");
        }
    }
}
