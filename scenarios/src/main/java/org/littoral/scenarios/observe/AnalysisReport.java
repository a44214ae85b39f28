package org.littoral.scenarios.observe;

import org.littoral.scenarios.report.CaptionedFigure;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.littoral.model.coast.Coast;
import org.littoral.scenarios.analysis.AnalysisResult;
import org.littoral.scenarios.analysis.AnalysisSettings;
import org.littoral.scenarios.analysis.SiteDayResult;
import org.littoral.scenarios.analysis.detect.Passage;
import org.littoral.scenarios.analysis.ingest.QcLog;
import org.littoral.scenarios.analysis.stats.ComparisonRow;
import org.littoral.scenarios.report.HtmlReport;
import org.littoral.scenarios.report.ClockTime;
import org.littoral.scenarios.report.ReaderText;
import org.littoral.scenarios.report.Table;

/**
 * The analysis report: a self-contained HTML page with the passages, figures (written also as PNG files
 * next to it) and the group comparisons. {@link #addSections} puts the same content into a larger
 * report (the demo).
 */
public final class AnalysisReport {
    private AnalysisReport() {
    }

    static List<Path> write(Path out, AnalysisResult r, QcLog qc, String what, Coast coast, AnalysisSettings s)
            throws IOException {
        List<Path> files = new ArrayList<>();
        List<CaptionedFigure> figs = AnalysisFigures.all(r, s, coast);
        for (CaptionedFigure c : figs) {
            Path png = out.resolve(c.fileName());
            c.figure().writePng(png);
            files.add(png);
        }
        HtmlReport rep = HtmlReport.create("littoral analysis: " + what);
        rep.meta("analysed", what);
        rep.meta("coast", String.format(Locale.ROOT, "latitude %.2f deg, land-to-sea bearing %.0f deg", coast.latitudeDeg(),
                coast.bearingLandToSeaDeg()));
        List<String> conv = org.littoral.scenarios.analysis.ConventionCheck.warnings(r, coast, s);
        if (!conv.isEmpty()) {
            rep.section("Check the conventions");
            for (String w : conv) {
                rep.paragraph("Warning: " + w + ".");
            }
        }
        addSections(rep, r, qc, figs, false);
        rep.cautions();
        Path html = out.resolve("report.html");
        rep.write(html);
        files.add(html);
        return files;
    }

    /** Adds the analysis sections (summary, passages, figures, comparisons) to {@code rep}. */
    /**
     * @param compact true for a larger report (the demo): only the onshore-turning passages and the comparisons
     *                that stay significant after the Holm correction are tabled (the CSV files hold everything)
     */
    public static void addSections(HtmlReport rep, AnalysisResult r, QcLog qc, List<CaptionedFigure> figs,
                                   boolean compact) {
        long onshore = r.passages().stream().filter(Passage::turnsOnshore).count();
        rep.section("Passages found");
        rep.paragraph(String.format(Locale.ROOT, "%d site-days analysed; %d passages detected, %d of them turning the wind into "
                + "the onshore sector. The QC log (qc-log.csv) has %d entries%s.", r.siteDays().size(), r.passages().size(),
                onshore, qc == null ? 0 : qc.entries().size(),
                qc == null || qc.warnings().isEmpty() ? "" : "; warnings: " + String.join("; ", qc.warnings())));
        Map<String, Integer> types = new LinkedHashMap<>();
        for (SiteDayResult d : r.siteDays()) {
            types.merge(d.breezeType().name().toLowerCase(Locale.ROOT), 1, Integer::sum);
        }
        rep.paragraph("Site-days by breeze type (from the morning ambient wind above the breeze layer relative to the coast):");
        rep.keyValues(types);
        for (CaptionedFigure c : figs) {
            if (c.fileName().startsWith("wind-direction")) {
                rep.figure(c.figure(), c.caption());
            }
        }
        Table t = Table.of("day", "site", "#", "time (local)", "+/-", "confidence", "onshore", "detectors", "breeze type");
        for (SiteDayResult d : r.siteDays()) {
            for (Passage p : d.passages()) {
                if (compact && !p.turnsOnshore()) {
                    continue;
                }
                t.row(p.day(), p.site(), p.ordinal(), clock(p.timeHours()), ClockTime.minutes(p.uncertaintyHours()), p.confidence(),
                        p.turnsOnshore() ? "yes" : "no", String.join(" ", p.detectors()),
                        d.breezeType().name().toLowerCase(Locale.ROOT));
            }
        }
        t.decimals("confidence", 2);
        rep.table((compact ? "Detected passages that turn the wind onshore, per site and day (passages.csv has every passage and "
                + "column)." : "Detected passages per site and day (passages.csv has every column).") + " Timing uncertainty is at "
                + "least half the local flight interval; confidence is the detectors' agreement.", t);
        flightSections(rep, r, figs, compact);
        rep.section("Responses, distributions and composites");
        for (String sentence : AnalysisFigures.smallSampleSentences(r)) {
            rep.paragraph(sentence);
        }
        for (CaptionedFigure c : figs) {
            if (!c.fileName().startsWith("wind-direction") && !isFlightFigure(c)) {
                rep.figure(c.figure(), c.caption());
            }
        }
        rep.section("Group comparisons");
        if (r.comparisonNote() != null && !r.comparisonNote().isBlank()) {
            rep.paragraph(r.comparisonNote());
        }
        Table c = Table.of("metric", "by", "A", "B", "n A", "n B", "mean A", "mean B", "difference", "test", "p", "p (Holm)");
        List<ComparisonRow> rows = new ArrayList<>(r.comparisons());
        if (compact) {
            rows.removeIf(x -> !(x.pHolm() < 0.05));
            rows.sort(java.util.Comparator.comparingDouble(ComparisonRow::pHolm));
            if (rows.size() > 15) {
                rows = rows.subList(0, 15);
            }
        }
        for (ComparisonRow row : rows) {
            boolean byType = row.attribute().equals("breeze_type");
            c.row(metricText(row.metric()), ReaderText.words(row.attribute()),
                    byType ? ReaderText.breezeType(row.groupA()) : row.groupA(), byType ? ReaderText.breezeType(row.groupB()) : row.groupB(),
                    row.nA(), row.nB(), row.meanA(), row.meanB(), row.meanA() - row.meanB(), testName(row.test()), row.pValue(),
                    row.pHolm());
        }
        c.decimals("mean A", 3).decimals("mean B", 3).decimals("difference", 3).decimals("p", 4).decimals("p (Holm)", 4);
        rep.table((compact ? "The group differences that stay significant after the Holm correction (p (Holm) < 0.05, at most "
                + "15, smallest p first; comparisons.csv has all " + r.comparisons().size() + "). " : "")
                + "Comparisons between groups: the test is chosen from the samples' size and normality diagnostics "
                + "(comparisons.csv has them); p (Holm) corrects for the number of comparisons made.", c);
    }

