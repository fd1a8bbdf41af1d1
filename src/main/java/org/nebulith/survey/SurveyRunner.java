package org.nebulith.survey;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayDeque;
import java.util.Iterator;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;

import org.nebulith.progress.Progress;

/**
 * Runs {@link StarJob} over a stream of stars on a pool of threads and hands the results to a sink
 * in catalogue order. At most {@value #WINDOW_PER_THREAD} stars per thread are in flight, so memory
 * stays constant in the catalogue's length. Results do not depend on the number of threads: each
 * star is a pure function of its row, the settings and the seed, and the order of output is the
 * order of input.
 */
public final class SurveyRunner {

    /** Stars in flight per thread (the ordered window). */
    public static final int WINDOW_PER_THREAD = 4;

    /** Receives each star's outcome, in catalogue order, on the calling thread. */
    public interface Sink {
        /**
         * @param row   the star
         * @param rows  its survey rows
         * @param block the rows as survey.csv text
         * @throws IOException if writing fails
         */
        void completed(StarRow row, List<SurveyRow> rows, String block) throws IOException;

        /**
         * Called only when failing stars are skipped.
         *
         * @param row     the star
         * @param failure why it failed
         * @throws IOException if writing fails
         */
        void failed(StarRow row, StarJobException failure) throws IOException;
    }

    /**
     * @param stars  stars completed
     * @param failed stars that failed and were skipped
     * @param draws  draws computed
     */
    public record Summary(long stars, long failed, long draws) {
    }

    private record Outcome(StarRow row, List<SurveyRow> rows, String block, StarJobException failure) {
    }

    private SurveyRunner() {
    }

    /** @return the default thread count: all available processors */
    public static int defaultThreads() {
        return Runtime.getRuntime().availableProcessors();
    }

    /**
     * @param stars       the stars, in catalogue order (read lazily)
     * @param settings    the run settings
     * @param estimators  estimators per effective settings
     * @param threads     worker threads, &gt;= 1
     * @param skipFailing whether a failing star is reported to the sink and skipped (else the run stops)
     * @param progress    advanced by the draws of each finished star
     * @param sink        receives the outcomes in order
     * @return what was done
     * @throws StarJobException for the first failing star (in catalogue order) unless skipFailing
     * @throws IOException if the sink fails
     */
    public static Summary run(Iterator<StarRow> stars, SurveySettings settings, EstimatorCache estimators, int threads,
                              boolean skipFailing, Progress progress, Sink sink) throws IOException {
        return run(stars, settings, estimators, threads, skipFailing, progress, sink, StarJob.DrawClock.NONE);
    }

    /**
     * {@link #run(Iterator, SurveySettings, EstimatorCache, int, boolean, Progress, Sink)} that also reports the
     * wall time of every draw to {@code clock} (benchmarks).
     *
     * @param stars       the stars, in catalogue order (read lazily)
     * @param settings    the run settings
     * @param estimators  estimators per effective settings
     * @param threads     worker threads, &gt;= 1
     * @param skipFailing whether a failing star is reported to the sink and skipped (else the run stops)
     * @param progress    advanced by the draws of each finished star
     * @param sink        receives the outcomes in order
     * @param clock       receives each draw's wall time, from the worker threads
     * @return what was done
     * @throws IOException if the sink fails
     */
    public static Summary run(Iterator<StarRow> stars, SurveySettings settings, EstimatorCache estimators, int threads,
                              boolean skipFailing, Progress progress, Sink sink, StarJob.DrawClock clock)
            throws IOException {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be >= 1, got " + threads);
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads, daemonThreads());
        ArrayDeque<Future<Outcome>> window = new ArrayDeque<>();
        long done = 0;
        long failed = 0;
        try {
            while (stars.hasNext() || !window.isEmpty()) {
                while (stars.hasNext() && window.size() < threads * WINDOW_PER_THREAD) {
                    StarRow row = stars.next();
                    PlanetEstimator estimator = estimators.get(settings.forStar(row));
                    window.add(pool.submit(() -> compute(row, settings, estimator, progress, clock)));
                }
                Outcome o = take(window.removeFirst());
                if (o.failure() == null) {
                    sink.completed(o.row(), o.rows(), o.block());
                    done++;
                } else if (skipFailing) {
                    sink.failed(o.row(), o.failure());
                    failed++;
                } else {
                    throw o.failure();
                }
            }
        } finally {
            pool.shutdownNow();
        }
        return new Summary(done, failed, done * settings.draws());
    }

    private static Outcome compute(StarRow row, SurveySettings settings, PlanetEstimator estimator, Progress progress,
                                   StarJob.DrawClock clock) {
        try {
            List<SurveyRow> rows = StarJob.run(row, settings, estimator, clock);
            return new Outcome(row, rows, SurveyCsv.block(rows), null);
        } catch (StarJobException e) {
            return new Outcome(row, null, null, e);
        } finally {
            progress.advance(settings.draws());
        }
    }

    private static Outcome take(Future<Outcome> future) throws IOException {
        try {
            return future.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("survey interrupted", e);
        } catch (ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException) {
                throw (RuntimeException) cause;
            }
            if (cause instanceof Error) {
                throw (Error) cause;
            }
            throw new UncheckedIOException(new IOException(cause));
        }
    }

    private static java.util.concurrent.ThreadFactory daemonThreads() {
        AtomicInteger n = new AtomicInteger();
        return r -> {
            Thread t = new Thread(r, "nebulith-survey-" + n.incrementAndGet());
            t.setDaemon(true);
            return t;
        };
    }
}
