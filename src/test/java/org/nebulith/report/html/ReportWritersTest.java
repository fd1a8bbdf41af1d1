package org.nebulith.report.html;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.time.Instant;

import org.junit.jupiter.api.Test;
import org.nebulith.errors.NumericalException;
import org.nebulith.files.Table;

class ReportWritersTest {

    private static Report report() {
        Report r = new Report("T <&> \"q\"", "nebulith sequence", "0.1.0", Instant.parse("2026-01-01T00:00:00Z"));
        r.section("Results").keyTable(Table.withColumns("t.csv", "element", "T50_K").row("Al", 1653.2), "T50 | all")
                .paragraph("<b>not bold</b>");
        r.caution("No silicate liquids.").citation("K", "ref");
        return r.finish(Instant.parse("2026-01-01T00:01:05Z"));
    }

    @Test
    void htmlEscapesTextAndStatesVersionAndRunTime() {
        String html = HtmlReportWriter.write(report());
        assertTrue(html.contains("<h1>T &lt;&amp;&gt; &quot;q&quot;</h1>"), html);
        assertTrue(html.contains("&lt;b&gt;not bold&lt;/b&gt;"));
        assertTrue(html.contains("nebulith 0.1.0 \u00b7 nebulith sequence \u00b7 started 2026-01-01 00:00:00 UTC"
                + " \u00b7 run time 65.0 s"), html);
        assertTrue(html.contains("<td class=\"num\" data-v=\"1653.2\">1653.2</td>"), "people text, full value for sorting");
        assertTrue(html.contains("Assumptions and cautions") && html.contains("No silicate liquids."));
    }

    @Test
    void markdownSummaryHasKeyTablesCautionsAndSources() {
        String md = MarkdownSummaryWriter.write(report());
        assertTrue(md.contains("| element | T50_K |\n|---|---|\n| Al | 1653.2 |\n"), md);
        assertTrue(md.contains("T50 | all:") && md.contains("- No silicate liquids.") && md.contains("- K: ref"), md);
    }

    @Test
    void nanNeverReachesAReport() {
        Report r = new Report("x", "c", "v", Instant.EPOCH);
        r.section("s").table(Table.withColumns("t", "v").row(Double.NaN), "c");
        assertThrows(NumericalException.class, () -> HtmlReportWriter.write(r));
    }
}
