package org.littoral.scenarios.observe;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.littoral.scenarios.cli.Main;
import org.littoral.scenarios.demo.DemoCampaign;
import org.littoral.scenarios.demo.DemoDataWriter;
import picocli.CommandLine;

/** `littoral observe` writes its figures as PNG files and embeds every one of them in report.html. */
class ObserveReportTest {

    @Test
    void theReportEmbedsEveryFigureItWritesAndTheFilesAreReadableByOthers(@TempDir Path tmp) throws Exception {
        DemoDataWriter w = new DemoDataWriter(DemoCampaign.generate(DemoCampaign.DEFAULT_SEED));
        Path data = tmp.resolve("data");
        w.writeAll(data, java.util.List.of());
        Path out = tmp.resolve("out");
        int rc = new CommandLine(new Main()).execute("observe", data.resolve("binned/profiles-binned.csv.gz").toString(),
                "--coast", data.resolve("coast.yaml").toString(), "--days", data.resolve("days.csv").toString(),
                "--out", out.toString());
        assertEquals(0, rc);
        String html = Files.readString(out.resolve("report.html"));
        long pngFiles;
        try (var s = Files.list(out)) {
            pngFiles = s.filter(p -> p.toString().endsWith(".png")).count();
        }
        Matcher m = Pattern.compile("<img src=\"data:image/png;base64,").matcher(html);
        int embedded = 0;
        while (m.find()) {
            embedded++;
        }
        assertTrue(pngFiles >= 4, "wind-direction panels, passage times, response boxes, composites: " + pngFiles);
        assertEquals(pngFiles, embedded, "every PNG written is embedded in the report");
        assertTrue(html.contains("Drone operations follow local aviation rules"), "the report carries the cautions");
        assertTrue(html.contains("Detected passages per site and day"));
        long flights;
        long sections;
        try (var s = Files.list(out)) {
            var names = s.map(p -> p.getFileName().toString()).toList();
            flights = names.stream().filter(n -> n.startsWith("flights-")).count();
            sections = names.stream().filter(n -> n.startsWith("time-height-")).count();
        }
        assertEquals(4, flights, "a long campaign: profile figures of 4 chosen site-days");
        assertEquals(4, sections, "and their time-height sections");
        assertTrue(html.contains("the flight profiles and time-height sections below show 4 of them"), "the choice is said");
        Set<PosixFilePermission> perm = Files.getPosixFilePermissions(out.resolve("report.html"));
        assertTrue(perm.contains(PosixFilePermission.OTHERS_READ), "outputs are readable by others: " + perm);
    }

    @Test
    void aWindTurningThroughNorthBreaksTheLineInsteadOfCrossingThePanel() {
        double[][] xy = AnalysisFigures.breakWraps(new double[] {10, 11, 12, 13}, new double[] {350, 355, 5, 10});
        assertArrayEquals(new double[] {10, 11, 11.5, 12, 13}, xy[0], 1e-12);
        assertTrue(Double.isNaN(xy[1][2]));
        assertEquals(5, xy[1][3], 1e-12);
    }

    @Test
    void aSteadyVeerDoesNotBreakTheLine() {
        double[][] xy = AnalysisFigures.breakWraps(new double[] {10, 11, 12}, new double[] {300, 200, 135});
        assertEquals(3, xy[0].length);
    }
}
