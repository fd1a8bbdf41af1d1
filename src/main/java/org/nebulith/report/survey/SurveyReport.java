package org.nebulith.report.survey;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.SolarReference;
import org.nebulith.equilibrium.SystemSpec;
import org.nebulith.files.RunFolder;
import org.nebulith.files.RunInputs;
import org.nebulith.files.Table;
import org.nebulith.report.Cautions;
import org.nebulith.report.SourceList;
import org.nebulith.report.chart.ChartRenderer;
import org.nebulith.report.html.HtmlReportWriter;
import org.nebulith.report.html.MarkdownSummaryWriter;
import org.nebulith.report.html.Report;
import org.nebulith.thermo.SpeciesDatabase;
import org.nebulith.survey.PlanetSurveyEstimator;
import org.nebulith.survey.StarJob;
import org.nebulith.survey.SurveyFailures;
import org.nebulith.survey.SurveySettings;

/**
 * {@code report.html} and {@code summary.md} of a survey: the run notes, the settings, the chart,
 * the predicted planets of the first stars (medians and 16th-84th percentiles of the key quantities),
 * the first stars of {@code survey-stars.csv}, the sources (the full tables are in the CSV files).
 */
final class SurveyReport {
    /** Stars listed in the report's tables. */
    static final int SHOWN_STARS = 50;
    /** Quantities of the predicted-planet table. */
    static final List<String> PLANET_QUANTITIES = List.of("Mg_Si_molar", "Fe_Si_molar", "core_mass_fraction");

    /**
     * @param folder   the survey's open run folder
     * @param request  the survey request (settings)
     * @param started  when the survey started
     * @param notes    the run notes text
     * @param png      the chart's PNG, or null
     * @param starsCsv survey-stars.csv
     * @param surveyCsv the survey table (median, p16, p84 per star, zone and quantity)
     * @param inputs   the run's inputs
     */
    record Run(RunFolder folder, LocalSurvey.Request request, Instant started, String notes, byte[] png, Path starsCsv,
               Path surveyCsv, RunInputs inputs) {
    }

    private SurveyReport() {
    }

    static void write(Run run) throws IOException {
        String version = RunFolder.class.getPackage().getImplementationVersion();
        Report report = new Report("Nebulith host-star survey", "nebulith survey", version == null ? "dev" : version,
                run.started());
        Report.Section s = report.section("Run notes");
        for (String line : run.notes().split("\n")) {
            if (!line.isBlank()) {
                s.paragraph(line.strip());
            }
        }
        Report.Section r = report.section("Results");
        if (run.png() != null) {
            r.chart(new ChartRenderer.Rendered(SurveyChart.BASE, run.png(), Map.of()),
                    "Molar Mg/Si against Fe/Si of the host stars (open circles) and of their predicted planets "
                            + "(dots): medians. Mg/Si and Fe/Si share Si, so their errors are correlated: each star "
                            + "has its 68 % covariance ellipse, propagated to first order from the catalogue's [X/H] "
                            + "errors and error correlation as the survey draws them; the planets have their "
                            + "16th-84th percentile ranges as crosses (their covariance over the draws is not kept, "
                            + "so the crosses are not independent errors). The Sun (photosphere, Asplund et al. "
                            + "2009) and bulk Earth (McDonough 2003) marked.");
        }
        r.table(planets(run.surveyCsv()), "Predicted planets of the first " + SHOWN_STARS
                + " stars: medians and 16th-84th percentiles over the draws (all quantities: survey.csv)");
        r.table(stars(run.starsCsv()), StarsTable.FILE + " (first " + SHOWN_STARS + " stars)");
        Cautions.survey().forEach(report::caution);
        settings(report, run.request());
        sources(run.request()).forEach(c -> report.citation(c.key(), c.source()));
        report.inputs(run.inputs());
        for (String f : List.of("survey.csv", SurveyFailures.FILE, StarsTable.FILE, LocalSurvey.NOTES,
                SurveyChart.BASE + ".png", SurveyChart.BASE + ".svg", SurveyChart.BASE + ".pdf", "summary.md")) {
            report.outputFile(f);
        }
        report.finish(Instant.now());
        run.folder().writeText("report.html", HtmlReportWriter.write(report));
        run.folder().writeText("summary.md", MarkdownSummaryWriter.write(report));
    }

