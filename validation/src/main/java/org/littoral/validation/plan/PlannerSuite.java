package org.littoral.validation.plan;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.stream.Stream;
import org.littoral.scenarios.plan.CadenceOption;
import org.littoral.scenarios.plan.DenseWindow;
import org.littoral.scenarios.plan.PlanRun;
import org.littoral.scenarios.plan.PlanFile;
import org.littoral.scenarios.plan.PlanResult;
import org.littoral.scenarios.plan.PlanSpec;
import org.littoral.scenarios.plan.SiteSetScore;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.scenario.Scenario;
import org.littoral.scenarios.sweep.Member;
import org.littoral.scenarios.sweep.MemberExpander;
import org.littoral.scenarios.sweep.MemberStore;
import org.littoral.scenarios.sweep.ScenarioMemberRunner;
import org.littoral.scenarios.validate.ValidationCase;
import org.littoral.scenarios.validate.ValidationSuite;

/**
 * The planner against a coast whose answer is known in closed form: every member is a prescribed
 * constant-speed front (arrival t0 + x / c), run through the planner's whole path (sampling, the analysis
 * chain's detectors, scoring). The capture probability the planner computes must match the one counted
 * directly from the closed-form arrival and the flight schedule, within Monte-Carlo error; a denser
 * cadence and more sites must never score worse.
 */
public final class PlannerSuite implements ValidationSuite {
    static final String PLAN = String.join("\n",
            "base: sea-barrier-bay",
            "set:",
            "  grid.points: 256",
            "  grid.spacing_km: 1.0",
            "  grid.levels: 32",
            "  output.step_min: 5",
            "ensemble:",
            "  members: 48",
            "  seed: 11",
            "  draws:",
            "    ambient_wind.speed_m_per_s: {uniform: {from: 0, to: 10}}",
            "    ambient_wind.from_deg: {uniform: {from: 0, to: 360}}",
            "plan:",
            "  candidates_km: [2, 5, 10, 15, 20, 30]",
            "  sites_per_set: 2",
            "  cadences:",
            "    - {name: base, interval_min: 30}",
            "    - {name: dense, interval_min: 30, dense_interval_min: 15, dense_window: auto}",
            "  operating_hours: {start_h: 8, end_h: 18}",
            "  pilot_members: 48",
            "");

    /** Front start 10:00-15:00 from the drawn ambient speed, speed 1.5-4.5 m/s from the drawn direction. */
    static double startClockH(Scenario s) {
        return 10.0 + 0.5 * s.ambientWind().speedMPerS();
    }

    static double speedMPerS(Scenario s) {
        return 1.5 + 3.0 * s.ambientWind().fromDeg() / 360.0;
    }

    static final Solver PRESCRIBED = s -> new PrescribedFront(s.xGrid().pointsM(), s.zGrid().levelsM(), s.coast(), startClockH(s),
            speedMPerS(s));

    @Override
    public String title() {
        return "Site and cadence planner";
    }

    @Override
    public int order() {
        return 70;
    }

    @Override
    public List<ValidationCase> run() {
        Path dir = null;
        try {
            dir = Files.createTempDirectory("littoral-planner-check-");
            return check(dir);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(e);
        } finally {
            delete(dir);
        }
    }

