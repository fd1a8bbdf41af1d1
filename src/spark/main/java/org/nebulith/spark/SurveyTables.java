package org.nebulith.spark;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.function.Consumer;

import org.apache.hadoop.fs.FileSystem;
import org.apache.hadoop.fs.Path;
import org.apache.spark.api.java.JavaRDD;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.RowFactory;
import org.apache.spark.sql.SparkSession;
import org.apache.spark.sql.types.DataTypes;
import org.apache.spark.sql.types.StructField;
import org.apache.spark.sql.types.StructType;
import org.apache.spark.storage.StorageLevel;
import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;
import org.nebulith.files.CsvTableWriter;
import org.nebulith.survey.SurveyCsv;
import org.nebulith.survey.SurveyFailures;
import org.nebulith.survey.SurveyRow;

/**
 * Writes a distributed survey's tables into an output folder on any Hadoop file system (local,
 * HDFS, S3, ...). The folder is built as a hidden sibling ({@code .NAME.partial-...}) and renamed
 * into place at the end, so a failed run leaves no half-written folder under the final name.
 * <ul>
 * <li>{@code survey.csv}: without a grid, the same bytes as {@code nebulith survey} writes (same
 *     columns, stars in catalogue order, each star's block from {@link SurveyCsv#block});</li>
 * <li>{@code survey-grid.csv} instead, for a grid: columns {@code disk,zones} in front, then the
 *     same lines, cell by cell;</li>
 * <li>{@code survey.parquet}: every row with typed columns ({@link #SCHEMA});</li>
 * <li>{@code failures.csv}: every failed estimate, with the local survey's columns
 *     ({@link SurveyFailures#COLUMNS}: {@code star,draw,zone,T_K,P_bar,stage,reason}; stage {@code setup}
 *     when a star's disk or zone file cannot be used), the same bytes as the local survey's without a
 *     grid; for a grid, {@code disk,zones} in front (header only when nothing failed);</li>
 * <li>{@code survey-notes.txt}: the settings and counts (text given by the caller).</li>
 * </ul>
 * The results are persisted while they are written, so each task is computed once.
 */
public final class SurveyTables {

    /** Survey table without a grid. */
    public static final String CSV = SurveyCsv.FILE;
    /** Survey table of a grid. */
    public static final String GRID_CSV = "survey-grid.csv";
    /** Parquet table (a folder). */
    public static final String PARQUET = "survey.parquet";
    /** Failed estimates. */
    public static final String FAILURES = SurveyFailures.FILE;
    /** Notes. */
    public static final String NOTES = "survey-notes.txt";
    /** Columns of the failures table (without a grid). */
    public static final List<String> FAILURE_COLUMNS = SurveyFailures.COLUMNS;

    /** Columns of the Parquet table: the grid index, star, effective disk and zones, then those of survey.csv. */
    public static final StructType SCHEMA = new StructType(new StructField[] {
        DataTypes.createStructField("grid_index", DataTypes.LongType, false),
        DataTypes.createStructField("star", DataTypes.StringType, false),
        DataTypes.createStructField("disk", DataTypes.StringType, false),
        DataTypes.createStructField("zones", DataTypes.StringType, false),
        DataTypes.createStructField("zone", DataTypes.StringType, false),
        DataTypes.createStructField("quantity", DataTypes.StringType, false),
        DataTypes.createStructField("median", DataTypes.DoubleType, true),
        DataTypes.createStructField("p16", DataTypes.DoubleType, true),
        DataTypes.createStructField("p84", DataTypes.DoubleType, true),
        DataTypes.createStructField("unit", DataTypes.StringType, false),
        DataTypes.createStructField("nominal", DataTypes.DoubleType, true),
        DataTypes.createStructField("draws", DataTypes.IntegerType, false),
        DataTypes.createStructField("n_draws", DataTypes.IntegerType, false),
        DataTypes.createStructField("n_not_applicable", DataTypes.IntegerType, false),
    });

    /**
     * @param stars  stars (tasks) computed
     * @param failed tasks failed
     * @param rows   survey rows written
     * @param failedDraws draws failed (all of a failed task's draws included)
     * @param folder the output folder
     */
    public record Written(long stars, long failed, long rows, long failedDraws, String folder) {
    }

    private SurveyTables() {
    }

