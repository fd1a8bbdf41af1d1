package org.nebulith.cli;

/** The exit codes of the {@code nebulith} command (documented in the README). */
public final class ExitCodes {

    /** The run completed. */
    public static final int OK = 0;
    /** An internal error or an I/O failure while writing outputs. */
    public static final int FAILURE = 1;
    /** Bad input: a file, a field, an option, a preset; nothing was written. */
    public static final int BAD_INPUT = 2;
    /** A numerical failure (non-convergence, unusable result); the message names T, P and composition. */
    public static final int NUMERICAL = 3;

    private ExitCodes() {
    }
}
