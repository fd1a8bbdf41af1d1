package org.nebulith.spark;

import java.io.IOException;
import java.io.Serializable;

import org.nebulith.survey.PlanetEstimator;
import org.nebulith.survey.PlanetSurveyEstimator;
import org.nebulith.survey.SurveySettings;

/**
 * Builds the planet estimate for effective settings inside a Spark task. The factory is shipped to
 * the executors (hence serializable); the estimator it builds is not, and is built there, once per
 * partition and distinct disk/zones ({@link StarTasks}).
 */
@FunctionalInterface
public interface EstimatorFactory extends Serializable {

    /** The survey's real estimate ({@link PlanetSurveyEstimator}), the one {@code nebulith survey} uses. */
    EstimatorFactory PLANET = PlanetSurveyEstimator::create;

    /**
     * @param settings effective settings of a star ({@link SurveySettings#forStar})
     * @return a pure, thread-safe estimator
     * @throws IOException if a disk or zone file cannot be read
     */
    PlanetEstimator create(SurveySettings settings) throws IOException;
}
