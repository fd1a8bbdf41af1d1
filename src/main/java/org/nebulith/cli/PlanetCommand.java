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
        ElementAbundances gas = chemistry.composition(context);
        SystemSpec spec = chemistry.systemSpec(context);
        DiskModel diskModel = readDisk(context);
        List<FeedingZone> zoneList = readZones(context, diskModel);
        ZoneFileReader.overlaps(zoneList).forEach(line -> context.info("notice: " + line));
        DomainChecks.temperature("--floor-K", planet.floorK(), spec.species());
        DomainChecks.disk("--disk", disk, diskModel, PlanetFormation.profileMinAU(diskModel, zoneList),
                PlanetFormation.profileMaxAU(diskModel, zoneList), planet.floorK(), spec.species());
        try (RunFolder run = context.openRunFolder(context.defaultRunName())) {
            return compute(context, run, gas, spec, diskModel, zoneList);
        }
    }

    private int compute(RunContext context, RunFolder run, ElementAbundances gas, SystemSpec spec, DiskModel diskModel,
                        List<FeedingZone> zoneList) {
        FormationSettings settings = planet.settings(spec, ZoneCondensation.defaults());
        PlanetFormation formation = new PlanetFormation(settings, new EquilibriumSolver());
        List<ZonePlanet> planets;
        Path done;
        String task = "planet (" + zoneList.size() + (zoneList.size() == 1 ? " zone" : " zones")
                + ", radial profile, report)";
        try (Progress progress = context.progress(task, PlanetFormation.steps(zoneList, profilePoints) + 1L)) {
            PlanetFormation.Formation result = formation.run(gas, diskModel, zoneList, profilePoints, progress);
            planets = result.planets();
            done = writeOutputs(context, run, gas, diskModel, spec, planets, result.profile());
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
                              SystemSpec spec, List<ZonePlanet> planets, List<LocalCondensation.Local> scan) {
        List<Report.Setting> settings = new ArrayList<>();
        context.settings().forEach(s -> settings.add(new Report.Setting(s.key(), s.value(), s.origin())));
        List<Report.Citation> sources = new ArrayList<>();
        for (Map.Entry<String, String> e : SpeciesDatabase.bundled().sources().entrySet()) {
            sources.add(new Report.Citation(e.getKey(), e.getValue()));
        }
        PlanetReportWriter.RunData data = new PlanetReportWriter.RunData("Nebulith planet report",
                "nebulith planet", context.toolVersion(), context.started(), chemistry.describeComposition(),
                gas, diskModel, spec.describe(), planets, scan, settings, context.inputs(), sources,
                chemistry.ciReference());
        PlanetReportWriter.write(run, data);
        return run.commit();
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
