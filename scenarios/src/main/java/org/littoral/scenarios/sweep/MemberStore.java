package org.littoral.scenarios.sweep;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeSet;
import org.littoral.scenarios.output.AtomicFile;

/**
 * The per-member result files of a sweep, {@code <out>/members/<id>.json}. Each is written to a temporary
 * file in the same folder, forced to disk and renamed over the final name, so a reader (or a resumed run after a
 * kill) sees either the whole file or none of it.
 */
public final class MemberStore {

    /** What a resumed run finds for a member. */
    public enum State { ABSENT, VALID, VALID_FAILED, UNREADABLE, OTHER_INPUTS }

    public static final String STATUS_OK = "ok";
    public static final String STATUS_FAILED = "failed";

    private final Path dir;

    public MemberStore(Path outDir) {
        this.dir = outDir.resolve("members");
    }

    public Path folder() {
        return dir;
    }

    public Path fileOf(String id) {
        return dir.resolve(id + ".json");
    }

    public void create() {
        try {
            Files.createDirectories(dir);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create " + dir, e);
        }
    }

    /** The member record: identity, settings, inputs hash, outcome and the resolved inputs. */
    public static ObjectNode record(String sweepName, Member m, JsonNode summary, String error) {
        ObjectNode r = JsonNodeFactory.instance.objectNode();
        r.put("member", m.id());
        r.put("index", m.index());
        r.put("sweep", sweepName);
        ObjectNode settings = r.putObject("settings");
        ObjectNode labels = r.putObject("labels");
        for (SweepSpec.Setting s : m.settings()) {
            settings.set(s.path().toString(), s.value().value());
            labels.put(s.path().toString(), s.value().label());
        }
        r.put("inputs_sha256", m.inputsSha256());
        if (error == null) {
            r.put("status", STATUS_OK);
            r.set("result", summary == null ? JsonNodeFactory.instance.objectNode() : summary);
        } else {
            r.put("status", STATUS_FAILED);
            r.put("error", error);
        }
        r.set("inputs", m.document());
        return r;
    }

    /** Writes a member record atomically (temp file in the same folder, fsync, rename). */
    public void write(String id, ObjectNode record) throws IOException {
        AtomicFile.write(fileOf(id), CanonicalJson.prettyBytes(record));
    }


    /** Whether member m has a complete result computed from exactly its current inputs. */
    public State check(Member m) {
        Path f = fileOf(m.id());
        if (!Files.isRegularFile(f)) {
            return State.ABSENT;
        }
        JsonNode n;
        try {
            n = CanonicalJson.MAPPER.readTree(f.toFile());
        } catch (IOException e) {
            return State.UNREADABLE;
        }
        if (n == null || !n.isObject() || !m.id().equals(n.path("member").asText())
                || !(STATUS_OK.equals(n.path("status").asText()) || STATUS_FAILED.equals(n.path("status").asText()))) {
            return State.UNREADABLE;
        }
        if (!m.inputsSha256().equals(n.path("inputs_sha256").asText())) {
            return State.OTHER_INPUTS;
        }
        return STATUS_OK.equals(n.path("status").asText()) ? State.VALID : State.VALID_FAILED;
    }

    /** Member ids that have a result file, sorted. */
    public List<String> presentIds() {
        TreeSet<String> ids = new TreeSet<>();
        if (!Files.isDirectory(dir)) {
            return List.of();
        }
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(dir, "*.json")) {
            for (Path p : ds) {
                String fn = p.getFileName().toString();
                if (!fn.startsWith(".")) {
                    ids.add(fn.substring(0, fn.length() - ".json".length()));
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot list " + dir, e);
        }
        return new ArrayList<>(ids);
    }

    /** Deletes temporary files left by a run that was killed mid-write; returns how many. */
    public int deleteLeftoverTemps() {
        int n = 0;
        if (!Files.isDirectory(dir)) {
            return 0;
        }
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(dir, ".*" + AtomicFile.TMP_SUFFIX)) {
            for (Path p : ds) {
                Files.deleteIfExists(p);
                n++;
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot clean " + dir, e);
        }
        return n;
    }

    /** Deletes the temporary files an interrupted write of member {@code id} left; returns how many. */
    public int deleteLeftoverTemps(String id) {
        int n = 0;
        if (!Files.isDirectory(dir)) {
            return 0;
        }
        try (DirectoryStream<Path> ds = Files.newDirectoryStream(dir, "." + id + ".json.*" + AtomicFile.TMP_SUFFIX)) {
            for (Path p : ds) {
                Files.deleteIfExists(p);
                n++;
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot clean " + dir, e);
        }
        return n;
    }

    /** Reads a member record (for the comparison table). */
    public ObjectNode read(String id) throws IOException {
        return (ObjectNode) CanonicalJson.MAPPER.readTree(fileOf(id).toFile());
    }
}
