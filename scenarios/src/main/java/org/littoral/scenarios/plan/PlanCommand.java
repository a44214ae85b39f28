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
import java.util.concurrent.Callable;
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
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code littoral plan PLAN --out DIR}: where to put profiling sites and how often to fly. */
@Command(name = "plan", description = {"Rank candidate site sets and flight cadences over an ensemble of plausible days.",
        "Each member's synthetic soundings at every candidate distance go through the analysis chain's passage detectors; "
                + "scores are the chance of catching the passage with enough profiles either side, of resolving the propagation "
                + "speed, and of separating a bay breeze from the sea breeze. Plan file format: docs/planning.md. "
                + "Built-in plans: quillmarsh-plan-nonlinear (the invented demo coast, nonlinear), quillmarsh-plan (the same, "
                + "linear quick look), bay-coast-plan (the sea-barrier-bay coast, nonlinear). Candidates over water or inside "
                + "the model's sponges are left out with a note. Writes plan.json, recommendations.csv (every ranked set), "
                + "site-capture.csv, arrival-fan.csv, arrival-fan.png, capture-by-distance.png, report.html, plan-inputs.json, "
                + "sweep.json and members/ to --out.",
        "Idealised model, not a forecast. Drone operations follow local aviation rules (ceilings, airspace, storms); those rules win."})
public final class PlanCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "PLAN", description = "Plan file (YAML/JSON) or built-in plan name.")
    String planRef;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: out/plans/<plan name>).")
    Path out;

    @Option(names = "--resume", description = "Skip members already computed in DIR from the same inputs.")
    boolean resume;

    @Option(names = "--overwrite", description = "Start again in DIR: remove the outputs of an earlier run there first.")
    boolean overwrite;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: all cores).")
    Integer threads;

    @Option(names = "--settings", paramLabel = "FILE",
            description = "Analysis settings (YAML) for the synthetic soundings' passage detection, as for observe; echoed into plan.json.")
    Path settingsFile;

    @Option(names = "--model", paramLabel = "MODEL", description = "Override the plan's model: nonlinear (fronts; a linear base "
            + "scenario runs on the 200 x 2 km ensemble grid unless the plan sets grid keys) or linear (a quick look: its times "
            + "are the onset of onshore flow, linear theory has no front).")
    String model;

    @Mixin
    org.littoral.scenarios.cluster.ClusterOptions cluster;

    @Override
    public Integer call() throws Exception {
        PlanSpec plan = PlanFile.load(planRef);
        Path dir = out != null ? out : Path.of("out", "plans", org.littoral.scenarios.output.SafeNames.fileName(plan.ensemble().name()));
        int n = threads != null ? threads : Runtime.getRuntime().availableProcessors();
        if (n < 1) {
            throw new UserInputException("--threads must be at least 1; got " + n);
        }
        String m = model != null ? model : plan.model();
        if (model != null) {
            JobModel.check("--model", model);
        }
        if (resume && overwrite) {
            throw new UserInputException("littoral plan: --resume continues the run in the folder and --overwrite removes it; "
                    + "give one of the two");
        }
        AnalysisSettings as = new AnalysisSettings();
        if (settingsFile != null) {
            org.littoral.scenarios.analysis.SettingsFile.apply(settingsFile, as);
        }
        Placement where = cluster.placement(dir, overwrite);
        OutputFolder folder = cluster.prepareFolder(dir, "plan " + planRef, resume, overwrite, System.err);
        PlanRun.PlanOutcome o = PlanRun.run(plan, m, dir, n, resume, System.err, Solver.standard(), as, where);
        if (o.result() == null) {
            return org.littoral.scenarios.cluster.ClusterOptions.exitCode(o.members());
        }
        folder.finish();
        PlanOutputs.printSummary(plan, o.result(), System.out);
        System.out.println("littoral: plan written to " + dir.resolve("plan.json") + ", " + dir.resolve("report.html"));
        if (o.failed() > 0) {
            System.out.println("littoral: " + o.failed() + " member(s) failed and are left out of every score (reasons in "
                    + "members/<id>.json); fix the cause and run again with --resume");
            return 1;
        }
        return 0;
    }

}
