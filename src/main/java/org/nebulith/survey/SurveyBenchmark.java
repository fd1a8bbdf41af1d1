package org.nebulith.survey;

import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Function;

import org.nebulith.composition.SolarReference;
import org.nebulith.progress.Progress;
import org.nebulith.thermo.Element;

/**
 * The survey benchmark: stars (invented, or read from a catalogue) through {@link SurveyRunner},
 * output discarded, timed on the wall clock and on the process CPU clock, with the wall time of
 * every draw and of each draw's first equilibrium.
 */
public final class SurveyBenchmark {

    /** Default scatter of the invented stars' [X/H] about their [Fe/H] [dex]. */
    public static final double DEFAULT_SCATTER_DEX = 0.05;
    private static final Element[] MEASURED = {Element.Fe, Element.Mg, Element.Si, Element.Ca, Element.Al, Element.Ti,
        Element.Ni};

    /**
     * @param stars            stars
     * @param draws            draws per star
     * @param threads          threads
     * @param seconds          wall time [s]
     * @param equilibria       equilibrium solutions counted by the estimator (0 if it does not count)
     * @param cpuSeconds       CPU time of the whole process during the run [s] (NaN if the JVM cannot tell)
     * @param drawMillis       wall time of every draw, sorted [ms]
     * @param firstEquilibriumShare share of the estimate time spent in each estimate's first
     *                         equilibrium (NaN if the estimator does not time itself)
     * @param failedStars      stars whose nominal estimate failed (recorded, as in a survey)
     * @param failedDraws      draws whose estimate failed (recorded and left out, as in a survey)
     */
    public record Figures(int stars, int draws, int threads, double seconds, long equilibria, double cpuSeconds,
                          double[] drawMillis, double firstEquilibriumShare, long failedStars, long failedDraws) {
        /** @return draws computed */
        public long totalDraws() {
            return (long) stars * draws;
        }

        /** @return draws per second */
        public double drawsPerSecond() {
            return totalDraws() / seconds;
        }

        /** @return equilibria per second */
        public double equilibriaPerSecond() {
            return equilibria / seconds;
        }

        /** @return equilibria per draw (the nominal estimates of the stars included in the count) */
        public double equilibriaPerDraw() {
            return (double) equilibria / totalDraws();
        }

        /** @return process CPU time per draw [ms] */
        public double cpuMillisPerDraw() {
            return 1e3 * cpuSeconds / totalDraws();
        }

        /** @param q quantile in [0, 1] @return the draw time at that quantile [ms] (nearest rank) */
        public double drawMillisAt(double q) {
            if (drawMillis.length == 0) {
                return Double.NaN;
            }
            int k = (int) Math.ceil(q * drawMillis.length) - 1;
            return drawMillis[Math.max(0, Math.min(drawMillis.length - 1, k))];
        }
    }

    private SurveyBenchmark() {
    }

    /**
     * @param factory builds the estimator for the settings (default disk and zone)
     * @param stars   number of invented stars
     * @param draws   draws per star
     * @param threads worker threads
     * @param seed    the seed
     * @return the figures
     */
    public static Figures run(Function<SurveySettings, PlanetEstimator> factory, int stars, int draws, int threads,
                              long seed) throws IOException {
        return run(factory, inventedStars(stars, seed, DEFAULT_SCATTER_DEX), draws, threads, seed, Progress.none());
    }

    /**
     * @param factory  builds the estimator for the settings (run default disk and zone, or a star's own)
     * @param rows     the stars
     * @param draws    draws per star
     * @param threads  worker threads
     * @param seed     the seed
     * @param progress advanced by the draws of each finished star
     * @return the figures
     * @throws IOException never in practice (the output is discarded)
     */
    public static Figures run(Function<SurveySettings, PlanetEstimator> factory, List<StarRow> rows, int draws,
                              int threads, long seed, Progress progress) throws IOException {
        SurveySettings settings = new SurveySettings(draws, seed, SolarReference.ASPLUND2009, null, null);
        EstimatorCache cache = new EstimatorCache(factory);
        cache.get(settings);
        for (StarRow r : rows) {
            cache.get(settings.forStar(r));
        }
        long before = cache.equilibria();
        long estimateBefore = cache.estimateNanos();
        long firstBefore = cache.firstEquilibriumNanos();
        long[] times = new long[rows.size() * draws];
        AtomicInteger next = new AtomicInteger();
        long[] failedDraws = {0};
        long[] failedStars = {0};
        double cpuStart = processCpuSeconds();
        long start = System.nanoTime();
        SurveyRunner.run(rows.iterator(), settings, cache, threads, progress, star -> {
            failedDraws[0] += star.failedDraws();
            failedStars[0] += star.starFailure() != null ? 1 : 0;
        }, nanos -> times[next.getAndIncrement()] = nanos);
        double seconds = (System.nanoTime() - start) / 1e9;
        double cpu = processCpuSeconds() - cpuStart;
        double[] ms = new double[next.get()];
        for (int i = 0; i < ms.length; i++) {
            ms[i] = times[i] / 1e6;
        }
        Arrays.sort(ms);
        long estimate = cache.estimateNanos() - estimateBefore;
        double share = estimate > 0 ? (double) (cache.firstEquilibriumNanos() - firstBefore) / estimate : Double.NaN;
        return new Figures(rows.size(), draws, threads, seconds, cache.equilibria() - before, cpu, ms, share,
                failedStars[0], failedDraws[0]);
    }

    /** @return CPU time used by this process so far [s], NaN if the JVM does not report it */
    static double processCpuSeconds() {
        java.lang.management.OperatingSystemMXBean os = ManagementFactory.getOperatingSystemMXBean();
        if (os instanceof com.sun.management.OperatingSystemMXBean) {
            long ns = ((com.sun.management.OperatingSystemMXBean) os).getProcessCpuTime();
            return ns >= 0 ? ns / 1e9 : Double.NaN;
        }
        return Double.NaN;
    }

    /** @return invented benchmark stars with {@link #DEFAULT_SCATTER_DEX} */
    static List<StarRow> inventedStars(int n, long seed) {
        return inventedStars(n, seed, DEFAULT_SCATTER_DEX);
    }

    /**
     * Invented benchmark stars (benchmark data only): [Fe/H] uniform over -0.5..+0.4; Mg, Si, Ca, Al,
     * Ti, Ni at [Fe/H] plus a Normal offset of standard deviation {@code scatterDex}; errors uniform
     * over 0.02-0.1 dex.
     *
     * @param n          number of stars
     * @param seed       the seed
     * @param scatterDex standard deviation of each element's [X/H] about the star's [Fe/H] [dex]
     * @return the stars, named Bench-1, Bench-2, ...
     */
    public static List<StarRow> inventedStars(int n, long seed, double scatterDex) {
        List<StarRow> rows = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            String name = "Bench-" + (i + 1);
            DrawRandom r = DrawRandom.forDraw(seed, name, -1);
            double feH = -0.5 + 0.9 * ((r.nextLong() >>> 11) * 0x1.0p-53);
            Map<Element, Measurement> m = new EnumMap<>(Element.class);
            for (Element el : MEASURED) {
                double offset = el == Element.Fe ? 0 : scatterDex * r.nextGaussian();
                double error = 0.02 + 0.08 * ((r.nextLong() >>> 11) * 0x1.0p-53);
                m.put(el, new Measurement(feH + offset, error));
            }
            rows.add(StarRow.of(name, m));
        }
        return rows;
    }
}
