package org.nebulith.spark;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.sql.SparkSession;
import org.nebulith.composition.SolarReference;
import org.nebulith.progress.Progress;
import org.nebulith.survey.EstimatorCache;
import org.nebulith.survey.PlanetSurveyEstimator;
import org.nebulith.survey.StarRow;
import org.nebulith.survey.SurveyRunner;
import org.nebulith.survey.SurveySettings;

/**
 * Benchmark (not a test): the same survey in the local engine ({@link SurveyRunner}, N threads) and
 * in Spark {@code local[N]} ({@link SparkSurvey}, results brought back to the driver), with the real
 * planet estimate, default disk and zone. The stars are the demo catalogue's invented stars,
 * repeated under new names ({@code NDC Alder #2}, ...) up to {@code --stars}. Both runs are warmed
 * up first (JIT, Spark classes); the Spark session's start-up is timed apart. With {@code --rounds R}
 * both run R times, alternating which goes first (this machine is shared, so drift in its load
 * cancels). Prints both throughputs (wall and CPU), the overhead ratio, and whether both gave the
 * same bytes.
 *
 * <p>Run: {@code java <spark flags> -cp nebulith-spark.jar:<spark jars> org.nebulith.spark.SparkBenchmark
 * --stars 40 --draws 50} (see src/spark/README.md).
 */
public final class SparkBenchmark {

    private SparkBenchmark() {
    }

    /**
     * @param args {@code --stars N --draws D --cores C --partitions P --seed S} (all optional)
     * @throws IOException if the demo catalogue cannot be read
     */
    public static void main(String[] args) throws IOException {
        int stars = 40;
        int draws = 50;
        int cores = 2;
        Integer partitions = null;
        long seed = 7;
        int rounds = 1;
        for (int i = 0; i + 1 < args.length; i += 2) {
            switch (args[i]) {
                case "--stars": stars = Integer.parseInt(args[i + 1]); break;
                case "--draws": draws = Integer.parseInt(args[i + 1]); break;
                case "--cores": cores = Integer.parseInt(args[i + 1]); break;
                case "--partitions": partitions = Integer.valueOf(args[i + 1]); break;
                case "--seed": seed = Long.parseLong(args[i + 1]); break;
                case "--rounds": rounds = Integer.parseInt(args[i + 1]); break;
                default: throw new IllegalArgumentException("unknown option " + args[i]
                        + "; accepted: --stars --draws --cores --partitions --seed --rounds");
            }
        }
        SurveySettings settings = new SurveySettings(draws, seed, SolarReference.ASPLUND2009, null, null);
        List<StarRow> rows = stars(stars, settings);
        List<GridTask> tasks = new SurveyGrid(List.of(), List.of()).tasks(rows);
        int parts = partitions != null ? partitions : SparkSurvey.defaultPartitions(tasks.size(), draws, cores);
        long work = (long) stars * draws;
        System.out.printf(Locale.ROOT, "benchmark: %d invented stars x %d draws = %d draws, default disk and zone;"
                + " %d cores requested, %d available; load average %s%n", stars, draws, work, cores,
                Runtime.getRuntime().availableProcessors(), loadAverage());

        long t = System.nanoTime();
        PlanetSurveyEstimator.create(settings);
        System.out.printf(Locale.ROOT, "estimator set-up (once per partition in Spark, once per run locally): %.2f s%n",
                seconds(t));
        warmUp(rows, cores);

        t = System.nanoTime();
        SparkSession spark = SparkSessions.local(cores);
        spark.sparkContext().setLogLevel("WARN");
        double sessionSeconds = seconds(t);
        JavaSparkContext jsc = JavaSparkContext.fromSparkContext(spark.sparkContext());
        List<GridTask> warm = new SurveyGrid(List.of(), List.of()).tasks(rows.subList(0, Math.min(2, rows.size())));
        SparkSurvey.results(jsc, warm, new SurveySettings(2, seed, SolarReference.ASPLUND2009, null, null),
                EstimatorFactory.PLANET, warm.size()).collect();
        System.out.printf(Locale.ROOT, "Spark session start: %.1f s (not included below)%n", sessionSeconds);

        double[] wall = new double[2];
        double[] cpu = new double[2];
        List<Double> ratios = new ArrayList<>();
        boolean same = true;
        for (int round = 0; round < rounds; round++) {
            double[] w = new double[2];
            double[] c = new double[2];
            List<String> local = null;
            List<String> distributed = null;
            for (int k = 0; k < 2; k++) {
                boolean sparkTurn = (k == 1) == (round % 2 == 0);
                long t0 = System.nanoTime();
                long c0 = processCpu();
                if (sparkTurn) {
                    distributed = SparkSurvey.results(jsc, tasks, settings, EstimatorFactory.PLANET, parts)
                            .map(r -> r.ok() ? r.block() : "FAILED " + r.failure()).collect();
                } else {
                    local = local(rows, settings, cores);
                }
                int slot = sparkTurn ? 1 : 0;
                w[slot] = seconds(t0);
                c[slot] = (processCpu() - c0) / 1e9;
            }
            same &= local.equals(distributed);
            System.out.printf(Locale.ROOT, "round %d (%s first): local %.1f s wall, %.1f s CPU; Spark %.1f s wall,"
                    + " %.1f s CPU; wall ratio %.3f; load %s%n", round + 1, round % 2 == 0 ? "local" : "Spark", w[0], c[0],
                    w[1], c[1], w[1] / w[0], loadAverage());
            ratios.add(w[1] / w[0]);
            for (int k = 0; k < 2; k++) {
                wall[k] += w[k];
                cpu[k] += c[k];
            }
        }
        spark.stop();
        long total = work * rounds;
        System.out.printf(Locale.ROOT, "local survey, %d threads:        %8.1f s  %8.1f draws/s  %7.1f draws/s/core"
                + "  (%.1f draws per CPU second)%n", cores, wall[0], total / wall[0], total / wall[0] / cores, total / cpu[0]);
        System.out.printf(Locale.ROOT, "Spark local[%d], %d partitions: %8.1f s  %8.1f draws/s  %7.1f draws/s/core"
                + "  (%.1f draws per CPU second)%n", cores, parts, wall[1], total / wall[1], total / wall[1] / cores,
                total / cpu[1]);
        java.util.Collections.sort(ratios);
        System.out.printf(Locale.ROOT, "Spark overhead: wall %+.1f %% (summed time ratio %.3f, median of rounds %.3f);"
                + " CPU %+.1f %%; target < 30 %% on a survey of >= 60 s%n", 100 * (wall[1] / wall[0] - 1),
                wall[1] / wall[0], ratios.get(ratios.size() / 2), 100 * (cpu[1] / cpu[0] - 1));
        System.out.println("same bytes in both: " + (same ? "yes" : "NO"));
        System.out.println("load average after: " + loadAverage());
    }

