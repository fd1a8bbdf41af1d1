/**
 * Stress states of the equilibrium engine: a seeded generator of random states over the whole
 * domain of the tool (temperature, pressure, element scatter, C/O, dust enrichment) and the solve of
 * each from a cold and a warm start, with timings. Used by {@code nebulith bench-robust} and by the
 * tests; it depends on composition and equilibrium only.
 */
package org.nebulith.stress;
