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
import org.littoral.scenarios.observe.ObserveCommand;
import org.littoral.scenarios.plan.PlanCommand;
import org.littoral.scenarios.plan.PlanFile;
import org.littoral.scenarios.plan.PlanReport;
import org.littoral.scenarios.plan.PlanSpec;
import org.littoral.scenarios.report.HtmlReport;
import org.littoral.scenarios.report.Table;
import org.littoral.scenarios.sweep.ScenarioMemberRunner;
import org.littoral.scenarios.sweep.SweepCommand;
import org.littoral.scenarios.sweep.SweepFile;
import org.littoral.scenarios.sweep.SweepSpec;
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

    @Option(names = "--sweep", paramLabel = "SWEEP", defaultValue = "hypotheses",
            description = "Hypothesis sweep to run (built-in name or file; default: ${DEFAULT-VALUE}).")
    String sweepRef;

    @Option(names = "--plan", paramLabel = "PLAN", defaultValue = "quillmarsh-plan-nonlinear",
            description = "Plan to run (built-in name or file; default: ${DEFAULT-VALUE}; quillmarsh-plan is the linear quick look).")
    String planRef;

    @Option(names = "--resume", description = "Keep sweep and plan members already computed in DIR.")
    boolean resume;

    /** Scenario compared with the observations (the invented coast on a weak-offshore day). */
    static final String COMPARE_SCENARIO = "quillmarsh-reach";
    /** The day whose passage times the demo checks. */
    static final String CHECK_DAY = "2031-06-25";


    @Override
    public Integer call() throws Exception {
        int n = threads != null ? threads : Runtime.getRuntime().availableProcessors();
        Progress p = new Progress(System.err, 6);
        Files.createDirectories(out);
        HtmlReport rep = HtmlReport.create("littoral demo: the INVENTED Quillmarsh Reach campaign");
        rep.meta("data", "INVENTED demonstration data (not observations), " + data);
        rep.meta("written by", "littoral demo");

        p.step("demo campaign data");
        Path dataDir = ensureData(data, out.resolve("demo-data"));
        Coast coast = CoastFile.load(dataDir.resolve("coast.yaml").toString());
        intro(rep, dataDir);

        p.step("hypothesis sweep of ambient flows (" + sweepRef + ")");
        SweepSpec sweep = SweepFile.load(sweepRef, ScenarioMemberRunner.scenarioSource());
        SweepCommand.Result sr = SweepCommand.run(sweep, out.resolve("sweep"), n, resume, false, false);
        sweepSection(rep, sr);

        p.step("analysis of the demo observations");
        AnalysisSettings settings = new AnalysisSettings();
        ObserveCommand.Observed o = ObserveCommand.ingest(dataDir.resolve("binned").resolve("profiles-binned.csv.gz"), settings);
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
        compareSection(rep, dataDir, out.resolve("compare"));

        p.step("timing check of the observed passages on " + CHECK_DAY);
        timingSection(rep, dataDir, obsDir.resolve("passages.csv"), out.resolve("check-timing"), n);

        p.step("site and cadence plan for the invented coast (" + planRef + ")");
        PlanSpec plan = PlanFile.load(planRef);
        PlanCommand.PlanOutcome po = PlanCommand.run(plan, plan.model(), out.resolve("plan"), n, resume, System.err);
        List<CaptionedFigure> pf = PlanReport.figures(plan, po.result());
        PlanReport.addSections(rep, plan, po.result(), po.windows(), pf, true);

        rep.section("Cautions");
        rep.cautions();
        Path index = out.resolve("index.html");
        rep.write(index);
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
        String dayFile = "check-timing-" + CHECK_DAY + ".yaml";
        try (java.io.InputStream in = DemoCommand.class.getResourceAsStream("/org/littoral/scenarios/demo/" + dayFile)) {
            if (in != null) {
                org.littoral.scenarios.output.AtomicFile.write(fallback.resolve(dayFile), in.readAllBytes());
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

    private static void sweepSection(HtmlReport rep, SweepCommand.Result sr) throws IOException {
        rep.section("Hypotheses: the ambient flow (model sweep)");
        rep.paragraph(sr.spec().description() + ". " + sr.outcome().members() + " members (" + sr.outcome().failed()
                + " failed). Each member is one run of the model; the comparison table and the member runs are in sweep/.");
        for (Path f : sr.figures()) {
            byte[] png = Files.readAllBytes(f);
            rep.figurePng(png, pngWidth(png), captionOf(f.getFileName().toString()));
        }
        rep.table("The sweep's main results per member (sweep/comparison.csv has every column). Arrival: the first time the "
                + "total near-surface wind turns into the onshore sector at the site; empty where it never does (onshore all day, "
                + "or the breeze never overcomes the ambient wind).", compactSweepTable(sr.table()));
    }

    private static void compareSection(HtmlReport rep, Path dataDir, Path dir) throws IOException {
        org.littoral.scenarios.compare.CompareCommand.Outcome o = org.littoral.scenarios.compare.CompareCommand.run(
                COMPARE_SCENARIO, "nonlinear", dataDir.resolve("binned/profiles-binned.csv.gz"), dataDir.resolve("coast.yaml").toString(),
                dataDir.resolve("days.csv"), "scenario", dir, null);
        org.littoral.scenarios.compare.Comparison.Result r = o.result();
        rep.section("The model against the observations");
        rep.paragraph("The built-in scenario " + COMPARE_SCENARIO + " (the invented coast on a weak-offshore day, "
                + r.modelName() + " model) was run once; its synthetic soundings at the two sites went through the same "
                + "analysis chain as the observations, and were compared with the " + r.days().size() + " observed days of the "
                + "same breeze type (" + r.pairs() + " paired profiles). Full tables and the per-day metrics: compare/.");
        if (!r.notes().isEmpty()) {
            rep.bullets(r.notes());
        }
        rep.table("Bias (model minus observed) and RMSE per site, layer and variable; wind direction differences are "
                + "circular (wrapped to +/-180 deg).", org.littoral.scenarios.compare.CompareOutputs.metricsTable(r.metrics()));
        rep.table("Passage-time error per site: the chain's passage in the model soundings, and the model's own front "
                + "arrival, minus the observed passage (hours).",
                org.littoral.scenarios.compare.CompareOutputs.passageSummaryTable(r.passageSummaries()));
        for (Path f : o.figures()) {
            byte[] png = Files.readAllBytes(f);
            rep.figurePng(png, pngWidth(png), "Time-height sections at " + f.getFileName().toString()
                    .replaceFirst("^section-", "").replaceFirst("\\.png$", "") + ": observed composite (left) and model (right) "
                    + "on the same colour scale.");
        }
    }

    private static void timingSection(HtmlReport rep, Path dataDir, Path passages, Path dir, int threads) throws IOException {
        Path day = dataDir.resolve("check-timing-" + CHECK_DAY + ".yaml");
        rep.section("Timing check of the observed passages");
        if (!Files.isRegularFile(day)) {
            rep.paragraph("Not run: the day file " + day + " is not in the data folder (it ships in demo-data/).");
            return;
        }
        org.littoral.scenarios.timing.CheckTimingResult c = org.littoral.scenarios.timing.CheckTimingCommand.run(passages, day,
                dir, new org.littoral.scenarios.timing.CheckTimingCommand.Options(null, threads, false,
                        new PrintStream(java.io.OutputStream.nullOutputStream(), false, java.nio.charset.StandardCharsets.UTF_8),
                        false));
        rep.paragraph("The passages the chain found on " + CHECK_DAY + " (observe/passages.csv) against an ensemble of "
                + c.members() + " plausible versions of that day (" + c.model() + " model; day file " + day.getFileName()
                + "), and the speed implied between the sites against a density-current speed from the day's temperature "
                + "contrast and breeze depth (Benjamin 1968; Simpson & Britter 1980). A flag is advice, never an edit of the "
                + "data. Full outputs: check-timing/.");
        rep.figure(c.figure(), c.figureCaption());
        rep.table("Flags raised, with their reasons (none: the timings are consistent).", c.flagsTable());
        rep.table("Where each observed passage falls in the ensemble's arrival times.", c.envelopeTable());
    }

    /** Member, ambient wind, breeze type, peak breeze, depth, penetration and the arrival at each site. */
    static Table compactSweepTable(org.littoral.scenarios.sweep.ComparisonTable t) {
        List<String> siteCols = new ArrayList<>();
        for (String c : t.columns()) {
            if (c.startsWith("diagnostics.sites.") && c.endsWith(".onshore_arrival.time_local")) {
                siteCols.add(c);
            }
        }
        List<String> head = new ArrayList<>(List.of("member", "ambient from (deg)", "speed (m/s)", "breeze type",
                "peak breeze (m/s)", "peak time", "onshore layer (m)", "penetration (km)"));
        for (String c : siteCols) {
            head.add("arrival " + c.substring("diagnostics.sites.".length(), c.length() - ".onshore_arrival.time_local".length()));
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
            row.add(r.get("diagnostics.max_inland_penetration.km"));
            for (String c : siteCols) {
                row.add(r.get(c));
            }
            out.row(row.toArray());
        }
        return out.decimals("peak breeze (m/s)", 1).decimals("onshore layer (m)", 0).decimals("penetration (km)", 0)
                .decimals("ambient from (deg)", 0).decimals("speed (m/s)", 1);
    }

    /** Width in pixels from a PNG's IHDR chunk (bytes 16-19, big-endian). */
    static int pngWidth(byte[] png) {
        return ((png[16] & 0xff) << 24) | ((png[17] & 0xff) << 16) | ((png[18] & 0xff) << 8) | (png[19] & 0xff);
    }

    static String captionOf(String file) {
        String base = file.replace(".png", "").replace('-', ' ');
        return switch (file) {
            case "arrival-vs-ambient.png" -> "Onshore-flow arrival time at each site against the ambient wind speed, one line "
                    + "per ambient direction (breeze type).";
            case "penetration-vs-ambient.png" -> "Maximum inland penetration of the onshore flow against the ambient wind speed, "
                    + "one line per ambient direction (breeze type).";
            case "post-passage-by-type.png" -> "Changes at the sites in the two hours after the onshore flow arrives, by breeze type "
                    + "(members grouped by the ambient wind relative to the coast).";
            default -> "Sweep comparison: " + base + ".";
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
