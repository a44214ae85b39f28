package org.littoral.scenarios.sweep;

import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Function;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.output.AtomicFile;
import org.littoral.scenarios.run.WorkEstimate;

/**
 * Runs the members of a sweep on a fixed pool of threads and writes each result the moment it finishes (see
 * {@link MemberStore}). A member that fails (model blow-up, bad value) gets a "failed" record with the reason
 * and the sweep goes on. With {@code resume}, members whose record exists and was computed from the same
 * inputs (hash of the resolved scenario document) are skipped; a record from different inputs stops the run.
 */
public final class SweepExecutor {

    /**
     * @param threads worker threads (at least 1)
     * @param resume skip members that already have a valid result
     * @param log where progress lines and notes go (stderr for the command line)
     * @param progressBar draw a progress bar (only sensible on a terminal); otherwise a line every
     *                    {@code throttleMillis} at most
     * @param throttleMillis minimum interval between plain progress lines
     * @param retryFailed on resume, run members whose record says "failed" again (e.g. after fixing the cause)
     */
    public record Options(int threads, boolean resume, PrintStream log, boolean progressBar, long throttleMillis,
                          boolean retryFailed, Placement placement, WorkEstimate largest) {
        public Options {
            if (threads < 1) {
                throw new UserInputException("--threads must be at least 1; got " + threads);
            }
            if (placement == null) {
                placement = Placement.ALL_HERE;
            }
        }

        /** Options that compute every member here. */
        public Options(int threads, boolean resume, PrintStream log, boolean progressBar, long throttleMillis,
                       boolean retryFailed) {
            this(threads, resume, log, progressBar, throttleMillis, retryFailed, Placement.ALL_HERE, null);
        }

        /**
         * These options with another placement (a shard, the merge step, a batch system).
         *
         * @param largestMember the work estimate of the largest member (what a batch task asks memory for), or null
         */
        public Options placed(Placement where, WorkEstimate largestMember) {
            return new Options(threads, resume, log, progressBar, throttleMillis, retryFailed, where, largestMember);
        }

        /** Terminal-aware defaults: a bar when there is a console, else a line at most every 15 s. */
        public static Options forCommandLine(int threads, boolean resume, boolean retryFailed) {
            return new Options(threads, resume, System.err, System.console() != null, 15_000, retryFailed);
        }

        /** Options without retrying failed members. */
        public Options(int threads, boolean resume, PrintStream log, boolean progressBar, long throttleMillis) {
            this(threads, resume, log, progressBar, throttleMillis, false);
        }
    }

    /**
     * What the run did.
     *
     * @param failed members whose result is a failure after this run: those that failed now and those that failed in
     *               an earlier run and were not run again (a resumed sweep is complete only when this is 0)
     * @param failedEarlier of {@code failed}, those from an earlier run (kept because --retry-failed was not given)
     */
    public record Outcome(int members, int ran, int skipped, int failed, double wallSeconds, int failedEarlier,
                          boolean complete) {
        /** The outcome of a process that ends with every member's result in the folder. */
        public Outcome(int members, int ran, int skipped, int failed, double wallSeconds, int failedEarlier) {
            this(members, ran, skipped, failed, wallSeconds, failedEarlier, true);
        }

        /** Members that failed in this run. */
        public int failedNow() {
            return failed - failedEarlier;
        }
    }

    /** Scratch folder for members whose run files are not kept, under the output folder; emptied when a run starts. */
    public static final String SCRATCH = ".scratch";

    private SweepExecutor() {
    }

