package org.littoral.scenarios.output;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileStore;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;
import java.util.stream.Stream;
import org.littoral.scenarios.input.InputText;
import org.littoral.scenarios.input.Shown;
import org.littoral.scenarios.input.UserInputException;

/**
 * The folder a command writes into ({@code --out}), checked before anything is computed: an empty name, a file, a
 * dangling link, a place that cannot be created or written, or a nearly full disk each give one line (exit 2); a
 * folder that already holds another run's outputs is not mixed with a new run's unless {@code --overwrite} (which
 * first removes the earlier run's files) or {@code --resume} (where the command can continue a run) says so.
 *
 * <p>Every command that writes a folder leaves {@link #MANIFEST} in it: which command wrote it, when, whether it
 * finished, and the files it wrote, so a later run knows what to replace and a reader knows where the files came
 * from.
 */
public final class OutputFolder {
    /** The record of the run that wrote a folder. */
    public static final String MANIFEST = "littoral-run.json";
    /** Less free space than this is refused before a run starts. */
    public static final long MIN_FREE_BYTES = 32L << 20;

    /** What to do with a folder that already holds outputs. */
    public enum Mode {
        /** Refuse to write into a folder that holds another run's outputs. */
        FRESH,
        /** Remove the earlier run's files first. */
        OVERWRITE,
        /** Continue the run whose outputs are there (sweeps, plans, timing ensembles). */
        RESUME
    }

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private final Path dir;
    private final String command;
    private final Instant started;
    private final TreeSet<String> earlierFiles = new TreeSet<>();

    private OutputFolder(Path dir, String command, Instant started) {
        this.dir = dir;
        this.command = command;
        this.started = started;
    }

    /** The folder. */
    public Path path() {
        return dir;
    }

    /**
     * Checks and prepares an output folder.
     *
     * @param dir the folder as given (null when the command chose its default)
     * @param command the command and what it runs, for the record and messages ("run classic-45N")
     * @param mode what to do with earlier outputs
     * @param resumable whether the command can continue a run (its messages then offer --resume)
     * @param log where notes go (the files an overwrite removed), or null
     */
    public static OutputFolder prepare(Path dir, String command, Mode mode, boolean resumable, PrintStream log) {
        return prepare(dir, command, mode, resumable, log, MIN_FREE_BYTES);
    }

    /** As {@link #prepare(Path, String, Mode, boolean, PrintStream)}, needing {@code freeBytes} free on the disk. */
    public static OutputFolder prepare(Path dir, String command, Mode mode, boolean resumable, PrintStream log, long freeBytes) {
        check(dir);
        Path abs = dir.toAbsolutePath().normalize();
        try {
            Files.createDirectories(dir);
        } catch (IOException e) {
            throw cannot(dir, "create", e);
        }
        probeWritable(dir);
        checkFreeSpace(dir, Math.max(MIN_FREE_BYTES, freeBytes));
        List<String> present = listFiles(dir);
        present.remove(MANIFEST);
        JsonNode old = readManifest(dir);
        OutputFolder f = new OutputFolder(dir, command, continuedStart(mode, old));
        String oldCommand = old == null ? null : old.path("command").asText("");
        if (!present.isEmpty()) {
            String kind = oldCommand == null ? "files" : "the outputs of an earlier '" + Shown.bare(oldCommand) + "'"
                    + (old.path("complete").asBoolean(false) ? "" : " (unfinished)");
            String example = present.get(0);
            if (mode == Mode.FRESH) {
                throw new UserInputException("--out " + dir + " already holds " + kind + " (" + present.size() + " file"
                        + (present.size() == 1 ? "" : "s") + ", e.g. " + Shown.bare(example) + "); "
                        + (resumable ? "add --resume to continue that run, --overwrite to replace it," : "add --overwrite to replace them,")
                        + " or give another --out folder");
            }
            if (mode == Mode.RESUME && old != null && !sameCommandWord(oldCommand, command)) {
                throw new UserInputException("--resume: --out " + dir + " holds the outputs of '" + Shown.bare(oldCommand)
                        + "', not of a " + firstWord(command) + " run; give the folder of that run, or another --out folder");
            }
            if (mode == Mode.OVERWRITE) {
                int removed = f.removeEarlier(old, present, abs);
                if (log != null && removed > 0) {
                    log.println("littoral: --overwrite: removed " + removed + " file(s) of the earlier run in " + dir);
                }
            } else if (old != null) {
                old.path("files").forEach(n -> f.earlierFiles.add(n.asText()));
            }
        }
        f.writeManifest(false, List.of());
        return f;
    }

