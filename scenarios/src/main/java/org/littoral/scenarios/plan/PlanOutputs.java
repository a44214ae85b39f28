package org.littoral.scenarios.plan;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;
import org.littoral.scenarios.output.AtomicFile;
import org.littoral.scenarios.output.Csv;
import org.littoral.scenarios.scenario.Scenario;

/** Writes a plan's tables (CSV, JSON) and prints its summary. */
public final class PlanOutputs {
    public static final String CAUTION = "The model is idealised: these are scenario comparisons, not a forecast, and must not be "
            + "used for aviation, marine or public-safety decisions. Drone operations are governed by local aviation rules "
            + "(altitude ceilings, airspace near airports, flying near convective storms) and licensed practice; where this plan "
            + "differs from them, those rules win.";

    /**
     * The ceiling caution shown beside the altitude ceiling. Our own wording of common practice: many aviation
     * authorities cap small uncrewed aircraft at about 120 m (400 ft) above ground unless the operator holds a
     * permission, and field teams stop flying when convection comes near.
     */
    public static String ceilingCaution(double ceilingM) {
        String over = ceilingM > 120.0
                ? String.format(Locale.ROOT, " This plan's profiles reach %.0f m, above that limit: fly them only with the permission your "
                        + "authority requires.", ceilingM)
                : "";
        return "Many jurisdictions limit small uncrewed aircraft to about 120 m (400 ft) above ground unless the operator holds a "
                + "permission or waiver; check the rule where you fly." + over + " Stop flights and land when convection is near "
                + "(towering cumulus, thunder or lightning, gust fronts, sudden wind shifts): a storm's outflow can arrive within minutes.";
    }

    private PlanOutputs() {
    }

    static void write(Path dir, PlanSpec plan, String model, Scenario base, PlanResult r, DenseWindow[][] windows, double wallSeconds,
                      org.littoral.scenarios.analysis.AnalysisSettings analysis) throws IOException {
        AtomicFile.write(dir.resolve("site-capture.csv"), siteCsv(r).getBytes(StandardCharsets.UTF_8));
        AtomicFile.write(dir.resolve("recommendations.csv"), recommendationsCsv(r, r.ranked.size()).getBytes(StandardCharsets.UTF_8));
        AtomicFile.write(dir.resolve("arrival-fan.csv"), fanCsv(r).getBytes(StandardCharsets.UTF_8));
        ObjectMapper json = new ObjectMapper();
        ObjectNode root = json.createObjectNode();
        root.put("plan", plan.ensemble().name());
        root.put("caution", CAUTION);
        root.put("ceiling_caution", ceilingCaution(plan.ceilingM()));
        root.set("analysis_settings", org.littoral.scenarios.analysis.SettingsFile.toJson(analysis));
        root.put("base_scenario", plan.ensemble().baseLabel());
        root.put("model", model.equals("scenario") ? base.kind().name().toLowerCase(Locale.ROOT) : model);
        root.put("members", r.members);
        root.put("failed_members", r.failedMembers);
        root.put("wall_seconds", Math.round(wallSeconds * 10) / 10.0);
        root.put("sites_per_set", plan.sitesPerSet());
        root.set("candidates_km", json.valueToTree(plan.candidatesKm()));
        root.put("operating_hours", clock(plan.operatingStartH()) + "-" + clock(plan.operatingEndH()));
        root.put("altitude_ceiling_m", plan.ceilingM());
        ObjectNode crit = root.putObject("criteria");
        crit.put("min_profiles_before", plan.criteria().minProfilesBefore());
        crit.put("min_profiles_after", plan.criteria().minProfilesAfter());
        crit.put("timing_tolerance_min", plan.criteria().timingToleranceH() * 60);
        crit.put("speed_tolerance_fraction", plan.criteria().speedRelativeTolerance());
        root.put("coast_has_bay", r.hasBay);
        root.put("score_definition", r.hasBay
                ? "0.5 P(speed resolved) + 0.3 P(passage captured at >= 1 site) + 0.2 P(bay and sea breeze separated)"
                : "0.6 P(speed resolved) + 0.4 P(passage captured at >= 1 site)");
        ArrayNode recs = root.putArray("recommendations");
        for (int i = 0; i < Math.min(plan.top(), r.ranked.size()); i++) {
            SiteSetScore s = r.ranked.get(i);
            ObjectNode o = recs.addObject();
            o.put("rank", i + 1);
            o.set("sites_km", json.valueToTree(s.distancesKm()));
            o.put("cadence", s.cadence());
            o.put("score", round(s.score()));
            o.set("p_captured_any", prop(json, s.anyCaptured()));
            o.set("p_speed_resolved", prop(json, s.speedResolved()));
            if (s.bayAndSeaSeparated() != null) {
                o.set("p_bay_sea_separated", prop(json, s.bayAndSeaSeparated()));
            }
            o.put("expected_sites_capturing", round(s.expectedSitesCaptured()));
            o.put("flights_per_day", s.flightsPerDay());
            ArrayNode dw = o.putArray("dense_windows");
            int c = cadenceIndex(plan, s.cadence());
            for (double d : s.distancesKm()) {
                int i2 = indexOf(plan.candidatesKm(), d);
                CadenceOption opt = plan.cadences().get(c);
                ObjectNode w = dw.addObject();
                w.put("site_km", d);
                if (!opt.hasDense()) {
                    w.put("window", "none (single cadence)");
                } else if (opt.autoWindow()) {
                    DenseWindow win = windows[c][i2];
                    w.put("window", win == null || !win.exists() ? "none (no arrival in the pilot members)"
                            : clock(win.startClockH()) + "-" + clock(win.endClockH()));
                } else {
                    w.put("window", clock(opt.denseStartH()) + "-" + clock(opt.denseEndH()));
                }
            }
        }
        root.set("notes", json.valueToTree(r.notes));
        root.set("files", json.valueToTree(List.of("site-capture.csv", "recommendations.csv", "arrival-fan.csv", "members/")));
        AtomicFile.write(dir.resolve("plan.json"), json.writerWithDefaultPrettyPrinter().writeValueAsBytes(root));
        PlanReport.write(dir, plan, model.equals("scenario") ? base.kind().name().toLowerCase(Locale.ROOT) : model, r, windows);
    }

