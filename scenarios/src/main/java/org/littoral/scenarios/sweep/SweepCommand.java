package org.littoral.scenarios.sweep;

import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.Callable;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.output.OutputFolder;
import org.littoral.scenarios.output.SafeNames;
import org.littoral.scenarios.run.Solver;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code littoral sweep SWEEP --out DIR [--resume] [--threads N]}. */
@Command(name = "sweep", description = {"Run every member of a sweep or ensemble file on all cores and compare them side by side.",
        "Writes members/<id>.json as each member finishes (atomically; --resume continues a killed sweep), runs/<id>/ (each "
                + "member's run files, unless --no-run-files), then comparison.csv and comparison.json and the figures "
                + "arrival-vs-ambient.png, penetration-vs-ambient.png and post-passage-by-type.png (when the members report those "
                + "values). Built-in sweeps: hypotheses (nonlinear, 12 members), quillmarsh-ambient (linear, 12), ambient-flow "
                + "(linear, 12), ambient-ensemble (linear, 40 drawn days); 'littoral sweep --list' describes them. Linear "
                + "members' times are the onset of onshore flow (linear theory has no front). The sweep file format is in "
                + "docs/sweeps.md."})
public final class SweepCommand implements Callable<Integer> {

    @Parameters(index = "0", arity = "0..1", paramLabel = "SWEEP", description = "Sweep file (YAML/JSON) or built-in sweep name.")
    String sweep;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: out/sweeps/<sweep name>).")
    Path out;

    @Option(names = "--resume", description = "Skip members whose result is already in DIR (computed from the same inputs).")
    boolean resume;

    @Option(names = "--overwrite", description = "Start again in DIR: remove the outputs of an earlier run there first.")
    boolean overwrite;

    @Option(names = "--retry-failed", description = "With --resume, run members that failed last time again.")
    boolean retryFailed;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: all cores).")
    Integer threads;

    @Option(names = "--no-run-files", description = "Do not keep each member's run files (soundings, sections) under DIR/runs.")
    boolean noRunFiles;

    @Option(names = "--fields-nc", description = "Also write each member's model fields as runs/<id>/fields.nc (CF-1.8 netCDF; "
            + "tens to hundreds of MB per member).")
    boolean fieldsNc;

    @Option(names = "--list", description = "List the built-in sweeps and exit.")
    boolean list;

    @Mixin
    org.littoral.scenarios.cluster.ClusterOptions cluster;

    @Override
    public Integer call() throws Exception {
        if (list || sweep == null) {
            for (String b : SweepFile.BUILTINS) {
                SweepSpec s = SweepFile.readBuiltin(b, ScenarioMemberRunner.scenarioSource());
                System.out.printf("%-18s %4d members  %s%n", b, s.memberCount(), s.description());
            }
            if (sweep == null && !list) {
                System.out.println("give a sweep: littoral sweep ambient-flow --out out/sweeps/ambient-flow");
            }
            return 0;
        }
        SweepSpec spec = SweepFile.load(sweep, ScenarioMemberRunner.scenarioSource());
        Path dir = out != null ? out : Path.of("out", "sweeps", SafeNames.fileName(spec.name()));
        int n = threads != null ? threads : Runtime.getRuntime().availableProcessors();
        if (fieldsNc && noRunFiles) {
            throw new UserInputException("littoral sweep: --fields-nc keeps fields.nc among each member's run files, which "
                    + "--no-run-files drops; give one of the two");
        }
        if (resume && overwrite) {
            throw new UserInputException("littoral sweep: --resume continues the run in the folder and --overwrite removes it; "
                    + "give one of the two");
        }
        Placement where = cluster.placement(dir, overwrite);
        OutputFolder folder = cluster.prepareFolder(dir, "sweep " + sweep, resume, overwrite, System.err);
        SweepRun.Result r = SweepRun.run(spec, dir, n, resume, retryFailed, !noRunFiles, fieldsNc, where);
        if (!r.outcome().complete()) {
            return org.littoral.scenarios.cluster.ClusterOptions.exitCode(r.outcome());
        }
        folder.finish();
        SweepExecutor.Outcome o = r.outcome();
        System.out.println("littoral: sweep " + spec.name() + ": " + o.members() + " members (" + o.failed() + " failed"
                + (o.failedEarlier() > 0 ? ", " + o.failedEarlier() + " of them in an earlier run" : "") + "); wrote "
                + dir.resolve("comparison.csv") + ", comparison.json" + (r.figures().isEmpty() ? "" : " and " + r.figures().size() + " figure(s)"));
        if (o.failed() > 0) {
            System.out.println("littoral: " + o.failed() + " member(s) failed; their reasons are in the 'error' column and in "
                    + "members/<id>.json; fix the cause and run again with --resume --retry-failed");
            return 1;
        }
        return 0;
    }
}
