package org.littoral.scenarios.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class HtmlReportTest {
    private static int count(String s, String needle) {
        int n = 0;
        for (int i = s.indexOf(needle); i >= 0; i = s.indexOf(needle, i + 1)) {
            n++;
        }
        return n;
    }

    @Test
    void escapesTheFiveHtmlSpecialCharacters() {
        assertEquals("&lt;b&gt;T &amp; q&lt;/b&gt; &quot;x&quot; &#39;y&#39;", HtmlReport.escape("<b>T & q</b> \"x\" 'y'"));
    }

    @Test
    void userTextNeverBecomesMarkup() {
        String html = HtmlReport.create("<script>alert(1)</script>").section("a < b").paragraph("<img src=x>")
                .table("t", Table.of("<c>").row("<d>")).toHtml();
        assertFalse(html.contains("<script>"));
        assertFalse(html.contains("<img src=x>"));
        assertFalse(html.contains("<c>") || html.contains("<d>"));
        assertTrue(html.contains("&lt;img src=x&gt;"));
    }

    @Test
    void everyFigureIsEmbeddedAsADataUriAndNumbered(@TempDir Path dir) throws Exception {
        double[] x = {0, 1, 2, 3};
        double[] y = {1, 3, 2, 4};
        HtmlReport r = HtmlReport.create("r").section("one")
                .figure(LineFigure.builder().size(400, 300).line("a", x, y).build(), "first")
                .section("two")
                .figure(ScatterFigure.builder().size(400, 300).points("p", x, y).build(), "second")
                .figure(BoxPlotFigure.builder().size(400, 300).group("g", y).build(), "third");
        Path p = dir.resolve("report.html");
        r.write(p);
        String html = Files.readString(p);
        assertEquals(3, r.figureCount());
        assertEquals(3, count(html, "src=\"data:image/png;base64,"));
        assertTrue(html.contains("<b>Figure 3.</b> third"));
        // self-contained: no external resources, no scripts
        assertFalse(html.contains("http://") || html.contains("https://"));
        assertFalse(html.toLowerCase().contains("<script"));
        // each data URI decodes to a PNG (signature 0x89 'P' 'N' 'G')
        Matcher m = Pattern.compile("data:image/png;base64,([A-Za-z0-9+/=]+)").matcher(html);
        int decoded = 0;
        while (m.find()) {
            byte[] png = java.util.Base64.getDecoder().decode(m.group(1));
            assertEquals((byte) 0x89, png[0]);
            assertEquals('P', png[1]);
            decoded++;
        }
        assertEquals(3, decoded);
    }

    @Test
    void tableOfContentsListsEverySectionWithAnAnchor() {
        String html = HtmlReport.create("r").section("Alpha").section("Beta").toHtml();
        assertTrue(html.contains("<a href=\"#sec-1\">Alpha</a>"));
        assertTrue(html.contains("<a href=\"#sec-2\">Beta</a>"));
        assertTrue(html.contains("id=\"sec-2\""));
    }

    @Test
    void standardCautionsSayNotAForecastAndDeferToAviationRules() {
        String html = HtmlReport.create("r").cautions().toHtml();
        assertTrue(html.contains("not a weather forecast"));
        assertTrue(html.contains("aviation, marine or public-safety decisions"));
        assertTrue(html.contains("aviation rules"));
        assertEquals(2, count(html, "class=\"caution\""));
    }

    @Test
    void tableNumbersAreFormattedPerColumnAndNanShowsADash() {
        String html = HtmlReport.create("r").table("t", Table.of("dT_K", "n").row(-2.31456, 3).row(Double.NaN, 4))
                .toHtml();
        assertTrue(html.contains(">\u22122.315<"), html);
        assertTrue(html.contains(">\u2013<"));
        assertTrue(html.contains("<b>Table 1.</b> t"));
    }
}
