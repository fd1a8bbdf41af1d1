package org.nebulith.planet.interior;

import java.util.List;

/**
 * A solved interior structure.
 *
 * @param model           what it was computed from
 * @param radiusKm        surface radius (where P = 0) [km]
 * @param coreRadiusKm    core radius [km] (0 without a core)
 * @param centralGpa      central pressure [GPa]
 * @param cmbGpa          pressure at the core-mantle boundary [GPa] (central pressure without a core)
 * @param waterBaseGpa    pressure at the base of the water layer [GPa] (0 without water)
 * @param profile         the profile, centre first
 */
public record Structure(InteriorModel model, double radiusKm, double coreRadiusKm, double centralGpa, double cmbGpa,
                        double waterBaseGpa, List<ProfilePoint> profile) {
    /** @return surface radius [R_earth] */
    public double radiusRearth() {
        return radiusKm * 1000 / Constants.R_EARTH_M;
    }

    /** @return mean density [kg/m3] */
    public double meanDensity() {
        double r = radiusKm * 1000;
        return model.massMearth() * Constants.M_EARTH_KG / (4.0 / 3.0 * Math.PI * r * r * r);
    }
}