    static boolean isFlightFigure(CaptionedFigure c) {
        return c.fileName().startsWith(FlightFigures.PROFILES_PREFIX) || c.fileName().startsWith(FlightFigures.SECTION_PREFIX);
    }

    /**
     * The observed flights: profile plots and time-height sections per site-day (every site-day of a short campaign,
     * a choice for a long one, said in a sentence). A compact report shows the first site-day's figures only.
     */
    static void flightSections(HtmlReport rep, AnalysisResult r, List<CaptionedFigure> figs, boolean compact) {
        List<CaptionedFigure> flights = figs.stream().filter(AnalysisReport::isFlightFigure).toList();
        if (flights.isEmpty()) {
            return;
        }
        rep.section("The observed flights");
        FlightFigures.Choice choice = FlightFigures.choose(r);
        if (choice.sentence() != null) {
            rep.paragraph(choice.sentence());
        }
        String firstSuffix = FlightFigures.fileSuffix(choice.siteDays().get(0));
        if (compact && choice.siteDays().size() > 1) {
            rep.paragraph("Shown here for " + choice.siteDays().get(0).siteDay().site() + " on " + choice.siteDays().get(0).siteDay().day()
                    + "; the observe folder holds the figures of " + choice.siteDays().size() + " site-days ("
                    + FlightFigures.PROFILES_PREFIX + "*.png, " + FlightFigures.SECTION_PREFIX + "*.png).");
        }
        for (CaptionedFigure c : flights) {
            if (!compact || c.fileName().endsWith(firstSuffix)) {
                rep.figure(c.figure(), c.caption());
            }
        }
    }

    /** "change alongshore_wind_m_per_s 100-300m" -> "change of alongshore wind (m/s), 100-300 m". */
    static String metricText(String metric) {
        String[] p = metric.split(" ");
        if (p.length != 3) {
            return ReaderText.layer(metric.replace('_', ' '));
        }
        return p[0].replace('_', ' ') + " of " + ReaderText.label(p[1]) + ", " + ReaderText.layer(p[2]);
    }

    static String testName(ComparisonRow.Test t) {
        return switch (t) {
            case Z_TEST -> "z-test";
            case WELCH_T -> "Welch t";
            case MANN_WHITNEY -> "Mann-Whitney";
        };
    }

    static String clock(double h) {
        long m = Math.round(h * 60);
        return String.format(Locale.ROOT, "%02d:%02d", m / 60, m % 60);
    }
}
