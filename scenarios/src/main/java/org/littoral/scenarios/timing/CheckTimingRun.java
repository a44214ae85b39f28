package org.littoral.scenarios.timing;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.model.surface.SolarGeometry;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.scenario.JobModel;
import org.littoral.scenarios.run.WorkEstimate;
import org.littoral.scenarios.sweep.Member;
import org.littoral.scenarios.sweep.MemberExpander;
import org.littoral.scenarios.sweep.MemberStore;
import org.littoral.scenarios.sweep.SweepExecutor;
import org.littoral.scenarios.output.OutputFolder;
import org.littoral.scenarios.sweep.Placement;

/**
 * The timing-check use case as a plain Java call: read the passages, run the day's ensemble, flag implausible
 * timings and write the tables, figure and report. {@link CheckTimingCommand} is its command line; {@code littoral demo}
 * and the benchmark call it directly.
 */
public final class CheckTimingRun {
    private CheckTimingRun() {
    }

    /**
     * @param model "linear", "nonlinear" or null (the day file's choice)
     * @param progressBar draw a progress bar (a terminal); otherwise a line at most every 15 s
     */
    public record Options(String model, int threads, boolean resume, PrintStream log, boolean progressBar, Path columns,
                          Placement placement) {
        public Options(String model, int threads, boolean resume, PrintStream log, boolean progressBar) {
            this(model, threads, resume, log, progressBar, null, Placement.ALL_HERE);
        }

        public Options(String model, int threads, boolean resume, PrintStream log, boolean progressBar, Path columns) {
            this(model, threads, resume, log, progressBar, columns, Placement.ALL_HERE);
        }

        public Options {
            if (threads < 1) {
                throw new UserInputException("--threads must be at least 1; got " + threads);
            }
            if (model != null) {
                JobModel.check("--model", model);
            }
            if (placement == null) {
                placement = Placement.ALL_HERE;
            }
        }

        /** Quiet defaults for callers such as {@code littoral demo}: all cores, no bar, the day file's model. */
        public static Options quiet(PrintStream log) {
            return new Options(null, Runtime.getRuntime().availableProcessors(), false, log, false);
        }
    }

    /** Entry point for other commands (e.g. {@code littoral demo}): reads the files, runs, writes, returns the paths. */
    public static CheckTimingResult run(Path passagesFile, Path dayFile, Path dir, Options opt) throws IOException {
        return run(DayFile.read(dayFile, opt.model()), passagesFile, dir, opt, Solver.standard());
    }

