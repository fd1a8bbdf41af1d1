package org.nebulith.cli;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;
import org.nebulith.errors.NumericalException;
import org.nebulith.planet.interior.CoreComposition;
import org.nebulith.planet.interior.InteriorModel;
import org.nebulith.planet.interior.MantleComposition;
import org.nebulith.planet.interior.Structure;
import org.nebulith.planet.interior.StructureException;
import org.nebulith.planet.interior.StructureSolver;
import org.nebulith.files.RunFolder;
import org.nebulith.report.html.Report;
import org.nebulith.report.interior.InteriorReportWriter;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * {@code nebulith interior}: the cold interior structure of a layered planet (iron core, silicate
 * mantle, optional water) of a given mass and composition.
 */
@Command(name = "interior",
        description = {
            "Interior structure of a rocky planet: radius, core radius, central and",
            "core-mantle boundary pressures, and the profile of mass, pressure, density and",
            "gravity. Cold structure with published equations of state (iron core,",
            "olivine-pyroxene, bridgmanite and post-bridgmanite mantle, optional ice VII).",
            "Writes into --out (default reports/interior-<yyyyMMdd-HHmmss>/):",
            "  interior-structure.csv, interior-profile.csv, interior-profile chart",
            "  (.png/.svg/.pdf), report.html.",
        },
        footerHeading = "%nExamples:%n",
        footer = {
            "  nebulith interior --mass-Mearth 1 --core-mass-fraction 0.325",
            "  nebulith interior --mass-Mearth 4 --core-mass-fraction 0.3 \\",
            "      --water-mass-fraction 0.2",
            "  nebulith interior --mass-Mearth 1 \\",
            "      --bulk reports/planet-X/bulk-composition.csv --zone inner",
        })
public final class InteriorCommand extends RunCommand {

    @Mixin
    private RunOptions output;

    @Override
    protected OutputTarget outputTarget() {
        return output;
    }

    @Option(names = "--mass-Mearth", required = true, paramLabel = "M", description = "Planet mass [M_earth].")
    private double mass;

    @Option(names = "--core-mass-fraction", paramLabel = "X",
            description = "Core mass / rock mass (water excluded), 0..1 (default 0.325, or the zone's with --bulk).")
    private Double coreMassFraction;

    @Option(names = "--water-mass-fraction", paramLabel = "W",
            description = "Water mass / planet mass, 0..<1 (default 0, or the zone's with --bulk).")
    private Double waterMassFraction;

    @Option(names = "--mantle-Mg-number", paramLabel = "N",
            description = "Mantle 100 Mg/(Mg+Fe) molar (default 100, or the zone's with --bulk).")
    private Double mgNumber;

    @Option(names = "--mantle-Mg-Si", paramLabel = "R",
            description = "Mantle Mg/Si molar (default: Mg#/100, i.e. (Mg+Fe)/Si = 1, MgSiO3; or the zone's with --bulk).")
    private Double mgSi;

    @Option(names = "--core-Si-wt-pct", paramLabel = "X", defaultValue = "0",
            description = "Si in the core [wt%% of the core]. Default: ${DEFAULT-VALUE}.")
    private double coreSi;

    @Option(names = "--core-O-wt-pct", paramLabel = "X", defaultValue = "0",
            description = "O in the core [wt%% of the core]. Default: ${DEFAULT-VALUE}.")
    private double coreO;

    @Option(names = "--bulk", paramLabel = "FILE",
            description = "A planet run's bulk-composition.csv: core mass fraction, mantle Mg#, Mg/Si and water from --zone.")
    private Path bulk;

    @Option(names = "--zone", paramLabel = "NAME", description = "The zone of --bulk to use.")
    private String zone;

    @Override
    protected int execute(final RunContext context) throws IOException {
        InteriorModel model = model(context);
        try (RunFolder run = context.openRunFolder(context.defaultRunName())) {
            Structure s = solve(model);
            InteriorReportWriter.writeInterior(run, header(context, "nebulith interior"), s);
            Path done = run.commit();
            context.out().println(InteriorReportWriter.summaryLine(s));
            context.out().println("report: " + done.resolve("report.html"));
            context.cautions(InteriorReportWriter.CAUTIONS, done.resolve("report.html"));
        }
        return ExitCodes.OK;
    }