    /**
     * When a run continues an unfinished one (a killed run resumed, the merge step of a job array that another process
     * submitted), the files written since the earlier start belong to it too: its record counts from then.
     */
    private static Instant continuedStart(Mode mode, JsonNode old) {
        Instant now = Instant.now();
        if (mode != Mode.RESUME || old == null || old.path("complete").asBoolean(false)) {
            return now;
        }
        try {
            Instant then = Instant.parse(old.path("started").asText());
            return then.isBefore(now) ? then : now;
        } catch (RuntimeException e) {
            return now;
        }
    }

    /**
     * Only the checks that the folder can be used (a name, not a file or dangling link, creatable, writable, some free
     * space), for commands that manage their folder's contents themselves. Creates the folder.
     */
    public static void usable(Path dir) {
        check(dir);
        try {
            Files.createDirectories(dir);
        } catch (IOException e) {
            throw cannot(dir, "create", e);
        }
        probeWritable(dir);
        checkFreeSpace(dir, MIN_FREE_BYTES);
    }

    /** The checks on the name alone (and what is at that path), before anything is created. */
    static void check(Path dir) {
        if (dir == null || dir.toString().isBlank()) {
            throw new UserInputException("--out is empty; give a folder, e.g. --out out/run1 (it is created when missing)");
        }
        if (Files.isSymbolicLink(dir) && !Files.exists(dir)) {
            String target;
            try {
                target = Files.readSymbolicLink(dir).toString();
            } catch (IOException e) {
                target = "?";
            }
            throw new UserInputException("--out " + dir + " is a link to " + Shown.bare(target) + ", which does not exist; "
                    + "remove the link or give another folder");
        }
        if (Files.exists(dir) && !Files.isDirectory(dir)) {
            throw new UserInputException("--out " + dir + " is a file, not a folder; give a folder (it is created when missing) "
                    + "or move the file away");
        }
        for (Path p = dir.toAbsolutePath().getParent(); p != null; p = p.getParent()) {
            if (Files.exists(p)) {
                if (!Files.isDirectory(p)) {
                    throw new UserInputException("--out " + dir + ": " + p + " is a file, so no folder can be made under it; "
                            + "give another --out folder");
                }
                break;
            }
        }
    }

    private static void probeWritable(Path dir) {
        try {
            Path probe = Files.createTempFile(dir, ".littoral-write-check", ".tmp");
            Files.delete(probe);
        } catch (IOException e) {
            throw cannot(dir, "write into", e);
        }
    }

    /** Refuses a folder on a disk with less than {@code bytes} free. */
    public static void checkFreeSpace(Path dir, long bytes) {
        try {
            FileStore store = Files.getFileStore(dir);
            long free = store.getUsableSpace();
            if (free < bytes) {
                throw new UserInputException("--out " + dir + ": only " + InputText.bytes(free) + " free on its disk, less than the "
                        + InputText.bytes(bytes) + " the outputs need; free some space or give a folder on another disk");
            }
        } catch (IOException e) {
            // a file system that cannot say: the write itself will tell
        }
    }

    private static UserInputException cannot(Path dir, String what, IOException e) {
        String why;
        if (e instanceof AccessDeniedException) {
            why = "permission denied";
        } else if (e instanceof java.nio.file.NoSuchFileException) {
            why = "the system allows no folder there";
        } else if (e instanceof FileSystemException fs && fs.getReason() != null) {
            why = fs.getReason();
        } else {
            why = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        }
        String fix = why.toLowerCase(Locale.ROOT).contains("space") ? "free some space or give a folder on another disk"
                : "give a folder you can write to";
        return new UserInputException("--out " + dir + ": cannot " + what + " the folder (" + Shown.clip(why, 80) + "); " + fix, e);
    }

