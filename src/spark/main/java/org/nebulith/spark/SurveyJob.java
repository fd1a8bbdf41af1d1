package org.nebulith.spark;

import java.io.IOException;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;

import org.apache.hadoop.fs.Path;
import org.apache.spark.api.java.JavaRDD;
import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.sql.SparkSession;
import org.nebulith.composition.SolarReference;
import org.nebulith.survey.StarRow;
import org.nebulith.survey.SurveySettings;

/**
 * A whole distributed survey, driven from the Spark driver: read and check the catalogue, build the
 * grid's tasks, compute them on the executors ({@link SparkSurvey}), write the tables
 * ({@link SurveyTables}).
 */
public final class SurveyJob {

    /**
     * @param catalogue  the catalogue (Hadoop path or URI, read by the driver)
     * @param out        the output folder (Hadoop path or URI; on a cluster, a file system the executors share)
     * @param draws      draws per star
     * @param seed       the seed
     * @param solar      the catalogue's solar reference
     * @param grid       disk models and zone files
     * @param partitions partitions, or null for {@link SparkSurvey#defaultPartitions}
     * @param skipBad    skip bad catalogue rows; failing stars do not change the exit code
     * @param force      replace an existing output folder
     */
    public record Request(String catalogue, String out, int draws, long seed, SolarReference solar, SurveyGrid grid,
                          Integer partitions, boolean skipBad, boolean force) {
    }

    /**
     * @param written    what was written
     * @param tasks      tasks (stars x grid cells)
     * @param partitions partitions used
     * @param seconds    wall time of computing and writing [s]
     */
    public record Outcome(SurveyTables.Written written, long tasks, int partitions, double seconds) {
    }

    private SurveyJob() {
    }

    /**
     * @param spark   the session
     * @param request what to run
     * @param factory the planet estimate
     * @param warn    problem lines (bad rows, failed stars)
     * @return the outcome
     * @throws IOException on read or write failures
     * @throws org.nebulith.errors.InputException for a bad catalogue or an existing output
     */
    public static Outcome run(SparkSession spark, Request request, EstimatorFactory factory, Consumer<String> warn)
            throws IOException {
        SurveySettings settings = request.grid().settings(request.draws(), request.seed(), request.solar());
        org.apache.hadoop.conf.Configuration hadoop = spark.sparkContext().hadoopConfiguration();
        Path out = new Path(request.out());
        SurveyTables.checkOutput(out.getFileSystem(hadoop), out, request.force());
        List<StarRow> stars = CatalogueInput.read(request.catalogue(), hadoop, settings, request.skipBad(), warn);
        List<GridTask> tasks = request.grid().tasks(stars);
        JavaSparkContext jsc = JavaSparkContext.fromSparkContext(spark.sparkContext());
        int partitions = request.partitions() != null ? request.partitions()
                : SparkSurvey.defaultPartitions(tasks.size(), request.draws(), jsc.defaultParallelism());
        long start = System.nanoTime();
        jsc.setJobDescription("nebulith survey: " + tasks.size() + " tasks x " + request.draws() + " draws");
        JavaRDD<TaskResult> results = SparkSurvey.results(jsc, tasks, settings, factory, partitions);
        int[] shown = {0};
        SurveyTables.Written w = SurveyTables.write(spark, results, request.grid().isGrid(), request.out(),
                request.force(), written -> notes(request, settings, stars.size(), tasks.size(), partitions, written,
                        spark.sparkContext().master()),
                failed -> {
                    if (shown[0]++ < 100) {
                        warn.accept("failed: " + failed.failure());
                    }
                });
        if (shown[0] > 100) {
            warn.accept("... and " + (shown[0] - 100) + " more failed stars, listed in " + SurveyTables.FAILURES);
        }
        return new Outcome(w, tasks.size(), partitions, (System.nanoTime() - start) / 1e9);
    }

    private static String notes(Request r, SurveySettings settings, long stars, long tasks, int partitions,
                                SurveyTables.Written w, String master) {
        StringBuilder b = new StringBuilder();
        b.append("Nebulith survey on Apache Spark\n\n");
        b.append("catalogue: ").append(r.catalogue()).append(" (").append(stars).append(" stars)\n");
        b.append("draws per star: ").append(r.draws()).append("\nseed: ").append(r.seed()).append('\n');
        b.append("solar reference: ").append(r.solar().name().toLowerCase(Locale.ROOT)).append('\n');
        b.append("grid: ").append(r.grid()).append(" (").append(r.grid().cells()).append(" cell(s))\n");
        b.append("run disk: ").append(settings.disk() == null ? "(default) " + SurveyGrid.diskLabel(settings)
                : settings.disk()).append('\n');
        b.append("run zones: ").append(settings.zones() == null ? "(default) " + SurveyGrid.zonesLabel(settings)
                : settings.zones()).append('\n');
        b.append("tasks: ").append(tasks).append(" in ").append(partitions).append(" partitions; Spark master ")
                .append(master).append('\n');
        b.append("computed: ").append(w.stars()).append(" tasks, ").append(w.rows()).append(" rows; failed: ")
                .append(w.failed()).append(" tasks; draws failed: ").append(w.failedDraws()).append(" of ")
                .append(tasks * r.draws()).append(" (listed in ").append(SurveyTables.FAILURES).append(")\n\n");
        b.append("Method: the same per-star function as `nebulith survey` (draw d of star S uses the random stream\n");
        b.append("of (seed, S, d)), so every star's block equals the local survey's whatever the partitioning.\n");
        b.append("Caution: only the catalogue's random errors are propagated, not systematics between abundance\n");
        b.append("analyses; the planet estimate keeps the assumptions of the disk and zone models used.\n");
        return b.toString();
    }
}
