package org.nebulith.cli;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.nebulith.condensation.CondensationSequence;
import org.nebulith.condensation.ElementCondensation;
import org.nebulith.condensation.PressurePath;
import org.nebulith.condensation.SequenceRunner;
import org.nebulith.condensation.SequenceSettings;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.ConvergenceException;
import org.nebulith.errors.Messages;
import org.nebulith.errors.NumericalException;
import org.nebulith.report.SourceList;
import org.nebulith.progress.Alongside;
import org.nebulith.report.planet.PlanetCharts;
import org.nebulith.survey.HostMonteCarlo;
import org.nebulith.thermo.Element;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.disk.DiskModel;
import org.nebulith.disk.DiskPresets;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.equilibrium.SystemSpec;
import org.nebulith.errors.InputException;
import org.nebulith.planet.FormationSettings;
import org.nebulith.planet.PlanetFormation;
import org.nebulith.planet.ZonePlanet;
import org.nebulith.progress.Progress;
import org.nebulith.files.RunFolder;
import org.nebulith.report.html.Report;
import org.nebulith.report.planet.PlanetReportWriter;
import org.nebulith.thermo.SpeciesDatabase;
import org.nebulith.zones.FeedingZone;
import org.nebulith.zones.LocalCondensation;
import org.nebulith.zones.ZoneCondensation;
import org.nebulith.zones.ZoneFileReader;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code nebulith planet}: bulk composition of the rocky planets of one or more feeding zones in a
 * disk, with their core-mantle split and a comparison with the host star and reference bodies.
 */
@Command(name = "planet",
        description = {
            "Bulk composition of rocky planets formed from their feeding zones in a disk.",
            "Integrates what condenses across each zone; core/mantle split; key ratios beside",
            "the host star, bulk Earth and CI chondrite. Without arguments it runs the",
            "built-in demo scenario (the invented star Tessaly, its disk and three planets).",
            "Writes into --out (default reports/planet-<yyyyMMdd-HHmmss>/):",
            "  bulk-composition.csv, comparison.csv, zone-phases.csv, radial-profile.csv,",
            "  radial-map and planet-comparison charts (.png/.svg/.pdf), report.html and",
            "  summary.md; prints one line per planet.",
        },
        footerHeading = "%nExamples:%n",
        footer = {
            "  nebulith planet              demo scenario (about a minute)",
            "  nebulith planet --preset tessaly-planets",
            "  nebulith planet --composition protosolar-lodders2003 --disk mmsn-hayashi1981 \\",
            "      --zones feeding-zones/demo-system.csv --out reports/mmsn-demo",
            "  nebulith planet --sulfide-in-mantle --core-Si-wt-pct 5 --variant B88",
        })
public final class PlanetCommand extends RunCommand {
    /** The demo zones, shipped on the classpath. */
    static final String DEMO_ZONES = "feeding-zones/demo-system.csv";
    /** Their name as a named input (working folder's feeding-zones/ first, then built-in). */
    static final String DEMO_ZONES_NAME = "demo-system";

    @Mixin
    private RunOptions output;

    @Override
    protected OutputTarget outputTarget() {
        return output;
    }

    /** Most radii of the radial profile (each is an equilibrium solve). */
    static final int MAX_PROFILE_POINTS = 10_000;

    @Mixin
    private ChemistryOptions chemistry;

    @Option(names = "--disk", paramLabel = "NAME|FILE", defaultValue = DiskPresets.STEADY_VISCOUS_DEFAULT,
            description = "Disk model: a preset (mmsn-hayashi1981, hot-early-disk, steady-viscous-default) or a "
                    + "disk file with the header parameter,value or the header "
                    + "r_AU,T_K,P_bar,sigma_gas_g_cm2 (table). Default: ${DEFAULT-VALUE}.")
    private String disk;

    @Option(names = "--zones", paramLabel = "FILE",
            description = "Feeding zones: a name in feeding-zones/ or a file with the header "
                    + "zone,shape,r_center_AU,half_width_AU[,planet_mass_Mearth]. Default: " + DEMO_ZONES_NAME + ".")
    private String zones;

    @Option(names = "--abundance-errors", paramLabel = "X=dex,...",
            description = "1-sigma errors of the host star's [X/H] [dex], e.g. Fe=0.05,Mg=0.04,Si=0.04: the "
                    + "comparison chart then shows 16th-84th percentile bars from a seeded Monte Carlo over them.")
    private String abundanceErrors;

