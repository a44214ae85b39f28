package org.littoral.scenarios.demo;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.report.LineFigure;

/** Pieces of `littoral demo`: where its data comes from, the answer key, embedded figure sizes. */
class DemoCommandTest {

    /**
     * The whole demo end to end as the linear quick look (--quick), so that it runs in seconds: one report with every
     * step's section, every figure embedded, the cautions, and each step's own files; the timing check flags every
     * planted error with its reason, and its captions are computed from its flags.
     */
    @Test
    void theDemoWritesOneReportWithEveryStepAndEveryFigureEmbedded(@TempDir Path tmp) throws Exception {
        Path out = tmp.resolve("demo");
        int rc = new picocli.CommandLine(new org.littoral.scenarios.cli.Main()).execute("demo", "--out", out.toString(),
                "--data", tmp.resolve("no-data-here").toString(), "--quick", "--threads", "2");
        assertEquals(0, rc);
        String html = Files.readString(out.resolve("index.html"));
        for (String heading : new String[] {"What was run and why", "Hypotheses: the ambient flow", "what the analysis chain finds",
            "The model against the observations", "Timing check of one day", "Recommended site sets and cadences",
            "Why capture is at most", "Cautions"}) {
            assertTrue(html.contains(heading), "section '" + heading + "'");
        }
        int figures = html.split("<img src=\"data:image/png;base64,", -1).length - 1;
        assertTrue(figures >= 10, "figures embedded: " + figures);
        assertTrue(html.contains("Drone operations follow local aviation rules"));
        assertTrue(html.contains("INVENTED"));
        assertTrue(html.contains("3 of the 3 planted errors are flagged with the expected reason"), "planted errors");
        assertTrue(html.contains("onset of onshore flow (linear theory has no front)"), "the quick look labels its times");
        assertTrue(!html.contains("(none: the timings are consistent)"), "no fixed caption above the flags");
        for (String f : new String[] {"sweep/comparison.csv", "observe/passages.csv", "compare/metrics.csv",
            "check-timing/true-passages/flags.csv", "check-timing/chain-passages/flags.csv",
            "check-timing/planted-too-fast/flags.csv", "plan/plan.json"}) {
            assertTrue(Files.isRegularFile(out.resolve(f)), f);
        }
    }

    @Test
    void theBundledPlantedErrorsAreTheOnesInDemoData() throws Exception {
        Path repo = Path.of("").toAbsolutePath().getParent();
        Path inRepo = repo.resolve("demo-data/" + DemoCommand.PLANTED);
        org.junit.jupiter.api.Assumptions.assumeTrue(Files.isRegularFile(inRepo), "run from the scenarios module of a checkout");
        try (var in = DemoCommand.class.getResourceAsStream("/org/littoral/scenarios/demo/" + DemoCommand.PLANTED)) {
            assertEquals(Files.readString(inRepo), new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8));
        }
    }

    @Test
    void theBundledDayFileIsTheOneInDemoData() throws Exception {
        Path repo = Path.of("").toAbsolutePath().getParent();
        Path inRepo = repo.resolve("demo-data/check-timing-2031-06-25.yaml");
        org.junit.jupiter.api.Assumptions.assumeTrue(Files.isRegularFile(inRepo), "run from the scenarios module of a checkout");
        try (var in = DemoCommand.class.getResourceAsStream("/org/littoral/scenarios/demo/check-timing-2031-06-25.yaml")) {
            assertEquals(Files.readString(inRepo), new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8));
        }
    }

    @Test
    void aMissingDataFolderIsWrittenAfreshByTheGenerator(@TempDir Path tmp) throws Exception {
        Path got = DemoCommand.ensureData(tmp.resolve("nowhere"), tmp.resolve("fresh"));
        assertEquals(tmp.resolve("fresh"), got);
        assertTrue(Files.isRegularFile(got.resolve("binned/profiles-binned.csv.gz")));
        assertTrue(Files.readString(got.resolve("coast.yaml")).contains("INVENTED"));
        Path again = DemoCommand.ensureData(got, tmp.resolve("other"));
        assertEquals(got, again, "a complete folder is used as it is");
    }

    @Test
    void theAnswerKeyGroupsTruePassagesBySiteDay(@TempDir Path tmp) throws Exception {
        Path csv = tmp.resolve("p.csv");
        Files.writeString(csv, "# INVENTED\nday,site,passage,time_hours\n2031-06-25,marsh-4km,1,9.5\n2031-06-25,marsh-4km,2,12.0\n"
                + "2031-06-25,plain-25km,1,13.25\n");
        Map<String, double[]> t = DemoCommand.readTruth(csv);
        assertArrayEquals(new double[] {9.5, 12.0}, t.get("2031-06-25/marsh-4km"), 0);
        assertArrayEquals(new double[] {13.25}, t.get("2031-06-25/plain-25km"), 0);
    }

    @Test
    void embeddedFiguresKeepTheirNativeWidth() {
        byte[] png = LineFigure.builder().size(731, 400).x("x", "").y("y", "").line("a", new double[] {0, 1}, new double[] {0, 1})
                .build().toPngBytes();
        assertEquals(731, DemoCommand.pngWidth(png));
    }
}