    static void printSummary(PlanSpec plan, PlanResult r, PrintStream out) {
        out.println("Plan " + plan.ensemble().name() + ": " + r.members + " members, " + plan.candidatesKm().length
                + " candidate distances, " + plan.sitesPerSet() + " sites per set");
        out.println("rank  sites (km)          cadence                               score  P(capture)  P(speed)" + (r.hasBay ? "  P(bay/sea)" : "")
                + "  flights/day");
        for (int i = 0; i < Math.min(plan.top(), r.ranked.size()); i++) {
            SiteSetScore s = r.ranked.get(i);
            out.printf(Locale.ROOT, "%4d  %-18s  %-36s  %5.2f  %10s  %8s%s  %11d%n", i + 1,
                    s.distancesKm().stream().map(d -> String.format(Locale.ROOT, "%.1f", d)).collect(Collectors.joining(", ")),
                    s.cadence(), s.score(), pct(s.anyCaptured()), pct(s.speedResolved()),
                    r.hasBay ? String.format(Locale.ROOT, "  %10s", pct(s.bayAndSeaSeparated())) : "", s.flightsPerDay());
        }
        for (String n : r.notes) {
            out.println("note: " + n);
        }
        out.println("CAUTION: " + CAUTION);
        out.println("CAUTION (altitude ceiling " + Math.round(plan.ceilingM()) + " m): " + ceilingCaution(plan.ceilingM()));
    }