    private static List<String> local(List<StarRow> rows, SurveySettings settings, int threads) throws IOException {
        List<String> blocks = new ArrayList<>();
        SurveyRunner.run(rows.iterator(), settings, new EstimatorCache(SparkBenchmark::planet), threads,
                Progress.none(), star -> blocks.add(star.starFailure() == null ? star.block()
                        : "FAILED star '" + star.row().star() + "' (catalogue line " + star.row().line() + "), "
                        + star.starFailure()));
        return blocks;
    }

    private static void warmUp(List<StarRow> rows, int threads) throws IOException {
        SurveySettings few = new SurveySettings(4, 1, SolarReference.ASPLUND2009, null, null);
        local(rows.subList(0, Math.min(2 * threads, rows.size())), few, threads);
    }

    private static org.nebulith.survey.PlanetEstimator planet(SurveySettings s) {
        try {
            return PlanetSurveyEstimator.create(s);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    /** @return n rows: the demo catalogue's stars, repeated under new names */
    static List<StarRow> stars(int n, SurveySettings settings) throws IOException {
        List<String> lines = new ArrayList<>();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(
                SparkBenchmark.class.getResourceAsStream("/presets/demo-catalogue.csv"), StandardCharsets.UTF_8))) {
            for (String line = r.readLine(); line != null; line = r.readLine()) {
                if (!line.startsWith("#")) {
                    lines.add(line);
                }
            }
        }
        StringBuilder csv = new StringBuilder(lines.get(0)).append('\n');
        int demo = lines.size() - 1;
        for (int i = 0; i < n; i++) {
            String row = lines.get(1 + i % demo);
            csv.append(i < demo ? row : row.replaceFirst(",", " #" + (1 + i / demo) + ",")).append('\n');
        }
        Path file = Files.createTempFile("nebulith-bench", ".csv");
        try {
            Files.writeString(file, csv);
            return CatalogueInput.read(file, "benchmark catalogue", settings, false, System.err::println);
        } finally {
            Files.deleteIfExists(file);
        }
    }

    /** @return CPU time of the whole process [ns] (all threads, Spark's own included) */
    private static long processCpu() {
        java.lang.management.OperatingSystemMXBean os = java.lang.management.ManagementFactory.getOperatingSystemMXBean();
        return os instanceof com.sun.management.OperatingSystemMXBean sun ? sun.getProcessCpuTime() : 0;
    }

    private static double seconds(long start) {
        return (System.nanoTime() - start) / 1e9;
    }

    private static String loadAverage() {
        try {
            return Files.readString(Path.of("/proc/loadavg")).trim();
        } catch (IOException | RuntimeException e) {
            return "(unknown)";
        }
    }
}
