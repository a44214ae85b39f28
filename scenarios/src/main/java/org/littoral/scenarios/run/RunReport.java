package org.littoral.scenarios.run;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import org.littoral.scenarios.report.HtmlReport;
import org.littoral.scenarios.report.ReaderText;
import org.littoral.scenarios.report.Table;
import org.littoral.scenarios.scenario.JobModel;
import org.littoral.scenarios.scenario.Scenario;

/**
 * The self-contained report.html of one {@code littoral run}, read from what the run wrote: the scenario, the
 * diagnostics of its summary (times as HH:MM, definitions as the summary states them), the figures embedded, and
 * what every file holds. Through {@link HtmlReport}, like every other report.
 */
public final class RunReport {
    private RunReport() {
    }

    /** Writes {@code dir/report.html} and returns its path. */
    public static Path write(Scenario s, ScenarioRun.Outcome o, Path dir) throws IOException {
        JsonNode sum = o.summary();
        JsonNode dg = sum.path("diagnostics");
        boolean fronts = !JobModel.isLinear(sum.path("model").asText());
        HtmlReport h = HtmlReport.create("littoral run: " + s.name());
        h.meta("scenario", s.source()).meta("model", sum.path("model").asText())
                .meta("grid", String.format(Locale.ROOT, "%d x %.3g km, %d levels to %.0f m", s.xGrid().nx(),
                        (s.xGrid().xM(1) - s.xGrid().xM(0)) / 1000.0, s.zGrid().size(), s.zGrid().topM()))
                .meta("clock", sum.path("clock").asText()).meta("written by", "littoral run");
        h.cautions();

        h.section("Scenario");
        h.paragraph(s.description());
        Map<String, Object> kv = new LinkedHashMap<>();
        kv.put("latitude", String.format(Locale.ROOT, "%.1f deg", s.coast().latitudeDeg()));
        kv.put("sea lies towards (bearing)", String.format(Locale.ROOT, "%.0f deg", s.coast().bearingLandToSeaDeg()));
        kv.put("ambient wind", String.format(Locale.ROOT, "%.1f m/s from %.0f deg (cross-shore %+.1f m/s, onshore +)",
                s.ambientWind().speedMPerS(), s.ambientWind().fromDeg(), s.ambientWind().crossShoreMPerS()));
        kv.put("sites", s.sites().size());
        h.keyValues(kv);

        h.section("Breeze diagnostics");
        h.paragraph((fronts ? "Times are the model front's (nonlinear model). " : "Linear theory has no front: every time "
                + "below is the onset of onshore flow. ") + "Definitions (summary.json, docs/fronts.md): "
                + dg.path("definitions").asText());
        Map<String, Object> d = new LinkedHashMap<>();
        JsonNode peak = dg.path("peak_onshore_wind");
        d.put("peak onshore breeze wind", peak.has("text") ? peak.path("text").asText()
                : String.format(Locale.ROOT, "%.1f m/s at %s, %.0f km inland", peak.path("breeze_m_per_s").asDouble(),
                        peak.path("time_local").asText(), peak.path("x_km").asDouble()));
        d.put(fronts ? "front onset at the coast" : "onset of onshore flow at the coast", timeText(dg.path("onshore_flow_onset_at_coast")));
        JsonNode pen = dg.path("max_inland_penetration");
        d.put("maximum inland penetration", penetrationText(pen));
        JsonNode circ = dg.path("circulation_at_peak");
        if (circ.has("onshore_layer_depth_m") && !circ.path("onshore_layer_depth_m").isNull()) {
            d.put("depth of the onshore flow at the peak", String.format(Locale.ROOT, "%.0f m (circulation %.0f m deep)",
                    circ.path("onshore_layer_depth_m").asDouble(), circ.path("circulation_depth_m").asDouble()));
        }
        h.keyValues(d);

        Table sites = Table.of("site", "km inland", fronts ? "front arrival" : "onset of onshore flow", "peak breeze wind (m/s)",
                "peak at");
        for (JsonNode site : dg.path("sites")) {
            sites.row(site.path("name").asText(), site.path("inland_km").asDouble(), timeText(site.path("onshore_arrival")),
                    site.path("peak_breeze_m_per_s").isNumber() ? site.path("peak_breeze_m_per_s").asDouble() : null,
                    site.path("peak_time_local").isTextual() ? site.path("peak_time_local").asText() : null);
        }
        h.table("At each site: " + (fronts ? "the front's arrival" : "the onset of onshore flow (linear: no front)") + " (local time, +/- its "
                + "uncertainty), and the largest breeze wind near the ground and when.", sites.decimals("km inland", 1)
                .decimals("peak breeze wind (m/s)", 1));
        if (dg.path("implied_speeds_between_sites").size() > 0) {
            Table sp = Table.of("from", "to", "implied speed");
            for (JsonNode v : dg.path("implied_speeds_between_sites")) {
                sp.row(v.path("from").asText(), v.path("to").asText(), v.path("speed_m_per_s").isNumber()
                        ? String.format(Locale.ROOT, "%.2f m/s", v.path("speed_m_per_s").asDouble()) : v.path("note").asText("not resolved"));
            }
            h.table("Speed implied by the arrivals at neighbouring sites: distance over time difference, only where the "
                    + "difference exceeds the arrivals' uncertainties.", sp);
        }

        h.section("Figures");
        for (Path f : o.files()) {
            String name = f.getFileName().toString();
            if (name.endsWith(".png") && Files.isRegularFile(f)) {
                byte[] png = Files.readAllBytes(f);
                h.figurePng(png, pngWidth(png), figureCaption(name, fronts));
            }
        }

        h.section("Files");
        Table files = Table.of("file", "what it holds");
        for (Path f : o.files()) {
            files.row(dir.relativize(f).toString(), fileText(f.getFileName().toString()));
        }
        files.row("report.html", "this report");
        h.table("What the run wrote to " + dir + ".", files);
        Path out = dir.resolve("report.html");
        h.write(out);
        return out;
    }

