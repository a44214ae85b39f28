package org.littoral.scenarios.report;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Map;
import org.littoral.scenarios.output.AtomicFile;

/**
 * A self-contained HTML report: one file, inline CSS, figures embedded as base64 PNG, no scripts and
 * no external resources. Sections are numbered and listed in a table of contents; figures and
 * tables are numbered with captions. All text is HTML-escaped.
 *
 * <pre>
 * HtmlReport.create("Scenario comparison: offshore vs onshore ambient wind")
 *     .meta("Scenario file", "scenarios/offshore.yaml")
 *     .cautions()                                  // the standard cautions, always near the top
 *     .section("Front arrival")
 *     .paragraph("Arrival times at the three sites ...")
 *     .figure(fanChart, "Front arrival time against distance inland.")
 *     .table("Arrival per site.", table)
 *     .write(Path.of("out/report.html"));
 * </pre>
 */
public final class HtmlReport {
    /** Standard caution: the model is idealised. Our own wording of the product brief's requirement. */
    public static final String CAUTION_MODEL = "littoral is an idealised model of a coastal circulation. It "
            + "solves simplified equations for an idealised coast and is meant for comparing scenarios and "
            + "planning field work. Its output is not a weather forecast and must not be used to make "
            + "aviation, marine or public-safety decisions.";
    /** Standard caution for drone operations. */
    public static final String CAUTION_DRONES = "Drone flights are governed by the aviation rules where you fly: "
            + "altitude ceilings, airspace near airports and flying near convective storms are matters for those "
            + "rules and the authorities that set them. Any flight schedule or site choice suggested here is "
            + "advice for planning only and always gives way to them.";

    private final String title;
    private final List<String[]> meta = new ArrayList<>();
    private final List<Block> blocks = new ArrayList<>();
    private int sections;
    private int figures;
    private int tables;

    private HtmlReport(String title) {
        this.title = title == null ? "" : title;
    }

    public static HtmlReport create(String title) {
        return new HtmlReport(title);
    }

    private interface Block {
        void render(StringBuilder sb);
    }

    /** A line in the header's key-value list (scenario file, version, date). */
    public HtmlReport meta(String key, String value) {
        meta.add(new String[] {key, value});
        return this;
    }

    /** Starts a numbered section (listed in the table of contents). */
    public HtmlReport section(String heading) {
        int n = ++sections;
        blocks.add(new SectionBlock(n, heading));
        return this;
    }

    /** A sub-heading inside the current section (not numbered, not in the contents). */
    public HtmlReport subsection(String heading) {
        blocks.add(sb -> sb.append("<h3>").append(escape(heading)).append("</h3>\n"));
        return this;
    }

    /** A paragraph of plain text (escaped; blank lines split paragraphs). */
    public HtmlReport paragraph(String text) {
        for (String para : text.split("\\n\\s*\\n")) {
            String p = para.strip();
            if (!p.isEmpty()) {
                blocks.add(sb -> sb.append("<p>").append(escape(p)).append("</p>\n"));
            }
        }
        return this;
    }

    /** A bulleted list of plain-text items. */
    public HtmlReport bullets(List<String> items) {
        blocks.add(sb -> {
            sb.append("<ul>\n");
            for (String i : items) {
                sb.append("<li>").append(escape(i)).append("</li>\n");
            }
            sb.append("</ul>\n");
        });
        return this;
    }

    /** Preformatted text (logs, a scenario file). */
    public HtmlReport preformatted(String text) {
        blocks.add(sb -> sb.append("<pre>").append(escape(text)).append("</pre>\n"));
        return this;
    }

    /** A two-column key-value table without a number. */
    public HtmlReport keyValues(Map<String, ?> entries) {
        blocks.add(sb -> {
            sb.append("<table class=\"kv\">\n");
            for (Map.Entry<String, ?> e : entries.entrySet()) {
                Object v = e.getValue();
                String text = v instanceof Double || v instanceof Float
                        ? Table.displayText(v, decimalsFor(((Number) v).doubleValue())) : Table.displayText(v, 0);
                sb.append("<tr><th>").append(escape(e.getKey())).append("</th><td>").append(escape(text))
                        .append("</td></tr>\n");
            }
            sb.append("</table>\n");
        });
        return this;
    }

    private static int decimalsFor(double x) {
        if (!Double.isFinite(x) || x == 0 || x == Math.rint(x)) {
            return 0;
        }
        return Math.max(0, Math.min(4, 3 - (int) Math.floor(Math.log10(Math.abs(x)))));
    }

