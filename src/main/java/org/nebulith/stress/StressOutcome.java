package org.nebulith.stress;

/**
 * The outcome of one solve of the stress series.
 *
 * @param converged        true if the solver returned a checked equilibrium
 * @param nanos            wall time of the solve [ns]
 * @param newtonIterations Newton iterations spent (0 on failure)
 * @param failure          the solver's message on failure, else ""
 */
public record StressOutcome(boolean converged, long nanos, int newtonIterations, String failure) {
}