    /** As {@link #run(Path, Path, Path, Options)} with a parsed day and a given solver (tests, validation). */
    public static CheckTimingResult run(DaySpec spec, Path passagesFile, Path dir, Options opt, Solver solver) throws IOException {
        long t0 = System.nanoTime();
        String model = opt.model() != null ? opt.model() : spec.model();
        // a day parsed for the other model keeps its grid (read the file with DayFile.read(file, model) to get that
        // model's grid defaults); the kind alone decides which model solves the members
        spec.ensemble().base().put("kind", model);
        boolean linear = model.equals("linear");
        PassageTable.Read obs = PassageTable.read(passagesFile, spec, opt.columns());

        double[] xM = distances(spec);
        List<Member> members = MemberExpander.expand(spec.ensemble());
        ArrivalMemberRunner runner = new ArrivalMemberRunner(spec.source(), solver, xM);
        WorkEstimate largest = null;
        for (Member m : members) {
            WorkEstimate w = WorkEstimate.of(runner.scenarioOf(m));
            largest = largest == null || w.runBytes() > largest.runBytes() ? w : largest;
        }
        Placement where = opt.placement();
        if (where.concurrentHere(opt.threads()) > 0) {
            largest.check(Math.min(where.concurrentHere(opt.threads()), members.size()), "day file " + spec.source());
        }
        Files.createDirectories(dir);
        opt.log().println("check-timing: " + members.size() + " ensemble member(s), " + model + " model, " + opt.threads()
                + " thread(s)");
        SweepExecutor.Outcome so = SweepExecutor.run(spec.ensemble(), members, dir, runner,
                new SweepExecutor.Options(opt.threads(), opt.resume(), opt.log(), opt.progressBar(), 15_000)
                        .placed(where, largest));
        if (!so.complete()) {
            return CheckTimingResult.elsewhere(dir, so);
        }

        MemberStore store = new MemberStore(dir);
        List<double[]> arrivals = new ArrayList<>();
        List<Double> onsets = new ArrayList<>();
        String firstError = null;
        String modelName = model;
        for (Member m : members) {
            ObjectNode rec = store.read(m.id());
            if (!MemberStore.STATUS_OK.equals(rec.path("status").asText())) {
                if (firstError == null) {
                    firstError = m.id() + ": " + rec.path("error").asText();
                }
                continue;
            }
            JsonNode res = rec.get("result");
            double[] a = new double[xM.length];
            for (int i = 0; i < a.length; i++) {
                JsonNode v = res.path("arrival_h").path(i);
                a[i] = v.isNumber() ? v.asDouble() : Double.NaN;
            }
            arrivals.add(a);
            onsets.add(res.path("onset_h").isNumber() ? res.get("onset_h").asDouble() : Double.NaN);
            modelName = res.path("model").asText(model);
        }
        if (arrivals.isEmpty()) {
            throw new UserInputException("check-timing " + spec.source() + ": every one of the " + members.size()
                    + " ensemble members failed (first: " + firstError + "); fix the cause and run again with --resume");
        }

        int ns = spec.sites().size();
        List<TimingInputs.ArrivalEnvelope> envelopes = new ArrayList<>();
        Map<String, double[]> flights = new HashMap<>();
        for (int s = 0; s < ns; s++) {
            double[] e = new double[arrivals.size()];
            for (int k = 0; k < e.length; k++) {
                e[k] = arrivals.get(k)[s];
            }
            DaySpec.Site site = spec.sites().get(s);
            envelopes.add(new TimingInputs.ArrivalEnvelope(site.name(), "sea_breeze", e));
            flights.put(site.name(), site.flightHours());
        }
        // Earliest plausible onset at the coast: the day file's, else the earliest onset of any member, so that "earlier
        // than any plausible onset" also allows the front to run from there at the fastest plausible speed.
        TimingInputs.DayConditions dc = spec.conditions();
        List<String> notes = new ArrayList<>(obs.notes());
        TimingInputs.Settings settings = spec.settings();
        if (linear) {
            settings.envelopeFlags = false;
            notes.add("linear quick look: the envelope is the " + JobModel.LINEAR_TIMES + ", shown beside the observed "
                    + "passages but never used to flag one; only the density-current and flight-time checks can flag "
                    + "(run with --model nonlinear for the front)");
        }
        if (Double.isNaN(dc.earliestOnsetHours()) && linear) {
            double rise = sunriseClockH(spec);
            if (Double.isFinite(rise)) {
                dc = withEarliestOnset(dc, rise);
                notes.add("earliest plausible onset at the coast: sunrise, " + TimingCheck.clock(rise) + " local (Cooper 1969 "
                        + "declination): the land must heat before a breeze can start (front.earliest_onset_h not given)");
            }
        } else if (Double.isNaN(dc.earliestOnsetHours())) {
            double first = Double.POSITIVE_INFINITY;
            for (double o : onsets) {
                if (Double.isFinite(o)) {
                    first = Math.min(first, o);
                }
            }
            if (Double.isFinite(first)) {
                dc = withEarliestOnset(dc, first);
                notes.add("earliest plausible onset at the coast: " + TimingCheck.clock(first) + ", the earliest onset of the "
                        + arrivals.size() + " ensemble members (front.earliest_onset_h not given)");
            }
        }
        TimingCheck.Result check = new TimingCheck(settings).check(dc, obs.passages(), flights, envelopes);
        for (TimingInputs.ObservedPassage p : obs.passages()) {
            if (!TimingCheck.firstAtSite(p, obs.passages())) {
                notes.add(String.format(java.util.Locale.ROOT, "%s %s at %s is a later passage at that site (after an earlier one "
                        + "the same day): not compared with the envelope, whose times are the model's first front arrival "
                        + "there (docs/fronts.md); the density-current and flight checks still apply", p.label().replace('_', ' '),
                        TimingCheck.clock(p.timeHours()), p.site()));
            }
        }
        double[] speed = DensityCurrent.plausibleSpeedRangeMPerS(spec.conditions().thetaVContrastK(),
                spec.conditions().contrastUncertaintyK(), spec.conditions().thetaVK(), spec.conditions().breezeDepthM(),
                spec.conditions().depthUncertaintyM(), spec.conditions().totalDepthM(), spec.conditions().crossShoreWindMPerS(),
                spec.settings().retardationMin);
        if (so.failed() > 0) {
            notes.add(so.failed() + " ensemble member(s) failed (first: " + firstError + "); they are left out of the envelope");
        }
        org.littoral.scenarios.sensitivity.ConditionsFit.Fit explanation;
        try {
            explanation = org.littoral.scenarios.sensitivity.TimingExplanation.explain(spec, members, store, obs.passages());
        } catch (RuntimeException e) {
            explanation = org.littoral.scenarios.sensitivity.TimingExplanation.failed("the fit failed: " + e.getMessage());
        }
        double wall = (System.nanoTime() - t0) / 1e9;
        CheckTimingOutputs.Inputs in = new CheckTimingOutputs.Inputs(spec, passagesFile, obs, modelName, xM, arrivals, onsets,
                envelopes, check, speed, notes, so, wall, explanation);
        return CheckTimingOutputs.write(dir, in);
    }

