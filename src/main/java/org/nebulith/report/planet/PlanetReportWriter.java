package org.nebulith.report.planet;

import java.time.Instant;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

import org.nebulith.composition.ElementAbundances;
import org.nebulith.disk.DiskModel;
import org.nebulith.planet.PlanetComposition;
import org.nebulith.planet.ZoneNotices;
import org.nebulith.planet.ZonePlanet;
import org.nebulith.report.Cautions;
import org.nebulith.files.RunFolder;
import org.nebulith.files.RunInputs;
import org.nebulith.files.Table;
import org.nebulith.report.chart.ChartFormat;
import org.nebulith.report.chart.ChartRenderer;
import org.nebulith.report.chart.ChartSize;
import org.nebulith.report.html.HtmlReportWriter;
import org.nebulith.report.html.MarkdownSummaryWriter;
import org.nebulith.report.html.Report;
import org.nebulith.thermo.DataSet;
import org.nebulith.zones.IntegrationQuality;
import org.nebulith.zones.LocalCondensation;
import org.nebulith.zones.ZoneInventory;

/** Writes every output of a planet run into its run folder: tables, charts, HTML report, summary. */
public final class PlanetReportWriter {
    /**
     * @param chemistry description of the chemical system (data set and solutions)
     * @return the cautions every planet report carries ({@link Cautions#planet})
     */
    public static List<String> cautions(String chemistry) {
        return Cautions.planet(chemistry, DataSet.named(DataSet.DEFAULT).variants());
    }

    /**
     * Everything the report shows.
     *
     * @param title        report title
     * @param command      the command line
     * @param version      tool version
     * @param started      start time
     * @param composition  description of the gas composition
     * @param host         the host star's composition
     * @param disk         the disk
     * @param chemistry    description of the chemical system
     * @param planets      the zone planets
     * @param scan         the radial scan, inner first
     * @param settings     effective settings (key, value, origin)
     * @param inputs       the run's input files
     * @param sources      data sources (key, citation)
     * @param ci           the CI-chondrite reference of the run (dust and comparisons)
     */
    public record RunData(String title, String command, String version, Instant started, String composition,
                          ElementAbundances host, DiskModel disk, String chemistry, List<ZonePlanet> planets,
                          List<LocalCondensation.Local> scan, List<Report.Setting> settings, RunInputs inputs,
                          List<Report.Citation> sources, org.nebulith.composition.CiReference ci) {
        /** Run data with the default CI reference. */
        public RunData(String title, String command, String version, Instant started, String composition,
                       ElementAbundances host, DiskModel disk, String chemistry, List<ZonePlanet> planets,
                       List<LocalCondensation.Local> scan, List<Report.Setting> settings, RunInputs inputs,
                       List<Report.Citation> sources) {
            this(title, command, version, started, composition, host, disk, chemistry, planets, scan, settings, inputs,
                    sources, org.nebulith.composition.CiReference.DEFAULT);
        }
    }

    private PlanetReportWriter() {
    }

    /**
     * @param planets the zone planets, inner first
     * @param chemistry description of the chemical system (data set and solutions)
     * @return the standing cautions ({@link #cautions(String)}), then one per pair of overlapping feeding zones
     */
    public static List<String> cautions(String chemistry, List<ZonePlanet> planets) {
        List<String> all = new java.util.ArrayList<>(cautions(chemistry));
        List<org.nebulith.zones.FeedingZone> zones = new java.util.ArrayList<>();
        planets.forEach(p -> zones.add(p.inventory().zone()));
        org.nebulith.zones.ZoneFileReader.overlaps(zones).forEach(line -> all.add(capitalised(line) + "."));
        return all;
    }

    private static String capitalised(String line) {
        return Character.toUpperCase(line.charAt(0)) + line.substring(1);
    }

