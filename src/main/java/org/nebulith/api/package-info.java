/**
 * The library's entry point: {@link org.nebulith.api.Nebulith} starts each of the four jobs (one
 * equilibrium state, a condensation sequence, the planets of a disk, a survey of a star catalogue)
 * with a builder whose defaults are those of the command line; the results print a readable summary
 * and answer lookups by name. {@link org.nebulith.api.ThermoData} chooses the thermodynamic data,
 * from the bundled sets or extended by the caller's own species files. Everything underneath
 * (packages {@code equilibrium}, {@code condensation}, {@code planet}, {@code survey}) stays
 * available for finer control.
 */
package org.nebulith.api;
