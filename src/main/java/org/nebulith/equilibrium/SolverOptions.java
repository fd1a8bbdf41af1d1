package org.nebulith.equilibrium;

/**
 * Explicit settings of the {@link EquilibriumSolver}.
 *
 * @param balanceTolerance   largest relative element-balance residual accepted [-]
 * @param potentialTolerance largest residual of a phase condition, in units of RT [-]
 * @param affinityTolerance  an absent phase counts as supersaturated below minus this, per atom [RT]
 * @param maxNewtonIterations Newton iterations per active set
 * @param maxPhaseChanges    phase additions and removals per solve
 * @param maxPotentialStep   largest change of an element potential per Newton step [RT]
 * @param coldStartTK        temperature from which a cold start continues down (or up) [K]
 */
public record SolverOptions(double balanceTolerance, double potentialTolerance, double affinityTolerance,
                            int maxNewtonIterations, int maxPhaseChanges, double maxPotentialStep,
                            double coldStartTK) {

    /** @return defaults: balance 1e-12, potentials 1e-10, affinity 1e-8, 30 iterations, 200 changes */
    public static SolverOptions defaults() {
        return new SolverOptions(1e-12, 1e-10, 1e-8, 30, 200, 4.0, 4500.0);
    }

    public SolverOptions {
        if (!(balanceTolerance > 0) || !(potentialTolerance > 0) || !(affinityTolerance > 0)) {
            throw new IllegalArgumentException("tolerances must be positive");
        }
        if (maxNewtonIterations < 1 || maxPhaseChanges < 1 || !(maxPotentialStep > 0)) {
            throw new IllegalArgumentException("iteration limits and step must be positive");
        }
    }
}
