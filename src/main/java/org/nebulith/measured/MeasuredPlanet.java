package org.nebulith.measured;

import java.util.OptionalDouble;

/**
 * One row of a planets file: a planet with its measured mass and radius.
 *
 * @param planet    planet name
 * @param star      host star (a catalogue name)
 * @param mass      mass [M_earth], &gt; 0
 * @param massErr   1-sigma error [M_earth], &gt; 0
 * @param radius    radius [R_earth], &gt; 0
 * @param radiusErr 1-sigma error [R_earth], &gt; 0
 * @param aAU       orbital distance [AU], if given
 * @param line      1-based line in the file
 */
public record MeasuredPlanet(String planet, String star, double mass, double massErr, double radius,
                             double radiusErr, OptionalDouble aAU, long line) {
}
