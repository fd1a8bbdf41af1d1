package org.nebulith.progress;

/** How progress is shown. */
public enum ProgressMode {
    /** A redrawn bar with elapsed time and ETA: only when a person watches a terminal. */
    TERMINAL_BAR,
    /** Plain lines at every tenth of the work (pipes, CI logs): no carriage returns, no colour. */
    LINES,
    /** Nothing (--quiet). */
    SILENT;

    /**
     * The mode for a command-line run.
     *
     * @param quiet       whether the user asked for no progress
     * @param hasTerminal whether {@code System.console() != null}
     * @return the mode
     */
    public static ProgressMode choose(final boolean quiet, final boolean hasTerminal) {
        if (quiet) {
            return SILENT;
        }
        return hasTerminal ? TERMINAL_BAR : LINES;
    }
}
