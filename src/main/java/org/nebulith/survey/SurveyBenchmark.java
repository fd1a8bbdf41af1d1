package org.nebulith.survey;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

import org.nebulith.composition.SolarReference;
import org.nebulith.progress.Progress;
import org.nebulith.thermo.Element;

/**
 * The survey benchmark: a synthetic catalogue of invented stars (benchmark data only) through
 * {@link SurveyRunner}, output discarded, timed on the wall clock.
 */
public final class SurveyBenchmark {

    private static final Element[] MEASURED = {Element.Fe, Element.Mg, Element.Si, Element.Ca, Element.Al, Element.Ti,
        Element.Ni};

    /**
     * @param stars      stars
     * @param draws      draws per star
     * @param threads    threads
     * @param seconds    wall time [s]
     * @param equilibria equilibrium solutions counted by the estimator (0 if it does not count)
     */
    public record Figures(int stars, int draws, int threads, double seconds, long equilibria) {
        /** @return draws per second */
        public double drawsPerSecond() {
            return (double) stars * draws / seconds;
        }

        /** @return equilibria per second */
        public double equilibriaPerSecond() {
            return equilibria / seconds;
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
                              long seed) throws java.io.IOException {
        return run(factory, stars, draws, threads, seed, Progress.none());
    }

    /**
     * @param factory  builds the estimator for the settings (default disk and zone)
     * @param stars    number of invented stars
     * @param draws    draws per star
     * @param threads  worker threads
     * @param seed     the seed
     * @param progress advanced by the draws of each finished star (stars x draws in all)
     * @return the figures
     */
    public static Figures run(Function<SurveySettings, PlanetEstimator> factory, int stars, int draws, int threads,
                              long seed, Progress progress) throws java.io.IOException {
        SurveySettings settings = new SurveySettings(draws, seed, SolarReference.ASPLUND2009, null, null);
        EstimatorCache cache = new EstimatorCache(factory);
        cache.get(settings);
        List<StarRow> rows = inventedStars(stars, seed);
        long before = cache.equilibria();
        long start = System.nanoTime();
        SurveyRunner.run(rows.iterator(), settings, cache, threads, progress, star -> {
            // discarded: the benchmark times the computation
        });
        double seconds = (System.nanoTime() - start) / 1e9;
        return new Figures(stars, draws, threads, seconds, cache.equilibria() - before);
    }

    /** @return invented benchmark stars: [Fe/H] spread over -0.5..+0.4, other elements near it, errors 0.02-0.1 dex */
    static List<StarRow> inventedStars(int n, long seed) {
        List<StarRow> rows = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            String name = "Bench-" + (i + 1);
            DrawRandom r = DrawRandom.forDraw(seed, name, -1);
            double feH = -0.5 + 0.9 * ((r.nextLong() >>> 11) * 0x1.0p-53);
            Map<Element, Measurement> m = new EnumMap<>(Element.class);
            for (Element el : MEASURED) {
                double offset = el == Element.Fe ? 0 : 0.05 * r.nextGaussian();
                double error = 0.02 + 0.08 * ((r.nextLong() >>> 11) * 0x1.0p-53);
                m.put(el, new Measurement(feH + offset, error));
            }
            rows.add(StarRow.of(name, m));
        }
        return rows;
    }
}
