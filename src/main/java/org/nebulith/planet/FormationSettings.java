package org.nebulith.planet;

import org.nebulith.equilibrium.SystemSpec;
import org.nebulith.zones.ZoneCondensation;

/**
 * Settings of a planet estimate: the chemistry, the radial integration, the floor temperature of
 * the equilibrium and the core options.
 *
 * @param system      species, data set and solutions
 * @param integration zone integration settings
 * @param floorK      lowest equilibrium temperature [K]; colder gas keeps its rock assemblage and adds water ice
 * @param core        core-mantle split options
 */
public record FormationSettings(SystemSpec system, ZoneCondensation integration, double floorK, CoreOptions core) {

    /** Default floor temperature [K]: the lowest temperature of the default condensation sequence. */
    public static final double DEFAULT_FLOOR_K = 300.0;

    public FormationSettings {
        if (!(floorK >= 200)) {
            throw new IllegalArgumentException("floor temperature must be >= 200 K (mineral data start there), got " + floorK);
        }
    }

    /** @return default data set and solutions, report-grade integration, 300 K floor, default core */
    public static FormationSettings defaults() {
        return new FormationSettings(SystemSpec.defaults(), ZoneCondensation.defaults(), DEFAULT_FLOOR_K,
                CoreOptions.defaults());
    }

    /** @param z integration settings @return a copy with them */
    public FormationSettings withIntegration(ZoneCondensation z) {
        return new FormationSettings(system, z, floorK, core);
    }
}
