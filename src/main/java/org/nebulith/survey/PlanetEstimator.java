package org.nebulith.survey;

import java.util.LinkedHashMap;
import java.util.List;

import org.nebulith.composition.ElementAbundances;
import org.nebulith.planet.Quantity;

/**
 * The science of one draw: a pure, thread-safe function of the composition and the settings.
 *
 * <p>Contract for implementations: the same composition gives the same result (bit for bit), on
 * any thread; every composition of one star gives the same zones and quantities (names, units,
 * order), so that draws can be compared quantity by quantity (a quantity that does not apply, such
 * as a core mass fraction without rock, is marked {@link Quantity#notApplicable}, not left out and
 * not 0); the zone name {@code host} is reserved for the star's own ratios. Failures
 * (non-convergence) are thrown, naming the state
 * ({@link org.nebulith.errors.NumericalException#inZone} names the zone, radius, T and P); the
 * survey records them and goes on.
 */
public interface PlanetEstimator {

    /**
     * @param gas the star's element abundances (moles relative to H = 1, as built by
     *            {@link org.nebulith.composition.StellarAbundances})
     * @return per zone (zone name to quantities, in a fixed order), for one stellar composition
     */
    LinkedHashMap<String, List<Quantity>> estimate(ElementAbundances gas);

    /**
     * An estimator for compositions close to {@code nominal} (one star's draws): it may prepare
     * warm starts from the nominal composition, so that each draw converges faster. Its results must
     * remain a pure function of (nominal, draw composition).
     *
     * @param nominal the star's nominal composition
     * @return an estimator for this star (this one by default)
     */
    default PlanetEstimator near(ElementAbundances nominal) {
        return this;
    }

    /**
     * Optional counter hook for the benchmark.
     *
     * @return the number of equilibrium solutions computed by this estimator since it was made
     *         (summed over all threads), or 0 if it does not count
     */
    default long equilibria() {
        return 0;
    }

    /**
     * Optional timing hook for the benchmark.
     *
     * @return wall time spent in {@link #estimate} since the estimator was made, summed over all
     *         threads [ns], or 0 if it does not time itself
     */
    default long estimateNanos() {
        return 0;
    }

    /**
     * Optional timing hook for the benchmark.
     *
     * @return the part of {@link #estimateNanos()} spent in the first equilibrium of each estimate
     *         (the composition jump from the warm-start reference) [ns], or 0 if not timed
     */
    default long firstEquilibriumNanos() {
        return 0;
    }
}
