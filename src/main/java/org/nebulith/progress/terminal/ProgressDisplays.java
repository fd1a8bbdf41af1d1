package org.nebulith.progress.terminal;

import java.io.PrintStream;

import org.nebulith.progress.Progress;
import org.nebulith.progress.ProgressMode;

/**
 * Opens the progress display of a mode. Apart from the library because the terminal bar needs the
 * progress-bar dependency; the library jar leaves this package out.
 */
public final class ProgressDisplays {
    private ProgressDisplays() {
    }

    /**
     * @param mode  how to show it
     * @param task  short task name shown in front of the figures
     * @param total total number of steps (&gt; 0)
     * @param sink  where to write (normally standard error, never the stream carrying results)
     * @return the progress
     */
    public static Progress open(final ProgressMode mode, final String task, final long total, final PrintStream sink) {
        switch (mode) {
            case TERMINAL_BAR:
                return new TerminalBarProgress(task, total, sink);
            case LINES:
                return Progress.lines(task, total, sink);
            case SILENT:
            default:
                return Progress.none();
        }
    }
}
