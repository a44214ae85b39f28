package org.littoral.scenarios.observe;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.littoral.model.coast.Coast;
import org.littoral.scenarios.analysis.AnalysisResult;
import org.littoral.scenarios.analysis.SiteDayResult;
import org.littoral.scenarios.analysis.detect.Passage;
import org.littoral.scenarios.analysis.ingest.QcLog;
import org.littoral.scenarios.analysis.stats.ComparisonRow;

/** The analysis report (self-contained HTML). */
final class AnalysisReport {
    private AnalysisReport() {
    }

    static List<Path> write(Path out, AnalysisResult r, QcLog qc, String what, Coast coast) throws IOException {
        List<Path> files = new ArrayList<>();
        StringBuilder h = new StringBuilder();
        h.append("<!DOCTYPE html><html lang=\"en\"><head><meta charset=\"utf-8\"><title>littoral analysis</title><style>"
                + "body{font-family:DejaVu Sans,Arial,sans-serif;max-width:1100px;margin:2em auto;color:#222}table{border-collapse:collapse}"
                + "td,th{border:1px solid #bbb;padding:2px 6px;font-size:12px}th{background:#eef}</style></head><body>");
        h.append("<h1>Analysis of ").append(esc(what)).append("</h1>");
        h.append("<p>").append(r.siteDays().size()).append(" site-days, ").append(r.passages().size()).append(" passages (")
                .append(r.passages().stream().filter(Passage::turnsOnshore).count()).append(" turning the wind onshore). QC log: ")
                .append(qc.entries().size()).append(" entries (qc-log.csv).</p>");
        h.append("<h2>Passages</h2><table><tr><th>day</th><th>site</th><th>#</th><th>time</th><th>&plusmn; h</th><th>confidence</th>"
                + "<th>onshore</th><th>detectors</th><th>breeze type</th></tr>");
        for (SiteDayResult d : r.siteDays()) {
            for (Passage p : d.passages()) {
                h.append(String.format(Locale.ROOT, "<tr><td>%s</td><td>%s</td><td>%d</td><td>%s</td><td>%.2f</td><td>%.2f</td><td>%s</td>"
                        + "<td>%s</td><td>%s</td></tr>", esc(p.day()), esc(p.site()), p.ordinal(), clock(p.timeHours()), p.uncertaintyHours(),
                        p.confidence(), p.turnsOnshore() ? "yes" : "no", esc(String.join(" ", p.detectors())), d.breezeType().name()));
            }
        }
        h.append("</table>");
        h.append("<h2>Group comparisons</h2><p>").append(esc(r.comparisonNote() == null ? "" : r.comparisonNote())).append("</p>");
        h.append("<table><tr><th>metric</th><th>by</th><th>A</th><th>B</th><th>n</th><th>mean A</th><th>mean B</th><th>test</th>"
                + "<th>p</th><th>p (Holm)</th></tr>");
        for (ComparisonRow c : r.comparisons()) {
            h.append(String.format(Locale.ROOT, "<tr><td>%s</td><td>%s</td><td>%s</td><td>%s</td><td>%d/%d</td><td>%.3g</td><td>%.3g</td>"
                    + "<td>%s</td><td>%.3g</td><td>%.3g</td></tr>", esc(c.metric()), esc(c.attribute()), esc(c.groupA()), esc(c.groupB()),
                    c.nA(), c.nB(), c.meanA(), c.meanB(), c.test().name(), c.pValue(), c.pHolm()));
        }
        h.append("</table></body></html>\n");
        files.add(AnalysisOutputs.text(out.resolve("report.html"), h.toString()));
        return files;
    }

    static String clock(double h) {
        long m = Math.round(h * 60);
        return String.format(Locale.ROOT, "%02d:%02d", m / 60, m % 60);
    }

    static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }
}
