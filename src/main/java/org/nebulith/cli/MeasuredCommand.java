package org.nebulith.cli;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;

import org.nebulith.composition.SolarReference;
import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;
import org.nebulith.errors.NumericalException;
import org.nebulith.measured.HostStarTest;
import org.nebulith.measured.MeasuredPlanet;
import org.nebulith.measured.PlanetVerdict;
import org.nebulith.measured.PlanetsFileReader;
import org.nebulith.measured.StoichiometricEstimator;
import org.nebulith.planet.interior.CoreComposition;
import org.nebulith.planet.interior.InteriorModel;
import org.nebulith.planet.interior.MantleComposition;
import org.nebulith.planet.interior.StructureException;
import org.nebulith.progress.Progress;
import org.nebulith.files.RunFolder;
import org.nebulith.report.chart.Curve;
import org.nebulith.report.interior.InteriorReportWriter;
import org.nebulith.survey.CatalogueProblem;
import org.nebulith.survey.CatalogueReader;
import org.nebulith.survey.PlanetEstimator;
import org.nebulith.survey.PlanetSurveyEstimator;
import org.nebulith.survey.StarRow;
import org.nebulith.survey.SurveySettings;
import org.nebulith.zones.FeedingZone;
import org.nebulith.zones.KernelShape;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code nebulith measured}: the host-star test of planets with a measured mass and radius.
 */
@Command(name = "measured",
        description = {
            "Host-star test of measured planets: the core mass fraction from each planet's",
            "mass and radius (interior model, Monte Carlo over the errors) against the one",
            "predicted from its star's abundances (the survey's Monte Carlo), in standard",
            "deviations. Planets CSV with the header",
            PlanetsFileReader.HEADER + "[,a_AU];",
            "stars: a survey catalogue. Without --disk/--zones the star's planet is that of",
            "a zone where every rock-forming element condensed; with --disk, a_AU places a",
            "zone (a +- 0.1 a) in that disk.",
            "Writes into --out (default reports/measured-<yyyyMMdd-HHmmss>/): planets.csv,",
            "  mass-radius and core-fraction-comparison charts (.png/.svg/.pdf), report.html.",
        },
        footerHeading = "%nExamples:%n",
        footer = {
            "  nebulith measured --planets presets/demo-planets.csv \\",
            "      --catalogue presets/demo-catalogue.csv",
            "  nebulith measured --planets P.csv --catalogue C.csv \\",
            "      --disk steady-viscous-default --draws 100",
        })
public final class MeasuredCommand extends RunCommand {

    @Mixin
    private RunOptions output;

    @Override
    protected OutputTarget outputTarget() {
        return output;
    }
    private static final double ZONE_HALF_WIDTH = 0.1;

    @Option(names = "--planets", required = true, paramLabel = "FILE", description = "Planets file (CSV; see above).")
    private Path planetsFile;

    @Option(names = "--catalogue", required = true, paramLabel = "FILE", description = "Star catalogue (survey format).")
    private Path catalogue;

    @Option(names = "--draws", paramLabel = "N", defaultValue = "1000",
            description = "Monte Carlo draws per star (default: ${DEFAULT-VALUE}).")
    private int draws;

    @Option(names = "--planet-draws", paramLabel = "N", defaultValue = "4000",
            description = "Monte Carlo draws of each planet's mass and radius (default: ${DEFAULT-VALUE}).")
    private int planetDraws;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Seed (default: ${DEFAULT-VALUE}).")
    private long seed;

    @Option(names = "--disk", paramLabel = "NAME|FILE", description = "Disk preset or file for the star's prediction.")
    private String disk;

    @Option(names = "--zones", paramLabel = "FILE",
            description = "Feeding-zone file for the star's prediction (the zone named like the planet, else the first).")
    private String zones;

    @Option(names = "--solar-reference", paramLabel = "REF", defaultValue = "asplund2009",
            description = "Solar reference of the catalogue: asplund2009 (default) or lodders2003.")
    private String solarReference;

    @Option(names = "--core-Si-wt-pct", paramLabel = "X", defaultValue = "0",
            description = "Si in the planets' cores [wt%%] in the interior model. Default: ${DEFAULT-VALUE}.")
    private double coreSi;

