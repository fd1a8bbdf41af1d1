package org.nebulith.planet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;

import org.junit.jupiter.api.Test;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.disk.DiskState;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.zones.LocalCondensation;

/** The per-radius cache of the local condensation never hands one disk's state to another disk. */
class LocalCacheTest {

    @Test
    void anotherDiskAtACachedRadiusIsSolvedAfresh() {
        PlanetFormation f = new PlanetFormation(FormationSettings.defaults(), new EquilibriumSolver());
        LocalCondensation local = f.localCondensation(
                AbundancePresets.preset(AbundancePresets.PROTOSOLAR_LODDERS2003).abundances());
        DiskState warm = new DiskState(1.0, 1300, 1e-4, 100);
        LocalCondensation.Local first = local.at(warm);
        assertSame(first, local.at(new DiskState(1.0, 1300, 1e-4, 50)), "same conditions: cached");
        LocalCondensation.Local hotter = local.at(new DiskState(1.0, 1500, 1e-4, 100));
        assertEquals(1500, hotter.result().problem().temperatureK(), 0.0);
        LocalCondensation.Local denser = local.at(new DiskState(1.0, 1500, 1e-3, 100));
        assertEquals(1e-3, denser.result().problem().pressureBar(), 0.0);
    }
}