    /** A numbered table with a caption; numbers formatted per column, right-aligned. */
    public HtmlReport table(String caption, Table t) {
        int n = ++tables;
        blocks.add(sb -> {
            // the caption sits above the scrolling box, so a wide table never pushes it out of view; long cells wrap
            sb.append("<p class=\"tcaption\" id=\"table-").append(n).append("\"><b>Table ").append(n).append(".</b> ")
                    .append(escape(caption)).append("</p>\n<div class=\"tablewrap\"><table class=\"data\">\n<thead><tr>");
            int nc = t.columns().size();
            boolean[] numeric = new boolean[nc];
            int[] dec = new int[nc];
            for (int j = 0; j < nc; j++) {
                numeric[j] = true;
                for (List<Object> r : t.rows()) {
                    Object v = r.get(j);
                    numeric[j] &= v == null || v instanceof Number;
                }
                dec[j] = t.displayDecimals(j);
                sb.append(numeric[j] ? "<th class=\"num\">" : "<th>").append(escape(t.columns().get(j)))
                        .append("</th>");
            }
            sb.append("</tr></thead>\n<tbody>\n");
            for (List<Object> r : t.rows()) {
                sb.append("<tr>");
                for (int j = 0; j < nc; j++) {
                    sb.append(numeric[j] ? "<td class=\"num\">" : "<td>")
                            .append(escape(Table.displayText(r.get(j), dec[j]))).append("</td>");
                }
                sb.append("</tr>\n");
            }
            sb.append("</tbody>\n</table></div>\n");
        });
        return this;
    }

    /** A numbered figure, embedded as a base64 PNG data URI, with its caption. */
    public HtmlReport figure(Figure f, String caption) {
        return figurePng(f.toPngBytes(), f.widthPx(), caption);
    }

    /** A numbered figure from PNG bytes already rendered. */
    public HtmlReport figurePng(byte[] png, int widthPx, String caption) {
        int n = ++figures;
        String b64 = Base64.getEncoder().encodeToString(png);
        blocks.add(sb -> sb.append("<figure id=\"fig-").append(n).append("\">\n<img src=\"data:image/png;base64,")
                .append(b64).append("\" alt=\"Figure ").append(n).append(": ").append(escapeAttr(caption))
                .append("\" style=\"max-width:").append(widthPx).append("px\">\n<figcaption><b>Figure ").append(n)
                .append(".</b> ").append(escape(caption)).append("</figcaption>\n</figure>\n"));
        return this;
    }

    /** A caution box (amber) with a short bold heading. */
    public HtmlReport caution(String heading, String text) {
        blocks.add(sb -> sb.append("<div class=\"caution\"><b>").append(escape(heading)).append("</b> ")
                .append(escape(text)).append("</div>\n"));
        return this;
    }

    /** The standard cautions every littoral report carries: idealised model; drone rules. */
    public HtmlReport cautions() {
        caution("Idealised model, not a forecast.", CAUTION_MODEL);
        caution("Drone operations follow local aviation rules.", CAUTION_DRONES);
        return this;
    }

    public int figureCount() {
        return figures;
    }

    public int tableCount() {
        return tables;
    }

    /** The whole document. */
    public String toHtml() {
        StringBuilder body = new StringBuilder();
        for (Block b : blocks) {
            b.render(body);
        }
        StringBuilder sb = new StringBuilder(body.length() + 4096);
        sb.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n<title>")
                .append(escape(title)).append("</title>\n<style>\n").append(CSS).append("</style>\n</head>\n<body>\n")
                .append("<header>\n<h1>").append(escape(title)).append("</h1>\n");
        if (!meta.isEmpty()) {
            sb.append("<dl class=\"meta\">\n");
            for (String[] m : meta) {
                sb.append("<dt>").append(escape(m[0])).append("</dt><dd>").append(escape(m[1])).append("</dd>\n");
            }
            sb.append("</dl>\n");
        }
        sb.append("</header>\n");
        if (sections > 0) {
            sb.append("<nav class=\"toc\"><h2>Contents</h2>\n<ol>\n");
            for (Block b : blocks) {
                if (b instanceof SectionBlock) {
                    SectionBlock s = (SectionBlock) b;
                    sb.append("<li><a href=\"#sec-").append(s.n).append("\">").append(escape(s.heading))
                            .append("</a></li>\n");
                }
            }
            sb.append("</ol>\n</nav>\n");
        }
        sb.append("<main>\n");
        boolean open = false;
        StringBuilder part = new StringBuilder();
        for (Block b : blocks) {
            if (b instanceof SectionBlock) {
                if (open) {
                    sb.append("</section>\n");
                }
                open = true;
            }
            part.setLength(0);
            b.render(part);
            sb.append(part);
        }
        if (open) {
            sb.append("</section>\n");
        }
        sb.append("</main>\n<footer>Written by littoral, an idealised coastal-circulation simulator for scenario "
                + "comparison.</footer>\n</body>\n</html>\n");
        return sb.toString();
    }

