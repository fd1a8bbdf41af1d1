/**
 * Feeding zones (the radial region each planet accretes from, with a kernel weight), their CSV
 * file, and the radial integration of disk solids over a zone, piecewise between condensation
 * fronts. Depends on {@code org.nebulith.disk}; knows nothing of equilibrium chemistry: callers
 * supply the condensed amount per gram of gas as a {@link org.nebulith.zones.RadialIntegrand}.
 */
package org.nebulith.zones;
