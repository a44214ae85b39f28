package org.littoral.scenarios.sensitivity;

import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.littoral.scenarios.report.Figure;
import org.littoral.scenarios.report.FigureGrid;
import org.littoral.scenarios.report.HtmlReport;
import org.littoral.scenarios.report.IndexBarFigure;
import org.littoral.scenarios.report.Table;
import org.littoral.scenarios.report.TableWriter;
import org.littoral.scenarios.sweep.Member;

/** Writes what {@code littoral influence} produces: indices.csv, outcomes.csv, influence.json, the figure, report.html. */
public final class InfluenceOutputs {
    public static final String FIGURE = "indices-by-site.png";

    /** Paths written. */
    public record Written(Path indicesCsv, Path outcomesCsv, Path json, Path figure, Path report) {
    }

    private InfluenceOutputs() {
    }

    public static Written write(Path dir, InfluenceStudy.Result r, InfluenceStudy.Settings s) throws IOException {
        Table idx = indicesTable(r);
        Path csv = dir.resolve("indices.csv");
        TableWriter.writeCsv(idx, csv);
        Path outcomes = dir.resolve("outcomes.csv");
        TableWriter.writeCsv(outcomesTable(r), outcomes);
        Path json = dir.resolve("influence.json");
        TableWriter.writeJsonValue(summary(r, s, idx), json);
        Figure fig = figure(r);
        Path png = dir.resolve(FIGURE);
        fig.writePng(png);
        Path html = dir.resolve("report.html");
        report(r, s, fig).write(html);
        return new Written(csv, outcomes, json, png, html);
    }

    /** One row per output and input. */
    public static Table indicesTable(InfluenceStudy.Result r) {
        Table t = Table.of("output", "site", "input", "key_path", "first_order", "first_order_low", "first_order_high", "total",
                "total_low", "total_high", "rows_used", "output_mean", "output_variance", "fraction_arrived");
        for (InfluenceStudy.OutputIndices o : r.outputs()) {
            for (int i = 0; i < r.inputs().size(); i++) {
                SobolIndices.Index x = o.indices().indices()[i];
                t.row(o.key(), o.site(), r.inputs().get(i).name(), r.inputs().get(i).path().toString(), x.first(), x.firstLow(),
                        x.firstHigh(), x.total(), x.totalLow(), x.totalHigh(), o.indices().rowsUsed(), o.indices().mean(),
                        o.indices().variance(), Double.isFinite(o.fraction()) ? o.fraction() : null);
            }
        }
        for (String c : List.of("first_order", "first_order_low", "first_order_high", "total", "total_low", "total_high",
                "fraction_arrived")) {
            t.decimals(c, 3);
        }
        return t.decimals("output_mean", 4).decimals("output_variance", 5);
    }

    /** One row per member: block of the design, its inputs and its outputs. */
    static Table outcomesTable(InfluenceStudy.Result r) {
        List<String> cols = new ArrayList<>(List.of("member", "block", "row"));
        for (InfluenceStudy.Input in : r.inputs()) {
            cols.add(in.path().toString());
        }
        cols.addAll(r.valueKeys());
        Table t = Table.of(cols);
        int n = r.design().n();
        for (Member m : r.members()) {
            List<Object> row = new ArrayList<>();
            int block = m.index() / n;
            row.add(m.id());
            row.add(block == 0 ? "A" : block == 1 ? "B" : "A_B(" + r.inputs().get(block - 2).name() + ")");
            row.add(m.index() % n);
            for (int i = 0; i < r.inputs().size(); i++) {
                var v = m.settings().get(i).value().value();
                row.add(v.isNumber() ? (Object) v.asDouble() : m.settings().get(i).value().label());
            }
            for (int k = 0; k < r.valueKeys().size(); k++) {
                double v = r.values()[k][m.index()];
                row.add(Double.isFinite(v) ? v : null);
            }
            t.row(row.toArray());
        }
        return t;
    }

