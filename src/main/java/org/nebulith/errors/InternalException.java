package org.nebulith.errors;

/**
 * A branch that should be impossible was reached (a bug, not a user error). The command line
 * maps it to exit code 1 and asks the user to report it.
 */
public final class InternalException extends NebulithException {

    private static final long serialVersionUID = 1L;

    /**
     * @param description what went wrong
     * @param cause       the underlying cause, or null
     */
    public InternalException(final String description, final Throwable cause) {
        super(Messages.INTERNAL, cause, description);
    }
}
