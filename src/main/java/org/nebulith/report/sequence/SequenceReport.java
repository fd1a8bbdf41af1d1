package org.nebulith.report.sequence;

import java.time.Instant;
import java.util.List;

import org.nebulith.condensation.CondensationSequence;
import org.nebulith.format.Decimal;
import org.nebulith.files.RunFolder;
import org.nebulith.files.RunInputs;
import org.nebulith.report.html.HtmlReportWriter;
import org.nebulith.report.html.MarkdownSummaryWriter;
import org.nebulith.report.html.Report;

/** The HTML report and Markdown summary of a sequence run. */
public final class SequenceReport {
    private SequenceReport() {
    }

    /**
     * What the report shows besides the sequence itself.
     *
     * @param version   tool version
     * @param started   start time
     * @param composition description of the composition
     * @param chemistry description of the chemical system
     * @param pressure  description of the pressure or path
     * @param settings  effective settings
     * @param cautions  the cautions
     * @param sources   data sources
     * @param inputs    input files
     */
    public record Meta(String version, Instant started, String composition, String chemistry, String pressure,
                       List<Report.Setting> settings, List<String> cautions, List<Report.Citation> sources,
                       RunInputs inputs) {
    }

    /**
     * @param run    the open run folder
     * @param seq    the sequence
     * @param tables its tables
     * @param charts its charts
     * @param meta   the rest
     */
    public static void write(RunFolder run, CondensationSequence seq, SequenceTables tables,
                             SequenceCharts.Charts charts, Meta meta) {
        Report report = new Report("Nebulith condensation sequence", "nebulith sequence", meta.version(), meta.started());
        String mode = seq.settings().isFractional()
                ? "removal fraction " + Decimal.format(seq.settings().removalFraction()) + " (that fraction of each step's new condensate withdrawn from further reaction)"
                : "equilibrium condensation (all condensates keep reacting)";
        report.section("Scenario")
                .paragraph("Composition: " + meta.composition() + ".")
                .paragraph("Chemistry: " + meta.chemistry() + ".")
                .paragraph("Pressure: " + meta.pressure() + "; " + mode + "; " + seq.steps().size()
                        + " temperatures from " + Decimal.format(seq.settings().tMaxK()) + " to "
                        + Decimal.format(seq.settings().tMinK()) + " K.");
        report.section("Condensation temperatures")
                .keyTable(tables.condensationTemperatures(), SequenceTables.TEMPERATURES
                        + ": 50% condensation temperature, host phase at T50 and onset of each element")
                .chart(charts.curves(), "Fraction of each element condensed (in solids, withdrawn or reacting) against "
                        + "temperature, cooling to the right; rings mark the 50% condensation temperatures (T50), "
                        + "markers and line patterns tell the elements apart without colour.");
        report.section("Phases")
                .chart(charts.assemblage(), charts.assemblageCaption())
                .table(tables.phaseAppearance(), SequenceTables.APPEARANCE + ": appearance and disappearance on cooling");
        meta.settings().forEach(s -> report.setting(s.key(), s.value(), s.origin()));
        meta.cautions().forEach(report::caution);
        meta.sources().forEach(c -> report.citation(c.key(), c.source()));
        report.inputs(meta.inputs());
        for (String f : List.of(SequenceTables.SEQUENCE, SequenceTables.FRACTIONS, SequenceTables.TEMPERATURES,
                SequenceTables.APPEARANCE, SequenceNotes.FILE, "summary.md")) {
            report.outputFile(f);
        }
        charts.files().forEach(report::outputFile);
        report.finish(Instant.now());
        run.writeText("report.html", HtmlReportWriter.write(report));
        run.writeText("summary.md", MarkdownSummaryWriter.write(report));
    }
}
