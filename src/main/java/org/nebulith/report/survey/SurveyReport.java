package org.nebulith.report.survey;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Map;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.nebulith.files.AtomicOutput;
import org.nebulith.report.Cautions;
import org.nebulith.files.RunInputs;
import org.nebulith.files.Table;
import org.nebulith.files.RunFolder;
import org.nebulith.files.RunInputs;
import org.nebulith.files.Table;
import org.nebulith.report.chart.ChartRenderer;
import org.nebulith.report.html.HtmlReportWriter;
import org.nebulith.report.html.MarkdownSummaryWriter;
import org.nebulith.report.html.Report;
import org.nebulith.survey.SurveyFailures;

/**
 * {@code report.html} and {@code summary.md} of a survey: the run notes, the chart and the first
 * stars of {@code survey-stars.csv} (the full tables are in the CSV files).
 */
final class SurveyReport {
    /** Stars listed in the report's table. */
    static final int SHOWN_STARS = 50;

    private SurveyReport() {
    }

    static void write(RunFolder run, String notes, byte[] png, Path starsCsv, RunInputs inputs) throws IOException {
        Report report = new Report("Nebulith host-star survey", "nebulith survey", org.nebulith.files.RunFolder.class
                .getPackage().getImplementationVersion() == null ? "dev"
                : org.nebulith.files.RunFolder.class.getPackage().getImplementationVersion(), Instant.now());
        Report.Section s = report.section("Run notes");
        for (String line : notes.split("\n")) {
            if (!line.isBlank()) {
                s.paragraph(line.strip());
            }
        }
        Report.Section r = report.section("Results");
        if (png != null) {
            r.chart(new ChartRenderer.Rendered(SurveyChart.BASE, png, Map.of()),
                    "Molar Mg/Si against Fe/Si of the host stars and of their predicted planets "
                            + "(medians, 16th-84th percentile bars).");
        }
        r.table(stars(starsCsv), "survey-stars.csv (first " + SHOWN_STARS + " stars)");
        Cautions.survey().forEach(report::caution);
        report.inputs(inputs);
        for (String f : List.of("survey.csv", SurveyFailures.FILE, StarsTable.FILE, LocalSurvey.NOTES, SurveyChart.BASE + ".png",
                SurveyChart.BASE + ".svg", SurveyChart.BASE + ".pdf", "summary.md")) {
            report.outputFile(f);
        }
        report.finish(Instant.now());
        run.writeText("report.html", HtmlReportWriter.write(report));
        run.writeText("summary.md", MarkdownSummaryWriter.write(report));
    }

    private static Table stars(Path csv) throws IOException {
        try (Reader in = Files.newBufferedReader(csv, StandardCharsets.UTF_8);
             CSVParser p = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(in)) {
            Table t = Table.withColumns(StarsTable.FILE, p.getHeaderNames());
            int n = 0;
            for (CSVRecord rec : p) {
                if (n++ >= SHOWN_STARS) {
                    break;
                }
                t.row(rec.toList());
            }
            return t;
        }
    }
}
