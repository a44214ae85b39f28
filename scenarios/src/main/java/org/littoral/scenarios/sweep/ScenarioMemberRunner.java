package org.littoral.scenarios.sweep;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.function.Function;
import java.util.stream.Stream;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.run.ScenarioRun;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.run.WorkEstimate;
import org.littoral.scenarios.scenario.BuiltinScenarios;
import org.littoral.scenarios.scenario.Scenario;
import org.littoral.scenarios.scenario.ScenarioFile;

/**
 * The real member runner: validates the member's scenario document with the scenario reader and runs it
 * through {@code littoral run}'s pipeline ({@link ScenarioRun}), keeping the run's files under
 * {@code runs/<id>/} (soundings for the analysis chain, the time-distance section) unless told not to.
 * The member result is the run summary without the parts the member file already holds (inputs) or that say
 * nothing about the member (file list, caution text).
 */
public final class ScenarioMemberRunner implements Function<Member, MemberResult> {
    private final String sweepSource;
    private final Path runsDir;
    private final Solver solver;
    private boolean fieldsNetcdf;

    /**
     * @param sweepSource the sweep file, for messages
     * @param runsDir folder for each member's run files, or null to run in a scratch folder that is deleted
     * @param solver the model ({@link Solver#standard()} picks it from the scenario's {@code kind})
     */
    public ScenarioMemberRunner(String sweepSource, Path runsDir, Solver solver) {
        this.sweepSource = sweepSource;
        this.runsDir = runsDir;
        this.solver = solver;
    }

    /** Whether each member's run also writes fields.nc (only useful with a runs folder). Returns this. */
    public ScenarioMemberRunner fieldsNetcdf(boolean write) {
        this.fieldsNetcdf = write;
        return this;
    }

    private Path scratchRoot;

    /**
     * Where members whose run files are not kept run (each in its own sub-folder, deleted when it finishes): under
     * the sweep's output folder, so a killed sweep leaves nothing elsewhere and a resumed one clears it
     * ({@link SweepExecutor#SCRATCH}). Without it, the system's temporary folder. Returns this.
     */
    public ScenarioMemberRunner scratchIn(Path folder) {
        this.scratchRoot = folder;
        return this;
    }

    /** Base scenarios as the scenario reader sees them: every default filled in, so every key can be swept. */
    public static ScenarioSource scenarioSource() {
        return new ScenarioSource() {
            @Override
            public ObjectNode load(String ref, Path relativeTo) {
                Path p = ScenarioSource.resolveFile(ref, relativeTo);
                Scenario s = p != null ? ScenarioFile.load(p) : BuiltinScenarios.resolve(ref);
                return s.inputs().deepCopy();
            }

            @Override
            public ObjectNode inline(ObjectNode tree, String label) {
                return ScenarioFile.fromTree(label, tree).inputs().deepCopy();
            }
        };
    }

    /** Reads a member's document with the scenario reader; its errors name the member and its settings. */
    public Scenario scenarioOf(Member m) {
        String json;
        try {
            json = CanonicalJson.MAPPER.writeValueAsString(m.document());
        } catch (JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
        String label = "sweep " + sweepSource + " member " + m.id() + (m.settings().isEmpty() ? "" : " (" + m.describe() + ")");
        return ScenarioFile.parse(label, json, true);
    }

    /** Checks every member before anything runs, so a bad combination stops the sweep at once. */
    public void checkAll(List<Member> members) {
        checkAll(members, 1);
    }

    /**
     * Checks every member before anything runs, and that {@code threads} of the largest run at once fit in memory
     * ({@link WorkEstimate}), so a bad combination or a sweep too big for the machine stops at once. With
     * {@code threads} 0 only the members are checked (their runs happen elsewhere, e.g. on a batch system).
     *
     * @return the estimate of the largest member (null without members)
     */
    public WorkEstimate checkAll(List<Member> members, int threads) {
        WorkEstimate largest = null;
        Member which = null;
        for (Member m : members) {
            WorkEstimate w = WorkEstimate.of(scenarioOf(m));
            if (largest == null || w.runBytes() > largest.runBytes()) {
                largest = w;
                which = m;
            }
        }
        if (largest != null && threads > 0) {
            largest.check(Math.min(threads, members.size()), "sweep " + sweepSource + " (largest member " + which.id() + ")");
        }
        return largest;
    }

    @Override
    public MemberResult apply(Member m) {
        Scenario s = scenarioOf(m);
        Path dir = null;
        boolean scratch = runsDir == null;
        try {
            dir = !scratch ? runsDir.resolve(m.id())
                    : scratchRoot != null ? scratchRoot.resolve(m.id()) : Files.createTempDirectory("littoral-member-");
            Files.createDirectories(dir);
            if (!scratch) {
                clearLeftoverTemps(dir);
            }
            ScenarioRun.Outcome o = new ScenarioRun(s, solver, null).figures(false).checkMemory(false).fieldsNetcdf(fieldsNetcdf)
                    .command("sweep " + sweepSource + " member " + m.id()).run(dir);
            return new MemberResult(trim(o.summary()));
        } catch (IOException e) {
            throw new UncheckedIOException("member " + m.id() + ": cannot write its run files to " + dir, e);
        } finally {
            if (scratch && dir != null) {
                deleteTree(dir);
            }
        }
    }

    static ObjectNode trim(ObjectNode summary) {
        ObjectNode out = JsonNodeFactory.instance.objectNode();
        for (String k : new String[] {"model", "derived", "diagnostics", "note"}) {
            JsonNode v = summary.get(k);
            if (v != null) {
                out.set(k, v);
            }
        }
        if (out.path("diagnostics").isObject()) {
            ((ObjectNode) out.get("diagnostics")).remove("definitions");
        }
        return out;
    }

    /**
     * Removes the temporary files a killed run of this member left in its run folder (an interrupted write of
     * soundings.nc, say), so that the member's run files are exactly those of one complete run.
     */
    private static void clearLeftoverTemps(Path dir) throws IOException {
        try (java.nio.file.DirectoryStream<Path> ds = Files.newDirectoryStream(dir,
                ".*" + org.littoral.scenarios.output.AtomicFile.TMP_SUFFIX)) {
            for (Path p : ds) {
                Files.deleteIfExists(p);
            }
        }
    }

    private static void deleteTree(Path dir) {
        try (Stream<Path> s = Files.walk(dir)) {
            s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            // a scratch folder that cannot be removed is harmless
        }
    }

    /** Wraps scenario errors raised while checking members into one line naming the sweep. */
    static UserInputException asSweepError(String source, UserInputException e) {
        return new UserInputException(e.getMessage().startsWith("sweep ") ? e.getMessage() : "sweep " + source + ": " + e.getMessage(), e);
    }
}
