package org.nebulith.planet;

import org.nebulith.zones.ZoneInventory;

/**
 * The planet of one feeding zone.
 *
 * @param inventory what the zone collected
 * @param planet    the planet built from it (or its "no solids" notice)
 */
public record ZonePlanet(ZoneInventory inventory, PlanetResult planet) {
    /** @return the zone's name */
    public String zoneName() {
        return inventory.zone().name();
    }
}
