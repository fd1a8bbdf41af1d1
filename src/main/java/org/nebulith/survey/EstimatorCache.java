package org.nebulith.survey;

import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Function;

/**
 * Builds each distinct planet estimator once: one per effective settings (the run's disk and
 * zones, or a star's own). Thread-safe.
 */
public final class EstimatorCache {

    private final Function<SurveySettings, PlanetEstimator> factory;
    private final Map<SurveySettings, PlanetEstimator> built = new ConcurrentHashMap<>();

    /** @param factory builds the estimator for effective settings (may throw on a bad disk or zone file) */
    public EstimatorCache(Function<SurveySettings, PlanetEstimator> factory) {
        this.factory = factory;
    }

    /**
     * @param settings effective settings ({@link SurveySettings#forStar})
     * @return the estimator
     */
    public PlanetEstimator get(SurveySettings settings) {
        PlanetEstimator e = built.get(settings);
        if (e == null) {
            e = factory.apply(settings);
            PlanetEstimator earlier = built.putIfAbsent(settings, e);
            if (earlier != null) {
                e = earlier;
            }
        }
        return e;
    }

    /** @return the estimate time of every estimator built so far [ns] ({@link PlanetEstimator#estimateNanos}) */
    public long estimateNanos() {
        long n = 0;
        for (PlanetEstimator e : built.values()) {
            n += e.estimateNanos();
        }
        return n;
    }

    /** @return the first-equilibrium time of every estimator built so far [ns] */
    public long firstEquilibriumNanos() {
        long n = 0;
        for (PlanetEstimator e : built.values()) {
            n += e.firstEquilibriumNanos();
        }
        return n;
    }

    /** @return the equilibria counted by every estimator built so far */
    public long equilibria() {
        long n = 0;
        for (PlanetEstimator e : built.values()) {
            n += e.equilibria();
        }
        return n;
    }
}
