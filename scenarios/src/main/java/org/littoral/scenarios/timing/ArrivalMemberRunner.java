package org.littoral.scenarios.timing;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;
import org.littoral.model.field.BreezeSolution;
import org.littoral.model.front.BreezeDiagnostics;
import org.littoral.model.front.FieldSections;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.scenario.Scenario;
import org.littoral.scenarios.sweep.Member;
import org.littoral.scenarios.sweep.MemberResult;
import org.littoral.scenarios.sweep.ScenarioMemberRunner;

/**
 * One member of a check-timing ensemble: solves the member's scenario (the model named by its {@code kind},
 * through the given solver) and records the model's arrival — THE definition of
 * {@link org.littoral.model.front.FrontTrack#arrivalAt}, the same as {@code littoral run}, sweeps, the planner and
 * compare — at every site and at a row of inland distances for the fan chart, plus the onset at the coast.
 */
public final class ArrivalMemberRunner implements Function<Member, MemberResult> {
    private final ScenarioMemberRunner scenarios;
    private final Solver solver;
    private final double[] xM;
    private final List<String> names;

    /**
     * @param xM distances (m inland) at which arrival is recorded; the result's {@code arrival_h} follows this order
     */
    public ArrivalMemberRunner(String source, Solver solver, double[] xM) {
        this.scenarios = new ScenarioMemberRunner(source, null, solver);
        this.solver = solver;
        this.xM = xM.clone();
        this.names = new ArrayList<>();
        for (double x : xM) {
            names.add(String.format(Locale.ROOT, "x%.3fkm", x / 1000.0));
        }
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
        ArrayNode a = out.putArray("arrival_h");
        for (int i = 0; i < xM.length; i++) {
            Double t = d.sites().get(i).arrivalClockH();
            if (t == null) {
                a.addNull();
            } else {
                a.add(Math.round(t * 1e6) / 1e6);
            }
        }
        if (d.onsetClockH() == null) {
            out.putNull("onset_h");
        } else {
            out.put("onset_h", Math.round(d.onsetClockH() * 1e6) / 1e6);
        }
        out.put("onshore_at_output_start", d.onshoreAtOutputStart());
        out.put("arrival_kind", d.track().fronts() ? "front passage" : "onset of onshore flow (linear theory has no front)");
        out.put("model", sol.modelName());
        return new MemberResult(out);
    }
}