    static String siteCsv(PlanResult r) {
        StringBuilder sb = new StringBuilder("distance_km,cadence,p_front_arrives,arrival_p10_local_h,arrival_median_local_h,"
                + "arrival_p90_local_h,p_captured,p_captured_low95,p_captured_high95,mean_flights_per_day,feasible,"
                + "dense_window_start_local_h,dense_window_end_local_h\n");
        for (PlanResult.SiteRow s : r.sites) {
            sb.append(String.format(Locale.ROOT, "%.3f,%s,%.4f,%s,%s,%s,%.4f,%.4f,%.4f,%.1f,%s,%s,%s%n", s.distanceKm(), Csv.field(s.cadence()),
                    s.frontArrives().estimate(), num(s.arrivalP10H()), num(s.arrivalMedianH()), num(s.arrivalP90H()),
                    s.captured().estimate(), s.captured().lower(), s.captured().upper(), s.meanFlights(), s.feasible(),
                    num(s.denseStartH()), num(s.denseEndH())));
        }
        return sb.toString();
    }

    static String recommendationsCsv(PlanResult r, int n) {
        StringBuilder sb = new StringBuilder("rank,sites_km,cadence,score,p_captured_any,p_captured_any_low95,p_captured_any_high95,"
                + "p_speed_resolved,p_speed_low95,p_speed_high95,p_bay_sea_separated,expected_sites_capturing,flights_per_day\n");
        for (int i = 0; i < Math.min(n, r.ranked.size()); i++) {
            SiteSetScore s = r.ranked.get(i);
            sb.append(String.format(Locale.ROOT, "%d,\"%s\",%s,%.4f,%.4f,%.4f,%.4f,%.4f,%.4f,%.4f,%s,%.3f,%d%n", i + 1,
                    s.distancesKm().stream().map(d -> String.format(Locale.ROOT, "%.2f", d)).collect(Collectors.joining(";")),
                    Csv.field(s.cadence()), s.score(), s.anyCaptured().estimate(), s.anyCaptured().lower(), s.anyCaptured().upper(),
                    s.speedResolved().estimate(), s.speedResolved().lower(), s.speedResolved().upper(),
                    s.bayAndSeaSeparated() == null ? "" : String.format(Locale.ROOT, "%.4f", s.bayAndSeaSeparated().estimate()),
                    s.expectedSitesCaptured(), s.flightsPerDay()));
        }
        return sb.toString();
    }

    static String fanCsv(PlanResult r) {
        StringBuilder sb = new StringBuilder("distance_km,fraction_of_members_with_arrival,arrival_p5_local_h,arrival_p25_local_h,"
                + "arrival_p50_local_h,arrival_p75_local_h,arrival_p95_local_h\n");
        for (PlanResult.FanRow f : r.fan) {
            sb.append(String.format(Locale.ROOT, "%.3f,%.4f,%s,%s,%s,%s,%s%n", f.distanceKm(), f.fractionArriving(), num(f.p5()),
                    num(f.p25()), num(f.p50()), num(f.p75()), num(f.p95())));
        }
        return sb.toString();
    }

    private static ObjectNode prop(ObjectMapper json, Proportion p) {
        ObjectNode o = json.createObjectNode();
        o.put("estimate", round(p.estimate()));
        o.put("low95", round(p.lower()));
        o.put("high95", round(p.upper()));
        o.put("members", p.trials());
        return o;
    }

    static int cadenceIndex(PlanSpec plan, String name) {
        for (int c = 0; c < plan.cadences().size(); c++) {
            if (plan.cadences().get(c).name().equals(name)) {
                return c;
            }
        }
        return 0;
    }

    static int indexOf(double[] a, double v) {
        for (int i = 0; i < a.length; i++) {
            if (a[i] == v) {
                return i;
            }
        }
        return 0;
    }

    static String pct(Proportion p) {
        return p == null ? "-" : String.format(Locale.ROOT, "%.0f%%", 100 * p.estimate());
    }

    static String clock(double h) {
        if (Double.isNaN(h)) {
            return "-";
        }
        long m = Math.round(h * 60);
        return String.format(Locale.ROOT, "%02d:%02d", m / 60, m % 60);
    }

    private static double round(double v) {
        return Math.round(v * 1e4) / 1e4;
    }

    private static String num(double v) {
        return Double.isNaN(v) ? "" : String.format(Locale.ROOT, "%.4f", v);
    }


}
