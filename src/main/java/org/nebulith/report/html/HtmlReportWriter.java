package org.nebulith.report.html;

import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.util.Base64;
import java.util.List;
import java.util.Locale;
import java.util.Map;

import org.nebulith.files.CellText;
import org.nebulith.files.RunInputs;
import org.nebulith.files.Table;
import org.nebulith.report.chart.ChartFormat;

/**
 * Writes a {@link Report} as one self-contained HTML5 file: the CSS is inline, charts are
 * embedded as base64 PNG (the SVG and PDF files of the run are linked by relative name), there
 * is no script and nothing is fetched: a Content-Security-Policy forbids every network load.
 */
public final class HtmlReportWriter {

    private static final DateTimeFormatter UTC =
            DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm:ss 'UTC'", Locale.ROOT).withZone(ZoneOffset.UTC);

    private static final String CSS = String.join("\n",
            "body{font-family:'DejaVu Sans',Helvetica,Arial,sans-serif;max-width:60rem;margin:2rem auto;"
                    + "padding:0 1rem;color:#222;line-height:1.45}",
            "h1{font-size:1.6rem;margin-bottom:.2rem}h2{font-size:1.2rem;border-bottom:1px solid #ccc;"
                    + "padding-bottom:.2rem;margin-top:2rem}",
            ".meta{color:#555;font-size:.9rem}",
            ".scroll{overflow-x:auto;max-width:100%}",
            "table{border-collapse:collapse;margin:.5rem 0 1rem;font-size:.85rem}",
            "th.sortable{cursor:pointer}th.sortable:after{content:' \\2195';color:#999;font-size:.75em}",
            "td{overflow-wrap:anywhere}",
            "p,li,figcaption{overflow-wrap:anywhere}",
            "th,td{border:1px solid #ccc;padding:.2rem .5rem;text-align:left;vertical-align:top}",
            "th{background:#f0f0f0}td.num{text-align:right;font-variant-numeric:tabular-nums}",
            "caption{caption-side:top;text-align:left;font-weight:bold;padding:.2rem 0}",
            "figure{margin:1rem 0}figure img{max-width:100%;height:auto;border:1px solid #eee}",
            "figcaption{font-size:.85rem;color:#444}",
            ".cautions li{margin:.3rem 0}.cautions{background:#fff8e6;border-left:4px solid #E69F00;"
                    + "padding:.5rem 1rem .5rem 2rem}",
            "code{font-size:.85rem}");

    private HtmlReportWriter() {
    }

    /**
     * @param report the report
     * @return the HTML document
     */
    public static String write(final Report report) {
        StringBuilder h = new StringBuilder(1 << 16);
        h.append("<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n")
                .append("<meta http-equiv=\"Content-Security-Policy\" content=\"default-src 'none'; "
                        + "img-src data:; style-src 'unsafe-inline'; script-src '" + TableSort.CSP_HASH + "'\">\n")
                .append("<meta name=\"viewport\" content=\"width=device-width, initial-scale=1\">\n")
                .append("<meta name=\"generator\" content=\"nebulith ").append(Html.escape(report.toolVersion()))
                .append("\">\n<title>").append(Html.escape(report.title())).append("</title>\n<style>\n")
                .append(CSS).append("\n</style>\n</head>\n<body>\n");
        h.append("<h1>").append(Html.escape(report.title())).append("</h1>\n");
        h.append("<p class=\"meta\">").append(Html.escape(metaLine(report))).append("</p>\n");
        if (!report.cautions().isEmpty()) {
            h.append("<h2 id=\"cautions\">Assumptions and cautions</h2>\n<ul class=\"cautions\">\n");
            for (String c : report.cautions()) {
                h.append("<li>").append(Html.escape(c)).append("</li>\n");
            }
            h.append("</ul>\n");
        }
        for (Report.Section s : report.sections()) {
            section(h, s);
        }
        runDetails(h, report);
        h.append("<script>").append(TableSort.SCRIPT).append("</script>\n");
        h.append("</body>\n</html>\n");
        return h.toString();
    }

    /**
     * @param report the report
     * @return "nebulith VERSION · command · started … · run time …"
     */
    static String metaLine(final Report report) {
        return "nebulith " + report.toolVersion() + " \u00b7 " + report.command() + " \u00b7 started "
                + UTC.format(report.started()) + " \u00b7 run time "
                + String.format(Locale.ROOT, "%.1f s", report.runTime().toMillis() / 1000.0);
    }

