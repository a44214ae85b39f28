package org.littoral.scenarios.timing;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.model.surface.SolarGeometry;
import org.littoral.scenarios.run.Solver;
import org.littoral.scenarios.scenario.JobModel;
import org.littoral.scenarios.run.WorkEstimate;
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

/** {@code littoral check-timing PASSAGES --day DAYFILE --out DIR}: are the observed passage times plausible? */
@Command(name = "check-timing", description = {"Sanity-check observed front passage times for one day.",
        "Compares each site's passage with an ensemble envelope of model arrivals for the day (its percentile), the implied "
                + "speed between sites with a density-current speed (Benjamin 1968; Simpson & Britter 1980), and the flight "
                + "times; flags with reasons (earlier than any plausible onset, inland before coast, implausible speed, one "
                + "flight interval off and which neighbouring flight the evidence favours). A flag is advice: the data are "
                + "never changed. PASSAGES is the passages.csv of littoral observe or a CSV with site, date, passage_time_local. "
                + "Day file format: docs/timing-checks.md. Writes flags.csv, envelope.csv, summary.json, "
                + "arrival-vs-distance.png, report.html, sweep.json and members/ to --out.",
        "Idealised model, not a forecast."})
public final class CheckTimingCommand implements Callable<Integer> {

    @Parameters(index = "0", paramLabel = "PASSAGES", description = "Passage table (littoral observe passages.csv, or site,date,passage_time_local).")
    Path passages;

    @Option(names = "--day", required = true, paramLabel = "DAYFILE", description = "Day file (YAML): coast, date, ambient wind, front, flights, ensemble.")
    Path day;

    @Option(names = "--out", paramLabel = "DIR", description = "Output folder (default: out/check-timing/<date>).")
    Path out;

    @Option(names = "--model", paramLabel = "MODEL", description = "Override the day file's ensemble model: nonlinear (fronts; "
            + "the default, on the 200 x 2 km ensemble grid) or linear (a quick look: its times are the onset of onshore flow, "
            + "shown but never used to flag a passage).")
    String model;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads for the ensemble (default: all cores).")
    Integer threads;

    @Option(names = "--columns", paramLabel = "MAP.yaml",
            description = "Column map of a user passage table: delimiter, timestamp column and form, local time zone, site (docs/analysis.md section 1b).")
    Path columns;

    @Option(names = "--resume", description = "Keep ensemble members already computed in DIR from the same inputs.")
    boolean resume;

    @Option(names = "--overwrite", description = "Start again in DIR: remove the outputs of an earlier run there first.")
    boolean overwrite;

    @Mixin
    org.littoral.scenarios.cluster.ClusterOptions cluster;

    @Override
    public Integer call() throws Exception {
        DaySpec spec = DayFile.read(day, model);
        Path dir = out != null ? out : Path.of("out", "check-timing", spec.date());
        int n = threads != null ? threads : Runtime.getRuntime().availableProcessors();
        if (resume && overwrite) {
            throw new UserInputException("littoral check-timing: --resume continues the run in the folder and --overwrite "
                    + "removes it; give one of the two");
        }
        Placement where = cluster.placement(dir, overwrite);
        OutputFolder folder = cluster.prepareFolder(dir, "check-timing " + passages, resume, overwrite, System.err);
        CheckTimingResult r = CheckTimingRun.run(spec, passages, dir, new CheckTimingRun.Options(model, n, resume, System.err, System.console() != null, columns,
                where), Solver.standard());
        if (r.check() == null) {
            return r.failedMembers() > 0 ? 1 : 0; // a shard or a submission: the merge step writes the check
        }
        folder.finish();
        PrintStream o = System.out;
        o.printf("littoral: %s: %d passage(s) checked against %d ensemble member(s) (%s model): %d flag(s)%n", spec.date(),
                r.check().passages().size(), r.members(), r.model(), r.check().flags().size());
        for (TimingFlag f : r.check().flags()) {
            o.println("  " + f.site() + " " + f.label() + " " + TimingCheck.clock(f.observedHours()) + ": " + f.kind() + ": "
                    + f.reason());
        }
        o.println("littoral: wrote " + r.flagsCsv() + ", " + r.envelopeCsv() + ", " + r.summaryJson() + ", " + r.figurePng()
                + ", " + r.reportHtml());
        return 0;
    }

}
