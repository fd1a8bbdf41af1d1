package org.nebulith.planet.interior;

import java.util.Arrays;
import java.util.SplittableRandom;

/**
 * The core mass fraction of a planet from its measured mass and radius: a seeded Monte Carlo of
 * normal draws of mass and radius (draws with a mass outside the grid or a radius &le; 0 are drawn
 * again), each inverted on a {@link MassRadiusGrid}. Draws denser than pure iron count as core mass
 * fraction 1 and draws lighter than pure rock as 0, and their fractions are reported apart: such
 * planets need something the model does not have (a denser or iron-richer interior, mantle stripping;
 * or volatiles, a hot or molten interior, an atmosphere), so their core mass fraction is not a measurement.
 */
public final class CoreMassFractionInversion {
    private static final int MAX_REDRAWS = 1000;

    /**
     * @param median           median core mass fraction
     * @param p16              16th percentile
     * @param p84              84th percentile
     * @param denserThanIron   fraction of draws denser than a pure-iron planet
     * @param lighterThanRock  fraction of draws lighter than a pure-rock (core-free) planet
     * @param draws            number of draws
     */
    public record Result(double median, double p16, double p84, double denserThanIron, double lighterThanRock,
                         int draws) {
    }

    private CoreMassFractionInversion() {
    }

    /**
     * @param grid    radii of the planet's composition
     * @param mass    measured mass [M_earth]
     * @param massErr its 1-sigma error [M_earth], &gt; 0
     * @param radius  measured radius [R_earth]
     * @param radiusErr its 1-sigma error [R_earth], &gt; 0
     * @param draws   number of draws, &gt;= 1
     * @param seed    seed (same seed, same result)
     * @return the summary
     */
    public static Result invert(final MassRadiusGrid grid, final double mass, final double massErr, final double radius,
                                final double radiusErr, final int draws, final long seed) {
        if (!(massErr > 0) || !(radiusErr > 0) || draws < 1) {
            throw new IllegalArgumentException("errors must be > 0 and draws >= 1");
        }
        SplittableRandom random = new SplittableRandom(seed);
        double[] cmf = new double[draws];
        int dense = 0;
        int light = 0;
        for (int d = 0; d < draws; d++) {
            double m;
            double r;
            int tries = 0;
            do {
                m = mass + massErr * random.nextGaussian();
                r = radius + radiusErr * random.nextGaussian();
                if (++tries > MAX_REDRAWS) {
                    throw new IllegalArgumentException("mass " + mass + " +- " + massErr
                            + " M_earth lies mostly outside the mass range of the grid");
                }
            } while (m < grid.minMassMearth() || m > grid.maxMassMearth() || r <= 0);
            double c = grid.coreMassFraction(m, r);
            if (c == Double.POSITIVE_INFINITY) {
                dense++;
                c = 1;
            } else if (c == Double.NEGATIVE_INFINITY) {
                light++;
                c = 0;
            }
            cmf[d] = c;
        }
        Arrays.sort(cmf);
        return new Result(quantile(cmf, 0.5), quantile(cmf, 0.16), quantile(cmf, 0.84), dense / (double) draws,
                light / (double) draws, draws);
    }

    /** Percentile by linear interpolation between order statistics (Hyndman &amp; Fan 1996, definition 7). */
    static double quantile(final double[] sorted, final double p) {
        double h = (sorted.length - 1) * p;
        int lo = (int) Math.floor(h);
        int hi = Math.min(sorted.length - 1, lo + 1);
        return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
    }
}