    private static void section(final StringBuilder h, final Report.Section s) {
        h.append("<h2>").append(Html.escape(s.title())).append("</h2>\n");
        for (Report.Block b : s.blocks()) {
            if (b instanceof Report.Paragraph) {
                h.append("<p>").append(Html.escape(((Report.Paragraph) b).text())).append("</p>\n");
            } else if (b instanceof Report.TableBlock) {
                Report.TableBlock t = (Report.TableBlock) b;
                table(h, t.table(), t.caption());
            } else {
                chart(h, (Report.ChartBlock) b);
            }
        }
    }

    private static void chart(final StringBuilder h, final Report.ChartBlock c) {
        String name = c.chart().baseName();
        h.append("<figure>\n<img alt=\"").append(Html.escape(c.caption())).append("\" src=\"data:image/png;base64,")
                .append(Base64.getEncoder().encodeToString(c.chart().png())).append("\">\n<figcaption>")
                .append(Html.escape(c.caption()));
        Map<ChartFormat, java.nio.file.Path> files = c.chart().files();
        StringBuilder links = new StringBuilder();
        for (ChartFormat f : new ChartFormat[] {ChartFormat.SVG, ChartFormat.PDF, ChartFormat.PNG}) {
            if (files.containsKey(f)) {
                String file = name + "." + f.extension();
                links.append(links.length() == 0 ? "" : ", ").append("<a href=\"").append(Html.escape(file))
                        .append("\">").append(f.name()).append("</a>");
            }
        }
        if (links.length() > 0) {
            h.append(" (").append(links).append(")");
        }
        h.append("</figcaption>\n</figure>\n");
    }

    /**
     * @param h       output
     * @param table   table
     * @param caption caption
     */
    static void table(final StringBuilder h, final Table table, final String caption) {
        h.append("<div class=\"scroll\"><table>\n<caption>").append(Html.escape(caption))
                .append("</caption>\n<thead><tr>");
        for (String col : table.columns()) {
            h.append("<th class=\"sortable\" title=\"click to sort\">").append(Html.escape(col)).append("</th>");
        }
        h.append("</tr></thead>\n<tbody>\n");
        List<List<Object>> rows = table.rows();
        for (int r = 0; r < rows.size(); r++) {
            h.append("<tr>");
            for (int c = 0; c < table.columns().size(); c++) {
                Object v = rows.get(r).get(c);
                String text = CellText.forPeople(v, table.name(), table.columns().get(c), r + 1);
                if (v instanceof Number) {
                    h.append("<td class=\"num\" data-v=\"").append(Html.escape(CellText.of(v, table.name(),
                            table.columns().get(c), r + 1))).append("\">");
                } else {
                    h.append("<td>");
                }
                h.append(Html.escape(text)).append("</td>");
            }
            h.append("</tr>\n");
        }
        h.append("</tbody>\n</table></div>\n");
    }

    private static void runDetails(final StringBuilder h, final Report report) {
        h.append("<h2 id=\"run\">Run details</h2>\n");
        if (!report.settings().isEmpty()) {
            Table settings = Table.withColumns("settings", "setting", "value", "from");
            report.settings().forEach(s -> settings.row(s.key(), s.value(), s.origin()));
            table(h, settings, "Settings");
        }
        Table inputs = Table.withColumns("inputs", "file", "role", "bytes", "SHA-256");
        for (RunInputs.InputFile f : report.inputs().files()) {
            inputs.row(f.path().toString(), f.role(), f.bytes(), f.sha256());
        }
        if (inputs.rows().isEmpty()) {
            h.append("<p>No input files: built-in data and command-line settings only.</p>\n");
        } else {
            table(h, inputs, "Input files");
        }
        if (!report.outputFiles().isEmpty()) {
            h.append("<p>Output files: ");
            for (int i = 0; i < report.outputFiles().size(); i++) {
                String f = report.outputFiles().get(i);
                h.append(i == 0 ? "" : ", ").append("<a href=\"").append(Html.escape(f)).append("\">")
                        .append(Html.escape(f)).append("</a>");
            }
            h.append("</p>\n");
        }
        if (!report.citations().isEmpty()) {
            h.append("<h2 id=\"sources\">Data sources and citations</h2>\n<ul>\n");
            for (Report.Citation c : report.citations()) {
                h.append("<li><b>").append(Html.escape(c.key())).append("</b>: ").append(Html.escape(c.source()))
                        .append("</li>\n");
            }
            h.append("</ul>\n");
        }
        h.append("<p class=\"meta\">").append(Html.escape(metaLine(report))).append("</p>\n");
    }
}
