package org.littoral.scenarios.sensitivity;

import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.output.OutputFolder;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.sweep.SweepExecutor;
import org.littoral.scenarios.timing.DayFile;
import org.littoral.scenarios.timing.DaySpec;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code littoral influence DAYFILE --out DIR}: variance-based sensitivity of the front's arrival to the day's uncertain inputs. */
@Command(name = "influence", description = {"Which uncertain input controls the front's arrival at each site, its inland "
        + "penetration and the post-passage change: Sobol' first-order and total indices (Saltelli et al. 2010; Jansen 1999) "
        + "with bootstrap intervals, over the uncertain inputs and distributions of a check-timing day file's ensemble.",
        "Runs N (k + 2) members for k inputs through the sweep machinery (all cores, one file per member, --resume). Writes "
                + "indices.csv, outcomes.csv, influence.json, indices-by-site.png, report.html, sweep.json and members/ to "
                + "--out. Day file format: docs/timing-checks.md; the study: docs/sensitivity.md.",
        "Idealised model, not a forecast."})
public final class InfluenceCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "DAYFILE", description = "Day file (YAML) whose ensemble section gives the uncertain inputs.")
    Path day;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: out/influence/<date>).")
    Path out;

    @Option(names = "--rows", paramLabel = "N", description = "Base sample size N (rows of each sample matrix; default 32). "
            + "The study runs N (k + 2) members; intervals narrow as 1/sqrt(N).")
    int rows = 32;

    @Option(names = "--points", paramLabel = "KIND", description = "sobol (low-discrepancy sequence, default) or random (seeded).")
    String points = "sobol";

    @Option(names = "--seed", paramLabel = "SEED", description = "Seed of random points and of the bootstrap (default 20261205).")
    long seed = 20261205L;

    @Option(names = "--bootstrap", paramLabel = "B", description = "Bootstrap resamples for the intervals (default 1000).")
    int bootstrap = 1000;

    @Option(names = "--model", paramLabel = "MODEL", description = "nonlinear (fronts; default) or linear (quick look: onset of onshore flow).")
    String model;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: all cores).")
    Integer threads;

    @Option(names = "--resume", description = "Keep members already computed in DIR from the same inputs.")
    boolean resume;

    @Option(names = "--overwrite", description = "Start again in DIR: remove the outputs of an earlier run there first.")
    boolean overwrite;

    @Mixin
    org.littoral.scenarios.cluster.ClusterOptions cluster;

    @Override
    public Integer call() throws Exception {
        DaySpec spec = DayFile.read(day, model);
        Path dir = out != null ? out : Path.of("out", "influence", spec.date());
        if (resume && overwrite) {
            throw new UserInputException("littoral influence: --resume continues the run in the folder and --overwrite removes it; "
                    + "give one of the two");
        }
        InfluenceStudy.Settings s = new InfluenceStudy.Settings(rows, points(points), seed, bootstrap, 0.95);
        int n = threads != null ? threads : Runtime.getRuntime().availableProcessors();
        org.littoral.scenarios.sweep.Placement where = cluster.placement(dir, overwrite);
        OutputFolder folder = cluster.prepareFolder(dir, "influence " + day, resume, overwrite, System.err);
        InfluenceStudy.Result r = InfluenceStudy.run(spec, s, dir, SweepExecutor.Options.forCommandLine(n, resume, false)
                .placed(where, null), Solver.standard());
        if (r == null) {
            return 0; // a shard or a submission (--on slurm): the merge step writes the indices
        }
        InfluenceOutputs.Written w = InfluenceOutputs.write(dir, r, s);
        folder.finish();
        System.out.println("littoral: " + spec.date() + ": " + r.members().size() + " members (" + r.model() + " model): "
                + InfluenceOutputs.headline(r));
        System.out.println("littoral: wrote " + w.indicesCsv() + ", " + w.outcomesCsv() + ", " + w.json() + ", " + w.figure()
                + ", " + w.report());
        return r.outcome().failed() > 0 ? 1 : 0;
    }

    static SampleDesign.Points points(String s) {
        return switch (s.toLowerCase(Locale.ROOT)) {
            case "sobol" -> SampleDesign.Points.SOBOL;
            case "random" -> SampleDesign.Points.RANDOM;
            default -> throw new UserInputException("--points " + s + " is not a design; use sobol (low-discrepancy sequence) or "
                    + "random (seeded pseudo-random points)");
        };
    }
}
