package org.littoral.scenarios.sensitivity;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import java.util.function.Function;
import org.littoral.model.field.BreezeSolution;
import org.littoral.model.front.Arrival;
import org.littoral.model.front.Extent;
import org.littoral.model.front.BreezeDiagnostics;
import org.littoral.model.front.FieldSections;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.scenario.Scenario;
import org.littoral.scenarios.sweep.Member;
import org.littoral.scenarios.sweep.MemberResult;
import org.littoral.scenarios.sweep.ScenarioMemberRunner;

/**
 * One member of a sensitivity study: solves the member's scenario and records, through THE definitions of
 * {@link org.littoral.model.front.FrontTrack} (docs/fronts.md; the same as run, sweep, plan and check-timing), the
 * arrival at each site (or why there is none), the maximum inland penetration, and the post-passage change of the
 * near-surface virtual potential temperature at each site over the two hours after the arrival (nonlinear runs only:
 * linear theory has no front and no thermodynamic response of its own at the surface).
 */
public final class OutcomeMemberRunner implements Function<Member, MemberResult> {
    /** Window after the passage over which the post-passage change is taken, h (the two hours of the product brief). */
    public static final double POST_PASSAGE_H = 2.0;

    private final ScenarioMemberRunner scenarios;
    private final Solver solver;
    private final List<String> names;
    private final double[] xM;

    public OutcomeMemberRunner(String source, Solver solver, List<String> siteNames, double[] siteXM) {
        this.scenarios = new ScenarioMemberRunner(source, null, solver);
        this.solver = solver;
        this.names = List.copyOf(siteNames);
        this.xM = siteXM.clone();
    }

    public Scenario scenarioOf(Member m) {
        return scenarios.scenarioOf(m);
    }

    @Override
    public MemberResult apply(Member m) {
        Scenario s = scenarioOf(m);
        BreezeSolution sol = solver.solve(s);
        boolean periodic = s.kind() == Scenario.Kind.LINEAR;
        FieldSections fs = FieldSections.evaluate(sol, s.coast(), s.output().clockHours(), s.output().nearSurfaceM(), xM,
                periodic, null);
        BreezeDiagnostics.Result d = BreezeDiagnostics.compute(fs, names, xM, s.output().onshoreThresholdMPerS());
        ObjectNode out = JsonNodeFactory.instance.objectNode();
        out.put("model", sol.modelName());
        out.put("fronts", d.track().fronts());
        out.put("output_start_h", fs.clockH[0]);
        out.put("output_end_h", fs.clockH[fs.clockH.length - 1]);
        ArrayNode sites = out.putArray("sites");
        for (int i = 0; i < xM.length; i++) {
            Arrival a = d.sites().get(i).arrival();
            ObjectNode o = sites.addObject();
            o.put("name", names.get(i));
            if (a.exists()) {
                o.put("arrival_h", round(a.timeH()));
                double change = postPassageChange(fs, xM[i], a.timeH());
                if (Double.isFinite(change)) {
                    o.put("theta_v_change_K", round(change));
                } else {
                    o.putNull("theta_v_change_K");
                }
            } else {
                o.putNull("arrival_h");
                o.putNull("theta_v_change_K");
                o.put("note", a.note());
                o.put("before_output", a.note() != null && a.note().startsWith("already"));
            }
        }
        Extent p = d.penetration();
        if (p.exists()) {
            o(out, "penetration_km", p.value() / 1000.0);
            out.put("penetration_at_least", p.atSearchLimit());
        } else {
            out.putNull("penetration_km");
            out.put("penetration_note", p.note());
        }
        return new MemberResult(out);
    }

    private static void o(ObjectNode n, String k, double v) {
        n.put(k, round(v));
    }

    private static double round(double v) {
        return Math.round(v * 1e6) / 1e6;
    }

    /**
     * Near-surface theta-v at the site {@link #POST_PASSAGE_H} after the arrival minus at the arrival, K (linear in time
     * and x between output times and grid points); NaN for linear theory or when the window runs past the output.
     */
    static double postPassageChange(FieldSections fs, double x, double arrivalH) {
        if (fs.nearSurfaceThetaV == null) {
            return Double.NaN;
        }
        double a = thetaVAt(fs, x, arrivalH);
        double b = thetaVAt(fs, x, arrivalH + POST_PASSAGE_H);
        return b - a;
    }

    private static double thetaVAt(FieldSections fs, double x, double h) {
        double[] t = fs.clockH;
        if (!(h >= t[0] && h <= t[t.length - 1])) {
            return Double.NaN;
        }
        int n = 0;
        while (n < t.length - 2 && t[n + 1] < h) {
            n++;
        }
        double wt = t[n + 1] > t[n] ? (h - t[n]) / (t[n + 1] - t[n]) : 0;
        double[] xs = fs.xM;
        int i = 0;
        while (i < xs.length - 2 && xs[i + 1] < x) {
            i++;
        }
        double wx = Math.min(1, Math.max(0, (x - xs[i]) / (xs[i + 1] - xs[i])));
        double v0 = (1 - wx) * fs.nearSurfaceThetaV[n][i] + wx * fs.nearSurfaceThetaV[n][i + 1];
        double v1 = (1 - wx) * fs.nearSurfaceThetaV[n + 1][i] + wx * fs.nearSurfaceThetaV[n + 1][i + 1];
        return (1 - wt) * v0 + wt * v1;
    }
}