    /** Writes the document atomically (UTF-8). */
    public void write(Path target) throws IOException {
        AtomicFile.writeString(target, toHtml());
    }

    private static final class SectionBlock implements Block {
        final int n;
        final String heading;

        SectionBlock(int n, String heading) {
            this.n = n;
            this.heading = heading;
        }

        @Override
        public void render(StringBuilder sb) {
            sb.append("<section id=\"sec-").append(n).append("\">\n<h2>").append(n).append(". ")
                    .append(escape(heading)).append("</h2>\n");
        }
    }

    /** Escapes text for HTML element content and attribute values. */
    public static String escape(String s) {
        if (s == null) {
            return "";
        }
        StringBuilder sb = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&':
                    sb.append("&amp;");
                    break;
                case '<':
                    sb.append("&lt;");
                    break;
                case '>':
                    sb.append("&gt;");
                    break;
                case '"':
                    sb.append("&quot;");
                    break;
                case '\'':
                    sb.append("&#39;");
                    break;
                default:
                    sb.append(c);
            }
        }
        return sb.toString();
    }

    private static String escapeAttr(String s) {
        return escape(s).replace("\n", " ");
    }

    private static final String CSS = String.join("\n",
            "body{font-family:'DejaVu Sans',Verdana,Helvetica,Arial,sans-serif;color:#222;background:#fff;",
            "  max-width:960px;margin:0 auto;padding:24px 28px 48px;line-height:1.5;font-size:15px}",
            "h1{font-size:26px;margin:0 0 8px;line-height:1.25}",
            "h2{font-size:20px;margin:32px 0 10px;padding-bottom:4px;border-bottom:1px solid #ddd}",
            "header{margin-bottom:12px}",
            "dl.meta{display:grid;grid-template-columns:max-content 1fr;gap:2px 14px;margin:8px 0;font-size:14px;color:#444}",
            "dl.meta dt{font-weight:bold}dl.meta dd{margin:0}",
            "nav.toc{background:#f6f7f9;border:1px solid #e1e4e8;border-radius:4px;padding:6px 18px;margin:16px 0}",
            "nav.toc h2{font-size:16px;border:none;margin:8px 0 4px}nav.toc ol{margin:4px 0 8px;padding-left:22px}",
            "a{color:#0b5cad;text-decoration:none}a:hover{text-decoration:underline}",
            ".caution{background:#fff8e6;border-left:5px solid #d99a00;padding:10px 14px;margin:12px 0;font-size:14px}",
            "figure{margin:18px 0 24px}figure img{width:100%;height:auto;border:1px solid #eee;display:block}",
            "figcaption{font-size:14px;color:#333;margin-top:6px}",
            "table{border-collapse:collapse;margin:4px 0 22px;font-size:14px}",
            ".tablewrap{overflow-x:auto;max-width:100%}",
            "p.tcaption{font-size:14px;margin:18px 0 4px}",
            "table.data td{max-width:28em;overflow-wrap:break-word;vertical-align:top}",
            "table.data th{vertical-align:bottom}",
            "table.data th{background:#f0f2f5;border-bottom:2px solid #ccc;padding:5px 10px;text-align:left}",
            "table.data td{border-bottom:1px solid #e6e6e6;padding:4px 10px}",
            "table.data tbody tr:nth-child(even){background:#fafbfc}",
            ".num{text-align:right;font-variant-numeric:tabular-nums}",
            "table.kv th{text-align:left;padding:3px 14px 3px 0;font-weight:bold;vertical-align:top}",
            "table.kv td{padding:3px 0}",
            "pre{background:#f6f7f9;border:1px solid #e1e4e8;padding:10px;overflow:auto;font-size:13px}",
            "footer{margin-top:40px;font-size:12px;color:#777;border-top:1px solid #eee;padding-top:8px}",
            "");
}
