package org.littoral.scenarios.plan;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.littoral.model.coast.SurfaceMap;
import org.littoral.scenarios.analysis.AnalysisSettings;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.output.AtomicFile;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.scenario.JobModel;
import org.littoral.scenarios.run.WorkEstimate;
import org.littoral.scenarios.scenario.Scenario;
import org.littoral.scenarios.sweep.Member;
import org.littoral.scenarios.sweep.MemberExpander;
import org.littoral.scenarios.sweep.MemberStore;
import org.littoral.scenarios.sweep.SweepExecutor;
import org.littoral.scenarios.output.OutputFolder;
import org.littoral.scenarios.sweep.Placement;

/**
 * The planning use case as a plain Java call: run the plan's ensemble, score the candidate site sets and cadences,
 * write plan.json and the report. {@link PlanCommand} is its command line; {@code littoral demo}, the benchmark and the
 * validation suite call it directly.
 */
public final class PlanRun {
    private PlanRun() {
    }

    /** What a plan run produced. */
    public record PlanOutcome(PlanResult result, DenseWindow[][] windows, Path dir, double wallSeconds, int failed,
                              SweepExecutor.Outcome members) {
    }

    /** Runs a plan end to end and writes its outputs; used by the command, the demo and the benchmark. */
    public static PlanOutcome run(PlanSpec plan, String model, Path dir, int threads, boolean resume, java.io.PrintStream log)
            throws IOException, InterruptedException {
        return run(plan, model, dir, threads, resume, log, Solver.standard());
    }

    /** As {@link #run(PlanSpec, String, Path, int, boolean, java.io.PrintStream)} with a given solver (tests, validation). */
    public static PlanOutcome run(PlanSpec plan, String model, Path dir, int threads, boolean resume, java.io.PrintStream log,
                                  Solver solver) throws IOException, InterruptedException {
        return run(plan, model, dir, threads, resume, log, solver, new AnalysisSettings());
    }

    /** As above with given analysis settings (a --settings file). */
    public static PlanOutcome run(PlanSpec plan, String model, Path dir, int threads, boolean resume, java.io.PrintStream log,
                                  Solver solver, AnalysisSettings settings) throws IOException, InterruptedException {
        return run(plan, model, dir, threads, resume, log, solver, settings, Placement.ALL_HERE);
    }

