package org.nebulith.spark;

import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.apache.spark.sql.SparkSession;
import org.nebulith.composition.SolarReference;
import org.nebulith.errors.InputException;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * The {@code spark-submit} entry point: catalogue in, survey tables out ({@link SurveyJob}).
 *
 * <p>Exit codes as the command line's: 0 success, 1 internal or I/O failure, 2 bad input (nothing
 * computed), 3 some stars failed (listed; every other star is written), 0 instead with
 * {@code --skip-bad}.
 */
@Command(name = "nebulith-spark", mixinStandardHelpOptions = true, versionProvider = SparkSurveyMain.Version.class,
        description = {
            "Host-star survey on Apache Spark: the per-star work of `nebulith survey`, as Spark tasks.",
            "Writes survey.csv (or survey-grid.csv for a grid), survey.parquet, failures.csv and",
            "survey-notes.txt into --out. Two or more --disk or --zones values make a grid: every star",
            "is computed under each disk model and zone file.",
        },
        footerHeading = "%nExample:%n",
        footer = {
            "  spark-submit --class org.nebulith.spark.SparkSurveyMain nebulith-spark.jar \\",
            "      --catalogue demo-catalogue.csv --draws 1000 --seed 7 --out survey-demo",
        })
public final class SparkSurveyMain implements Callable<Integer> {

    static final int OK = 0;
    static final int FAILURE = 1;
    static final int BAD_INPUT = 2;
    static final int STARS_FAILED = 3;

    @Option(names = "--catalogue", required = true, paramLabel = "PATH|URI", description = "Star catalogue CSV (as for `nebulith survey`).")
    private String catalogue;

    @Option(names = "--out", required = true, paramLabel = "PATH|URI",
            description = "Output folder; on a cluster, on a file system shared by the executors (HDFS, S3, NFS).")
    private String out;

    @Option(names = "--draws", paramLabel = "N", defaultValue = "1000", description = "Draws per star (default: ${DEFAULT-VALUE}).")
    private int draws;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Seed (default: ${DEFAULT-VALUE}).")
    private long seed;

    @Option(names = "--disk", split = ",", paramLabel = "NAME|FILE",
            description = "Disk preset or file; repeat (or separate by commas) for a grid of disk models.")
    private List<String> disks = new ArrayList<>();

    @Option(names = "--zones", split = ",", paramLabel = "FILE",
            description = "Feeding-zone file; repeat for a grid. Files must be readable where the tasks run "
                    + "(spark-submit --files, then the bare file name).")
    private List<String> zones = new ArrayList<>();

    @Option(names = "--solar-reference", paramLabel = "REF", defaultValue = "asplund2009",
            description = "asplund2009 (default) or lodders2003.")
    private String solar;

    @Option(names = "--partitions", paramLabel = "N",
            description = "Partitions (default: 2 per core, more for big runs, about 5000 draws each).")
    private Integer partitions;

    @Option(names = "--skip-bad", description = "Skip bad catalogue rows; failing stars then give exit code 0.")
    private boolean skipBad;

    @Option(names = "--force", description = "Replace an existing output folder.")
    private boolean force;

    private final PrintStream err;

    SparkSurveyMain(PrintStream err) {
        this.err = err;
    }

    /**
     * @param args the command line
     */
    public static void main(String[] args) {
        System.exit(run(args, System.err));
    }

    /**
     * @param args the command line
     * @param err  where messages go
     * @return the exit code
     */
    static int run(String[] args, PrintStream err) {
        CommandLine cl = new CommandLine(new SparkSurveyMain(err));
        cl.setErr(new java.io.PrintWriter(err, true));
        cl.setParameterExceptionHandler((e, a) -> {
            err.println("nebulith-spark: " + e.getMessage() + " (see --help)");
            return BAD_INPUT;
        });
        return cl.execute(args);
    }

    @Override
    public Integer call() {
        SurveyJob.Request request;
        try {
            request = request();
        } catch (InputException e) {
            err.println("nebulith-spark: " + e.getMessage());
            return BAD_INPUT;
        }
        SparkSession spark = SparkSessions.submitted();
        try {
            SurveyJob.Outcome o = SurveyJob.run(spark, request, EstimatorFactory.PLANET, err::println);
            SurveyTables.Written w = o.written();
            err.println(String.format(Locale.ROOT, "nebulith-spark: %d tasks in %d partitions: %d computed, %d failed;"
                    + " %d draws in %.1f s; wrote %s", o.tasks(), o.partitions(), w.stars(), w.failed(),
                    w.stars() * (long) draws, o.seconds(), w.folder()));
            err.println(w.failedDraws() + " of " + o.tasks() * (long) draws + " draws failed (" + SurveyTables.FAILURES + ")");
            return w.failed() > 0 && !skipBad ? STARS_FAILED : OK;
        } catch (InputException e) {
            err.println("nebulith-spark: " + e.getMessage());
            return BAD_INPUT;
        } catch (java.io.IOException | RuntimeException e) {
            err.println("nebulith-spark: failed: " + e);
            return FAILURE;
        } finally {
            spark.stop();
        }
    }

    SurveyJob.Request request() {
        if (draws < 1) {
            throw InputException.atOption("--draws", draws, "must be at least 1", "an integer >= 1");
        }
        if (partitions != null && partitions < 1) {
            throw InputException.atOption("--partitions", partitions, "must be at least 1", "an integer >= 1");
        }
        SolarReference ref;
        switch (solar.toLowerCase(Locale.ROOT)) {
            case "asplund2009": ref = SolarReference.ASPLUND2009; break;
            case "lodders2003": ref = SolarReference.LODDERS2003; break;
            default: throw InputException.atOption("--solar-reference", solar, "unknown solar reference",
                    "asplund2009, lodders2003");
        }
        return new SurveyJob.Request(catalogue, out, draws, seed, ref, new SurveyGrid(disks, zones), partitions, skipBad,
                force);
    }

    /** The version from the jar's manifest. */
    static final class Version implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            String v = SparkSurveyMain.class.getPackage().getImplementationVersion();
            return new String[] {"nebulith-spark " + (v == null ? "dev" : v)};
        }
    }
}
