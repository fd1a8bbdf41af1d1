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
     * Plain lines at every tenth of the work (for pipes and logs: no carriage returns, no colour).
     *
     * @param task  short task name shown in front of the figures
     * @param total total number of steps (&gt; 0)
     * @param sink  where to write (normally standard error, never the stream carrying results)
     * @return the progress
     */
    static Progress lines(final String task, final long total, final PrintStream sink) {
        return new LineProgress(task, total, sink, System::nanoTime);
    }
}
