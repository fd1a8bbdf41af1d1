package org.nebulith.survey;

/** Test access to the test-only stand-in estimator from other packages. */
public final class StandInEstimators {

    private StandInEstimators() {
    }

    /** @return the fully condensed (mass-balance) stand-in, see {@link FullyCondensedEstimator} */
    public static PlanetEstimator fullyCondensed() {
        return new FullyCondensedEstimator();
    }
}
