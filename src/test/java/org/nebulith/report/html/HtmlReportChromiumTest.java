package org.nebulith.report.html;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nebulith.report.chart.Figure;
import org.nebulith.files.AtomicOutput;
import org.nebulith.files.RunFolder;
import org.nebulith.files.RunInputs;
import org.nebulith.files.Table;
import org.nebulith.report.chart.ChartFixtures;
import org.nebulith.report.chart.ChartFormat;
import org.nebulith.report.chart.ChartRenderer;

/**
 * A report with every chart kind, opened in headless Chromium: every image must decode and the
 * page must raise no error and log nothing to the console. Skipped only when no Chromium binary
 * is installed ({@code .ci/run} installs Debian's {@code chromium}).
 */
@Tag("slow")
class HtmlReportChromiumTest {

    @TempDir
    Path dir;

    @Test
    void reportLoadsInChromiumWithEveryImageDecodedAndNoErrors() throws Exception {
        Optional<Path> chromium = findChromium();
        Assumptions.assumeTrue(chromium.isPresent(), "no chromium binary on PATH");
        Path target = dir.resolve("demo-run");
        Path input = Files.writeString(dir.resolve("demo.settings"), "P-bar = 1e-4\n");
        writeReport(target, new RunInputs().add(input, "preset"));

        String html = Files.readString(target.resolve("report.html"));
        assertEquals(1, html.split("<script", -1).length - 1, "the report's only script is the table sort");
        assertTrue(html.contains("script-src 'sha256-"), "the script is allowed by its hash only");
        assertFalse(Pattern.compile("src=\"(?!data:)").matcher(html).find(), "every image is embedded");
        assertTrue(html.contains(RunInputs.sha256(input)), "input checksum listed");
        ChromiumProbe.Result result = ChromiumProbe.open(target.resolve("report.html"), dir);
        assertEquals(ChartFixtures.all().size(), result.images(), "images in the page");
        assertTrue(result.overflow() <= 0, "no horizontal overflow: " + result.overflow() + " px");
        assertEquals(0, result.bad(), "images not decoded");
        assertEquals(0, result.errors(), "errors raised in the page");
        assertEquals(List.of(), result.console(), "console messages");
    }

    private static void writeReport(final Path target, final RunInputs inputs) {
        Report report = new Report("Keroa b (invented demo): bulk composition", "nebulith planet", "test",
                Instant.parse("2026-01-01T00:00:00Z"));
        try (RunFolder run = AtomicOutput.openRunFolder(target, false, inputs)) {
            Report.Section charts = report.section("Charts");
            for (Map.Entry<String, Figure> e : ChartFixtures.all().entrySet()) {
                ChartRenderer.Rendered r = ChartRenderer.write(e.getValue(), run, e.getKey(),
                        EnumSet.of(ChartFormat.PNG, ChartFormat.SVG));
                charts.chart(r, e.getKey().replace('-', ' ') + " (invented demo data)");
            }
            Table ratios = Table.withColumns("bulk-composition.csv", "zone", "quantity", "value", "unit")
                    .row("Keroa b", "Mg_Si_molar", 1.02, "mol/mol").row("Keroa b", "core_mass_fraction", 0.31, "1");
            report.section("Bulk composition").keyTable(ratios, "Key ratios <invented>").paragraph("A & B");
            report.caution("Ideal solid solutions and no kinetics.").citation("demo", "invented data, no source")
                    .inputs(inputs).setting("P-bar", "1e-4", "preset demo.settings:1").outputFile("bulk-composition.csv");
            run.writeCsv("bulk-composition.csv", ratios);
            report.finish(Instant.parse("2026-01-01T00:00:02.5Z"));
            run.writeText("report.html", HtmlReportWriter.write(report));
            run.writeText("summary.md", MarkdownSummaryWriter.write(report));
            run.commit();
        }
    }

    /** @return a Chromium binary on the PATH */
    static Optional<Path> findChromium() {
        String path = System.getenv("PATH");
        if (path == null) {
            return Optional.empty();
        }
        for (String name : List.of("chromium", "chromium-browser", "google-chrome")) {
            for (String folder : path.split(java.io.File.pathSeparator)) {
                Path candidate = Path.of(folder, name);
                if (Files.isExecutable(candidate)) {
                    return Optional.of(candidate);
                }
            }
        }
        return Optional.empty();
    }
}