    /**
     * Computes the members the placement gives this process ({@link Options#placement()}): all of them, one shard,
     * none (the merge step: every member must have a result, else {@link IncompleteRunException}), or none here
     * (they are handed to a batch system).
     */
    public static Outcome run(SweepSpec spec, List<Member> members, Path outDir,
                              Function<Member, MemberResult> runner, Options opt) {
        long t0 = System.nanoTime();
        Placement where = opt.placement();
        if (where instanceof Placement.MergeOnly merge) {
            return merge(spec, members, outDir, merge, opt, t0);
        }
        Placement.Shard shard = where instanceof Placement.Shard s ? s : null;
        MemberStore store = new MemberStore(outDir);
        store.create();
        if (where.runsAllHere()) {
            int temps = store.deleteLeftoverTemps();
            if (temps > 0) {
                opt.log().println("sweep: removed " + temps + " incomplete temporary file(s) left by an interrupted run");
            }
            Path scratch = outDir.resolve(SCRATCH);
            if (java.nio.file.Files.exists(scratch)) {
                int n = deleteTree(scratch);
                opt.log().println("sweep: removed " + scratch + " (" + n + " scratch file(s) left by an interrupted run)");
            }
        } else if (shard != null) {
            // other shards write into the same folders at the same time: clear only what this shard left behind
            int removed = 0;
            for (Member m : shard.of(members)) {
                removed += store.deleteLeftoverTemps(m.id());
                Path own = outDir.resolve(SCRATCH).resolve(m.id());
                if (java.nio.file.Files.exists(own)) {
                    removed += deleteTree(own);
                }
            }
            if (removed > 0) {
                opt.log().println("sweep: shard " + shard.label() + ": removed " + removed + " file(s) left by an interrupted run");
            }
        }
        int[] earlierFailed = {0};
        List<Member> todo = plan(spec, members, outDir, store, opt, earlierFailed);
        int skipped = members.size() - todo.size();
        if (where instanceof Placement.Dispatch d) {
            writeManifest(spec, members, outDir);
            d.dispatcher().dispatch(new Placement.Request(spec, members, todo, outDir, opt.largest(), opt.log()));
            return new Outcome(members.size(), 0, skipped, earlierFailed[0], (System.nanoTime() - t0) * 1e-9, earlierFailed[0],
                    false);
        }
        if (shard != null) {
            int own = shard.of(members).size();
            opt.log().println("sweep: shard " + shard.label() + ": " + own + " of " + members.size() + " members, "
                    + (own - todo.size()) + " of them already done");
            skipped = own - todo.size();
        } else if (skipped > 0) {
            opt.log().println("sweep: resuming: " + skipped + " of " + members.size() + " members already done");
        }
        writeManifest(spec, members, outDir);

        AtomicInteger failed = new AtomicInteger();
        AtomicInteger done = new AtomicInteger();
        int threads = Math.min(opt.threads(), Math.max(1, todo.size()));
        ExecutorService pool = Executors.newFixedThreadPool(threads, daemonThreads());
        ProgressBar bar = opt.progressBar() && !todo.isEmpty()
                ? new ProgressBarBuilder().setTaskName("sweep " + spec.name()).setInitialMax(todo.size()).build() : null;
        long[] lastLine = {System.nanoTime()};
        try {
            List<Future<?>> futures = new ArrayList<>(todo.size());
            for (Member m : todo) {
                futures.add(pool.submit(() -> {
                    ObjectNode rec = runOne(spec, m, runner);
                    if (MemberStore.STATUS_FAILED.equals(rec.path("status").asText())) {
                        failed.incrementAndGet();
                        if (bar == null) {
                            opt.log().println("sweep: member " + m.id() + " (" + m.describe() + ") failed: " + rec.path("error").asText());
                        }
                    }
                    try {
                        store.write(m.id(), rec);
                    } catch (IOException e) {
                        throw new UncheckedIOException("cannot write the result of member " + m.id() + " to "
                                + store.fileOf(m.id()), e);
                    }
                    int d = done.incrementAndGet();
                    if (bar != null) {
                        bar.step();
                    } else {
                        progressLine(opt, lastLine, d, todo.size(), failed.get());
                    }
                    return null;
                }));
            }
            for (Future<?> f : futures) {
                try {
                    f.get();
                } catch (ExecutionException e) {
                    Throwable c = e.getCause();
                    if (c instanceof RuntimeException re) {
                        throw re;
                    }
                    throw new IllegalStateException(c);
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("sweep interrupted; finished members are kept, run again with --resume", e);
        } finally {
            pool.shutdownNow();
            if (bar != null) {
                bar.close();
            }
        }
        try {
            // empty once every member has cleaned up after itself (other shards may still be using it)
            java.nio.file.Files.deleteIfExists(outDir.resolve(SCRATCH));
        } catch (IOException e) {
            // not empty: a member's scratch could not be removed, or another shard is running; the next run clears it
        }
        double wall = (System.nanoTime() - t0) * 1e-9;
        int total = failed.get() + earlierFailed[0];
        opt.log().printf(java.util.Locale.ROOT, "sweep: %s%d members: %d run, %d already done, %d failed%s; %.1f s on %d thread(s)%n",
                shard == null ? "" : "shard " + shard.label() + ": ", shard == null ? members.size() : shard.of(members).size(),
                todo.size(), skipped, total, earlierFailed[0] == 0 ? "" : " (" + earlierFailed[0]
                        + " of them in an earlier run; --resume --retry-failed runs them again)", wall, threads);
        return new Outcome(members.size(), todo.size(), skipped, total, wall, earlierFailed[0], shard == null);
    }

    /**
     * The merge step: computes nothing; every member must have a result from the same inputs. Members without one are
     * described (one line each, through the placement's report) and the run stops with {@link IncompleteRunException}.
     */
    private static Outcome merge(SweepSpec spec, List<Member> members, Path outDir, Placement.MergeOnly merge, Options opt,
                                 long t0) {
        MemberStore store = new MemberStore(outDir);
        checkForeign(spec, members, outDir, store);
        List<Member> missing = new ArrayList<>();
        int failed = 0;
        for (Member m : members) {
            switch (store.check(m)) {
                case VALID -> { }
                case VALID_FAILED -> failed++;
                case ABSENT, UNREADABLE -> missing.add(m);
                case OTHER_INPUTS -> throw otherInputs(spec, m, store);
                default -> throw new IllegalStateException();
            }
        }
        if (!missing.isEmpty()) {
            for (String line : merge.whyMissing().explain(missing, members.size())) {
                opt.log().println(line);
            }
            throw new IncompleteRunException(missing.size() + " of " + members.size() + " members have no result in "
                    + store.folder() + " (first: " + missing.get(0).id() + "); compute them by submitting again with --resume "
                    + "(only the unfinished shards run) or here with --resume, then merge");
        }
        writeManifest(spec, members, outDir);
        double wall = (System.nanoTime() - t0) * 1e-9;
        opt.log().printf(java.util.Locale.ROOT, "sweep: merged %d members (%d failed)%n", members.size(), failed);
        return new Outcome(members.size(), 0, members.size(), failed, wall, failed, true);
    }

    /** Runs one member, turning any failure of the member itself into a "failed" record. */
    static ObjectNode runOne(SweepSpec spec, Member m, Function<Member, MemberResult> runner) {
        String error;
        try {
            MemberResult r = runner.apply(m);
            return MemberStore.record(spec.name(), m, r == null ? null : r.summary(), null);
        } catch (UserInputException | IllegalArgumentException e) {
            error = firstLine(e.getMessage());
        } catch (RuntimeException e) {
            error = e.getClass().getSimpleName() + ": " + firstLine(e.getMessage());
        } catch (StackOverflowError | OutOfMemoryError e) {
            error = e.getClass().getSimpleName() + " while running this member";
        }
        return MemberStore.record(spec.name(), m, null, error);
    }

    private static String firstLine(String s) {
        return s == null ? "(no message)" : s.lines().findFirst().orElse("");
    }

    /** Which members still need running; refuses to mix results from other inputs. */
    private static List<Member> plan(SweepSpec spec, List<Member> members, Path outDir, MemberStore store, Options opt,
                                     int[] earlierFailed) {
        Placement.Shard shard = opt.placement() instanceof Placement.Shard s ? s : null;
        List<String> present = store.presentIds();
        if (!present.isEmpty() && !opt.resume() && shard == null) {
            // a shard always continues: the other shards are writing into the same folder, and a resubmitted shard
            // finds its earlier results (the submitting command made the --resume/--overwrite choice for the folder)
            throw new UserInputException(outDir + " already holds " + present.size() + " member result(s); add --resume"
                    + " to continue that sweep, or choose another --out folder");
        }
        checkForeign(spec, members, outDir, store);
        List<Member> todo = new ArrayList<>();
        for (Member m : members) {
            if (shard != null && !shard.owns(m)) {
                continue;
            }
            switch (store.check(m)) {
                case VALID -> { }
                case VALID_FAILED -> {
                    if (opt.retryFailed()) {
                        todo.add(m);
                    } else {
                        earlierFailed[0]++;
                    }
                }
                case ABSENT -> todo.add(m);
                case UNREADABLE -> {
                    opt.log().println("sweep: " + store.fileOf(m.id()) + " is unreadable; running member " + m.id() + " again");
                    todo.add(m);
                }
                case OTHER_INPUTS -> throw otherInputs(spec, m, store);
                default -> throw new IllegalStateException();
            }
        }
        return todo;
    }

    private static UserInputException otherInputs(SweepSpec spec, Member m, MemberStore store) {
        return new UserInputException("--resume: " + store.fileOf(m.id())
                + " was computed from other inputs than sweep " + spec.source() + " now gives member " + m.id()
                + " (" + m.describe() + "); the sweep or base scenario changed since that run: use another --out"
                + " folder or delete " + store.folder());
    }

    /** Refuses a folder holding results of members the sweep does not have (another sweep's results). */
    private static void checkForeign(SweepSpec spec, List<Member> members, Path outDir, MemberStore store) {
        Set<String> ids = new HashSet<>();
        for (Member m : members) {
            ids.add(m.id());
        }
        for (String id : store.presentIds()) {
            if (!ids.contains(id)) {
                throw new UserInputException("--resume: " + store.fileOf(id) + " is not a member of sweep " + spec.source()
                        + " (it has " + members.size() + " members); the sweep file changed since that run: use another --out"
                        + " folder or delete " + store.folder());
            }
        }
    }

    /** {@code sweep.json}: what the sweep is, so the folder explains itself. Same content on every run. */
    private static void writeManifest(SweepSpec spec, List<Member> members, Path outDir) {
        ObjectNode m = JsonNodeFactory.instance.objectNode();
        m.put("sweep", spec.name());
        m.put("description", spec.description());
        m.put("base", spec.baseLabel());
        m.put("mode", spec.zip() ? "zip" : "cartesian");
        m.put("members", members.size());
        var axes = m.putArray("axes");
        for (Axis a : spec.axes()) {
            var o = axes.addObject();
            o.put("key", a.path().toString());
            var labels = o.putArray("values");
            a.values().forEach(v -> labels.add(v.label()));
        }
        if (spec.ensemble() != null) {
            var e = m.putObject("ensemble");
            e.put("members", spec.ensemble().members());
            e.put("seed", spec.ensemble().seed());
            var d = e.putArray("draws");
            spec.ensemble().draws().forEach(x -> d.add(x.path().toString()));
        }
        try {
            AtomicFile.write(outDir.resolve("sweep.json"), CanonicalJson.prettyBytes(m));
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write " + outDir.resolve("sweep.json"), e);
        }
    }

    /** Deletes a folder and everything in it; returns the number of files removed. */
    static int deleteTree(Path dir) {
        int[] n = {0};
        try (java.util.stream.Stream<Path> s = java.nio.file.Files.walk(dir)) {
            s.sorted(java.util.Comparator.reverseOrder()).forEach(p -> {
                try {
                    if (!java.nio.file.Files.isDirectory(p)) {
                        n[0]++;
                    }
                    java.nio.file.Files.delete(p);
                } catch (IOException e) {
                    throw new UncheckedIOException("cannot remove " + p, e);
                }
            });
        } catch (IOException e) {
            throw new UncheckedIOException("cannot remove " + dir, e);
        }
        return n[0];
    }

    private static void progressLine(Options opt, long[] last, int done, int total, int failed) {
        long now = System.nanoTime();
        synchronized (last) {
            if (done < total && (now - last[0]) < opt.throttleMillis() * 1_000_000L) {
                return;
            }
            last[0] = now;
        }
        if (done < total) {
            opt.log().printf("sweep: %d/%d members done%s%n", done, total, failed > 0 ? " (" + failed + " failed)" : "");
        }
    }

    private static ThreadFactory daemonThreads() {
        AtomicInteger n = new AtomicInteger();
        return r -> {
            Thread t = new Thread(r, "sweep-" + n.incrementAndGet());
            t.setDaemon(true);
            return t;
        };
    }
}
