/**
 * Bulk composition of a planet from the condensed inventory of its feeding zone: element totals,
 * molar ratios, core-mantle split, mantle oxides and Mg#, ice fraction, comparison with reference
 * bodies and the host star, and the mass-radius relation of Zeng et al. 2016. Depends on
 * {@code org.nebulith.thermo} (elements, formulas) and {@code org.nebulith.composition}; knows
 * nothing of disks or equilibrium solvers.
 */
package org.nebulith.planet;