    @Option(names = "--core-O-wt-pct", paramLabel = "X", defaultValue = "0",
            description = "O in the planets' cores [wt%%] in the interior model. Default: ${DEFAULT-VALUE}.")
    private double coreO;

    @Override
    protected int execute(final RunContext context) throws IOException {
        checkOptions();
        context.input(planetsFile, "planets");
        context.input(catalogue, "catalogue");
        org.nebulith.survey.CatalogueCheck.registerNamedFiles(catalogue, catalogue.toString(), context.inputs());
        for (String f : new String[] {disk, zones}) {
            if (f != null && Files.isRegularFile(Path.of(f))) {
                context.input(Path.of(f), "disk or zones");
            }
        }
        List<MeasuredPlanet> planets;
        try (Reader r = Files.newBufferedReader(planetsFile, StandardCharsets.UTF_8)) {
            planets = PlanetsFileReader.read(r, planetsFile.toString());
        }
        Map<String, StarRow> stars = readCatalogue();
        CoreComposition core = core();
        HostStarTest test = new HostStarTest(core, planetDraws);
        SurveySettings settings = new SurveySettings(draws, seed, solar(), disk, zones);
        for (MeasuredPlanet p : planets) {
            check(p, stars, test);
        }
        try (RunFolder run = context.openRunFolder(context.defaultRunName())) {
            List<PlanetVerdict> verdicts = verdicts(context, planets, stars, test, settings);
            double[] masses = curveMasses(planets);
            List<Curve> curves = curves(masses, core);
            InteriorReportWriter.writeMeasured(run, InteriorCommand.header(context, "nebulith measured"), verdicts,
                    masses, curves, scenario());
            Path done = run.commit();
            verdicts.forEach(v -> context.out().println(InteriorReportWriter.verdictLine(v)));
            context.out().println("report: " + done.resolve("report.html"));
            context.cautions(InteriorReportWriter.MEASURED_CAUTIONS, done.resolve("report.html"));
        }
        return ExitCodes.OK;
    }

    private List<PlanetVerdict> verdicts(RunContext context, List<MeasuredPlanet> planets, Map<String, StarRow> stars,
                                         HostStarTest test, SurveySettings settings) throws IOException {
        List<PlanetVerdict> verdicts = new ArrayList<>();
        try (Progress progress = context.progress("planets", planets.size())) {
            for (MeasuredPlanet p : planets) {
                verdicts.add(verdict(p, stars.get(p.star()), test, settings));
                progress.step();
            }
        } catch (StructureException e) {
            throw new NumericalException(Messages.STRUCTURE_FAILURE, e, e.getMessage());
        }
        return verdicts;
    }
    private void checkOptions() {
        if (draws < 1) {
            throw InputException.atOption("--draws", draws, "must be at least 1", "an integer >= 1");
        }
        if (planetDraws < 1) {
            throw InputException.atOption("--planet-draws", planetDraws, "must be at least 1", "an integer >= 1");
        }
    }

    private CoreComposition core() {
        try {
            return new CoreComposition(coreSi, coreO);
        } catch (IllegalArgumentException e) {
            throw InputException.atOption("--core-Si-wt-pct", coreSi, e.getMessage(), "Si, O >= 0 with metal left");
        }
    }

    private String scenario() {
        if (disk == null && zones == null) {
            return "The star's prediction: every rock-forming element condensed (stoichiometric assumption of Santos "
                    + "et al. 2015), with the survey's Monte Carlo over the abundance errors (" + draws + " draws).";
        }
        return "The star's prediction: equilibrium condensation in the disk " + (disk == null ? "(default)" : disk)
                + (zones == null ? "" : " with the zones of " + zones) + ", with the survey's Monte Carlo (" + draws
                + " draws).";
    }

    private Map<String, StarRow> readCatalogue() throws IOException {
        Map<String, StarRow> stars = new LinkedHashMap<>();
        try (CatalogueReader reader = CatalogueReader.open(catalogue)) {
            for (CatalogueProblem p : reader.headerProblems()) {
                throw new InputException(Messages.BAD_INPUT_FILE, null, catalogue, p.problem(), p.accepted());
            }
            CatalogueReader.Parsed row;
            while ((row = reader.next()) != null) {
                if (!row.problems().isEmpty()) {
                    CatalogueProblem q = row.problems().get(0);
                    throw InputException.atField(catalogue, q.line(), q.column(), q.value(),
                            q.star().isEmpty() ? q.problem() : "star '" + q.star() + "': " + q.problem(), q.accepted());
                }
                if (stars.put(row.row().star(), row.row()) != null) {
                    throw InputException.atField(catalogue, row.line(), "star", row.star(),
                            "appears twice", "one row per star");
                }
            }
        }
        return stars;
    }