    /**
     * As above with the members placed elsewhere (one shard, the merge step, a batch system); only a run that ends
     * with every member's result scores and writes the plan, otherwise the outcome's result is null.
     */
    public static PlanOutcome run(PlanSpec plan, String model, Path dir, int threads, boolean resume, java.io.PrintStream log,
                                  Solver solver, AnalysisSettings settings, Placement where)
            throws IOException, InterruptedException {
        long t0 = System.nanoTime();
        if (model.equals("nonlinear")) {
            boolean gridSet = plan.ensemble().fixed().stream().anyMatch(f -> f.path().toString().startsWith("grid."));
            boolean startSet = plan.ensemble().fixed().stream().anyMatch(f -> f.path().toString().equals("output.start_h"));
            if (JobModel.toNonlinear(plan.ensemble().base(), gridSet)) {
                log.println("plan: " + JobModel.gridNote("the plan"));
                if (!startSet) {
                    // a forward run starts an hour before the first launch (a linear scenario's output window says nothing)
                    plan.ensemble().base().with("output").put("start_h", Math.max(0, Math.floor(plan.operatingStartH()) - 1));
                }
            }
        } else if (model.equals("linear")) {
            plan.ensemble().base().put("kind", "linear");
        }
        boolean endSet = plan.ensemble().fixed().stream().anyMatch(f -> f.path().toString().equals("output.end_h"));
        if ("nonlinear".equals(plan.ensemble().base().path("kind").asText()) && !endSet) {
            // a forward run need not go on after the last launch: arrivals later than that are no arrivals for the
            // campaign (PlanMemberRunner.truths), so an hour past it is enough (a third of a 06-24 h run saved)
            ObjectNode out = plan.ensemble().base().with("output");
            double end = out.path("end_h").asDouble(24.0);
            out.put("end_h", Math.min(end, Math.ceil(plan.operatingEndH()) + 1.0));
        }
        List<Member> members = MemberExpander.expand(plan.ensemble());
        PlanMemberRunner probe = new PlanMemberRunner(plan, solver, null, settings);
        WorkEstimate largest = null;
        for (Member mm : members) {
            WorkEstimate w = WorkEstimate.of(probe.scenarioOf(mm));
            largest = largest == null || w.runBytes() > largest.runBytes() ? w : largest;
        }
        if (where.concurrentHere(threads) > 0) {
            largest.check(Math.min(where.concurrentHere(threads), members.size()), "plan file " + plan.ensemble().source());
        }
        Scenario first = probe.scenarioOf(members.get(0));
        checkCandidates(plan, first);
        List<String> rejected = new ArrayList<>();
        plan = usableCandidates(plan, first, rejected);
        for (String r : rejected) {
            log.println("plan: " + r);
        }
        probe = new PlanMemberRunner(plan, solver, null, settings);
        boolean submitting = where instanceof Placement.Dispatch;
        // the pilot members that set the dense windows run where the members run: in every shard and in the merge
        // step (a few members each), never on the machine that only submits
        DenseWindow[][] windows = submitting ? new DenseWindow[plan.cadences().size()][plan.candidatesKm().length]
                : windows(plan, members, probe, threads, log);
        Files.createDirectories(dir);
        if (!submitting) {
            checkResumeInputs(plan, model, windows, dir, resume || !where.runsAllHere());
        }
        PlanMemberRunner runner = probe.withWindows(windows);
        SweepExecutor.Outcome so = SweepExecutor.run(plan.ensemble(), members, dir, runner,
                new SweepExecutor.Options(threads, resume, log, System.console() != null, 15_000).placed(where, largest));
        runner.clearPilots();
        if (!so.complete()) {
            return new PlanOutcome(null, windows, dir, (System.nanoTime() - t0) / 1e9, so.failed(), so);
        }
        MemberStore store = new MemberStore(dir);
        List<JsonNode> records = new ArrayList<>();
        for (Member mm : members) {
            ObjectNode rec = store.read(mm.id());
            if (MemberStore.STATUS_OK.equals(rec.path("status").asText())) {
                records.add(rec.get("result"));
            }
        }
        SurfaceMap surface = first.surface();
        List<Double> shores = surface.shorelinesM();
        boolean hasBay = shores.size() >= 3;
        double bayInland = hasBay ? shores.get(shores.size() - 1) / 1000.0 : Double.NaN;
        PlanResult result = PlanResult.build(plan, records, so.failed(), windows, hasBay, bayInland);
        result.notes.addAll(0, rejected);
        result.model = first.kind() == Scenario.Kind.LINEAR ? "linear" : "nonlinear";
        if (result.model.equals("linear")) {
            result.notes.add(0, "linear quick look: the plan's times are the " + JobModel.LINEAR_TIMES + "; run with --model "
                    + "nonlinear for the front");
        }
        if (so.failed() > 0) {
            result.notes.add(so.failed() + " member(s) failed (see members/*.json); they are left out of every score");
        }
        double wall = (System.nanoTime() - t0) / 1e9;
        PlanOutputs.write(dir, plan, model, first, result, windows, wall, settings);
        return new PlanOutcome(result, windows, dir, wall, so.failed(), so);
    }

    static void checkCandidates(PlanSpec plan, Scenario s) {
        double lastM = s.xGrid().lastM();
        for (int i = 0; i < plan.candidatesKm().length; i++) {
            if (plan.candidatesKm()[i] * 1000.0 >= lastM) {
                throw new UserInputException("plan file " + plan.ensemble().source() + ": plan.candidates_km[" + i + "]: value "
                        + plan.candidatesKm()[i] + " km lies outside the model domain, which ends " + String.format(Locale.ROOT,
                        "%.1f", lastM / 1000.0) + " km inland; use nearer candidates or a wider grid");
            }
        }
    }

