package org.nebulith.report.html;

import java.util.List;

import org.nebulith.files.CellText;
import org.nebulith.files.RunInputs;
import org.nebulith.files.Table;

/**
 * Writes the short Markdown summary of a {@link Report}: title, run line, the key tables
 * (those added with {@link Report.Section#keyTable}), the cautions, the inputs with checksums and
 * the citations; charts are referenced by file name.
 */
public final class MarkdownSummaryWriter {

    private MarkdownSummaryWriter() {
    }

    /**
     * @param report the report
     * @return the Markdown text
     */
    public static String write(final Report report) {
        StringBuilder m = new StringBuilder(4096);
        m.append("# ").append(report.title()).append("\n\n").append(HtmlReportWriter.metaLine(report))
                .append("\n\nFull report: `report.html`.\n");
        for (Report.Section s : report.sections()) {
            boolean heading = false;
            for (Report.Block b : s.blocks()) {
                if (b instanceof Report.TableBlock && ((Report.TableBlock) b).summary()) {
                    if (!heading) {
                        m.append("\n## ").append(s.title()).append('\n');
                        heading = true;
                    }
                    Report.TableBlock t = (Report.TableBlock) b;
                    m.append('\n').append(t.caption()).append(":\n\n");
                    table(m, t.table());
                } else if (b instanceof Report.ChartBlock && heading) {
                    Report.ChartBlock c = (Report.ChartBlock) b;
                    m.append("\nChart: `").append(c.chart().baseName()).append(".svg` (").append(c.caption())
                            .append(")\n");
                }
            }
        }
        if (!report.cautions().isEmpty()) {
            m.append("\n## Assumptions and cautions\n\n");
            report.cautions().forEach(c -> m.append("- ").append(c).append('\n'));
        }
        List<RunInputs.InputFile> inputs = report.inputs().files();
        if (!inputs.isEmpty()) {
            m.append("\n## Inputs\n\n");
            inputs.forEach(f -> m.append("- `").append(f.path()).append("` (").append(f.role()).append("), SHA-256 `")
                    .append(f.sha256()).append("`\n"));
        }
        if (!report.citations().isEmpty()) {
            m.append("\n## Sources\n\n");
            report.citations().forEach(c -> m.append("- ").append(c.key()).append(": ").append(c.source())
                    .append('\n'));
        }
        return m.toString();
    }

    private static void table(final StringBuilder m, final Table table) {
        m.append('|');
        table.columns().forEach(c -> m.append(' ').append(cell(c)).append(" |"));
        m.append("\n|");
        table.columns().forEach(c -> m.append("---|"));
        m.append('\n');
        List<List<Object>> rows = table.rows();
        for (int r = 0; r < rows.size(); r++) {
            m.append('|');
            for (int c = 0; c < table.columns().size(); c++) {
                m.append(' ').append(dataCell(CellText.forPeople(rows.get(r).get(c), table.name(), table.columns().get(c),
                        r + 1)))
                        .append(" |");
            }
            m.append('\n');
        }
    }

    /**
     * @param text a value from the run (a zone or star name, for instance)
     * @return the text with every Markdown special character escaped, so it shows as written
     */
    static String dataCell(final String text) {
        StringBuilder out = new StringBuilder(text.length() + 8);
        for (char ch : text.replace('\n', ' ').replace('\r', ' ').toCharArray()) {
            if ("\\`*_[]<>|~&".indexOf(ch) >= 0) {
                out.append('\\');
            }
            out.append(ch);
        }
        return out.toString();
    }

    private static String cell(final String text) {
        return text.replace("|", "\\|").replace("\n", " ");
    }
}
