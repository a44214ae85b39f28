package org.littoral.scenarios.run;

import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.output.OutputFolder;
import org.littoral.scenarios.output.SafeNames;
import org.littoral.scenarios.scenario.BuiltinScenarios;
import org.littoral.scenarios.scenario.Scenario;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code littoral run SCENARIO --out DIR}. */
@Command(name = "run", description = {"Run a scenario (a built-in name or a YAML/JSON file): model, synthetic soundings, "
        + "diagnostics, figures.", "Writes summary.json, soundings.csv and soundings.nc, fields.nc (CF-1.8 netCDF), "
        + "near_surface_breeze.csv, the figures near_surface_breeze.png and site_<site>_breeze.png, and report.html "
        + "(everything in one self-contained page) to --out."})
public final class RunCommand implements Callable<Integer> {

    @Parameters(index = "0", arity = "0..1", paramLabel = "SCENARIO", description = "Built-in scenario name or path to a scenario file.")
    String scenario;

    @Option(names = "--out", paramLabel = "DIR", description = "Output directory (default: out/<scenario name>).")
    Path out;

    @Option(names = "--no-fields-nc", description = "Do not write fields.nc (the model fields on time, height and distance).")
    boolean noFieldsNc;

    @Option(names = "--overwrite", description = "Replace the outputs of an earlier run in the output directory.")
    boolean overwrite;

    @Option(names = "--list", description = "List the built-in scenarios and exit.")
    boolean list;

    @Override
    public Integer call() throws Exception {
        if (list) {
            ScenariosCommand.printList(System.out);
            return 0;
        }
        if (scenario == null) {
            throw new UserInputException("littoral run: give a scenario, e.g. 'littoral run classic-45N --out out/classic-45N'; "
                    + "built-ins: " + String.join(", ", BuiltinScenarios.names()));
        }
        Scenario s = BuiltinScenarios.resolve(scenario);
        Path dir = out != null ? out : Path.of("out", SafeNames.fileName(s.name()));
        WorkEstimate work = WorkEstimate.of(s);
        work.check(1, s.source());
        OutputFolder folder = OutputFolder.prepare(dir, "run " + scenario, overwrite ? OutputFolder.Mode.OVERWRITE
                : OutputFolder.Mode.FRESH, false, System.err, work.outputBytes(!noFieldsNc));
        ScenarioRun.Outcome o = new ScenarioRun(s, Solver.standard(), System.console() != null ? System.err : null)
                .fieldsNetcdf(!noFieldsNc).checkMemory(false).command("run " + scenario + " --out " + dir).run(dir);
        Path report = RunReport.write(s, o, dir);
        folder.finish();
        System.out.println("littoral: wrote " + report + ", " + dir.resolve("summary.json") + " and the other outputs of " + s.name());
        return 0;
    }
}