    /** Removes the files an earlier run listed (or, without a record, nothing but the record); returns how many. */
    private int removeEarlier(JsonNode old, List<String> present, Path abs) {
        if (old == null) {
            throw new UserInputException("--overwrite: --out " + dir + " holds " + present.size() + " file(s) that no littoral run "
                    + "recorded writing (e.g. " + Shown.bare(present.get(0)) + "), and littoral removes only what it wrote; move "
                    + "them away or give another --out folder");
        }
        int n = 0;
        List<String> listed = new ArrayList<>();
        old.path("files").forEach(x -> listed.add(x.asText()));
        if (!old.path("complete").asBoolean(false)) {
            // an unfinished run (killed) recorded no list: its files are those written since it started
            FileTime since;
            try {
                since = FileTime.from(Instant.parse(old.path("started").asText()).minusSeconds(2));
            } catch (RuntimeException e) {
                since = FileTime.from(Instant.EPOCH);
            }
            for (String rel : present) {
                try {
                    if (Files.getLastModifiedTime(abs.resolve(rel)).compareTo(since) >= 0) {
                        listed.add(rel);
                    }
                } catch (IOException e) {
                    // gone already
                }
            }
        }
        for (String rel : listed) {
            Path p = abs.resolve(rel).normalize();
            if (!p.startsWith(abs) || p.equals(abs)) {
                continue; // never outside the folder, whatever the record says
            }
            try {
                if (Files.isRegularFile(p, java.nio.file.LinkOption.NOFOLLOW_LINKS) || Files.isSymbolicLink(p)) {
                    Files.delete(p);
                    n++;
                }
            } catch (IOException e) {
                throw cannot(dir, "clear", e);
            }
        }
        removeEmptyFolders(abs);
        return n;
    }

    private static void removeEmptyFolders(Path abs) {
        try (Stream<Path> s = Files.walk(abs)) {
            s.filter(Files::isDirectory).filter(p -> !p.equals(abs)).sorted(Comparator.reverseOrder()).forEach(p -> {
                try (Stream<Path> in = Files.list(p)) {
                    if (in.findAny().isEmpty()) {
                        Files.delete(p);
                    }
                } catch (IOException e) {
                    // leave it
                }
            });
        } catch (IOException e) {
            // leave them
        }
    }

    /** Files under the folder, relative, sorted (temporary and probe files left out). */
    static List<String> listFiles(Path dir) {
        List<String> out = new ArrayList<>();
        if (!Files.isDirectory(dir)) {
            return out;
        }
        try (Stream<Path> s = Files.walk(dir)) {
            s.filter(p -> Files.isRegularFile(p, java.nio.file.LinkOption.NOFOLLOW_LINKS))
                    .map(p -> dir.relativize(p).toString().replace('\\', '/'))
                    .filter(r -> !r.startsWith(".littoral-write-check"))
                    .sorted().forEach(out::add);
        } catch (IOException e) {
            throw cannot(dir, "list", e);
        }
        return out;
    }

    private static JsonNode readManifest(Path dir) {
        Path m = dir.resolve(MANIFEST);
        if (!Files.isRegularFile(m)) {
            return null;
        }
        try {
            JsonNode n = JSON.readTree(m.toFile());
            return n != null && n.isObject() ? n : null;
        } catch (IOException e) {
            return null;
        }
    }

    private static String firstWord(String s) {
        int sp = s.indexOf(' ');
        return sp < 0 ? s : s.substring(0, sp);
    }

    private static boolean sameCommandWord(String a, String b) {
        return firstWord(a).equals(firstWord(b));
    }

    /**
     * Records that the run finished: the files it wrote (everything changed since it started, plus what an earlier,
     * resumed run had written).
     */
    public void finish() {
        TreeSet<String> files = new TreeSet<>(earlierFiles);
        FileTime since = FileTime.from(started.minusSeconds(2));
        try (Stream<Path> s = Files.walk(dir)) {
            s.filter(p -> Files.isRegularFile(p, java.nio.file.LinkOption.NOFOLLOW_LINKS)).forEach(p -> {
                try {
                    if (Files.getLastModifiedTime(p).compareTo(since) >= 0) {
                        files.add(dir.relativize(p).toString().replace('\\', '/'));
                    }
                } catch (IOException e) {
                    // a file that vanished is not an output
                }
            });
        } catch (IOException e) {
            return; // the record is a help, not a result
        }
        files.remove(MANIFEST);
        writeManifest(true, new ArrayList<>(files));
    }

    private void writeManifest(boolean complete, List<String> files) {
        ObjectNode m = JSON.createObjectNode();
        m.put("command", command);
        m.put("started", started.toString());
        m.put("complete", complete);
        if (complete) {
            m.put("finished", Instant.now().toString());
        }
        ArrayNode f = m.putArray("files");
        files.forEach(f::add);
        m.put("note", "written by littoral: which run wrote this folder; --overwrite removes the files listed here");
        try {
            AtomicFile.write(dir.resolve(MANIFEST), JSON.writeValueAsBytes(m));
        } catch (IOException e) {
            throw cannot(dir, "write into", e);
        }
    }
}