    private static TimingInputs.DayConditions withEarliestOnset(TimingInputs.DayConditions dc, double onsetH) {
        return new TimingInputs.DayConditions(dc.day(), dc.crossShoreWindMPerS(), dc.thetaVContrastK(), dc.contrastUncertaintyK(),
                dc.thetaVK(), dc.breezeDepthM(), dc.depthUncertaintyM(), dc.totalDepthM(), onsetH);
    }

    /** Sunrise on the day's coast, local clock hours (geometric sun centre; NaN in polar day or night). */
    static double sunriseClockH(DaySpec spec) {
        org.littoral.model.coast.Coast c = spec.base().coast();
        double decl = SolarGeometry.declinationRad(c.dayOfYear());
        double half = SolarGeometry.sunsetHourAngleRad(c.latitudeDeg(), decl);
        if (!(half > 0) || !(half < Math.PI)) {
            return Double.NaN;
        }
        return c.clockHoursFromSolar(SolarGeometry.sunriseSolarHours(c.latitudeDeg(), decl));
    }

    /** Site distances first, then a row of distances for the fan chart from the coast to beyond the farthest site. */
    static double[] distances(DaySpec spec) {
        int ns = spec.sites().size();
        double farKm = spec.sites().get(ns - 1).inlandKm();
        double lastKm = spec.base().xGrid().lastM() / 1000.0;
        double toKm = Math.min(Math.max(farKm * 1.25, farKm + 2.0), 0.9 * lastKm);
        int nf = 25;
        double[] x = new double[ns + nf];
        for (int s = 0; s < ns; s++) {
            x[s] = spec.sites().get(s).inlandKm() * 1000.0;
        }
        double firstKm = spec.sites().get(0).inlandKm();
        double fromKm = firstKm <= 0 ? firstKm - 1.0 : Math.min(0.5, 0.5 * firstKm);
        for (int i = 0; i < nf; i++) {
            x[ns + i] = 1000.0 * (fromKm + (toKm - fromKm) * i / (nf - 1));
        }
        return x;
    }
}