    /**
     * @param run  the open run folder (committed by the caller)
     * @param data the run's data
     * @return the report (for printing a summary)
     */
    public static Report write(RunFolder run, RunData data) {
        Table bulk = PlanetTables.bulkComposition(data.planets());
        Table comparison = PlanetTables.comparison(data.planets(), data.host(), data.ci());
        Table phases = PlanetTables.zonePhases(data.planets());
        Table profile = PlanetTables.radialProfile(data.scan());
        run.writeCsv("bulk-composition.csv", bulk);
        run.writeCsv("comparison.csv", comparison);
        run.writeCsv("zone-phases.csv", phases);
        run.writeCsv("radial-profile.csv", profile);
        Set<ChartFormat> formats = EnumSet.allOf(ChartFormat.class);
        ChartRenderer.Rendered radial = ChartRenderer.write(PlanetCharts.radialMap(data.scan(), data.planets())
                .chart(ChartSize.PAGE), run, "radial-map", formats);
        ChartRenderer.Rendered compare = ChartRenderer.write(PlanetCharts.comparison(data.planets(), data.host(), data.ci())
                .chart(ChartSize.PAGE), run, "planet-comparison", formats);
        Report report = new Report(data.title(), data.command(), data.version(), data.started());
        report.section("Scenario")
                .paragraph("Composition: " + data.composition() + ".")
                .paragraph("Disk: " + data.disk().description() + ".")
                .paragraph("Chemistry: " + data.chemistry() + ".");
        Report.Section planets = report.section("Planets");
        for (ZonePlanet zp : data.planets()) {
            planets.paragraph(summary(zp));
            ZoneNotices.of(zp).forEach(n -> planets.paragraph("Notice: " + n + "."));
        }
        planets.keyTable(keyRows(data.planets()), "Key quantities per zone (all quantities: bulk-composition.csv)");
        report.section("Comparison with the host star and reference bodies")
                .chart(compare, "Molar ratios and core mass fraction of the predicted planets beside the host star, "
                        + "bulk Earth and CI chondrites (log scale).")
                .table(comparison, "comparison.csv");
        report.section("Radial structure of the disk")
                .chart(radial, "Fraction of the heavy elements condensed, and molar Mg/Si and Fe/Si of the local "
                        + "solids, against distance; feeding zones shaded, condensation fronts dashed.")
                .table(phases, "zone-phases.csv: what each zone collected");
        Report.Section integration = report.section("Radial integration");
        for (ZonePlanet zp : data.planets()) {
            integration.paragraph(integrationNote(zp));
        }
        data.settings().forEach(s -> report.setting(s.key(), s.value(), s.origin()));
        cautions(data.chemistry(), data.planets()).forEach(report::caution);
        data.sources().forEach(c -> report.citation(c.key(), c.source()));
        report.inputs(data.inputs());
        for (String f : List.of("bulk-composition.csv", "comparison.csv", "zone-phases.csv", "radial-profile.csv",
                "radial-map.png", "radial-map.svg", "radial-map.pdf", "planet-comparison.png", "planet-comparison.svg",
                "planet-comparison.pdf", "summary.md")) {
            report.outputFile(f);
        }
        report.finish(Instant.now());
        run.writeText("report.html", HtmlReportWriter.write(report));
        run.writeText("summary.md", MarkdownSummaryWriter.write(report));
        return report;
    }

    /** @param zp a zone planet @return one sentence about it */
    public static String summary(ZonePlanet zp) {
        if (!zp.planet().hasSolids()) {
            return zp.zoneName() + ": " + zp.planet().notice() + ".";
        }
        PlanetComposition c = zp.planet().require();
        StringBuilder sb = new StringBuilder(zp.zoneName()).append(String.format(java.util.Locale.ROOT,
                ": Mg/Si %.3f, Fe/Si %.3f (molar)", c.molarRatios().get("Mg_Si_molar"), c.molarRatios().get("Fe_Si_molar")));
        if (c.hasRock()) {
            sb.append(String.format(java.util.Locale.ROOT, ", core mass fraction %.3f", c.coreMassFraction()));
        }
        if (c.hasMgNumber()) {
            sb.append(String.format(java.util.Locale.ROOT, ", mantle Mg# %.1f", c.oxides().mgNumber()));
        }
        if (c.iceMassFraction() > 0) {
            sb.append(String.format(java.util.Locale.ROOT, ", ice %.1f wt%%", 100 * c.iceMassFraction()));
        }
        sb.append('.');
        return sb.toString();
    }

    /**
     * @param zp a zone planet
     * @return the run note on its radial integral: evaluations, the worst panel, its radius and its
     *         estimated error, and panels accepted where the error stopped falling
     */
    public static String integrationNote(ZonePlanet zp) {
        ZoneInventory inv = zp.inventory();
        IntegrationQuality q = inv.quality();
        if (q.fixedRule()) {
            return zp.zoneName() + ": fixed composite rule, " + inv.evaluations() + " evaluations (no error estimate).";
        }
        return String.format(java.util.Locale.ROOT, "%s: %d evaluations, %d fronts; worst panel %.6g-%.6g AU"
                + " (r = %.6g AU), estimated error %.2g relative; whole zone %.2g relative; %d panel(s) accepted"
                + " where the error stopped falling when halved.", zp.zoneName(), inv.evaluations(), inv.fronts().size(),
                q.worstLoAU(), q.worstHiAU(), q.worstRadiusAU(), q.worstRelError(), q.totalRelError(), q.acceptedPanels());
    }

    private static Table keyRows(List<ZonePlanet> planets) {
        Table t = Table.withColumns("key quantities", "zone", "Mg_Si_molar", "Fe_Si_molar", "core_mass_fraction",
                "mantle_Mg_number", "ice_mass_fraction");
        for (ZonePlanet zp : planets) {
            if (!zp.planet().hasSolids()) {
                t.row(zp.zoneName(), null, null, null, null, null);
                continue;
            }
            PlanetComposition c = zp.planet().require();
            t.row(zp.zoneName(), c.molarRatios().get("Mg_Si_molar"), c.molarRatios().get("Fe_Si_molar"),
                    c.hasRock() ? c.coreMassFraction() : null,
                    c.hasMgNumber() ? c.oxides().mgNumber() : null, c.iceMassFraction());
        }
        return t;
    }
}
