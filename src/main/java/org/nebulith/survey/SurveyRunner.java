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
 * in catalogue order (failures included: a star's failed draws are part of its outcome). At most {@value #WINDOW_PER_THREAD} stars per thread are in flight, so memory
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
         * @param star the star's outcome (it may stop the run by throwing)
         * @throws IOException if writing fails
         */
        void completed(StarOutput star) throws IOException;
    }

    /**
     * One star's outcome as it is written.
     *
     * @param row         the star
     * @param block       its rows as survey.csv text (empty when the star failed)
     * @param failures    its failures as failures.csv text (empty when none)
     * @param failedDraws draws lost (all of them when the nominal estimate failed)
     * @param starFailure why the star failed as a whole (its nominal estimate), or null
     */
    public record StarOutput(StarRow row, String block, String failures, long failedDraws, String starFailure) {

        /**
         * @param row    the star
         * @param result its survey
         * @return the outcome as written
         */
        public static StarOutput of(StarRow row, StarResult result) {
            String why = result.nominalFailure().map(StarJob::describe).orElse(null);
            return new StarOutput(row, SurveyCsv.block(result.rows()), SurveyFailures.block(result.failures()),
                    result.failedDraws(), why);
        }
    }

    /**
     * @param stars  stars completed (with rows)
     * @param failed stars whose nominal estimate failed
     * @param draws  draws computed
     */
    public record Summary(long stars, long failed, long draws) {
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
     * @param progress    advanced by the draws of each finished star
     * @param sink        receives the outcomes in order
     * @return what was done
     * @throws StarJobException for an estimator that breaks its contract (layout, reserved zone name)
     * @throws IOException if the sink fails
     */
    public static Summary run(Iterator<StarRow> stars, SurveySettings settings, EstimatorCache estimators, int threads,
                              Progress progress, Sink sink) throws IOException {
        return run(stars, settings, estimators, threads, progress, sink, StarJob.DrawClock.NONE);
    }

    /**
     * {@link #run(Iterator, SurveySettings, EstimatorCache, int, Progress, Sink)} that also reports the
     * wall time of every draw to {@code clock} (benchmarks).
     *
     * @param stars      the stars, in catalogue order (read lazily)
     * @param settings   the run settings
     * @param estimators estimators per effective settings
     * @param threads    worker threads, &gt;= 1
     * @param progress   advanced by the draws of each finished star
     * @param sink       receives the outcomes in order
     * @param clock      receives each draw's wall time, from the worker threads
     * @return what was done
     * @throws IOException if the sink fails
     */
    public static Summary run(Iterator<StarRow> stars, SurveySettings settings, EstimatorCache estimators, int threads,
                              Progress progress, Sink sink, StarJob.DrawClock clock) throws IOException {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be >= 1, got " + threads);
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads, daemonThreads());
        ArrayDeque<Future<StarOutput>> window = new ArrayDeque<>();
        long done = 0;
        long failed = 0;
        try {
            while (stars.hasNext() || !window.isEmpty()) {
                while (stars.hasNext() && window.size() < threads * WINDOW_PER_THREAD) {
                    StarRow row = stars.next();
                    PlanetEstimator estimator = estimators.get(settings.forStar(row));
                    window.add(pool.submit(() -> compute(row, settings, estimator, progress, clock)));
                }
                StarOutput o = take(window.removeFirst());
                sink.completed(o);
                if (o.starFailure() == null) {
                    done++;
                } else {
                    failed++;
                }
            }
        } finally {
            pool.shutdownNow();
        }
        return new Summary(done, failed, done * settings.draws());
    }

    private static StarOutput compute(StarRow row, SurveySettings settings, PlanetEstimator estimator,
                                      Progress progress, StarJob.DrawClock clock) {
        try {
            return StarOutput.of(row, StarJob.survey(row, settings, estimator, clock));
        } finally {
            progress.advance(settings.draws());
        }
    }

    private static StarOutput take(Future<StarOutput> future) throws IOException {
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