    /**
     * The plan without the candidates no campaign could fly from: over water (the sea, or a bay behind a barrier
     * strip) or inside the nonlinear model's far-field sponges, where the wind is relaxed towards the ambient state
     * and no front can be seen. Each left-out distance is described in {@code rejected}; a plan left with no
     * candidate is an input error.
     */
    static PlanSpec usableCandidates(PlanSpec plan, Scenario s, List<String> rejected) {
        SurfaceMap surface = s.surface();
        double spongeFromM = s.kind() == Scenario.Kind.NONLINEAR ? s.xGrid().lastM() - Scenario.NONLINEAR_SPONGE_M
                : Double.POSITIVE_INFINITY;
        java.util.Map<String, List<String>> water = new java.util.LinkedHashMap<>();
        List<String> sponge = new ArrayList<>();
        List<Double> kept = new ArrayList<>();
        for (double d : plan.candidatesKm()) {
            double x = d * 1000.0;
            org.littoral.model.coast.SurfaceSegment seg = surface.at(x);
            if (!seg.isLand()) {
                water.computeIfAbsent(String.format(Locale.ROOT, "%s (water, %s)", seg.name(), segmentSpan(seg)),
                        k -> new ArrayList<>()).add(km(d));
            } else if (x >= spongeFromM) {
                sponge.add(km(d));
            } else {
                kept.add(d);
            }
        }
        water.forEach((where, ds) -> rejected.add("candidate" + (ds.size() > 1 ? "s " : " ") + String.join(", ", ds)
                + " km lie" + (ds.size() > 1 ? "" : "s") + " over the " + where + ": no site can stand there; left out"));
        if (!sponge.isEmpty()) {
            rejected.add("candidate" + (sponge.size() > 1 ? "s " : " ") + String.join(", ", sponge) + " km lie"
                    + (sponge.size() > 1 ? "" : "s") + " inside the nonlinear model's far-field sponge (beyond "
                    + km(spongeFromM / 1000.0) + " km inland), where the flow is relaxed to the ambient wind; left out "
                    + "(widen grid.points to plan that far)");
        }
        if (kept.isEmpty()) {
            throw new UserInputException("plan file " + plan.ensemble().source() + ": plan.candidates_km: no candidate is left "
                    + "where a site can stand (" + String.join("; ", rejected) + "); give distances over land inside the domain");
        }
        if (kept.size() < plan.sitesPerSet()) {
            throw new UserInputException("plan file " + plan.ensemble().source() + ": plan.candidates_km: only " + kept.size()
                    + " candidate(s) over land remain for sets of " + plan.sitesPerSet() + " sites (" + String.join("; ", rejected)
                    + "); give more candidates over land");
        }
        if (kept.size() == plan.candidatesKm().length) {
            return plan;
        }
        double[] k = kept.stream().mapToDouble(Double::doubleValue).toArray();
        return new PlanSpec(plan.ensemble(), k, plan.sitesPerSet(), plan.cadences(), plan.operatingStartH(),
                plan.operatingEndH(), plan.maxFlightsPerSite(), plan.ceilingM(), plan.criteria(), plan.top(), plan.model(),
                plan.pilotMembers());
    }

    private static String segmentSpan(org.littoral.model.coast.SurfaceSegment seg) {
        boolean from = Double.isFinite(seg.fromM());
        boolean to = Double.isFinite(seg.toM());
        if (from && to) {
            return km(seg.fromM() / 1000.0) + "-" + km(seg.toM() / 1000.0) + " km";
        }
        return from ? "beyond " + km(seg.fromM() / 1000.0) + " km" : "seaward of " + km(seg.toM() / 1000.0) + " km";
    }