    private static ObjectNode summary(InfluenceStudy.Result r, InfluenceStudy.Settings s, Table idx) {
        ObjectNode o = JsonNodeFactory.instance.objectNode();
        o.put("day_file", r.spec().source());
        o.put("date", r.spec().date());
        o.put("model", r.model());
        ObjectNode d = o.putObject("design");
        d.put("points", s.points().name().toLowerCase(Locale.ROOT));
        d.put("rows_N", s.rows());
        d.put("inputs_k", r.inputs().size());
        d.put("members", r.members().size());
        d.put("seed", s.seed());
        d.put("bootstrap_resamples", s.resamples());
        d.put("confidence_level", s.level());
        d.put("estimators", "first-order: Saltelli et al. (2010) Table 2 (b); total: Jansen (1999); V(Y) from f(A) and f(B)");
        d.put("no_arrival", "arrival censored: the end of the output window when the front never reaches the site, the first "
                + "output time when it is already there; 'arrives' outputs give the indices of the arrival indicator");
        ArrayNode in = o.putArray("inputs");
        for (InfluenceStudy.Input x : r.inputs()) {
            in.addObject().put("name", x.name()).put("key_path", x.path().toString()).put("distribution", x.distribution().toString());
        }
        o.set("indices", TableWriter.toJsonNode(idx));
        o.put("failed_members", r.outcome().failed());
        o.put("wall_seconds", Math.round(r.wallSeconds() * 10) / 10.0);
        ArrayNode notes = o.putArray("notes");
        r.notes().forEach(notes::add);
        o.put("caution", HtmlReport.CAUTION_MODEL);
        return o;
    }

    /** One panel per output: the arrival at every site first, then penetration, the arrival indicators, the changes. */
    public static Figure figure(InfluenceStudy.Result r) {
        List<Figure> panels = new ArrayList<>();
        List<String> names = new ArrayList<>();
        r.inputs().forEach(i -> names.add(i.name()));
        for (InfluenceStudy.OutputIndices o : ordered(r)) {
            int k = names.size();
            double[][] f = new double[k][];
            double[][] t = new double[k][];
            for (int i = 0; i < k; i++) {
                SobolIndices.Index x = o.indices().indices()[i];
                f[i] = new double[] {x.first(), x.firstLow(), x.firstHigh()};
                t[i] = new double[] {x.total(), x.totalLow(), x.totalHigh()};
            }
            String note = String.format(Locale.ROOT, "%d of %d rows used%s", o.indices().rowsUsed(), r.design().n(),
                    Double.isFinite(o.fraction()) && o.key().startsWith("arrival") ? String.format(Locale.ROOT,
                            "; front arrives in %.0f %% of members", 100 * o.fraction()) : "");
            panels.add(new IndexBarFigure(760, 120 + 46 * k, o.label(), names, f, t, note));
        }
        if (panels.isEmpty()) {
            throw new IllegalStateException("no output varies");
        }
        return FigureGrid.of("Which input controls what (" + r.spec().date() + ", " + r.model() + " model)", panels, 2);
    }

    static List<InfluenceStudy.OutputIndices> ordered(InfluenceStudy.Result r) {
        List<InfluenceStudy.OutputIndices> out = new ArrayList<>();
        for (String prefix : List.of("arrival:", "penetration", "arrives:", "theta_v_change:")) {
            for (InfluenceStudy.OutputIndices o : r.outputs()) {
                if (o.key().startsWith(prefix)) {
                    out.add(o);
                }
            }
        }
        return out;
    }

