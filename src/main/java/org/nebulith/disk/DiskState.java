package org.nebulith.disk;

/**
 * The midplane state of a disk at one radius.
 *
 * @param rAU          heliocentric distance [AU]
 * @param temperatureK midplane temperature [K]
 * @param pressureBar  midplane pressure [bar]
 * @param sigmaGasGcm2 gas surface density [g cm^-2]
 */
public record DiskState(double rAU, double temperatureK, double pressureBar, double sigmaGasGcm2) {
}
