/**
 * Protoplanetary-disk models: midplane temperature, pressure and gas surface density against
 * heliocentric distance (power laws with the minimum-mass solar nebula, tabulated profiles, and a
 * steady viscous disk with stellar irradiation), their parameter files and named presets.
 * Physics only: no equilibrium chemistry here. Units are cgs inside this package, with the unit in
 * every method name ({@code temperatureK}, {@code pressureBar}, {@code sigmaGasGcm2}).
 */
package org.nebulith.disk;