    private static void settings(Report report, LocalSurvey.Request q) {
        SurveySettings s = q.settings();
        report.setting("catalogue", q.shownName(), "command line");
        report.setting("draws", Integer.toString(s.draws()), "run");
        report.setting("seed", Long.toString(s.seed()), "run");
        report.setting("solar reference", s.solar().name(), "run");
        report.setting("disk", s.disk() == null ? PlanetSurveyEstimator.DEFAULT_DISK + " (default)" : s.disk(), "run");
        report.setting("zones", s.zones() == null ? PlanetSurveyEstimator.DEFAULT_ZONES + " (default)" : s.zones(),
                "run");
        report.setting("threads", Integer.toString(q.threads()), "run");
        report.setting("skip bad rows", Boolean.toString(q.skipBad()), "run");
    }

    private static List<Report.Citation> sources(LocalSurvey.Request q) {
        boolean asplund = q.settings().solar() == SolarReference.ASPLUND2009;
        String solar = asplund
                ? "solar reference of the [X/H]: Asplund M., Grevesse N., Sauval A.J. & Scott P. (2009) ARA&A 47, 481, "
                        + "Table 1 (photosphere)"
                : "solar reference of the [X/H]: Lodders K. (2003) ApJ 591, 1220, Table 2 (proto-solar)";
        List<Report.Citation> extra = new ArrayList<>();
        extra.add(new Report.Citation("reference bodies", "Sun: Asplund et al. (2009) photosphere; bulk Earth: "
                + "McDonough W.F. (2003) Treatise on Geochemistry vol. 2"));
        extra.add(new Report.Citation("percentiles", "Hyndman R.J. & Fan Y. (1996) Am. Stat. 50, 361, definition 7"));
        var composition = AbundancePresets.preset(asplund ? AbundancePresets.PHOTOSPHERE_ASPLUND2009
                : AbundancePresets.PROTOSOLAR_LODDERS2003).abundances();
        return SourceList.of(solar, SystemSpec.defaults().species(), composition.elements(), SpeciesDatabase.bundled().sources(),
                extra);
    }

    /** @return star, zone and the median, p16 and p84 of the key quantities, planets only, first stars */
    static Table planets(Path surveyCsv) throws IOException {
        List<String> cols = new ArrayList<>(List.of("star", "zone"));
        for (String q : PLANET_QUANTITIES) {
            cols.add(q + "_median");
            cols.add(q + "_p16");
            cols.add(q + "_p84");
        }
        Table t = Table.withColumns("survey.csv", cols);
        Map<String, Map<String, double[]>> rows = new LinkedHashMap<>();
        try (Reader in = Files.newBufferedReader(surveyCsv, StandardCharsets.UTF_8);
             CSVParser p = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(in)) {
            java.util.Set<String> stars = new java.util.LinkedHashSet<>();
            for (CSVRecord rec : p) {
                String star = rec.get("star");
                if (!stars.contains(star) && stars.size() >= SHOWN_STARS) {
                    break;
                }
                stars.add(star);
                String zone = rec.get("zone");
                int k = PLANET_QUANTITIES.indexOf(rec.get("quantity"));
                if (zone.equals(StarJob.HOST_ZONE) || k < 0 || rec.get("median").isEmpty()) {
                    continue;
                }
                double[] v = rows.computeIfAbsent(star, x -> new LinkedHashMap<>())
                        .computeIfAbsent(zone, z -> nan(3 * PLANET_QUANTITIES.size()));
                v[3 * k] = Double.parseDouble(rec.get("median"));
                v[3 * k + 1] = parse(rec.get("p16"));
                v[3 * k + 2] = parse(rec.get("p84"));
            }
        }
        rows.forEach((star, zones) -> zones.forEach((zone, v) -> {
            List<Object> row = new ArrayList<>(List.of(star, zone));
            for (double x : v) {
                row.add(Double.isFinite(x) ? x : null);
            }
            t.row(row);
        }));
        return t;
    }

    private static double parse(String s) {
        return s.isEmpty() ? Double.NaN : Double.parseDouble(s);
    }

    private static double[] nan(int n) {
        double[] a = new double[n];
        java.util.Arrays.fill(a, Double.NaN);
        return a;
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
