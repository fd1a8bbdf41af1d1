package org.nebulith.zones;

import java.util.List;
import java.util.Locale;

import org.nebulith.disk.DiskModel;
import org.nebulith.disk.DiskState;
import org.nebulith.equilibrium.StateDomain;
import org.nebulith.thermo.Species;

/**
 * Whether a disk stays inside the temperatures and pressures the data cover
 * ({@link StateDomain}) wherever equilibria are computed: between two radii, at every radius
 * whose midplane is at or above the floor temperature (below it the assemblage is frozen).
 */
public final class DiskDomain {
    /** Radii sampled between the ends (log-spaced). */
    private static final int SAMPLES = 200;

    private DiskDomain() {
    }

    /**
     * @param disk    the disk
     * @param rMinAU  innermost radius used [AU] (clipped to the disk's range)
     * @param rMaxAU  outermost radius used [AU] (clipped to the disk's range)
     * @param floorK  the floor temperature [K]
     * @param species the species selection
     * @return null if the disk stays inside, else the first offending state, e.g.
     *         "T = 7000 K at r = 0.01 AU"
     */
    public static String problem(DiskModel disk, double rMinAU, double rMaxAU, double floorK, List<Species> species) {
        double lo = Math.max(disk.rMinAU(), Math.min(rMinAU, rMaxAU));
        double hi = Math.min(disk.rMaxAU(), Math.max(rMinAU, rMaxAU));
        if (!(hi >= lo)) {
            return null;
        }
        double tMin = StateDomain.minTemperatureK(species);
        double tMax = StateDomain.maxTemperatureK(species);
        for (int i = 0; i <= SAMPLES; i++) {
            double r = i == SAMPLES ? hi : lo * Math.pow(hi / lo, (double) i / SAMPLES);
            DiskState s = disk.stateAt(r);
            if (s.temperatureK() < floorK) {
                continue;
            }
            if (!(s.temperatureK() >= tMin && s.temperatureK() <= tMax)) {
                return String.format(Locale.ROOT, "gives T = %.6g K at r = %.6g AU, outside the temperature range of the data",
                        s.temperatureK(), r);
            }
            if (!StateDomain.coversPressure(s.pressureBar())) {
                return String.format(Locale.ROOT, "gives P = %.6g bar at r = %.6g AU, outside the pressure range of the model",
                        s.pressureBar(), r);
            }
        }
        return null;
    }
}
