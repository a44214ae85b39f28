package org.littoral.scenarios.compare;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
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

/**
 * The model-observation comparison as a plain Java call: run the scenario, ingest the observations, put both through
 * the same analysis chain and write the comparison. {@link CompareCommand} is its command line; {@code littoral demo}
 * and the tests call it directly.
 */
public final class CompareRun {
    private CompareRun() {
    }

    /** What {@link #run} produced. */
    public record Outcome(Comparison.Result result, ScenarioRun.Outcome model, CompareOutputs.Written written) {
        /** The time-height section PNGs, one per compared site. */
        public List<Path> figures() {
            return written.figures();
        }

        /** The passage-time PNG (model against observed), or null when there was nothing to plot. */
        public Path passageFigure() {
            return written.passageFigure();
        }

        public Path report() {
            return written.report();
        }
    }
    /**
     * The whole comparison as a Java call (for {@code littoral demo} and tests): runs the scenario through
     * {@link Solver#standard()} with the chosen model (its outputs go to {@code out/model}), ingests the observations as
     * {@code littoral observe} does, compares and writes everything to {@code out}.
     *
     * @param model      "nonlinear" (a linear scenario is put on the ensemble grid, {@link JobModel#toNonlinear}) or
     *                   "linear" (the scenario must be linear: a quick look, onset of onshore flow)
     * @param coastRef   coast of the observations, or null for the scenario's coast
     * @param days       per-day attribute table, or null
     * @param breezeType "scenario", "all" or a breeze type name
     * @param progress   where progress lines go, or null
     */
    public static Outcome run(String scenarioRef, String model, Path obs, String coastRef, Path days, String breezeType,
                              Path out, PrintStream progress) throws IOException {
        return run(scenarioRef, model, obs, coastRef, days, null, breezeType, out, progress);
    }

    /** As above, with a column map of the observations ({@code columns}, may be null). */
    public static Outcome run(String scenarioRef, String model, Path obs, String coastRef, Path days, Path columns,
                              String breezeType, Path out, PrintStream progress) throws IOException {
        return run(scenarioRef, model, obs, coastRef, days, columns, null, breezeType, out, progress);
    }

    /** As above, with an analysis settings file ({@code settingsFile}, may be null). */
    public static Outcome run(String scenarioRef, String model, Path obs, String coastRef, Path days, Path columns,
                              Path settingsFile, String breezeType, Path out, PrintStream progress) throws IOException {
        Scenario sc = withModel(BuiltinScenarios.resolve(scenarioRef), model);
        Coast coast = coastRef == null ? sc.coast() : CoastFile.load(coastRef);
        AnalysisSettings settings = new AnalysisSettings();
        if (settingsFile != null) {
            org.littoral.scenarios.analysis.SettingsFile.apply(settingsFile, settings);
        }
        org.littoral.scenarios.analysis.ingest.ColumnMap map = columns == null ? null
                : org.littoral.scenarios.analysis.ingest.ColumnMap.load(columns);
        settings.localZone = ObserveIngest.localZone(map, coast);
        ObserveIngest.Observed o = ObserveIngest.ingest(obs, settings, map);
        if (days != null) {
            settings.dayAttributes.putAll(DayTableReader.read(days));
        }
        java.util.Map<String, Double> inland = ObservedSites.inlandM(coastRef);
        // site names first: a mismatch should not cost a model run
        Comparison.matchSites(sc, o.profiles(), obs.toString(), inland, new java.util.ArrayList<>());
        Files.createDirectories(out);
        o.qc().writeCsv(out.resolve("qc-log.csv"));
        ScenarioRun.Outcome run = new ScenarioRun(sc, Solver.standard(), progress).run(out.resolve("model"));
        Comparison.Result r = Comparison.compute(new Comparison.Inputs(sc, run, o.profiles(), coast, settings, breezeType,
                obs.toString(), inland));
        CompareOutputs.Written w = CompareOutputs.write(out, r, sc.source(), obs.toString());
        return new Outcome(r, run, w);
    }

    /** The scenario as the chosen model runs it (see {@link #run(String, String, Path, String, Path, String, Path, PrintStream)}). */
    static Scenario withModel(Scenario sc, String model) {
        if (model.equals("linear")) {
            if (sc.kind() != Scenario.Kind.LINEAR) {
                throw new UserInputException("compare --model linear: scenario " + sc.source() + " is nonlinear (kind: nonlinear); "
                        + "drop --model linear, or give a linear scenario");
            }
            return sc;
        }
        if (sc.kind() == Scenario.Kind.NONLINEAR) {
            return sc;
        }
        ObjectNode doc = sc.inputs().deepCopy();
        JobModel.toNonlinear(doc, false);
        try {
            return ScenarioFile.parse(sc.source() + " (nonlinear, ensemble grid)",
                    new com.fasterxml.jackson.databind.ObjectMapper().writeValueAsString(doc), true);
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException(e);
        }
    }
}