    /**
     * @param spark     the session
     * @param results   the survey's results, in task order
     * @param grid      whether the run is a grid (writes {@link #GRID_CSV} instead of {@link #CSV})
     * @param out       the output folder (a Hadoop path or URI)
     * @param force     replace an existing folder
     * @param notes     the text of {@link #NOTES}, given the counts
     * @param onFailure told of each failed task, in task order
     * @return what was written
     * @throws IOException on write failures
     * @throws InputException if the folder exists and force is not set
     */
    public static Written write(SparkSession spark, JavaRDD<TaskResult> results, boolean grid, String out, boolean force,
                                java.util.function.Function<Written, String> notes, Consumer<TaskResult> onFailure)
            throws IOException {
        Path folder = new Path(out);
        FileSystem fs = folder.getFileSystem(spark.sparkContext().hadoopConfiguration());
        checkOutput(fs, folder, force);
        Path partial = new Path(folder.getParent() == null ? new Path(".") : folder.getParent(),
                "." + folder.getName() + ".partial-" + Long.toHexString(System.nanoTime()));
        fs.mkdirs(partial);
        results.persist(StorageLevel.MEMORY_AND_DISK());
        boolean done = false;
        try {
            spark.createDataFrame(results.flatMap(SurveyTables::rows), SCHEMA).write()
                    .parquet(new Path(partial, PARQUET).toString());
            fs.setWriteChecksum(false);
            Written w = writeCsv(fs, partial, results.toLocalIterator(), grid, onFailure, folder.toString());
            try (BufferedWriter n = writer(fs, new Path(partial, NOTES))) {
                n.write(notes.apply(w));
            }
            if (force && fs.exists(folder)) {
                fs.delete(folder, true);
            }
            if (!fs.rename(partial, folder)) {
                throw new IOException("cannot rename " + partial + " to " + folder);
            }
            done = true;
            return w;
        } finally {
            results.unpersist(false);
            if (!done) {
                fs.delete(partial, true);
            }
        }
    }

    /**
     * @param fs     the folder's file system
     * @param folder the output folder
     * @param force  whether it may be replaced
     * @throws IOException if the file system cannot be asked
     * @throws InputException if it exists and may not be replaced
     */
    public static void checkOutput(FileSystem fs, Path folder, boolean force) throws IOException {
        if (!force && fs.exists(folder)) {
            throw new InputException(Messages.OUTPUT_EXISTS, null, folder);
        }
    }

    private static Written writeCsv(FileSystem fs, Path partial, Iterator<TaskResult> results, boolean grid,
                                    Consumer<TaskResult> onFailure, String folder) throws IOException {
        long stars = 0;
        long failed = 0;
        long rows = 0;
        long failedDraws = 0;
        try (BufferedWriter csv = writer(fs, new Path(partial, grid ? GRID_CSV : CSV));
             BufferedWriter failures = writer(fs, new Path(partial, FAILURES))) {
            csv.write(grid ? prefix("disk", "zones") + SurveyCsv.HEADER : SurveyCsv.HEADER);
            failures.write(grid ? prefix("disk", "zones") + SurveyFailures.HEADER : SurveyFailures.HEADER);
            while (results.hasNext()) {
                TaskResult r = results.next();
                failures.write(grid ? prefixed(r, r.failures()) : r.failures());
                failedDraws += r.failedDraws();
                if (!r.ok()) {
                    failed++;
                    onFailure.accept(r);
                    continue;
                }
                stars++;
                rows += r.rows().size();
                csv.write(grid ? gridBlock(r) : r.block());
            }
        }
        return new Written(stars, failed, rows, failedDraws, folder);
    }

    /** @return the star's block with its disk and zones in front of every line */
    private static String gridBlock(TaskResult r) {
        return prefixed(r, r.block());
    }

    private static String prefixed(TaskResult r, String lines) {
        if (lines.isEmpty()) {
            return "";
        }
        String front = prefix(r.disk(), r.zones());
        StringBuilder b = new StringBuilder(lines.length() + 16 * front.length());
        for (String line : lines.split("\n")) {
            b.append(front).append(line).append('\n');
        }
        return b.toString();
    }

    private static String prefix(String disk, String zones) {
        return CsvTableWriter.FORMAT.format(disk, zones) + ",";
    }

    private static Iterator<Row> rows(TaskResult r) {
        List<Row> out = new ArrayList<>(r.rows().size());
        for (SurveyRow s : r.rows()) {
            out.add(RowFactory.create(r.index(), s.star(), r.disk(), r.zones(), s.zone(), s.quantity(), orNull(s.median()),
                    orNull(s.p16()), orNull(s.p84()), s.unit(), orNull(s.nominal()), s.draws(), s.nDraws(),
                    s.notApplicable()));
        }
        return out.iterator();
    }

    /** NaN is a survey row's "no value": null in Parquet, as it is an empty cell in the CSV. */
    private static Double orNull(double v) {
        return Double.isNaN(v) ? null : v;
    }

    private static BufferedWriter writer(FileSystem fs, Path file) throws IOException {
        return new BufferedWriter(new OutputStreamWriter(fs.create(file, false), StandardCharsets.UTF_8));
    }
}
