package org.nebulith.report.planet;

import java.time.Instant;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.nebulith.composition.ElementAbundances;
import org.nebulith.disk.DiskModel;
import org.nebulith.planet.PlanetComposition;
import org.nebulith.planet.ZoneNotices;
import org.nebulith.planet.ZonePlanet;
import org.nebulith.format.Decimal;
import org.nebulith.report.Cautions;
import org.nebulith.files.RunFolder;
import org.nebulith.files.RunInputs;
import org.nebulith.files.Table;
import org.nebulith.progress.Alongside;
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
     * @param errorBands   per zone, the 16th and 84th percentile offsets of the comparison's quantities from a
     *                     Monte Carlo over the host's [X/H] errors ({@link PlanetCharts#SHOWN} then the core
     *                     mass fraction), or null when no errors were given
     * @param errorNote    how the bands were computed (draws, seed, errors), or null
     * @param t50K         50% condensation temperatures of the host composition at 1e-4 bar [K], by element
     * @param ci           the CI-chondrite reference of the run (dust and comparisons)
     */
    public record RunData(String title, String command, String version, Instant started, String composition,
                          ElementAbundances host, DiskModel disk, String chemistry, List<ZonePlanet> planets,
                          List<LocalCondensation.Local> scan, List<Report.Setting> settings, RunInputs inputs,
                          List<Report.Citation> sources, Map<String, double[][]> errorBands, String errorNote,
                          Map<org.nebulith.thermo.Element, Double> t50K, org.nebulith.composition.CiReference ci) {
        /** Run data with the default CI reference, no error bars and no devolatilisation pattern. */
        public RunData(String title, String command, String version, Instant started, String composition,
                       ElementAbundances host, DiskModel disk, String chemistry, List<ZonePlanet> planets,
                       List<LocalCondensation.Local> scan, List<Report.Setting> settings, RunInputs inputs,
                       List<Report.Citation> sources) {
            this(title, command, version, started, composition, host, disk, chemistry, planets, scan, settings, inputs,
                    sources, null, null, null, org.nebulith.composition.CiReference.DEFAULT);
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
        Set<ChartFormat> formats = EnumSet.allOf(ChartFormat.class);
        // the three charts and the tables are independent: two charts are drawn on threads of their own
        Alongside<ChartRenderer.Rendered> radialDrawing = Alongside.start("radial map", () -> ChartRenderer.write(
                PlanetCharts.radialMap(data.scan(), data.planets(), data.host()).chart(ChartSize.PAGE.widthPt(), 370),
                run, "radial-map", formats));
        Alongside<ChartRenderer.Rendered> patternDrawing = Alongside.start("devolatilisation", () ->
                data.t50K() == null || data.t50K().isEmpty() ? null
                        : ChartRenderer.write(PlanetCharts.devolatilisation(data.planets(), data.host(), data.t50K())
                                .chart(ChartSize.PAGE), run, "devolatilisation", formats));
        ChartRenderer.Rendered[] drawn = new ChartRenderer.Rendered[1];
        Runnable tablesAndComparison = () -> {
            run.writeCsv("bulk-composition.csv", bulk);
            run.writeCsv("comparison.csv", comparison);
            run.writeCsv("zone-phases.csv", phases);
            run.writeCsv("radial-profile.csv", profile);
            drawn[0] = ChartRenderer.write(PlanetCharts.comparison(data.planets(), data.host(),
                    PlanetCharts.bars(data.planets(), data.errorBands()), data.ci())
                    .chart(ChartSize.PAGE.widthPt()), run, "planet-comparison", formats);
        };
        ChartRenderer.Rendered pattern = patternDrawing.joinAfter(() -> radialDrawing.joinAfter(tablesAndComparison));
        ChartRenderer.Rendered radial = radialDrawing.join();
        ChartRenderer.Rendered compare = drawn[0];
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
                .chart(compare, "Molar ratios and core mass fraction of the predicted planets (circles) beside the "
                        + "host star (star marker and dotted line) and reference bodies, one linear panel per quantity; "
                        + "n/a: the body has no such value. " + (data.errorNote() == null
                        ? "No [X/H] errors were given, so the planets have no error bars. "
                        : "Error bars: " + data.errorNote() + ". ")
                        + "References: " + PlanetCharts.REFERENCE_SOURCES + ".")
                .table(comparison, "comparison.csv");
        if (pattern != null) {
            report.section("Devolatilisation pattern")
                .chart(pattern, "Abundance of each element in the planets relative to the host star, both normalised "
                        + "to " + PlanetCharts.NORMALISING.symbol() + " (a refractory element), against the element's "
                        + "50% condensation temperature T50 computed by Nebulith for the host composition at 1e-4 bar "
                        + "(equilibrium, 5 K grid bisected to 0.5 K); bulk Earth (McDonough 2003) over the solar "
                        + "photosphere (Asplund et al. 2009) for comparison, plotted at the same T50. Values below "
                        + "the axis are drawn at its bottom. The figure follows the form of Wang, Lineweaver & "
                        + "Ireland (2019, Icarus 328, 287).");
        }
        report.section("Radial structure of the disk")
                .chart(radial, "Top: midplane temperature (left axis) and pressure (right axis, log) of the disk. "
                        + "Middle: molar Mg/Si and Fe/Si of the local equilibrium solids, host-star ratios dotted, "
                        + "and the condensed share of the mass of all elements heavier than He (right axis). "
                        + "Bottom: weight of each feeding zone, normalised to its peak. Dashed verticals: "
                        + "condensation fronts, '+' where a phase appears and '\u2212' where it disappears "
                        + "going outwards. Distance on a log scale, limited to the zones plus 30%.")
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
        if (pattern != null) {
            List.of("devolatilisation.png", "devolatilisation.svg", "devolatilisation.pdf").forEach(report::outputFile);
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
        StringBuilder sb = new StringBuilder(zp.zoneName()).append(": Mg/Si ")
                .append(people(c.molarRatios().get("Mg_Si_molar"))).append(", Fe/Si ")
                .append(people(c.molarRatios().get("Fe_Si_molar"))).append(" (molar)");
        if (c.hasRock()) {
            sb.append(", core mass fraction ").append(Decimal.forPeople(c.coreMassFraction()));
        }
        if (c.hasMgNumber()) {
            sb.append(", mantle Mg# ").append(Decimal.forPeople(c.oxides().mgNumber()));
        }
        if (c.iceMassFraction() > 0) {
            sb.append(", ice ").append(Decimal.forPeople(100 * c.iceMassFraction())).append(" wt%");
        }
        sb.append('.');
        return sb.toString();
    }

    private static String people(Double v) {
        return v == null || !Double.isFinite(v) ? "n/a" : Decimal.forPeople(v);
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
