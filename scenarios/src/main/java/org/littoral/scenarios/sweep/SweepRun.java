package org.littoral.scenarios.sweep;

import java.nio.file.Path;
import java.util.List;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.output.OutputFolder;
import org.littoral.scenarios.output.SafeNames;
import org.littoral.scenarios.run.Solver;

/**
 * The sweep use case as a plain Java call: expand the members, run them (here, as one shard, or through a batch
 * system), then write the comparison table and figures. {@link SweepCommand} is its command line; {@code littoral demo}
 * and the tests call it directly.
 */
public final class SweepRun {
    private SweepRun() {
    }

    /** What a sweep produced: the executor's outcome, the comparison table and the figure files. */
    public record Result(SweepSpec spec, SweepExecutor.Outcome outcome, ComparisonTable table, List<Path> figures) {
    }

    /** Runs a sweep into {@code dir} (progress on a terminal), then writes the comparison table and figures. */
    public static Result run(SweepSpec spec, Path dir, int threads, boolean resume, boolean retryFailed, boolean keepRunFiles)
            throws Exception {
        return run(spec, dir, threads, resume, retryFailed, keepRunFiles, false);
    }

    /** As {@link #run(SweepSpec, Path, int, boolean, boolean, boolean)}; {@code fieldsNc} keeps each member's fields.nc. */
    public static Result run(SweepSpec spec, Path dir, int threads, boolean resume, boolean retryFailed, boolean keepRunFiles,
                             boolean fieldsNc) throws Exception {
        return run(spec, dir, threads, resume, retryFailed, keepRunFiles, fieldsNc, Placement.ALL_HERE);
    }

    /**
     * As above, with the members placed elsewhere: one shard, the merge step, or a batch system. Only a run that ends
     * with every member's result (here or the merge) writes the table and figures; otherwise they are null and empty.
     */
    public static Result run(SweepSpec spec, Path dir, int threads, boolean resume, boolean retryFailed, boolean keepRunFiles,
                             boolean fieldsNc, Placement where) throws Exception {
        List<Member> members = MemberExpander.expand(spec);
        ScenarioMemberRunner runner = new ScenarioMemberRunner(spec.source(), keepRunFiles ? dir.resolve("runs") : null,
                Solver.standard()).fieldsNetcdf(fieldsNc && keepRunFiles).scratchIn(dir.resolve(SweepExecutor.SCRATCH));
        var largest = runner.checkAll(members, where.concurrentHere(threads));
        SweepExecutor.Outcome o = SweepExecutor.run(spec, members, dir, runner,
                SweepExecutor.Options.forCommandLine(threads, resume, retryFailed).placed(where, largest));
        if (!o.complete()) {
            return new Result(spec, o, null, List.of());
        }
        ComparisonTable table = ComparisonTable.build(spec, members, new MemberStore(dir));
        table.write(dir);
        List<Path> figures = ComparisonFigures.write(table, dir);
        return new Result(spec, o, table, figures);
    }
}
