package org.nebulith.progress;

import java.io.PrintStream;

/**
 * Progress of one long task counted in steps (zones, grid points, stars, draws). Library code
 * takes a {@code Progress} and calls {@link #advance(long)}; the command line decides how it is
 * shown. Implementations are thread-safe: parallel workers may advance the same instance.
 */
public interface Progress extends AutoCloseable {

    /**
     * Records that {@code steps} more steps are done.
     *
     * @param steps number of steps done since the last call (&ge; 0)
     */
    void advance(long steps);

    /** Records one step. */
    default void step() {
        advance(1);
    }

    /** Ends the display (prints the final state where the display has one). Idempotent. */
    @Override
    void close();

    /** @return a progress that shows nothing */
    static Progress none() {
        return SilentProgress.INSTANCE;
    }

    /**
     * Opens a progress display.
     *
     * @param mode  how to show it
     * @param task  short task name shown in front of the figures
     * @param total total number of steps (&gt; 0)
     * @param sink  where to write (normally standard error, never the stream carrying results)
     * @return the progress
     */
    static Progress open(final ProgressMode mode, final String task, final long total, final PrintStream sink) {
        switch (mode) {
            case TERMINAL_BAR:
                return new TerminalBarProgress(task, total, sink);
            case LINES:
                return new LineProgress(task, total, sink, System::nanoTime);
            case SILENT:
            default:
                return none();
        }
    }
}
