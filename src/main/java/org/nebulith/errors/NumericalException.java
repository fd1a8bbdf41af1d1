package org.nebulith.errors;

/**
 * A numerical failure: non-convergence or an unusable result. The message names the state
 * (temperature [K], pressure [bar], composition) so that the case can be reproduced. The command
 * line maps it to exit code 3.
 */
public class NumericalException extends NebulithException {

    private static final long serialVersionUID = 1L;

    /**
     * @param key   a numerical message of {@link Messages}
     * @param cause the underlying cause, or null
     * @param parts the template parameters
     */
    public NumericalException(final Messages key, final Throwable cause, final Object... parts) {
        super(key, cause, parts);
    }

    /**
     * The equilibrium iteration stopped without converging.
     *
     * @param tK          temperature [K]
     * @param pBar        pressure [bar]
     * @param composition the element inventory, as the user would write it (e.g. {@code H=1,O=4.9e-4})
     * @param iterations  iterations done
     * @param residual    final residual norm
     * @return the exception
     */
    public static NumericalException noConvergence(final double tK, final double pBar, final String composition,
                                                   final int iterations, final double residual) {
        return new NumericalException(Messages.NO_CONVERGENCE, null, tK, pBar, composition, iterations, residual);
    }

    /**
     * A result is unusable (a singular matrix, a negative amount, a non-finite value).
     *
     * @param what        what went wrong
     * @param tK          temperature [K]
     * @param pBar        pressure [bar]
     * @param composition the element inventory
     * @return the exception
     */
    public static NumericalException failure(final String what, final double tK, final double pBar,
                                             final String composition) {
        return new NumericalException(Messages.NUMERICAL_FAILURE, null, what, tK, pBar, composition);
    }

    /**
     * A numerical failure at one radius of a feeding zone (an equilibrium that does not converge,
     * an integral that cannot be resolved).
     *
     * @param zone  the zone's name
     * @param rAU   the radius [AU]
     * @param tK    the disk's temperature there [K]
     * @param pBar  the disk's pressure there [bar]
     * @param what  what failed
     * @param cause the underlying failure, or null
     * @return the exception
     */
    public static NumericalException inZone(final String zone, final double rAU, final double tK, final double pBar,
                                            final String what, final Throwable cause) {
        return new NumericalException(Messages.ZONE_STATE_FAILURE, cause, zone, rAU, tK, pBar, what);
    }
}
