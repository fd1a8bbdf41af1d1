package org.nebulith.planet.interior;

/**
 * One radius of a structure profile.
 *
 * @param rKm        radius [km]
 * @param mMearth    mass inside it [M_earth]
 * @param pGpa       pressure [GPa]
 * @param rhoKgM3    density [kg/m3]
 * @param gMs2       gravity [m/s2]
 * @param layer      the layer there
 */
public record ProfilePoint(double rKm, double mMearth, double pGpa, double rhoKgM3, double gMs2, LayerKind layer) {
}
