package org.nebulith.zones;

import java.util.List;

import org.nebulith.equilibrium.ChemicalSystem;

/**
 * The condensed solids a feeding zone collects: moles of every condensed phase member and of water
 * ice, integrated over the zone, with the integration's bookkeeping.
 *
 * @param zone          the zone
 * @param system        the chemical system (phase and member names)
 * @param memberMoles   [phase][member] moles collected (phase 0, the gas, is all zeros)
 * @param iceMoles      moles of water ice collected
 * @param gasMassG      kernel-weighted gas mass of the zone [g]
 * @param fronts        condensation fronts found inside the zone [AU]
 * @param evaluations   integrand evaluations
 * @param quality       the integral's error estimate and its worst panel
 */
public record ZoneInventory(FeedingZone zone, ChemicalSystem system, double[][] memberMoles, double iceMoles,
                            double gasMassG, List<Double> fronts, int evaluations, IntegrationQuality quality) {

    /** @return true if anything condensed in the zone */
    public boolean hasSolids() {
        if (iceMoles > 0) {
            return true;
        }
        for (int p = 1; p < memberMoles.length; p++) {
            for (double v : memberMoles[p]) {
                if (v > 0) {
                    return true;
                }
            }
        }
        return false;
    }
}