    private List<ValidationCase> check(Path dir) throws IOException, InterruptedException {
        PlanSpec plan = PlanFile.parse("planner check", PLAN, null, "planner-check");
        PrintStream quiet = new PrintStream(java.io.OutputStream.nullOutputStream());
        PlanRun.PlanOutcome o = PlanRun.run(plan, "scenario", dir, 2, false, quiet, PRESCRIBED);
        List<ValidationCase> out = new ArrayList<>();
        List<Member> members = MemberExpander.expand(plan.ensemble());
        ScenarioMemberRunner reader = new ScenarioMemberRunner("planner check", null, PRESCRIBED);
        double[] d = plan.candidatesKm();
        int n = members.size();
        double ascentTopOfLayerSec = 300.0 / 2.0; // detection layer top (300 m) at 2 m/s
        double ascentBottomOfLayerSec = 100.0 / 2.0;
        for (int c = 0; c < plan.cadences().size(); c++) {
            CadenceOption opt = plan.cadences().get(c);
            double worst = 0;
            double worstTol = 0;
            String where = "";
            for (int i = 0; i < d.length; i++) {
                int direct = 0;
                for (Member m : members) {
                    Scenario s = reader.scenarioOf(m);
                    double arr = startClockH(s) + d[i] * 1000.0 / speedMPerS(s) / 3600.0;
                    DenseWindow w = o.windows()[c][i];
                    int before = 0;
                    int after = 0;
                    for (double l : opt.schedule(plan.operatingStartH(), plan.operatingEndH(), w).launchTimesClockHours()) {
                        if (l + ascentTopOfLayerSec / 3600.0 < arr) {
                            before++;
                        } else if (l + ascentBottomOfLayerSec / 3600.0 > arr) {
                            after++;
                        }
                    }
                    direct += before >= plan.criteria().minProfilesBefore() && after >= plan.criteria().minProfilesAfter() ? 1 : 0;
                }
                double pDirect = (double) direct / n;
                double pPlan = row(o.result(), d[i], opt.name()).captured().estimate();
                // 99 % binomial sampling error of a member-level disagreement rate, plus one member
                double tol = 2.576 * Math.sqrt(Math.max(pDirect * (1 - pDirect), 0.05) / n) + 1.0 / n;
                if (Math.abs(pPlan - pDirect) - tol > worst - worstTol || where.isEmpty()) {
                    worst = Math.abs(pPlan - pDirect);
                    worstTol = tol;
                    where = String.format(Locale.ROOT, "%.0f km: planner %.3f, direct count %.3f", d[i], pPlan, pDirect);
                }
            }
            out.add(new ValidationCase("plan.capture-vs-closed-form." + opt.name(),
                    "closed-form constant-speed front (arrival t0 + x/c) counted against the flight schedule",
                    "P(passage captured with >= 2 profiles either side), worst candidate, cadence '" + opt.name() + "'",
                    "direct count", String.format(Locale.ROOT, "99 %% Monte-Carlo error (%.3f)", worstTol),
                    String.format(Locale.ROOT, "|diff| %.3f (%s)", worst, where), worst <= worstTol, false,
                    n + " members through sampling, the analysis chain's passage detectors and the scorer"));
        }
        int worse = 0;
        for (double km : d) {
            if (row(o.result(), km, "dense").captured().estimate() < row(o.result(), km, "base").captured().estimate()) {
                worse++;
            }
        }
        out.add(new ValidationCase("plan.denser-cadence-never-worse", "planner design requirement (issue: site and cadence planning)",
                "candidates where the 30/15-min cadence captures less often than the 30-min one", "0", "exact",
                String.valueOf(worse), worse == 0, false, "same members, flights of the dense option include every base flight"));

        List<JsonNode> records = new ArrayList<>();
        MemberStore store = new MemberStore(dir);
        for (Member m : members) {
            ObjectNode rec = store.read(m.id());
            records.add(rec.get("result"));
        }
        PlanSpec three = new PlanSpec(plan.ensemble(), plan.candidatesKm(), 3, plan.cadences(), plan.operatingStartH(),
                plan.operatingEndH(), plan.maxFlightsPerSite(), plan.ceilingM(), plan.criteria(), plan.top(), plan.model(),
                plan.pilotMembers());
        PlanResult r3 = PlanResult.build(three, records, 0, o.windows(), false, Double.NaN);
        Map<String, Double> pairScore = new HashMap<>();
        for (SiteSetScore s : o.result().ranked) {
            pairScore.put(s.cadence() + s.distancesKm(), s.score());
        }
        int violations = 0;
        for (SiteSetScore s : r3.ranked) {
            List<Double> ds = s.distancesKm();
            for (int drop = 0; drop < 3; drop++) {
                List<Double> pair = new ArrayList<>(ds);
                pair.remove(drop);
                Double p = pairScore.get(s.cadence() + pair);
                if (p != null && p > s.score() + 1e-12) {
                    violations++;
                }
            }
        }
        out.add(new ValidationCase("plan.more-sites-never-worse", "planner design requirement (issue: site and cadence planning)",
                "3-site sets scoring below one of their 2-site subsets", "0", "exact", String.valueOf(violations), violations == 0, false,
                r3.ranked.size() + " three-site sets checked"));
        return out;
    }

    private static PlanResult.SiteRow row(PlanResult r, double km, String cadence) {
        return r.sites.stream().filter(s -> s.distanceKm() == km && s.cadence().equals(cadence)).findFirst().orElseThrow();
    }

    private static void delete(Path dir) {
        if (dir == null) {
            return;
        }
        try (Stream<Path> s = Files.walk(dir)) {
            s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            // a temporary folder left behind is harmless
        }
    }
}
