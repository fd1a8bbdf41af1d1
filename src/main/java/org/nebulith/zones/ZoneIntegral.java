package org.nebulith.zones;

import java.util.List;

/**
 * The result of integrating a {@link RadialIntegrand} over a feeding zone.
 *
 * @param totals       per component: integral of Sigma_gas x f x kernel x 2 pi r dr
 *                     [unit of f x g], e.g. mol when f is in mol per gram of gas
 * @param gasMassG     the kernel-weighted gas mass of the zone [g]
 * @param segmentEdges the radii [AU] between which the integral was taken piecewise
 *                     (zone edges plus the break radii inside the zone)
 * @param evaluations  number of integrand evaluations
 * @param panels       number of Gauss-Legendre panels in the final partition
 * @param quality      the error estimate and its worst panel
 */
public record ZoneIntegral(double[] totals, double gasMassG, List<Double> segmentEdges, int evaluations, int panels,
                           IntegrationQuality quality) {
    public ZoneIntegral {
        totals = totals.clone();
        segmentEdges = List.copyOf(segmentEdges);
    }

    /** @return a copy of the totals */
    @Override
    public double[] totals() {
        return totals.clone();
    }

    /** @return component i of the totals */
    public double total(int i) {
        return totals[i];
    }
}