    static String timeText(JsonNode t) {
        if (t.path("time_local").isTextual()) {
            return t.path("time_local").asText() + (t.path("uncertainty_min").isNumber()
                    ? String.format(Locale.ROOT, " +/- %.0f min", t.path("uncertainty_min").asDouble()) : "");
        }
        return "none" + (t.path("note").isTextual() ? " (" + t.path("note").asText() + ")" : "");
    }

    static String penetrationText(JsonNode pen) {
        if (pen.path("text").isTextual()) {
            return pen.path("text").asText();
        }
        if (pen.path("km").isNumber()) {
            return String.format(Locale.ROOT, "%.0f km, at %s", pen.path("km").asDouble(), pen.path("time_local").asText("?"));
        }
        return "none" + (pen.path("note").isTextual() ? " (" + pen.path("note").asText() + ")" : "");
    }

    static String figureCaption(String name, boolean fronts) {
        if (name.equals("near_surface_breeze.png")) {
            return "Time-distance section of the near-surface cross-shore breeze wind (onshore positive, local time up), with "
                    + "the coast and the sites" + (fronts ? " and the front where it was found" : "") + ".";
        }
        if (name.startsWith("site_") && name.endsWith("_breeze.png")) {
            String site = name.substring(5, name.length() - "_breeze.png".length());
            return "Time-height section of the cross-shore breeze wind at " + site + " (onshore positive; bold line: the top "
                    + "of the onshore layer).";
        }
        return ReaderText.words(name.replace(".png", "")) + ".";
    }

    static String fileText(String name) {
        if (name.equals("summary.json")) {
            return "the diagnostics above with their definitions, the inputs with every default filled in, and the cautions";
        }
        if (name.equals("soundings.csv")) {
            return "synthetic soundings at the sites, binned like drone profiles (the analysis chain's binned CSV columns)";
        }
        if (name.equals("soundings.nc")) {
            return "the same soundings as a CF netCDF profile collection";
        }
        if (name.equals("fields.nc")) {
            return "the model fields on (time, height, distance) as CF netCDF";
        }
        if (name.equals("near_surface_breeze.csv")) {
            return "the near-surface time-distance section behind the figure (decimal local hours, km, m/s)";
        }
        if (name.endsWith(".png")) {
            return "figure (embedded above)";
        }
        return "";
    }

    /** Width in pixels from a PNG's IHDR chunk (bytes 16-19, big-endian). */
    static int pngWidth(byte[] png) {
        return ((png[16] & 0xff) << 24) | ((png[17] & 0xff) << 16) | ((png[18] & 0xff) << 8) | (png[19] & 0xff);
    }
}
