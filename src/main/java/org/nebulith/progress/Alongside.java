package org.nebulith.progress;

import java.util.concurrent.ExecutionException;
import java.util.concurrent.FutureTask;
import java.util.function.Supplier;

/**
 * One piece of output work (a chart in three formats, say) run on a thread of its own while the
 * caller does another: the brief commands spend most of their time writing charts and tables after
 * the computing, and the second core would otherwise stay idle. The work must only read what it
 * shares with the caller and write files of its own.
 *
 * @param <T> what the work returns
 */
public final class Alongside<T> {
    private final FutureTask<T> task;

    private Alongside(final FutureTask<T> task) {
        this.task = task;
    }

    /**
     * @param name thread name (shown in stack dumps)
     * @param work the work
     * @param <T>  its result
     * @return the running work
     */
    public static <T> Alongside<T> start(final String name, final Supplier<T> work) {
        FutureTask<T> t = new FutureTask<>(work::get);
        Thread thread = new Thread(t, name);
        thread.setDaemon(true);
        thread.start();
        return new Alongside<>(t);
    }

    /**
     * @return the work's result, once it has finished
     * @throws RuntimeException or Error: the one the work threw, as it was
     */
    public T join() {
        try {
            return task.get();
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException r) {
                throw r;
            }
            if (cause instanceof Error err) {
                throw err;
            }
            throw new IllegalStateException(cause);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while waiting for " + task, e);
        }
    }

    /**
     * Runs the caller's own work, then waits for this one.
     *
     * @param meanwhile the caller's work
     * @return this work's result
     * @throws RuntimeException or Error: the caller's (after this work has ended), else this work's
     */
    public T joinAfter(final Runnable meanwhile) {
        try {
            meanwhile.run();
        } catch (RuntimeException | Error e) {
            awaitQuietly();
            throw e;
        }
        return join();
    }

    /** Waits for the work to end and ignores its outcome: before the caller gives up on a failure of its own. */
    public void awaitQuietly() {
        try {
            task.get();
        } catch (ExecutionException | RuntimeException e) {
            // the caller's own failure is the one reported
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
