package org.littoral.scenarios.compare;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.littoral.model.coast.Coast;
import org.littoral.scenarios.analysis.AnalysisSettings;
import org.littoral.scenarios.analysis.ingest.DayTableReader;
import org.littoral.scenarios.observe.CoastFile;
import org.littoral.scenarios.observe.ObserveIngest;
import org.littoral.scenarios.run.ScenarioRun;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.scenario.BuiltinScenarios;
import org.littoral.scenarios.scenario.JobModel;
import org.littoral.scenarios.scenario.Scenario;
import org.littoral.scenarios.scenario.ScenarioFile;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.output.OutputFolder;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * {@code littoral compare SCENARIO OBS [--coast COAST] --out DIR}: runs the scenario, puts its synthetic
 * soundings and the observed profiles through the same analysis chain, and reports per site and layer
 * the bias and RMSE of temperature, mixing ratio, wind speed and direction, the passage-time errors,
 * and observed | model time-height sections.
 */
@Command(name = "compare", description = {"Compare a scenario with observed profiles: the same analysis chain on both; "
        + "bias and RMSE per site and layer, passage-time errors, observed | model time-height sections, report.html.",
        "The scenario's sites must carry the observed site names. Design: docs/compare.md. Writes metrics.csv, "
                + "metrics-by-day.csv, metrics.json, passage-errors.csv, passage-summary.csv, passage-times.png, "
                + "section-<site>.png, qc-log.csv, report.html and the model run's own files in model/ to --out."})
public final class CompareCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "SCENARIO", description = "Built-in scenario name or scenario file.")
    String scenario;

    @Parameters(index = "1", paramLabel = "OBS", description = "Observed profile CSV (.csv or .csv.gz) or a folder of them.")
    Path obs;

    @Option(names = "--coast", paramLabel = "COAST", description = "Coast of the observations (coast file, scenario file or "
            + "built-in name); default: the scenario's coast. A sites: list there is checked against the scenario's sites.")
    String coastRef;

    @Option(names = "--days", paramLabel = "DAYS.csv", description = "Per-day attribute table (breeze_type, ...), as for observe.")
    Path days;

    @Option(names = "--settings", paramLabel = "FILE", description = "Analysis settings (YAML), as for observe.")
    Path settingsFile;

    @Option(names = "--columns", paramLabel = "MAP.yaml",
            description = "Column map of the observations (your column names, units, delimiter, time zone), as for observe.")
    Path columns;

    @Option(names = "--breeze-type", paramLabel = "TYPE", defaultValue = "scenario",
            description = "Observed days to compare: 'scenario' (days of the scenario's own breeze type, default), 'all', "
                    + "or pure, corkscrew, backdoor, synoptic.")
    String breezeType;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "out/compare", description = "Output folder (default: ${DEFAULT-VALUE}).")
    Path out;

    @Option(names = "--model", paramLabel = "MODEL", defaultValue = "nonlinear",
            description = "Model that runs the scenario: nonlinear (default: fronts; a linear scenario runs on the 200 x 2 km "
                    + "ensemble grid) or linear (a quick look: its times are the onset of onshore flow, linear theory has no "
                    + "front; a nonlinear scenario cannot be run linear).")
    String model;


    @Option(names = "--overwrite", description = "Replace the outputs of an earlier run in the output folder.")
    boolean overwrite;

    @Override
    public Integer call() throws Exception {
        OutputFolder folder = OutputFolder.prepare(out, "compare " + scenario, overwrite ? OutputFolder.Mode.OVERWRITE
                : OutputFolder.Mode.FRESH, false, System.err);
        CompareRun.Outcome o = CompareRun.run(scenario, JobModel.check("--model", model), obs, coastRef, days, columns, settingsFile, breezeType, out,
                System.console() != null ? System.err : null);
        folder.finish();
        Comparison.Result r = o.result();
        System.out.println("littoral: compared " + r.scenarioName() + " with " + r.days().size() + " observed day(s) at "
                + r.sites().size() + " site(s) (" + r.pairs() + " paired profiles); wrote " + o.written().files().size()
                + " files to " + out + " (open report.html)");
        return 0;
    }

}
