package org.nebulith.measured;

import org.nebulith.planet.interior.CoreMassFractionInversion;

/**
 * The host-star test of one planet.
 *
 * @param planet          the planet as measured
 * @param zone            the zone of the star's prediction
 * @param predicted       star-predicted core mass fraction {median, p16, p84}
 * @param mantleMgNumber  the predicted mantle's Mg# (median), used in the inversion
 * @param mantleMgSi      the predicted mantle's molar Mg/Si (median), used in the inversion
 * @param measured        core mass fraction from mass and radius
 * @param differenceSigma (measured - predicted) / sqrt(sigma_m^2 + sigma_p^2), sigma = (p84 - p16) / 2
 * @param agreement       two-sided probability of a difference at least this large if both agree
 * @param radiusPureRock  radius of a core-free planet of this mass [R_earth]
 * @param radiusPredicted radius with the star-predicted core mass fraction [R_earth]
 */
public record PlanetVerdict(MeasuredPlanet planet, String zone, double[] predicted, double mantleMgNumber,
                            double mantleMgSi, CoreMassFractionInversion.Result measured, double differenceSigma,
                            double agreement, double radiusPureRock, double radiusPredicted) {
}
