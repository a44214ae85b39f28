package org.littoral.scenarios.plan;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;
import org.littoral.model.coast.Coast;
import org.littoral.model.field.BreezeSolution;
import org.littoral.model.sounding.FlightSchedule;
import org.littoral.model.sounding.Profile;
import org.littoral.model.sounding.SoundingSampler;
import org.littoral.model.sounding.SoundingSpec;
import org.littoral.model.sounding.VirtualSite;
import org.littoral.scenarios.analysis.AnalysisChain;
import org.littoral.scenarios.analysis.AnalysisSettings;
import org.littoral.scenarios.analysis.SiteDay;
import org.littoral.scenarios.analysis.detect.Passage;
import org.littoral.scenarios.analysis.detect.PassageDetector;
import org.littoral.scenarios.analysis.detect.PassageFinder;
import org.littoral.model.front.BreezeDiagnostics;
import org.littoral.model.front.FieldSections;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.scenario.Scenario;
import org.littoral.scenarios.sweep.Member;
import org.littoral.scenarios.sweep.MemberResult;
import org.littoral.scenarios.sweep.ScenarioMemberRunner;

/**
 * Runs one ensemble member for the planner: solves it, takes the model's own front arrival at every
 * candidate distance as the truth, flies every candidate at the finest cadence of any option, and for
 * each cadence option keeps the flights that option would fly and puts them through the analysis
 * chain's passage detectors — the same code that analyses observations — so what is scored is what the
 * campaign would actually detect.
 */
public final class PlanMemberRunner implements Function<Member, MemberResult> {
    /** Bins and ascent nodes for planning: coarser than a full run, ample for layer-mean wind shifts. */
    static final double PLAN_BIN_M = 10.0;
    static final double PLAN_NODE_SPACING_SEC = 300.0;

    private final PlanSpec plan;
    private final ScenarioMemberRunner scenarios;
    private final Solver solver;
    private final DenseWindow[][] windows;
    private final AnalysisSettings analysis;

    /**
     * @param windows windows[cadence][candidate] for auto dense windows (null entries when not auto)
     */
    public PlanMemberRunner(PlanSpec plan, Solver solver, DenseWindow[][] windows, AnalysisSettings analysis) {
        this.plan = plan;
        this.scenarios = new ScenarioMemberRunner(plan.ensemble().source(), null, solver);
        this.solver = solver;
        this.windows = windows;
        this.analysis = analysis.validate();
        this.pilots = new java.util.concurrent.ConcurrentHashMap<>();
    }

    public Scenario scenarioOf(Member m) {
        return scenarios.scenarioOf(m);
    }

