package org.nebulith.report.interior;

import java.time.Instant;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Locale;

import org.nebulith.measured.PlanetVerdict;
import org.nebulith.planet.interior.ProfilePoint;
import org.nebulith.planet.interior.Structure;
import org.nebulith.files.RunFolder;
import org.nebulith.files.RunInputs;
import org.nebulith.files.Table;
import org.nebulith.report.chart.ChartFormat;
import org.nebulith.report.chart.ChartRenderer;
import org.nebulith.report.chart.ChartSize;
import org.nebulith.report.chart.CoreFractionComparison;
import org.nebulith.report.chart.Curve;
import org.nebulith.report.chart.InteriorProfileChart;
import org.nebulith.report.chart.MassRadiusChart;
import org.nebulith.report.html.HtmlReportWriter;
import org.nebulith.report.html.Report;

/** Writes the outputs of {@code nebulith interior} and {@code nebulith measured} into their run folders. */
public final class InteriorReportWriter {
    /** Cautions of every interior result. */
    public static final List<String> CAUTIONS = List.of(
            "The structure is cold (isothermal at the reference temperature of the equations of state): a real "
                    + "thermal profile expands every layer (a few per cent lower density, a radius up to ~2-3 % "
                    + "larger for an Earth-like planet) and lowers the central pressure; molten layers are not modelled.",
            "Equations of state are extrapolated beyond their fitted range at the centres of massive planets "
                    + "(above ~1 TPa); no Thomas-Fermi-Dirac or ab initio correction is applied.",
            "The mantle holds only Mg, Fe, Si and O (Ca, Al, Na, Ti left out); Fe replaces Mg at constant molar "
                    + "volume with one Mg# in every phase; the transition zone is not modelled apart (olivine-pyroxene "
                    + "up to 23 GPa, bridgmanite to 125 GPa, post-bridgmanite beyond).",
            "Light elements in the core are carried as FeSi and FeO by ideal volume mixing; S and Ni count as iron. "
                    + "The water layer is ice VII at every pressure (liquid or ice Ih near the surface is denser than "
                    + "this fit allows for at P -> 0 only approximately).");
    /** Cautions of the host-star test. */
    public static final List<String> MEASURED_CAUTIONS = List.of(
            "Draws denser than pure iron or lighter than pure rock are counted as core mass fraction 1 or 0 and "
                    + "reported apart: they need an explanation the model does not give (a denser core or mantle "
                    + "stripping; volatiles, a hot or molten interior, an atmosphere).",
            "Without disk or zone options the star's prediction assumes that every rock-forming element condensed "
                    + "(the stoichiometric assumption of Santos et al. 2015): all Fe, Ni, Co and S in the core, no FeO "
                    + "in the mantle; a hot zone or oxidised iron gives a lower core mass fraction.",
            "Agreement is read from the 16th-84th percentile ranges as if both distributions were Gaussian.");

    private InteriorReportWriter() {
    }

    /**
     * Everything a report shows besides its content.
     *
     * @param command  the command line
     * @param version  tool version
     * @param started  start time
     * @param settings effective settings
     * @param inputs   the run's inputs
     */
    public record Header(String command, String version, Instant started, List<Report.Setting> settings,
                         RunInputs inputs) {
    }

    /**
     * @param run       the open run folder
     * @param header    the run's header data
     * @param structure the structure
     */
    public static void writeInterior(final RunFolder run, final Header header, final Structure structure) {
        Table profile = InteriorTables.profile(structure);
        Table summary = InteriorTables.summary(structure);
        run.writeCsv("interior-profile.csv", profile);
        run.writeCsv("interior-structure.csv", summary);
        ChartRenderer.Rendered chart = ChartRenderer.write(profileChart(structure).chart(ChartSize.PAGE), run,
                "interior-profile", EnumSet.allOf(ChartFormat.class));
        Report report = new Report("Nebulith interior structure", header.command(), header.version(), header.started());
        report.section("Structure").paragraph(summaryLine(structure)).table(summary, "interior-structure.csv")
                .chart(chart, "Density and pressure against radius (interior-profile.csv).");
        finish(run, header, report, CAUTIONS, List.of("interior-profile.csv", "interior-structure.csv",
                "interior-profile.png", "interior-profile.svg", "interior-profile.pdf"));
    }

