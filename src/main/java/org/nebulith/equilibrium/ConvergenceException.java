package org.nebulith.equilibrium;

/**
 * The solver could not find an equilibrium that passes its checks. The message names the state
 * (T, P, composition) and what failed.
 */
public class ConvergenceException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** @param message what failed, at which state */
    public ConvergenceException(String message) {
        super(message);
    }
}
