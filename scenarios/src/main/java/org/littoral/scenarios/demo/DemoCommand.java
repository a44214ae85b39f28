package org.littoral.scenarios.demo;

import org.littoral.scenarios.report.CaptionedFigure;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;

import org.littoral.model.coast.Coast;
import org.littoral.scenarios.analysis.AnalysisChain;
import org.littoral.scenarios.analysis.AnalysisResult;
import org.littoral.scenarios.analysis.AnalysisSettings;
import org.littoral.scenarios.analysis.detect.CampaignSkill;
import org.littoral.scenarios.analysis.detect.DetectionScore;
import org.littoral.scenarios.analysis.ingest.CsvTable;
import org.littoral.scenarios.analysis.ingest.DayTableReader;
import org.littoral.scenarios.observe.AnalysisFigures;
import org.littoral.scenarios.observe.AnalysisOutputs;
import org.littoral.scenarios.observe.AnalysisReport;
import org.littoral.scenarios.observe.CoastFile;
import org.littoral.scenarios.observe.ObserveIngest;
import org.littoral.scenarios.plan.PlanRun;
import org.littoral.scenarios.plan.PlanFile;
import org.littoral.scenarios.plan.PlanReport;
import org.littoral.scenarios.plan.PlanSpec;
import org.littoral.scenarios.report.HtmlReport;
import org.littoral.scenarios.report.ClockTime;
import org.littoral.scenarios.report.Table;
import org.littoral.scenarios.scenario.JobModel;
import org.littoral.scenarios.timing.CheckTimingRun;
import org.littoral.scenarios.timing.CheckTimingResult;
import org.littoral.scenarios.timing.TimingFlag;
import org.littoral.scenarios.sweep.ScenarioMemberRunner;
import org.littoral.scenarios.sweep.SweepRun;
import org.littoral.scenarios.sweep.SweepFile;
import org.littoral.scenarios.sweep.SweepSpec;
import org.littoral.scenarios.input.UserInputException;
import org.littoral.scenarios.output.OutputFolder;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * The whole story on the INVENTED Quillmarsh Reach campaign in one run and one report: the hypothesis
 * sweep of ambient flows, the analysis of the demo observations (scored against their answer key), site
 * and cadence planning for the invented coast, and (where those commands are present) the model-observation
 * comparison and the timing checks. Every part keeps its own outputs in a sub-folder; index.html embeds
 * every figure.
 */
@Command(name = "demo", mixinStandardHelpOptions = true,
        description = "Run the whole story on the INVENTED demo campaign (Quillmarsh Reach) and write one report, "
                + "out/demo/index.html; each part keeps its own outputs in sweep/, observe/, compare/, check-timing/ and plan/.")
