package org.nebulith.cli;

import java.io.IOException;
import java.util.List;

import org.nebulith.equilibrium.SystemSpec;
import org.nebulith.errors.InputException;
import org.nebulith.planet.CoreOptions;
import org.nebulith.planet.FormationOptions;
import org.nebulith.planet.FormationSettings;
import org.nebulith.zones.ZoneCondensation;

import picocli.CommandLine.Option;

/**
 * The options of a planet estimate beyond the chemistry: floor temperature and core formation,
 * shared by {@code planet} and {@code survey}. Each bad value is reported against its option.
 */
public final class PlanetOptions {

    /** Lowest accepted floor temperature [K]: the mineral data start at 200 K. */
    static final double MIN_FLOOR_K = 200;

    @Option(names = "--sulfide-in-mantle", description = "Keep sulfides in the mantle (default: in the core).")
    private boolean sulfideInMantle;

    @Option(names = "--core-Si-wt-pct", paramLabel = "X", defaultValue = "0",
            description = "Si in the core [wt%% of the core], taken from the mantle. Default: ${DEFAULT-VALUE}.")
    private double coreSi;

    @Option(names = "--core-O-wt-pct", paramLabel = "X", defaultValue = "0",
            description = "O in the core [wt%% of the core], taken from the mantle. Default: ${DEFAULT-VALUE}.")
    private double coreO;

    @Option(names = "--floor-K", paramLabel = "T", defaultValue = "300",
            description = "Lowest equilibrium temperature [K], at least 200; colder gas keeps its rock and adds "
                    + "water ice. Default: ${DEFAULT-VALUE}.")
    private double floorK;

    /** Checks every option of this group (before anything is read or computed). */
    void check() {
        floorK();
        core();
    }

    /** @return the checked core options */
    CoreOptions core() {
        checkWtPct("--core-Si-wt-pct", coreSi);
        checkWtPct("--core-O-wt-pct", coreO);
        if (!(coreSi + coreO < 50)) {
            throw InputException.atOption("--core-O-wt-pct", coreO, "with --core-Si-wt-pct " + coreSi
                    + " the light elements reach 50 wt% of the core", "--core-Si-wt-pct + --core-O-wt-pct < 50");
        }
        return new CoreOptions(!sulfideInMantle, coreSi, coreO);
    }

    /** @return the checked floor temperature [K] */
    double floorK() {
        if (!(floorK >= MIN_FLOOR_K) || Double.isInfinite(floorK)) {
            throw InputException.atOption("--floor-K", floorK, "below the start of the mineral data",
                    "a temperature of at least " + (int) MIN_FLOOR_K + " K");
        }
        return floorK;
    }

    /**
     * @param spec        the chemical system
     * @param integration the zone integration
     * @return the planet settings
     */
    FormationSettings settings(SystemSpec spec, ZoneCondensation integration) {
        return new FormationSettings(spec, integration, floorK(), core());
    }

    /**
     * @param system  the chemistry options (checked here)
     * @param context the run (files are registered as inputs)
     * @return every planet option as plain values, for a survey
     * @throws IOException if a list or species file cannot be read
     */
    FormationOptions formationOptions(SystemOptions system, RunContext context) throws IOException {
        SystemOptions.Selection s = system.select(context);
        CoreOptions c = core();
        return new FormationOptions(system.dataSet(), system.variants(),
                system.speciesFile().map(p -> p.toAbsolutePath().toString()).orElse(null),
                s.gases().map(List::copyOf).orElse(null), s.condensed().map(List::copyOf).orElse(null),
                s.solutionNames(), floorK(), c.sulfideInCore(), c.coreSiWtPct(), c.coreOWtPct());
    }

    private static void checkWtPct(String option, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw InputException.atOption(option, value, "not a fraction of the core", "a number of wt% >= 0");
        }
    }
}