    private void check(final MeasuredPlanet p, final Map<String, StarRow> stars, final HostStarTest test) {
        if (!stars.containsKey(p.star())) {
            throw InputException.atField(planetsFile, p.line(), "star", p.star(), "unknown star",
                    "a star of " + catalogue);
        }
        double largest;
        try {
            largest = test.largestRadius(p);
        } catch (StructureException e) {
            throw new NumericalException(Messages.STRUCTURE_FAILURE, e, e.getMessage());
        }
        if (p.radius() > largest) {
            throw InputException.atField(planetsFile, p.line(), "radius_Rearth", p.radius(),
                    String.format(Locale.ROOT, "radius %s R_earth is larger than any rocky body of %s M_earth allows (%.3f R_earth for 75 %% water"
                            + " on rock); such a planet needs a gas envelope", p.radius(), p.mass(), largest),
                    String.format(Locale.ROOT, "a radius up to %.3f R_earth", largest));
        }
    }

    private PlanetVerdict verdict(final MeasuredPlanet p, final StarRow star, final HostStarTest test,
                                  final SurveySettings settings) throws IOException {
        long planetSeed = seed * 1_000_003L + p.line();
        if (disk == null && zones == null) {
            return test.test(p, star, StoichiometricEstimator.ZONE, new StoichiometricEstimator(), settings, planetSeed);
        }
        PlanetSurveyEstimator estimator;
        String zone;
        if (p.aAU().isPresent() && zones == null) {
            double a = p.aAU().getAsDouble();
            FeedingZone z = new FeedingZone(p.planet(), KernelShape.TOPHAT, a, ZONE_HALF_WIDTH * a,
                    OptionalDouble.of(p.mass()));
            estimator = PlanetSurveyEstimator.create(settings, List.of(z));
            zone = p.planet();
        } else {
            estimator = (PlanetSurveyEstimator) SurveyCommand.estimator(settings);
            zone = estimator.zones().get(0).name();
            for (FeedingZone z : estimator.zones()) {
                if (z.name().equals(p.planet())) {
                    zone = z.name();
                }
            }
        }
        PlanetEstimator forStar = estimator;
        return test.test(p, star, zone, forStar, settings, planetSeed);
    }

    private static double[] curveMasses(final List<MeasuredPlanet> planets) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        for (MeasuredPlanet p : planets) {
            lo = Math.min(lo, p.mass());
            hi = Math.max(hi, p.mass());
        }
        lo = Math.max(InteriorModel.MASS_MIN, Math.min(0.5, lo / 2));
        hi = Math.min(InteriorModel.MASS_MAX, Math.max(10, hi * 2));
        int n = 16;
        double[] m = new double[n];
        for (int i = 0; i < n; i++) {
            m[i] = Math.exp(Math.log(lo) + (Math.log(hi) - Math.log(lo)) * i / (n - 1));
        }
        return m;
    }

    private static List<Curve> curves(final double[] masses, final CoreComposition core) {
        Object[][] specs = {{"rock, core mass fraction 0", 0.0, 0.0}, {"Earth-like, 0.325", 0.325, 0.0},
            {"core mass fraction 0.5", 0.5, 0.0}, {"pure iron", 1.0, 0.0}, {"50 % water on Earth-like rock", 0.325, 0.5}};
        List<Curve> out = new ArrayList<>();
        for (Object[] s : specs) {
            double[] r = new double[masses.length];
            for (int i = 0; i < masses.length; i++) {
                r[i] = InteriorCommand.solve(new InteriorModel(masses[i], (Double) s[1], (Double) s[2],
                        MantleComposition.magnesiumSilicate(), core)).radiusRearth();
            }
            out.add(new Curve((String) s[0], r));
        }
        return out;
    }

    private SolarReference solar() {
        return SolarReferences.parse(solarReference);
    }
}