    /**
     * @param run       the open run folder
     * @param header    the run's header data
     * @param verdicts  the planets' tests
     * @param curves    mass-radius curves (masses first)
     * @param curveMass the masses of the curves [M_earth]
     * @param scenario  a sentence on where the star's predictions come from
     */
    public static void writeMeasured(final RunFolder run, final Header header, final List<PlanetVerdict> verdicts,
                                     final double[] curveMass, final List<Curve> curves, final String scenario) {
        Table planets = InteriorTables.planets(verdicts);
        run.writeCsv("planets.csv", planets);
        List<MassRadiusChart.Planet> points = new ArrayList<>();
        List<CoreFractionComparison.Point> cmf = new ArrayList<>();
        for (PlanetVerdict v : verdicts) {
            points.add(new MassRadiusChart.Planet(v.planet().planet(), v.planet().mass(), v.planet().massErr(),
                    v.planet().radius(), v.planet().radiusErr()));
            cmf.add(new CoreFractionComparison.Point(v.planet().planet(), v.predicted()[0], v.predicted()[1],
                    v.predicted()[2], v.measured().median(), v.measured().p16(), v.measured().p84()));
        }
        EnumSet<ChartFormat> formats = EnumSet.allOf(ChartFormat.class);
        ChartRenderer.Rendered mr = ChartRenderer.write(new MassRadiusChart(curveMass, curves, points)
                .chart(ChartSize.PAGE), run, "mass-radius", formats);
        ChartRenderer.Rendered cc = ChartRenderer.write(new CoreFractionComparison(cmf).chart(ChartSize.PAGE), run,
                "core-fraction-comparison", formats);
        Report report = new Report("Nebulith host-star test of measured planets", header.command(), header.version(),
                header.started());
        Report.Section s = report.section("Planets").paragraph(scenario);
        for (PlanetVerdict v : verdicts) {
            s.paragraph(verdictLine(v));
        }
        s.table(planets, "planets.csv");
        report.section("Mass and radius").chart(mr, "Measured planets (1-sigma bars) with curves of constant "
                + "composition from the interior model (cold, iron core and MgSiO3 mantle).");
        report.section("Core mass fraction: planet against star").chart(cc, "Core mass fraction from mass and radius "
                + "against the one predicted from the host star (16th-84th percentile bars); the 1:1 line is agreement.");
        List<String> cautions = new ArrayList<>(MEASURED_CAUTIONS);
        cautions.addAll(CAUTIONS);
        finish(run, header, report, cautions, List.of("planets.csv", "mass-radius.png", "mass-radius.svg",
                "mass-radius.pdf", "core-fraction-comparison.png", "core-fraction-comparison.svg",
                "core-fraction-comparison.pdf"));
    }

    private static void finish(final RunFolder run, final Header header, final Report report, final List<String> cautions,
                               final List<String> files) {
        header.settings().forEach(x -> report.setting(x.key(), x.value(), x.origin()));
        cautions.forEach(report::caution);
        report.citation("structure-mantle", "Stixrude, L. & Lithgow-Bertelloni, C. 2011, Geophys. J. Int. 184, 1180"
                + " (mantle phases, Table A1)");
        report.citation("structure-iron-ice", "Seager, S. et al. 2007, ApJ 669, 1279 (epsilon-iron and ice VII fits)");
        report.citation("host-star-test", "Santos, N. C. et al. 2015, A&A 580, L13; Adibekyan, V. et al. 2021, "
                + "Science 374, 330");
        report.inputs(header.inputs());
        files.forEach(report::outputFile);
        report.finish(Instant.now());
        run.writeText("report.html", HtmlReportWriter.write(report));
    }

    private static InteriorProfileChart profileChart(final Structure s) {
        List<ProfilePoint> pts = s.profile();
        double[] r = new double[pts.size()];
        double[] rho = new double[pts.size()];
        double[] p = new double[pts.size()];
        for (int i = 0; i < r.length; i++) {
            r[i] = pts.get(i).rKm();
            rho[i] = pts.get(i).rhoKgM3();
            p[i] = pts.get(i).pGpa();
        }
        return new InteriorProfileChart(r, rho, p);
    }

    /** @param s a structure @return one line for people */
    public static String summaryLine(final Structure s) {
        return String.format(Locale.ROOT, "radius %.1f km (%.4f R_earth), core radius %.1f km, central pressure %.1f GPa,"
                + " core-mantle boundary %.1f GPa, mean density %.0f kg/m3", s.radiusKm(), s.radiusRearth(),
                s.coreRadiusKm(), s.centralGpa(), s.cmbGpa(), s.meanDensity());
    }

    /** @param v a verdict @return one line for people */
    public static String verdictLine(final PlanetVerdict v) {
        return String.format(Locale.ROOT, "%s (%s): core mass fraction %.2f (%.2f-%.2f) from mass and radius, %.2f "
                + "(%.2f-%.2f) from the star; difference %.1f sigma, agreement probability %.2f; %.0f %% of draws denser "
                + "than iron, %.0f %% lighter than rock.", v.planet().planet(), v.planet().star(), v.measured().median(),
                v.measured().p16(), v.measured().p84(), v.predicted()[0], v.predicted()[1], v.predicted()[2],
                v.differenceSigma(), v.agreement(), 100 * v.measured().denserThanIron(),
                100 * v.measured().lighterThanRock()) + (v.measured().denserThanIron() + v.measured().lighterThanRock() > 0.5
                ? " Most draws lie outside pure rock to pure iron: the core mass fraction is not measured and the"
                        + " difference is only a bound." : "");
    }
}