    @Option(names = "--error-draws", paramLabel = "N", defaultValue = "40",
            description = "Monte Carlo draws for --abundance-errors. Default: ${DEFAULT-VALUE}.")
    private int errorDraws;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1",
            description = "Seed of the --abundance-errors Monte Carlo. Default: ${DEFAULT-VALUE}.")
    private long seed;

    @Mixin
    private PlanetOptions planet = new PlanetOptions();

    @Option(names = "--profile-points", paramLabel = "N", defaultValue = "160",
            description = "Radii of the radial profile. Default: ${DEFAULT-VALUE}.")
    private int profilePoints;

    @Override
    protected int execute(final RunContext context) throws IOException {
        chemistry.defaultComposition(AbundancePresets.DEMO_STAR);
        planet.check();
        if (profilePoints < 2 || profilePoints > MAX_PROFILE_POINTS) {
            throw InputException.atOption("--profile-points", profilePoints, profilePoints < 2 ? "too few radii"
                    : "too many radii (each is an equilibrium solve)", "an integer from 2 to " + MAX_PROFILE_POINTS);
        }
        Map<Element, Double> errors = errors();
        ElementAbundances gas = chemistry.composition(context);
        SystemSpec spec = chemistry.systemSpec(context);
        DiskModel diskModel = readDisk(context);
        List<FeedingZone> zoneList = readZones(context, diskModel);
        ZoneFileReader.overlaps(zoneList).forEach(line -> context.info("notice: " + line));
        DomainChecks.temperature("--floor-K", planet.floorK(), spec.species());
        DomainChecks.disk("--disk", disk, diskModel, PlanetFormation.profileMinAU(diskModel, zoneList),
                PlanetFormation.profileMaxAU(diskModel, zoneList), planet.floorK(), spec.species());
        try (RunFolder run = context.openRunFolder(context.defaultRunName())) {
            org.nebulith.report.chart.ChartRenderer.warmUpInBackground();
            return compute(context, run, gas, spec, diskModel, zoneList, errors);
        }
    }

    private int compute(RunContext context, RunFolder run, ElementAbundances gas, SystemSpec spec, DiskModel diskModel,
                        List<FeedingZone> zoneList, Map<Element, Double> errors) {
        FormationSettings settings = planet.settings(spec, ZoneCondensation.defaults());
        PlanetFormation formation = new PlanetFormation(settings, new EquilibriumSolver());
        List<ZonePlanet> planets;
        Path done;
        String task = "planet (" + zoneList.size() + (zoneList.size() == 1 ? " zone" : " zones")
                + ", radial profile, report)";
        try (Progress progress = context.progress(task, PlanetFormation.steps(zoneList, profilePoints) + 1L)) {
            // the host's condensation temperatures do not depend on the disk: the second core computes them
            Alongside<Map<Element, Double>> hostSequence = Alongside.start("host T50", () -> hostT50(spec, gas));
            PlanetFormation.Formation[] formed = new PlanetFormation.Formation[1];
            Map<Element, Double> t50 = hostSequence.joinAfter(
                    () -> formed[0] = formation.run(gas, diskModel, zoneList, profilePoints, progress));
            PlanetFormation.Formation result = formed[0];
            planets = result.planets();
            Map<String, double[][]> bands = errors == null ? null : HostMonteCarlo.offsets(gas, errors, diskModel,
                    zoneList, PlanetCharts.quantityNames(), errorDraws, seed);
            String errorNote = errors == null ? null
                    : errorDraws + " seeded draws (seed " + seed + ") of the host's [X/H] with 1-sigma errors "
                    + errors + " dex (other elements held), 16th to 84th percentile, run through the survey's planet "
                    + "estimate on this disk and these zones and centred on the values shown";
            done = writeOutputs(context, run, gas, diskModel, spec, planets, result.profile(), bands, t50, errorNote);
            progress.step();
        }
        for (ZonePlanet zp : planets) {
            context.out().println(PlanetReportWriter.summary(zp));
        }
        for (ZonePlanet zp : planets) {
            org.nebulith.planet.ZoneNotices.of(zp).forEach(n -> context.warn("notice: " + n));
        }
        context.out().println("report: " + done.resolve("report.html"));
        context.info("cautions: " + PlanetReportWriter.cautions(spec.describe()).size()
                + " on model assumptions and data limits, in "
                + done.resolve("report.html") + " (and summary.md)");
        return ExitCodes.OK;
    }

    private Path writeOutputs(RunContext context, RunFolder run, ElementAbundances gas, DiskModel diskModel,
                              SystemSpec spec, List<ZonePlanet> planets, List<LocalCondensation.Local> scan,
                              Map<String, double[][]> bands, Map<Element, Double> t50, String errorNote) {
        List<Report.Setting> settings = new ArrayList<>();
        context.settings().forEach(s -> settings.add(new Report.Setting(s.key(), s.value(), s.origin())));
        List<Report.Citation> extra = new ArrayList<>();
        extra.add(new Report.Citation("disk", diskModel.description()));
        extra.add(new Report.Citation("reference bodies", PlanetCharts.REFERENCE_SOURCES));
        extra.add(new Report.Citation("Zeng2016", "Zeng L., Sasselov D.D. & Jacobsen S.B. (2016) ApJ 819, 127: "
                + "mass-radius relation of rocky planets (radius_Rearth_Zeng2016 in bulk-composition.csv)"));
        List<Report.Citation> sources = SourceList.of(chemistry.citeComposition(context), spec.species(),
                gas.elements(), SpeciesDatabase.bundled().sources(), extra);
        PlanetReportWriter.RunData data = new PlanetReportWriter.RunData("Nebulith planet report",
                "nebulith planet", context.toolVersion(), context.started(), chemistry.describeComposition(),
                gas, diskModel, spec.describe(), planets, scan, settings, context.inputs(), sources, bands, errorNote,
                t50, chemistry.ciReference());
        PlanetReportWriter.write(run, data);
        return run.commit();
    }

    /**
     * 50% condensation temperatures of the gas at 1e-4 bar (the usual reference pressure), equilibrium
     * condensation on a 5 K grid bisected to 0.5 K, for the devolatilisation pattern.
     */
    private static Map<Element, Double> hostT50(SystemSpec spec, ElementAbundances gas) {
        ChemicalSystem system = spec.build(gas.elements());
        double[] totals = new double[system.elementCount()];
        for (int j = 0; j < totals.length; j++) {
            totals[j] = gas.moles(system.elements().get(j));
        }
        SequenceSettings s = new SequenceSettings(PressurePath.constant(1e-4), 2000, 250, 5, 0, 0.5);
        CondensationSequence seq;
        try {
            seq = new SequenceRunner(new EquilibriumSolver()).run(system, totals, s);
        } catch (ConvergenceException e) {
            throw new NumericalException(Messages.SEQUENCE_STOPPED, e, e.getMessage());
        }
        Map<Element, Double> out = new java.util.EnumMap<>(Element.class);
        for (ElementCondensation ec : seq.condensationTemperatures()) {
            if (ec.t50K().isPresent()) {
                out.put(ec.element(), ec.t50K().getAsDouble());
            }
        }
        return out;
    }

    /** @return the --abundance-errors by element, or null when not given */
    private Map<Element, Double> errors() {
        if (abundanceErrors == null) {
            return null;
        }
        if (errorDraws < 2) {
            throw InputException.atOption("--error-draws", errorDraws, "too few draws", "an integer >= 2");
        }
        Map<Element, Double> out = new java.util.EnumMap<>(Element.class);
        for (String part : abundanceErrors.split(",")) {
            String[] kv = part.split("=", 2);
            Element e = kv.length == 2 ? Element.fromSymbol(kv[0].strip()) : null;
            double v;
            try {
                v = kv.length == 2 ? Double.parseDouble(kv[1].strip()) : Double.NaN;
            } catch (NumberFormatException x) {
                v = Double.NaN;
            }
            if (e == null || !(v >= 0) || !Double.isFinite(v) || e == Element.H) {
                throw InputException.atOption("--abundance-errors", part, "not an element and a 1-sigma error",
                        "X=dex pairs separated by commas, X an element other than H, dex >= 0 (e.g. Fe=0.05,Mg=0.04)");
            }
            out.put(e, v);
        }
        return out;
    }

    private DiskModel readDisk(RunContext context) throws IOException {
        Optional<PresetCatalogue.Entry> named = PresetCatalogue.here().find(PresetCatalogue.Kind.DISK, disk);
        if (named.isPresent()) {
            context.namedInput(named.get(), "disk preset");
            return DiskPresets.read(new StringReader(named.get().text()), named.get().shown());
        }
        Path p = Path.of(disk);
        if (Files.exists(p)) {
            context.input(p, "disk");
        }
        if (!DiskPresets.NAMES.contains(disk) && !Files.isRegularFile(p)) {
            throw InputException.atOption("--disk", disk, "neither a disk preset nor a file",
                    String.join(", ", DiskPresets.NAMES) + ", or a disk file");
        }
        return DiskPresets.resolve(disk);
    }

    private List<FeedingZone> readZones(RunContext context, DiskModel diskModel) throws IOException {
        String name = zones != null ? zones : DEMO_ZONES_NAME;
        Optional<PresetCatalogue.Entry> named = PresetCatalogue.here().find(PresetCatalogue.Kind.ZONES, name);
        if (named.isPresent()) {
            context.namedInput(named.get(), "feeding zones");
            return ZoneFileReader.read(new StringReader(named.get().text()), named.get().shown(), diskModel);
        }
        Path f = context.input(Path.of(zones), "feeding zones");
        try (Reader r = Files.newBufferedReader(f, StandardCharsets.UTF_8)) {
            return ZoneFileReader.read(r, zones, diskModel);
        }
    }
}