    /**
     * The model's arrival (local clock h, NaN = none) at every candidate distance: THE definition of
     * {@link org.littoral.model.front.FrontTrack#arrivalAt} (a front passage for the nonlinear model, the onset of
     * onshore flow for linear theory), at the scenario's near-surface level like every other job.
     */
    public double[] truths(Scenario s, BreezeSolution sol) {
        double[] x = candidateXM();
        List<String> names = siteNames();
        boolean periodic = s.kind() == Scenario.Kind.LINEAR;
        FieldSections fs = FieldSections.evaluate(sol, s.coast(), s.output().clockHours(), s.output().nearSurfaceM(), x, periodic,
                null);
        BreezeDiagnostics.Result d = BreezeDiagnostics.compute(fs, names, x, s.output().onshoreThresholdMPerS());
        double[] out = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            Double a = d.sites().get(i).arrivalClockH();
            // an arrival after the last launch (a night-time turn of the wind) is no arrival for the campaign's day
            out[i] = a == null || a > plan.operatingEndH() ? Double.NaN : a;
        }
        return out;
    }

    /**
     * What a member gives before any cadence is chosen: the truths and the soundings flown at the finest cadence of
     * any option at every candidate. Neither depends on the dense windows, so a pilot member's are kept for its
     * scoring run instead of solving it twice.
     */
    private record Flown(double[] truth, List<Profile> profiles, String modelName) {
    }

    /** Pilot members' flights, from {@link #truthsOf} until {@link #apply} takes them (shared by {@link #withWindows}). */
    private final java.util.concurrent.ConcurrentHashMap<String, Flown> pilots;

    private PlanMemberRunner(PlanMemberRunner from, DenseWindow[][] windows) {
        this.plan = from.plan;
        this.scenarios = from.scenarios;
        this.solver = from.solver;
        this.windows = windows;
        this.analysis = from.analysis;
        this.pilots = from.pilots;
    }

    /** The same runner with the dense windows set, keeping the pilot members' flights so they are not solved again. */
    public PlanMemberRunner withWindows(DenseWindow[][] windows) {
        return new PlanMemberRunner(this, windows);
    }

    /** Forgets the pilot members' flights (e.g. after a resumed run that did not need them). */
    public void clearPilots() {
        pilots.clear();
    }

    /** Truths only (for the pilot members that set the automatic dense windows); the member's flights are kept for scoring. */
    public double[] truthsOf(Member m) {
        Flown f = fly(m);
        pilots.put(m.id(), f);
        return f.truth();
    }

    private Flown fly(Member m) {
        Scenario s = scenarioOf(m);
        BreezeSolution sol = solver.solve(s);
        double[] truth = truths(s, sol);
        boolean periodic = s.kind() == Scenario.Kind.LINEAR;
        double finest = finestIntervalMin();
        FlightSchedule all = FlightSchedule.regular(finest, plan.operatingStartH(), plan.operatingEndH());
        List<VirtualSite> sites = new ArrayList<>();
        double[] x = candidateXM();
        for (int i = 0; i < x.length; i++) {
            sites.add(new VirtualSite(siteNames().get(i), x[i]));
        }
        SoundingSpec spec = new SoundingSpec(plan.ceilingM(), PLAN_BIN_M, SoundingSpec.DEFAULT_ASCENT_RATE_M_PER_S,
                PLAN_NODE_SPACING_SEC, null, m.id(), 0);
        return new Flown(truth, new SoundingSampler(sol, s.coast(), sites, all, spec, periodic).sampleAll(), sol.modelName());
    }

    @Override
    public MemberResult apply(Member m) {
        Scenario s = scenarioOf(m);
        Flown fl = pilots.remove(m.id());
        if (fl == null) {
            fl = fly(m);
        }
        double[] truth = fl.truth();
        Coast coast = s.coast();
        double[] x = candidateXM();
        List<SiteDay> byCandidate = AnalysisChain.group(fl.profiles());
        List<PassageDetector> detectors = PassageFinder.detectors(analysis.detection);

        JsonNodeFactory f = JsonNodeFactory.instance;
        ObjectNode out = f.objectNode();
        out.set("truth_h", array(truth));
        ArrayNode cads = out.putArray("cadences");
        for (int c = 0; c < plan.cadences().size(); c++) {
            CadenceOption opt = plan.cadences().get(c);
            double[] detected = new double[x.length];
            double[] second = new double[x.length];
            int[] before = new int[x.length];
            int[] after = new int[x.length];
            int[] flights = new int[x.length];
            for (int i = 0; i < x.length; i++) {
                FlightSchedule sch = opt.schedule(plan.operatingStartH(), plan.operatingEndH(), windows[c][i]);
                List<Double> launches = sch.launchTimesClockHours();
                flights[i] = launches.size();
                SiteDay sd = subset(findSite(byCandidate, siteNames().get(i)), launches);
                List<Passage> onshore = new ArrayList<>();
                for (Passage p : PassageFinder.find(sd, coast, detectors, analysis.detection).passages()) {
                    if (p.turnsOnshore()) {
                        onshore.add(p);
                    }
                }
                detected[i] = onshore.isEmpty() ? Double.NaN : onshore.get(0).timeHours();
                second[i] = onshore.size() < 2 ? Double.NaN : onshore.get(1).timeHours();
                for (double t : sd.timeHours()) {
                    if (!Double.isNaN(detected[i]) && t < detected[i]) {
                        before[i]++;
                    } else if (!Double.isNaN(detected[i]) && t > detected[i]) {
                        after[i]++;
                    }
                }
            }
            ObjectNode co = cads.addObject();
            co.put("name", opt.name());
            co.set("detected_h", array(detected));
            co.set("second_onshore_h", array(second));
            co.set("profiles_before", ints(before));
            co.set("profiles_after", ints(after));
            co.set("flights", ints(flights));
        }
        out.put("model", fl.modelName());
        return new MemberResult(out);
    }

    private static SiteDay findSite(List<SiteDay> days, String site) {
        for (SiteDay d : days) {
            if (d.site().equals(site)) {
                return d;
            }
        }
        throw new IllegalStateException("no profiles were flown at " + site);
    }

    /** The profiles of a site-day whose launch times are in the given schedule (to the second). */
    static SiteDay subset(SiteDay sd, List<Double> launches) {
        List<Profile> keep = new ArrayList<>();
        int j = 0;
        for (Profile p : sd.profiles()) {
            while (j < launches.size() && launches.get(j) < p.timeHours() - 1.0 / 3600.0) {
                j++;
            }
            if (j < launches.size() && Math.abs(launches.get(j) - p.timeHours()) <= 1.0 / 3600.0) {
                keep.add(p);
            }
        }
        double[] t = keep.stream().mapToDouble(Profile::timeHours).toArray();
        return new SiteDay(sd.site(), sd.day(), keep, t);
    }

    /** The greatest common interval (whole minutes) of every option, so each option's flights are a subset. */
    double finestIntervalMin() {
        long g = 0;
        for (CadenceOption c : plan.cadences()) {
            g = gcd(g, Math.round(c.intervalMin()));
            if (c.hasDense()) {
                g = gcd(g, Math.round(c.denseIntervalMin()));
            }
        }
        return Math.max(1, g);
    }

    private static long gcd(long a, long b) {
        return b == 0 ? a : gcd(b, a % b);
    }

    double[] candidateXM() {
        double[] x = new double[plan.candidatesKm().length];
        for (int i = 0; i < x.length; i++) {
            x[i] = plan.candidatesKm()[i] * 1000.0;
        }
        return x;
    }

    List<String> siteNames() {
        List<String> n = new ArrayList<>();
        for (double d : plan.candidatesKm()) {
            n.add(String.format(Locale.ROOT, "d%.2fkm", d));
        }
        return n;
    }

    static ArrayNode array(double[] v) {
        ArrayNode a = JsonNodeFactory.instance.arrayNode();
        for (double d : v) {
            if (Double.isNaN(d)) {
                a.addNull();
            } else {
                a.add(Math.round(d * 1e6) / 1e6);
            }
        }
        return a;
    }

    static ArrayNode ints(int[] v) {
        ArrayNode a = JsonNodeFactory.instance.arrayNode();
        for (int d : v) {
            a.add(d);
        }
        return a;
    }
}
