package org.littoral.scenarios.plan;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Locale;
import java.util.stream.Collectors;
import org.littoral.scenarios.scenario.Scenario;

/** The plan's self-contained HTML report (tables now; figures are added by the report library). */
final class PlanReport {
    private PlanReport() {
    }

    static void write(Path dir, PlanSpec plan, String model, Scenario base, PlanResult r, DenseWindow[][] windows) throws IOException {
        StringBuilder h = new StringBuilder();
        h.append("<!DOCTYPE html><html lang=\"en\"><head><meta charset=\"utf-8\"><title>littoral plan ")
                .append(esc(plan.ensemble().name())).append("</title><style>body{font-family:DejaVu Sans,Arial,sans-serif;max-width:1000px;"
                + "margin:2em auto;color:#222}table{border-collapse:collapse}td,th{border:1px solid #bbb;padding:3px 8px;"
                + "font-size:13px}th{background:#eef}.caution{border:2px solid #c60;background:#fff4e5;padding:.6em 1em}</style></head><body>");
        h.append("<h1>Site and cadence plan: ").append(esc(plan.ensemble().name())).append("</h1>");
        h.append("<div class=\"caution\"><b>Caution.</b> ").append(esc(PlanOutputs.CAUTION)).append("</div>");
        h.append("<p>").append(r.members).append(" ensemble members of <code>").append(esc(plan.ensemble().baseLabel()))
                .append("</code> (").append(esc(model)).append(" model), ").append(plan.candidatesKm().length)
                .append(" candidate distances, ").append(plan.sitesPerSet()).append(" sites per set, operating hours ")
                .append(PlanOutputs.clock(plan.operatingStartH())).append("&ndash;").append(PlanOutputs.clock(plan.operatingEndH()))
                .append(", ceiling ").append(String.format(Locale.ROOT, "%.0f", plan.ceilingM())).append(" m.</p>");
        h.append("<h2>Recommendations</h2><table><tr><th>rank</th><th>sites (km inland)</th><th>cadence</th><th>score</th>"
                + "<th>P(capture) [95% CI]</th><th>P(speed) [95% CI]</th>").append(r.hasBay ? "<th>P(bay/sea)</th>" : "")
                .append("<th>flights/day</th></tr>");
        for (int i = 0; i < Math.min(plan.top(), r.ranked.size()); i++) {
            SiteSetScore s = r.ranked.get(i);
            h.append("<tr><td>").append(i + 1).append("</td><td>")
                    .append(s.distancesKm().stream().map(d -> String.format(Locale.ROOT, "%.1f", d)).collect(Collectors.joining(", ")))
                    .append("</td><td>").append(esc(s.cadence())).append("</td><td>").append(String.format(Locale.ROOT, "%.2f", s.score()))
                    .append("</td><td>").append(ci(s.anyCaptured())).append("</td><td>").append(ci(s.speedResolved())).append("</td>")
                    .append(r.hasBay ? "<td>" + ci(s.bayAndSeaSeparated()) + "</td>" : "").append("<td>").append(s.flightsPerDay())
                    .append("</td></tr>");
        }
        h.append("</table>");
        for (String n : r.notes) {
            h.append("<p><i>Note:</i> ").append(esc(n)).append("</p>");
        }
        h.append("<h2>Arrival time against inland distance</h2><table><tr><th>km</th><th>members with arrival</th><th>5%</th>"
                + "<th>25%</th><th>median</th><th>75%</th><th>95%</th></tr>");
        for (PlanResult.FanRow f : r.fan) {
            h.append(String.format(Locale.ROOT, "<tr><td>%.1f</td><td>%.0f%%</td><td>%s</td><td>%s</td><td>%s</td><td>%s</td><td>%s</td></tr>",
                    f.distanceKm(), 100 * f.fractionArriving(), PlanOutputs.clock(f.p5()), PlanOutputs.clock(f.p25()),
                    PlanOutputs.clock(f.p50()), PlanOutputs.clock(f.p75()), PlanOutputs.clock(f.p95())));
        }
        h.append("</table></body></html>\n");
        PlanOutputs.atomic(dir.resolve("report.html"), h.toString().getBytes(StandardCharsets.UTF_8));
    }

    private static String ci(Proportion p) {
        if (p == null) {
            return "-";
        }
        return String.format(Locale.ROOT, "%.0f%% [%.0f&ndash;%.0f]", 100 * p.estimate(), 100 * p.lower(), 100 * p.upper());
    }

    static String esc(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