    private static String km(double v) {
        return v == Math.rint(v) ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%.1f", v);
    }

    /** Automatic dense windows from the pilot members' arrival times (fixed windows need no pilot). */
    static DenseWindow[][] windows(PlanSpec plan, List<Member> members, PlanMemberRunner probe, int threads,
                                   java.io.PrintStream log) throws InterruptedException {
        int nd = plan.candidatesKm().length;
        DenseWindow[][] w = new DenseWindow[plan.cadences().size()][nd];
        boolean anyAuto = plan.cadences().stream().anyMatch(CadenceOption::autoWindow);
        if (!anyAuto) {
            return w;
        }
        int pilot = Math.min(plan.pilotMembers(), members.size());
        log.println("plan: " + pilot + " pilot member(s) set the dense windows from their arrival times");
        double[][] truths = new double[pilot][];
        ExecutorService pool = Executors.newFixedThreadPool(threads);
        try {
            List<Future<double[]>> fs = new ArrayList<>();
            for (int k = 0; k < pilot; k++) {
                Member mm = members.get(k);
                fs.add(pool.submit(() -> probe.truthsOf(mm)));
            }
            for (int k = 0; k < pilot; k++) {
                try {
                    truths[k] = fs.get(k).get();
                } catch (java.util.concurrent.ExecutionException e) {
                    Throwable c = e.getCause();
                    log.println("plan: pilot member " + members.get(k).id() + " failed (" + c.getMessage() + "); left out of the windows");
                    truths[k] = null;
                }
            }
        } finally {
            pool.shutdownNow();
        }
        for (int c = 0; c < plan.cadences().size(); c++) {
            CadenceOption opt = plan.cadences().get(c);
            if (!opt.autoWindow()) {
                continue;
            }
            for (int i = 0; i < nd; i++) {
                List<Double> a = new ArrayList<>();
                for (double[] t : truths) {
                    if (t != null) {
                        a.add(t[i]);
                    }
                }
                w[c][i] = DenseWindow.fromArrivals(a.stream().mapToDouble(Double::doubleValue).toArray(), opt.intervalMin() / 60.0,
                        plan.operatingStartH(), plan.operatingEndH());
            }
        }
        return w;
    }

    /** A resumed plan must have the same options and windows; otherwise results would be mixed. */
    static void checkResumeInputs(PlanSpec plan, String model, DenseWindow[][] windows, Path dir, boolean resume) throws IOException {
        ObjectMapper json = new ObjectMapper();
        ObjectNode inputs = json.createObjectNode();
        inputs.put("model", model);
        inputs.set("candidates_km", json.valueToTree(plan.candidatesKm()));
        inputs.set("cadences", json.valueToTree(plan.cadences().stream().map(c -> c.name() + "|" + c.intervalMin() + "|"
                + c.denseIntervalMin() + "|" + c.autoWindow() + "|" + c.denseStartH() + "|" + c.denseEndH()).toList()));
        inputs.put("operating", plan.operatingStartH() + "-" + plan.operatingEndH());
        inputs.put("ceiling_m", plan.ceilingM());
        List<String> w = new ArrayList<>();
        for (DenseWindow[] row : windows) {
            for (DenseWindow d : row) {
                w.add(d == null ? "-" : String.format(Locale.ROOT, "%.6f-%.6f", d.startClockH(), d.endClockH()));
            }
        }
        inputs.set("windows", json.valueToTree(w));
        Path f = dir.resolve("plan-inputs.json");
        if (resume && Files.exists(f)) {
            JsonNode old = json.readTree(f.toFile());
            if (!old.equals(inputs)) {
                throw new UserInputException("plan --resume: " + dir + " holds results computed with other plan options "
                        + "(candidates, cadences, hours, ceiling, model or windows differ); use a new --out folder");
            }
        }
        AtomicFile.write(f, json.writerWithDefaultPrettyPrinter().writeValueAsBytes(inputs));
    }
}
