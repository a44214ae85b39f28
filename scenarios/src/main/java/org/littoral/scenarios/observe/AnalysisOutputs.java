package org.littoral.scenarios.observe;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.littoral.model.coast.Coast;
import org.littoral.model.sounding.Profile;
import org.littoral.scenarios.analysis.AnalysisResult;
import org.littoral.scenarios.analysis.SiteDayResult;
import org.littoral.scenarios.analysis.detect.Passage;
import org.littoral.scenarios.analysis.ingest.QcLog;
import org.littoral.scenarios.output.AtomicFile;

/** Writes everything the analysis chain produced: tables first (each atomically), then the summary and report. */
public final class AnalysisOutputs {
    private AnalysisOutputs() {
    }

    public static List<Path> write(Path out, AnalysisResult r, QcLog qc, String what, Coast coast, List<Profile> profiles,
            org.littoral.scenarios.analysis.AnalysisSettings settings)
            throws IOException {
        List<Path> files = new ArrayList<>();
        files.add(text(out.resolve("site-days.csv"), AnalysisTables.siteDays(r)));
        files.add(text(out.resolve("passages.csv"), AnalysisTables.passages(r, settings.localZone)));
        files.add(text(out.resolve("responses.csv"), AnalysisTables.responses(r)));
        files.add(text(out.resolve("distributions.csv"), AnalysisTables.distributions(r)));
        files.add(text(out.resolve("composites.csv"), AnalysisTables.composites(r)));
        files.add(text(out.resolve("comparisons.csv"), AnalysisTables.comparisons(r)));
        files.add(out.resolve("qc-log.csv"));
        ObjectMapper json = new ObjectMapper();
        ObjectNode root = json.createObjectNode();
        root.put("analysed", what);
        if (settings.localZone != null) {
            root.put("local_clock", settings.localZone.getId());
        }
        root.put("profiles", profiles.size());
        root.put("site_days", r.siteDays().size());
        root.put("passages", r.passages().size());
        root.put("onshore_passages", r.passages().stream().filter(Passage::turnsOnshore).count());
        root.put("qc_entries", qc.entries().size());
        root.set("qc_warnings", json.valueToTree(qc.warnings()));
        root.put("comparison_note", r.comparisonNote());
        root.set("settings", org.littoral.scenarios.analysis.SettingsFile.toJson(settings));
        root.set("convention_warnings", json.valueToTree(org.littoral.scenarios.analysis.ConventionCheck.warnings(r, coast, settings)));
        root.set("notes", json.valueToTree(r.notes()));
        ArrayNode days = root.putArray("site_day_summary");
        for (SiteDayResult d : r.siteDays()) {
            ObjectNode o = days.addObject();
            o.put("day", d.siteDay().day());
            o.put("site", d.siteDay().site());
            o.put("breeze_type", d.breezeType().name());
            ArrayNode ps = o.putArray("passages");
            for (Passage p : d.passages()) {
                ObjectNode po = ps.addObject();
                po.put("time_local_h", Math.round(p.timeHours() * 1e4) / 1e4);
                if (settings.localZone != null) {
                    String[] lu = AnalysisTables.localAndUtc(p.day(), p.timeHours(), settings.localZone);
                    po.put("time_local", lu[0]);
                    po.put("time_utc", lu[1]);
                }
                po.put("uncertainty_h", Math.round(p.uncertaintyHours() * 1e4) / 1e4);
                po.put("confidence", p.confidence());
                po.put("turns_onshore", p.turnsOnshore());
                po.put("detectors", String.join(" ", p.detectors()));
            }
        }
        Path summary = out.resolve("analysis.json");
        AtomicFile.write(summary, json.writerWithDefaultPrettyPrinter().writeValueAsBytes(root));
        files.add(summary);
        files.addAll(AnalysisReport.write(out, r, qc, what, coast, settings));
        return files;
    }

    static Path text(Path p, String s) throws IOException {
        AtomicFile.write(p, s.getBytes(StandardCharsets.UTF_8));
        return p;
    }
}