public final class DemoCommand implements Callable<Integer> {

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "out/demo", description = "Output folder (default: ${DEFAULT-VALUE}).")
    Path out;

    @Option(names = "--data", paramLabel = "DIR", defaultValue = "demo-data",
            description = "Demo campaign folder (default: ${DEFAULT-VALUE}; written afresh by the generator when it is missing).")
    Path data;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: all cores).")
    Integer threads;

    @Option(names = "--sweep", paramLabel = "SWEEP",
            description = "Hypothesis sweep to run (built-in name or file; default: hypotheses, nonlinear).")
    String sweepRef;

    @Option(names = "--plan", paramLabel = "PLAN",
            description = "Plan to run (built-in name or file; default: quillmarsh-plan-nonlinear; quillmarsh-plan is the linear "
                    + "quick look).")
    String planRef;

    @Option(names = "--resume", description = "Keep sweep and plan members already computed in DIR.")
    boolean resume;

    @Option(names = "--quick", description = "The linear quick look for every part (seconds instead of a minute): the linear "
            + "sweep quillmarsh-ambient and plan quillmarsh-plan unless --sweep or --plan say otherwise, and the linear model "
            + "for the comparison and the timing check. Linear theory has no front: its times are the onset of onshore flow.")
    boolean quick;
    @Option(names = "--overwrite", description = "Start again in DIR: remove the outputs of an earlier run there first.")
    boolean overwrite;

    /** Scenario compared with the observations (the invented coast on a weak-offshore day). */
    static final String COMPARE_SCENARIO = "quillmarsh-reach";
    /** The day whose passage times the demo checks. */
    static final String CHECK_DAY = "2031-06-25";


    @Override
    public Integer call() throws Exception {
        int n = threads != null ? threads : Runtime.getRuntime().availableProcessors();
        if (sweepRef == null) {
            sweepRef = quick ? "quillmarsh-ambient" : "hypotheses";
        }
        if (planRef == null) {
            planRef = quick ? "quillmarsh-plan" : "quillmarsh-plan-nonlinear";
        }
        String jobModel = quick ? "linear" : "nonlinear";
        Progress p = new Progress(System.err, 6);
        if (resume && overwrite) {
            throw new UserInputException("littoral demo: --resume continues the run in the folder and --overwrite removes it; "
                    + "give one of the two");
        }
        OutputFolder folder = OutputFolder.prepare(out, "demo", resume ? OutputFolder.Mode.RESUME
                : overwrite ? OutputFolder.Mode.OVERWRITE : OutputFolder.Mode.FRESH, true, System.err);
        HtmlReport rep = HtmlReport.create("littoral demo: the INVENTED Quillmarsh Reach campaign");
        rep.meta("data", "INVENTED demonstration data (not observations), " + data);
        rep.meta("written by", "littoral demo");

        p.step("demo campaign data");
        Path dataDir = ensureData(data, out.resolve("demo-data"));
        Coast coast = CoastFile.load(dataDir.resolve("coast.yaml").toString());
        intro(rep, dataDir);

        p.step("hypothesis sweep of ambient flows (" + sweepRef + ")");
        SweepSpec sweep = SweepFile.load(sweepRef, ScenarioMemberRunner.scenarioSource());
        SweepRun.Result sr = SweepRun.run(sweep, out.resolve("sweep"), n, resume, false, false);
        sweepSection(rep, sr);

        p.step("analysis of the demo observations");
        AnalysisSettings settings = new AnalysisSettings();
        ObserveIngest.Observed o = ObserveIngest.ingest(dataDir.resolve("binned").resolve("profiles-binned.csv.gz"), settings);
        settings.dayAttributes.putAll(DayTableReader.read(dataDir.resolve("days.csv")));
        AnalysisResult ar = AnalysisChain.run(o.profiles(), coast, settings);
        Path obsDir = out.resolve("observe");
        Files.createDirectories(obsDir);
        o.qc().writeCsv(obsDir.resolve("qc-log.csv"));
        AnalysisOutputs.write(obsDir, ar, o.qc(), "the INVENTED demo campaign", coast, o.profiles(), settings);
        List<CaptionedFigure> figs = AnalysisFigures.all(ar, settings, coast);
        rep.section("The demo observations: what the analysis chain finds");
        rep.paragraph("The same analysis chain that reads synthetic soundings reads the (invented) observations: ingest and QC, "
                + "passage detectors (PELT change points on the wind and a multivariate change point over several levels and "
                + "variables), response metrics, composites and group statistics. Full tables: observe/.");
        skillTable(rep, ar, settings, coast, dataDir.resolve("truth").resolve("passages.csv"));
        AnalysisReport.addSections(rep, ar, o.qc(), figs, true);

        p.step("model against the observations (" + COMPARE_SCENARIO + ", pure days)");
        compareSection(rep, dataDir, out.resolve("compare"), jobModel);

        p.step("timing check of the observed passages on " + CHECK_DAY);
        timingSection(rep, dataDir, obsDir.resolve("passages.csv"), out.resolve("check-timing"), n, jobModel);

        p.step("site and cadence plan for the invented coast (" + planRef + ")");
        PlanSpec plan = PlanFile.load(planRef);
        PlanRun.PlanOutcome po = PlanRun.run(plan, plan.model(), out.resolve("plan"), n, resume, System.err);
        List<CaptionedFigure> pf = PlanReport.figures(plan, po.result());
        PlanReport.addSections(rep, plan, po.result(), po.windows(), pf, true);

        rep.section("Cautions");
        rep.cautions();
        Path index = out.resolve("index.html");
        rep.write(index);
        folder.finish();
        p.done("wrote " + index + " (" + rep.figureCount() + " figures, " + rep.tableCount() + " tables)");
        System.out.println("littoral: demo written to " + index);
        return 0;
    }

    /** The campaign folder to read: the given one when it holds the files, else a fresh copy from the generator. */
    public static Path ensureData(Path given, Path fallback) throws IOException {
        if (Files.isRegularFile(given.resolve("coast.yaml")) && Files.isRegularFile(given.resolve("binned/profiles-binned.csv.gz"))
                && Files.isRegularFile(given.resolve("truth/passages.csv")) && Files.isRegularFile(given.resolve("days.csv"))) {
            return given;
        }
        new DemoDataWriter(DemoCampaign.generate(DemoCampaign.DEFAULT_SEED)).writeAll(fallback, List.of());
        // the timing check's day file is hand-written (not made by the generator); a copy ships in the jar
        for (String handWritten : List.of("check-timing-" + CHECK_DAY + ".yaml", PLANTED)) {
            try (java.io.InputStream in = DemoCommand.class.getResourceAsStream("/org/littoral/scenarios/demo/" + handWritten)) {
                if (in != null) {
                    org.littoral.scenarios.output.AtomicFile.write(fallback.resolve(handWritten), in.readAllBytes());
                }
            }
        }
        return fallback;
    }

    private static void intro(HtmlReport rep, Path dataDir) {
        rep.section("What was run and why");
        rep.paragraph("Quillmarsh Reach is an INVENTED coast (sea, a 1.2 km barrier strip, a 2.5 km bay, the mainland) with two "
                + "profiling sites, 'marsh-4km' 4 km and 'plain-25km' 25 km from the sea shore, and an INVENTED campaign of 36 days "
                + "of drone-like profiles to 600 m, every 30 min and every 15 min around the expected front. The days were made "
                + "by a generator that is independent of littoral's models (smooth background profiles plus a prescribed front "
                + "with a wind shift, cooling and moistening of random size, sensor noise and missing flights), so the true "
                + "passage times are known (" + dataDir.resolve("truth/passages.csv") + ").");
        rep.bullets(List.of(
                "1. Hypotheses: how do offshore, shore-parallel and onshore ambient winds change a breeze's timing, strength "
                        + "and depth? A sweep of the model over the ambient wind.",
                "2. The observations: what passages, responses and group differences does the analysis chain find in the "
                        + "demo campaign, and how well do its detectors recover the known passage times?",
                "3. Model and observations: how far is the model's weak-offshore day from the observed ones, site by "
                        + "site and layer by layer, and in passage time?",
                "4. Timing: are the passage times found on one day consistent with the plausible range and with the "
                        + "front's physics, or is one of them suspect?",
                "5. Planning: where should two sites go on this coast, and is a denser cadence around the front worth it?"));
    }

    private static void sweepSection(HtmlReport rep, SweepRun.Result sr) throws IOException {
        rep.section("Hypotheses: the ambient flow (model sweep)");
        rep.paragraph(sr.spec().description() + ". " + sr.outcome().members() + " members (" + sr.outcome().failed()
                + " failed). Each member is one run of the model; the comparison table and the member runs are in sweep/.");
        String times = org.littoral.scenarios.sweep.ComparisonFigures.timesLabel(sr.table());
        for (Path f : sr.figures()) {
            byte[] png = Files.readAllBytes(f);
            rep.figurePng(png, pngWidth(png), captionOf(f.getFileName().toString(), times));
        }
        rep.table("The sweep's main results per member (sweep/comparison.csv has every column). Arrival at a site: the " + times
                + " there (docs/fronts.md), local time; 'never' where it does not get there during the run. Penetration: the "
                + "farthest the front gets ('at least' at the limit of the search; 'none' where no front forms).",
                compactSweepTable(sr.table()));
    }

    private static void compareSection(HtmlReport rep, Path dataDir, Path dir, String model) throws IOException {
        org.littoral.scenarios.compare.CompareRun.Outcome o = org.littoral.scenarios.compare.CompareRun.run(
                COMPARE_SCENARIO, model, dataDir.resolve("binned/profiles-binned.csv.gz"),
                dataDir.resolve("coast.yaml").toString(), dataDir.resolve("days.csv"), "scenario", dir, null);
        org.littoral.scenarios.compare.Comparison.Result r = o.result();
        rep.section("The model against the observations");
        rep.paragraph("The built-in scenario " + COMPARE_SCENARIO + " (the invented coast on a weak-offshore day) was run once "
                + "with the " + r.modelName() + " model (" + (JobModel.isLinear(r.modelName()) ? "the linear quick look: its "
                + "times are the onset of onshore flow" : "linear theory has no front, so compare runs the nonlinear model, on a "
                + "200 x 2 km grid") + "); its synthetic soundings at the two sites went through the same analysis chain as the "
                + "observations, and were compared with the " + r.days().size() + " observed days of the same breeze type ("
                + r.pairs() + " paired profiles). Full tables and the per-day metrics: compare/.");
        if (!r.notes().isEmpty()) {
            rep.bullets(r.notes());
        }
        rep.table("Bias (model minus observed) and RMSE per site, layer and variable; wind direction differences are "
                + "circular (wrapped to +/-180 deg).", org.littoral.scenarios.compare.CompareOutputs.metricsView(r.metrics()));
        List<String> found = new ArrayList<>();
        List<String> missed = new ArrayList<>();
        for (org.littoral.scenarios.compare.Comparison.PassageSummary ps : r.passageSummaries()) {
            (Double.isFinite(ps.modelChainH()) ? found : missed).add(ps.site());
        }
        rep.table(String.format(Locale.ROOT, "Passage timing per site: the chain's onshore passage in the model soundings, and the "
                + "model's own front arrival, against the observed passages (errors model minus observed). The chain finds a "
                + "passage in the model soundings at %s%s.", found.isEmpty() ? "no site" : String.join(" and ", found),
                missed.isEmpty() ? "" : "; none at " + String.join(" and ", missed)),
                org.littoral.scenarios.compare.CompareOutputs.passageSummaryView(r.passageSummaries(), r.modelName()));
        for (Path f : o.figures()) {
            byte[] png = Files.readAllBytes(f);
            rep.figurePng(png, pngWidth(png), "Time-height sections at " + f.getFileName().toString()
                    .replaceFirst("^section-", "").replaceFirst("\\.png$", "") + ": observed composite (left) and model (right) "
                    + "on the same colour scale.");
        }
    }

    /** The hand-written table of planted timing errors on the check day (shipped in demo-data and in the jar). */
    static final String PLANTED = "check-timing-" + CHECK_DAY + "-planted.csv";

    /**
     * The timing check on the demo's consistent day: the day's true passages (answer key), the chain's passages, and each
     * planted error, all against one ensemble (run once; the other checks reuse its members). Every caption and verdict is
     * computed from the flags, so a caption can never contradict its table.
     */
    private static void timingSection(HtmlReport rep, Path dataDir, Path chainPassages, Path dir, int threads, String model)
            throws IOException {
        Path day = dataDir.resolve("check-timing-" + CHECK_DAY + ".yaml");
        rep.section("Timing check of one day's passages");
        if (!Files.isRegularFile(day)) {
            rep.paragraph("Not run: the day file " + day + " is not in the data folder (it ships in demo-data/).");
            return;
        }
        PrintStream quiet = new PrintStream(java.io.OutputStream.nullOutputStream(), false, java.nio.charset.StandardCharsets.UTF_8);
        Path truth = dataDir.resolve("truth/passages.csv");
        CheckTimingResult c = CheckTimingRun.run(truth, day, dir.resolve("true-passages"),
                new CheckTimingRun.Options(model, threads, false, quiet, false));
        CheckTimingResult chain = CheckTimingRun.run(chainPassages, day, reuseEnsemble(dir.resolve("true-passages"),
                dir.resolve("chain-passages")), new CheckTimingRun.Options(model, threads, true, quiet, false));
        rep.paragraph("The passage times of " + CHECK_DAY + ", a consistent day of the invented campaign (weak offshore wind, a "
                + "bay breeze and then the sea breeze), against an ensemble of " + c.members() + " plausible versions of that day ("
                + c.model() + " model; day file " + day.getFileName() + "), and the speed implied between the sites against a "
                + "density-current speed from the day's temperature contrast and breeze depth (Benjamin 1968; Simpson & Britter "
                + "1980). Three sets of times are checked against the same ensemble: the true passages (the answer key), the "
                + "passages the analysis chain found in the demo profiles, and the true passages with one error planted at a "
                + "time. A flag is advice, never an edit of the data. Full outputs: check-timing/.");
        if (!c.notes().isEmpty()) {
            rep.bullets(c.notes());
        }
        rep.figure(c.figure(), c.figureCaption());
        Table t = Table.of("passages", "site", "passage", "time", "flags");
        int trueFlagged = addPassageRows(t, "true (answer key)", c);
        int chainFlagged = addPassageRows(t, "found by the chain", chain);
        int nTrue = c.check().passages().size();
        int nChain = chain.check().passages().size();
        rep.table(String.format(Locale.ROOT, "The true passages and the chain's passages of %s against the ensemble: %s of the "
                + "%d true passages flagged; %s of the chain's %d passages flagged.", CHECK_DAY,
                trueFlagged == 0 ? "none" : String.valueOf(trueFlagged), nTrue, chainFlagged == 0 ? "none" : String.valueOf(chainFlagged),
                nChain) + (trueFlagged + chainFlagged == 0 ? "" : " The reasons are in the table below."), t);
        if (c.check().flags().size() + chain.check().flags().size() > 0) {
            Table reasons = Table.of("passages", "site", "flag", "reason");
            for (TimingFlag f : c.check().flags()) {
                reasons.row("true", f.site(), f.kind().name(), f.reason());
            }
            for (TimingFlag f : chain.check().flags()) {
                reasons.row("chain", f.site(), f.kind().name(), f.reason());
            }
            rep.table("Why each of those passages was flagged.", reasons);
        }
        rep.table(c.envelopeCaption(), c.envelopeView());

        Path plantedFile = dataDir.resolve(PLANTED);
        if (!Files.isRegularFile(plantedFile)) {
            rep.paragraph("Planted errors not checked: " + plantedFile + " is not in the data folder (it ships in demo-data/).");
            return;
        }
        Table pt = Table.of("case", "what was planted", "expected flag", "flags raised at that site", "right reason");
        int right = 0;
        List<Planted> cases = planted(plantedFile);
        for (Planted pc : cases) {
            Path cdir = reuseEnsemble(dir.resolve("true-passages"), dir.resolve("planted-" + pc.name()));
            Path csv = cdir.resolve("passages.csv");
            org.littoral.scenarios.output.AtomicFile.write(csv, pc.csv().getBytes(java.nio.charset.StandardCharsets.UTF_8));
            CheckTimingResult r = CheckTimingRun.run(csv, day, cdir, new CheckTimingRun.Options(model, threads, true, quiet,
                    false));
            List<String> raised = new ArrayList<>();
            boolean ok = false;
            for (TimingFlag f : r.check().flags()) {
                if (f.site().equals(pc.site())) {
                    raised.add(f.kind().name());
                    ok |= f.kind().name().equals(pc.expectedFlag());
                }
            }
            right += ok ? 1 : 0;
            pt.row(pc.name(), pc.what(), pc.expectedFlag(), raised.isEmpty() ? "none" : String.join(", ", raised), ok ? "yes" : "NO");
        }
        rep.table(String.format(Locale.ROOT, "Planted errors (%s): each case is the day's true passages with one time changed. "
                + "%d of the %d planted errors are flagged with the expected reason at the planted site%s.", PLANTED, right,
                cases.size(), right == cases.size() ? "" : "; the others are listed with what was raised instead"), pt);
    }

    /** Rows per checked passage: the passage set, site, label, time and its flags; returns how many passages were flagged. */
    private static int addPassageRows(Table t, String what, CheckTimingResult r) {
        int flagged = 0;
        for (org.littoral.scenarios.timing.TimingCheck.PassageAssessment a : r.check().passages()) {
            var p = a.passage();
            List<String> kinds = new ArrayList<>();
            for (TimingFlag f : r.check().flags()) {
                if (f.site().equals(p.site()) && f.label().equals(p.label())) {
                    kinds.add(f.kind().name());
                }
            }
            flagged += kinds.isEmpty() ? 0 : 1;
            t.row(what, p.site(), p.label().replace('_', ' '), ClockTime.hhmmWithin(p.timeHours(), p.uncertaintyHours()),
                    kinds.isEmpty() ? "none" : String.join(", ", kinds));
        }
        return flagged;
    }

    /** A new check folder holding a copy of an ensemble already computed (members and sweep record), so it is reused. */
    static Path reuseEnsemble(Path from, Path to) throws IOException {
        Files.createDirectories(to.resolve("members"));
        try (var files = Files.list(from.resolve("members"))) {
            for (Path f : (Iterable<Path>) files::iterator) {
                Files.copy(f, to.resolve("members").resolve(f.getFileName()), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
            }
        }
        for (String f : List.of("sweep.json")) {
            if (Files.isRegularFile(from.resolve(f))) {
                Files.copy(from.resolve(f), to.resolve(f), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
            }
        }
        return to;
    }

    /** One planted-error case: its rows as a check-timing passage table, the planted site and the flag it must raise. */
    record Planted(String name, String what, String site, String expectedFlag, String csv) {
    }

    static List<Planted> planted(Path file) {
        CsvTable t = CsvTable.read(file);
        Map<String, StringBuilder> rows = new LinkedHashMap<>();
        Map<String, String[]> meta = new LinkedHashMap<>();
        for (int r = 0; r < t.rowCount(); r++) {
            String c = t.cell(r, t.column("case"));
            rows.computeIfAbsent(c, k -> new StringBuilder("# INVENTED planted case " + k + "\nsite,date,passage_time_local,label\n"))
                    .append(t.cell(r, t.column("site"))).append(',').append(t.cell(r, t.column("date"))).append(',')
                    .append(t.cell(r, t.column("passage_time_local"))).append(',').append(t.cell(r, t.column("label"))).append('\n');
            if (!t.cell(r, t.column("expected_flag")).isEmpty()) {
                meta.put(c, new String[] {t.cell(r, t.column("planted")), t.cell(r, t.column("site")),
                        t.cell(r, t.column("expected_flag"))});
            }
        }
        List<Planted> out = new ArrayList<>();
        rows.forEach((c, csv) -> {
            String[] m = meta.get(c);
            if (m == null) {
                throw new org.littoral.scenarios.input.UserInputException(file + ": case " + c + " has no row with an "
                        + "expected_flag; mark the row whose time was changed");
            }
            out.add(new Planted(c, m[0], m[1], m[2], csv.toString()));
        });
        return out;
    }

    /** Member, ambient wind, breeze type, peak breeze, depth, penetration and the arrival at each site (HH:MM). */
    static Table compactSweepTable(org.littoral.scenarios.sweep.ComparisonTable t) {
        List<String> siteCols = new ArrayList<>();
        for (String c : t.columns()) {
            if (c.startsWith("diagnostics.sites.") && c.endsWith(".onshore_arrival.time_local_h")) {
                siteCols.add(c);
            }
        }
        List<String> head = new ArrayList<>(List.of("member", "ambient from (deg)", "speed (m/s)", "breeze type",
                "peak breeze (m/s)", "peak time", "onshore layer (m)", "penetration (km)"));
        for (String c : siteCols) {
            head.add("arrival " + c.substring("diagnostics.sites.".length(), c.length() - ".onshore_arrival.time_local_h".length()));
        }
        Table out = Table.of(head);
        for (java.util.Map<String, Object> r : t.rows()) {
            List<Object> row = new ArrayList<>();
            row.add(r.get("member"));
            row.add(r.get("ambient_from_deg"));
            row.add(r.get("ambient_speed_m_per_s"));
            row.add(r.get("breeze_type"));
            row.add(r.get("diagnostics.peak_onshore_wind.breeze_m_per_s"));
            row.add(r.get("diagnostics.peak_onshore_wind.time_local"));
            row.add(r.get("diagnostics.circulation_at_peak.onshore_layer_depth_m"));
            row.add(penetration(r));
            for (String c : siteCols) {
                Object h = r.get(c);
                row.add(h instanceof Number n ? ClockTime.hhmm(n.doubleValue()) : "never");
            }
            out.row(row.toArray());
        }
        return out.decimals("peak breeze (m/s)", 1).decimals("onshore layer (m)", 0)
                .decimals("ambient from (deg)", 0).decimals("speed (m/s)", 1);
    }

    private static String penetration(java.util.Map<String, Object> r) {
        Object km = r.get("diagnostics.max_inland_penetration.km");
        if (km instanceof Number n) {
            return String.format(Locale.ROOT, "%.0f", n.doubleValue());
        }
        Object atLeast = r.get("diagnostics.max_inland_penetration.at_least_km");
        if (atLeast instanceof Number n) {
            return String.format(Locale.ROOT, "at least %.0f", n.doubleValue());
        }
        return "none";
    }

    /** Width in pixels from a PNG's IHDR chunk (bytes 16-19, big-endian). */
    static int pngWidth(byte[] png) {
        return ((png[16] & 0xff) << 24) | ((png[17] & 0xff) << 16) | ((png[18] & 0xff) << 8) | (png[19] & 0xff);
    }

    static String captionOf(String file, String times) {
        return switch (file) {
            case "arrival-vs-ambient.png" -> "The " + times + " at each site against the ambient wind speed, one marker per "
                    + "breeze type (the ambient direction relative to the coast); open circles on the top frame: members in "
                    + "which it never gets there.";
            case "penetration-vs-ambient.png" -> "Maximum inland penetration of the front against the ambient wind speed, one "
                    + "marker per breeze type; open triangles: lower bounds (the front reached the limit of the search); open "
                    + "circles on the bottom frame: no front.";
            case "post-passage-by-type.png" -> "Changes at the sites in the two hours after the front arrives, by breeze type "
                    + "(members grouped by the ambient wind relative to the coast).";
            default -> "Sweep comparison: " + file.replace(".png", "").replace('-', ' ') + ".";
        };
    }

    /** Hits and false detections against the campaign's answer key, per detector and for the combined passages. */
    static void skillTable(HtmlReport rep, AnalysisResult ar, AnalysisSettings s, Coast coast, Path truthCsv) {
        Map<String, double[]> truth = readTruth(truthCsv);
        Table t = Table.of("detections scored", "true passages", "found within one flight interval", "hit rate %", "detections",
                "false detections", "false %");
        for (CampaignSkill.Row row : CampaignSkill.score(ar, s.detection, coast, truth)) {
            DetectionScore d = row.score();
            t.row(row.what(), d.truths(), d.hits(), 100 * d.hitRate(), d.detections(), d.falseDetections(), 100 * d.falseRate());
        }
        t.decimals("hit rate %", 0).decimals("false %", 0);
        rep.table("Detection skill on the INVENTED campaign against its answer key (truth/passages.csv): a true passage is found "
                + "when a detection lies within one local flight interval of it; every other detection is false. The true passages are breeze fronts, so the last row (passages that turn the wind onshore) is the one to judge by; the detectors' other change points (a veer, a speed change) are not claimed as breeze passages.", t);
    }

    /** The answer key: true passage times (local hours) per "day/site". */
    public static Map<String, double[]> readTruth(Path csv) {
        CsvTable t = CsvTable.read(csv);
        Map<String, List<Double>> m = new LinkedHashMap<>();
        int day = t.column("day");
        int site = t.column("site");
        int h = t.column("time_hours");
        for (int r = 0; r < t.rowCount(); r++) {
            m.computeIfAbsent(t.cell(r, day) + "/" + t.cell(r, site), k -> new ArrayList<>()).add(t.number(r, h));
        }
        Map<String, double[]> out = new LinkedHashMap<>();
        m.forEach((k, v) -> out.put(k, v.stream().mapToDouble(Double::doubleValue).toArray()));
        return out;
    }

    /** Step lines on the terminal: "[2/5] hypothesis sweep ... (12 s)". */
    static final class Progress {
        private final PrintStream err;
        private final int total;
        private final long t0 = System.nanoTime();
        private int k;

        Progress(PrintStream err, int total) {
            this.err = err;
            this.total = total;
        }

        void step(String what) {
            k++;
            err.printf(Locale.ROOT, "demo: [%d/%d] %s (%.0f s so far)%n", k, total, what, (System.nanoTime() - t0) / 1e9);
        }

        void done(String what) {
            err.printf(Locale.ROOT, "demo: done in %.0f s: %s%n", (System.nanoTime() - t0) / 1e9, what);
        }
    }

}
