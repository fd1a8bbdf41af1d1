package org.nebulith.cli;

/** How much the command prints besides results and errors. */
public enum Verbosity {
    /** Results and errors only: no notes, no progress. */
    QUIET,
    /** Notes and progress. */
    NORMAL,
    /** Also details, and stack traces of failures. */
    VERBOSE
}
