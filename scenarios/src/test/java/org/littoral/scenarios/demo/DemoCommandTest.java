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
        Files.writeString(csv, "# INVENTED\nday,site,passage,time_hours\n2031-06-25,bayshore,1,9.5\n2031-06-25,bayshore,2,12.0\n"
                + "2031-06-25,inland,1,13.25\n");
        Map<String, double[]> t = DemoCommand.readTruth(csv);
        assertArrayEquals(new double[] {9.5, 12.0}, t.get("2031-06-25/bayshore"), 0);
        assertArrayEquals(new double[] {13.25}, t.get("2031-06-25/inland"), 0);
    }

    @Test
    void embeddedFiguresKeepTheirNativeWidth() {
        byte[] png = LineFigure.builder().size(731, 400).x("x", "").y("y", "").line("a", new double[] {0, 1}, new double[] {0, 1})
                .build().toPngBytes();
        assertEquals(731, DemoCommand.pngWidth(png));
    }
}