    private static HtmlReport report(InfluenceStudy.Result r, InfluenceStudy.Settings s, Figure fig) {
        HtmlReport h = HtmlReport.create("Which input controls the breeze: " + r.spec().date());
        h.meta("Day file", r.spec().source()).meta("Model", r.model() + ", " + r.members().size() + " members")
                .meta("Generated by", "littoral influence");
        h.cautions();
        h.section("Indices");
        h.paragraph(headline(r));
        h.figure(fig, "Sobol' indices of each output: the first-order index S_i is the share of the output's variance that "
                + "input i explains on its own; the total index S_Ti adds every interaction it takes part in. Whiskers: "
                + Math.round(100 * s.level()) + " % bootstrap intervals over the " + s.rows() + " rows (" + s.resamples()
                + " resamples). An input whose total index is near zero can be fixed anywhere in its range.");
        Table view = Table.of("output", "input", "S_i", "S_i interval", "S_Ti", "S_Ti interval", "rows used");
        for (InfluenceStudy.OutputIndices o : ordered(r)) {
            for (int i = 0; i < r.inputs().size(); i++) {
                SobolIndices.Index x = o.indices().indices()[i];
                view.row(o.label(), r.inputs().get(i).name(), x.first(), interval(x.firstLow(), x.firstHigh()), x.total(),
                        interval(x.totalLow(), x.totalHigh()), o.indices().rowsUsed());
            }
        }
        h.table("Indices with their " + Math.round(100 * s.level()) + " % bootstrap intervals (also in indices.csv).",
                view.decimals("S_i", 3).decimals("S_Ti", 3));
        h.section("How the study was made");
        Map<String, Object> kv = new LinkedHashMap<>();
        kv.put("design", (s.points() == SampleDesign.Points.SOBOL ? "Sobol' sequence" : "seeded random points (seed " + s.seed()
                + ")") + ", N = " + s.rows() + " rows of A and B, k = " + r.inputs().size() + " inputs: N (k + 2) = "
                + r.members().size() + " members");
        kv.put("estimators", "first-order: Saltelli et al. (2010), Table 2 (b); total: Jansen (1999); bootstrap over rows");
        kv.put("members without an arrival", "arrival censored at the end of the output window (never arrives) or at its "
                + "first time (already there); the 'whether it reaches' outputs are the indices of the arrival indicator");
        kv.put("post-passage change", "near-surface theta-v " + OutcomeMemberRunner.POST_PASSAGE_H + " h after the arrival "
                + "minus at the arrival, only over rows whose front arrives in every block");
        kv.put("wall time", String.format(Locale.ROOT, "%.1f s (%d run now, %d reused)", r.wallSeconds(), r.outcome().ran(),
                r.outcome().skipped()));
        h.keyValues(kv);
        h.subsection("Uncertain inputs (the day file's ensemble distributions)");
        h.bullets(r.spec().describedDraws());
        if (!r.notes().isEmpty()) {
            h.section("Notes");
            h.bullets(r.notes());
        }
        return h;
    }

    private static String interval(double a, double b) {
        return Double.isFinite(a) ? String.format(Locale.ROOT, "%.3f to %.3f", a, b) : null;
    }

    /** One sentence per site: the input with the largest total index of its arrival. */
    static String headline(InfluenceStudy.Result r) {
        List<String> parts = new ArrayList<>();
        for (InfluenceStudy.OutputIndices o : r.outputs()) {
            if (!o.key().startsWith("arrival:")) {
                continue;
            }
            int best = dominant(o);
            if (best < 0) {
                parts.add("the arrival at " + o.site() + " does not vary");
                continue;
            }
            SobolIndices.Index x = o.indices().indices()[best];
            parts.add(String.format(Locale.ROOT, "at %s the %s controls the arrival most (S_T = %.2f, S = %.2f)", o.site(),
                    r.inputs().get(best).name(), x.total(), x.first()));
        }
        return parts.isEmpty() ? "No output varies." : capitalise(String.join("; ", parts)) + ".";
    }

    /** The input with the largest total index, or -1. */
    public static int dominant(InfluenceStudy.OutputIndices o) {
        int best = -1;
        double v = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < o.indices().indices().length; i++) {
            double t = o.indices().indices()[i].total();
            if (Double.isFinite(t) && t > v) {
                v = t;
                best = i;
            }
        }
        return best;
    }

    private static String capitalise(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