    /**
     * @param model a planet
     * @return its structure
     * @throws NumericalException if it cannot be solved
     */
    static Structure solve(final InteriorModel model) {
        try {
            return new StructureSolver().solve(model);
        } catch (StructureException e) {
            throw new NumericalException(Messages.STRUCTURE_FAILURE, e, e.getMessage());
        }
    }

    /** @return the run's report header */
    static InteriorReportWriter.Header header(final RunContext context, final String command) {
        List<Report.Setting> settings = new ArrayList<>();
        context.settings().forEach(x -> settings.add(new Report.Setting(x.key(), x.value(), x.origin())));
        return new InteriorReportWriter.Header(command, context.toolVersion(), context.started(), settings,
                context.inputs());
    }

    private InteriorModel model(final RunContext context) throws IOException {
        if (!(mass >= InteriorModel.MASS_MIN && mass <= InteriorModel.MASS_MAX)) {
            throw InputException.atOption("--mass-Mearth", mass, "outside the interior model's range",
                    InteriorModel.MASS_MIN + " to " + InteriorModel.MASS_MAX);
        }
        Map<String, Double> zoneValues = bulk == null ? Map.of() : readBulk(context);
        double cmf = pick(coreMassFraction, zoneValues.get("core_mass_fraction"), 0.325);
        double water = pick(waterMassFraction, zoneValues.get("water_mass_fraction"), 0);
        double mg = pick(mgNumber, zoneValues.get("mantle_Mg_number"), 100);
        if (!(cmf >= 0 && cmf <= 1)) {
            throw InputException.atOption("--core-mass-fraction", cmf, "not a fraction", "a number from 0 to 1");
        }
        if (!(water >= 0 && water < 1)) {
            throw InputException.atOption("--water-mass-fraction", water, "not a fraction below 1", "0 <= W < 1");
        }
        if (!(mg > 0 && mg <= 100)) {
            throw InputException.atOption("--mantle-Mg-number", mg, "not a Mg#", "a number in (0, 100]");
        }
        Double bulkMgSi = zoneValues.containsKey("mantle_MgO_wt_pct") && zoneValues.containsKey("mantle_SiO2_wt_pct")
                ? (zoneValues.get("mantle_MgO_wt_pct") / 40.304) / (zoneValues.get("mantle_SiO2_wt_pct") / 60.084) : null;
        double ratio = pick(mgSi, bulkMgSi, mg / 100);
        if (!(ratio > 0) || ratio / (mg / 100) < 0.5 || ratio / (mg / 100) > 4) {
            throw InputException.atOption("--mantle-Mg-Si", ratio, "gives (Mg+Fe)/Si outside the model's range",
                    "(Mg/Si)/(Mg#/100) from 0.5 to 4");
        }
        CoreComposition core;
        try {
            core = new CoreComposition(coreSi, coreO);
        } catch (IllegalArgumentException e) {
            throw InputException.atOption("--core-Si-wt-pct", coreSi, e.getMessage(), "Si, O >= 0 with metal left");
        }
        return new InteriorModel(mass, cmf, water, MantleComposition.of(ratio, mg), core);
    }

    private static double pick(final Double option, final Double fromFile, final double fallback) {
        return option != null ? option : fromFile != null ? fromFile : fallback;
    }

    private Map<String, Double> readBulk(final RunContext context) throws IOException {
        if (zone == null) {
            throw InputException.atOption("--bulk", bulk, "needs --zone", "--zone NAME of a zone in the file");
        }
        context.input(bulk, "bulk composition");
        Map<String, Double> values = new HashMap<>();
        long line = 0;
        try (Reader r = Files.newBufferedReader(bulk, StandardCharsets.UTF_8)) {
            for (String text : new java.io.BufferedReader(r).lines().toList()) {
                line++;
                String[] f = text.split(",", -1);
                if (line == 1) {
                    if (!text.startsWith("zone,quantity,value,unit")) {
                        throw InputException.atField(bulk, 1, "(header)", text, "not a bulk-composition.csv",
                                "zone,quantity,value,unit");
                    }
                    continue;
                }
                if (f.length >= 3 && f[0].equals(zone)) {
                    try {
                        values.put(f[1], Double.parseDouble(f[2]));
                    } catch (NumberFormatException e) {
                        throw InputException.atField(bulk, line, "value", f[2], "not a number", "a number");
                    }
                }
            }
        }
        if (!values.containsKey("core_mass_fraction")) {
            throw InputException.atOption("--zone", zone, "no core_mass_fraction for this zone in " + bulk,
                    "a zone of the file with rock");
        }
        return values;
    }
}
