package org.nebulith.cli;

import java.util.List;

import org.nebulith.disk.DiskModel;
import org.nebulith.equilibrium.StateDomain;
import org.nebulith.errors.InputException;
import org.nebulith.thermo.Species;

/**
 * Range checks of temperatures and pressures against what the data set covers
 * ({@link StateDomain}), made before anything is computed: a value outside is bad input naming the
 * option, the value and the accepted range.
 */
final class DomainChecks {
    private DomainChecks() {
    }

    /**
     * @param option  the option name
     * @param tK      its value [K]
     * @param species the species selection
     */
    static void temperature(final String option, final double tK, final List<Species> species) {
        double lo = StateDomain.minTemperatureK(species);
        double hi = StateDomain.maxTemperatureK(species);
        if (!(tK >= lo && tK <= hi)) {
            throw InputException.atOption(option, tK, "outside the temperature range of the data",
                    StateDomain.temperatureRange(lo, hi));
        }
    }

    /** @param option the option name @param pBar its value [bar] */
    static void pressure(final String option, final double pBar) {
        if (!StateDomain.coversPressure(pBar)) {
            throw InputException.atOption(option, pBar, "outside the pressure range of the model", StateDomain.pressureRange());
        }
    }

    /**
     * Checks the disk where equilibria are computed: wherever the midplane is at or above the
     * floor temperature between rMin and rMax (200 log-spaced radii and both ends), T must be
     * within the data and P within the model's range.
     *
     * @param option  the option naming the disk
     * @param name    the disk as the user named it
     * @param disk    the disk
     * @param rMinAU  innermost radius used [AU]
     * @param rMaxAU  outermost radius used [AU]
     * @param floorK  the floor temperature [K]
     * @param species the species selection
     */
    static void disk(final String option, final String name, final DiskModel disk, final double rMinAU,
                     final double rMaxAU, final double floorK, final List<Species> species) {
        String problem = org.nebulith.zones.DiskDomain.problem(disk, rMinAU, rMaxAU, floorK, species);
        if (problem != null) {
            throw InputException.atOption(option, name, problem, "a disk whose T stays within "
                    + StateDomain.temperatureRange(StateDomain.minTemperatureK(species), StateDomain.maxTemperatureK(species))
                    + " and P within " + StateDomain.pressureRange() + " above the floor temperature");
        }
    }
}
