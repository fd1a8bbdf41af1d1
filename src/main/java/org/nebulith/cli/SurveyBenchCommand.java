package org.nebulith.cli;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.nebulith.errors.InputException;
import org.nebulith.progress.Progress;
import org.nebulith.survey.CatalogueProblem;
import org.nebulith.survey.CatalogueReader;
import org.nebulith.survey.StarRow;
import org.nebulith.survey.SurveyBenchmark;
import org.nebulith.survey.SurveyRunner;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code nebulith bench-survey}: times the survey with the planet estimate of
 * {@link SurveyCommand#estimator} on invented benchmark stars (or on a catalogue's stars) with the
 * default disk and zone. Targets on 2 cores of a quiet machine: 100 stars x 100 draws at 600 draws
 * per second or more; invented stars with 0.3 dex scatter at 300 draws per second or more.
 */
@Command(name = "bench-survey",
        description = {
            "Benchmark of the survey: invented stars (or a catalogue's) x draws with the",
            "default disk and zone. Prints progress, then wall time, draws and equilibria",
            "per second, equilibria per draw, the median and 99th-percentile time per draw,",
            "the share of each draw's first equilibrium and the CPU time per draw.",
            "Targets on 2 cores of a quiet machine: 600 draws/s with the defaults,",
            "300 draws/s with --scatter 0.3.",
        },
        footerHeading = "%nExamples:%n",
        footer = {"  nebulith bench-survey", "  nebulith bench-survey --stars 20 --draws 50 --threads 1",
            "  nebulith bench-survey --scatter 0.3", "  nebulith bench-survey --catalogue stars.csv --stars 50"})
public final class SurveyBenchCommand extends RunCommand {
    /** Target of the default benchmark on 2 cores of a quiet machine [draws/s]. */
    static final double TARGET_DRAWS_PER_S = 600;
    /** Target with 0.3 dex scatter on 2 cores of a quiet machine [draws/s]. */
    static final double TARGET_SCATTER_DRAWS_PER_S = 300;

    @Option(names = "--stars", paramLabel = "N",
            description = "Stars: invented ones (default 100), or the first N of --catalogue (default all).")
    private Integer stars;

    @Option(names = "--draws", paramLabel = "N", defaultValue = "100", description = "Draws per star (default: ${DEFAULT-VALUE}).")
    private int draws;

    @Option(names = "--threads", paramLabel = "N", description = "Worker threads (default: all processors).")
    private Integer threads;

    @Option(names = "--seed", defaultValue = "1", description = "Seed (default: ${DEFAULT-VALUE}).")
    private long seed;

    @Option(names = "--scatter", paramLabel = "DEX", defaultValue = "0.05",
            description = "Standard deviation of the invented stars' [X/H] about their [Fe/H] [dex] (default: ${DEFAULT-VALUE}).")
    private double scatterDex;

    @Option(names = "--catalogue", paramLabel = "FILE",
            description = "Take the stars (their abundances, errors and own disk/zones) from this survey catalogue.")
    private Path catalogue;

    @Override
    protected int execute(final RunContext context) throws IOException {
        int workers = threads == null ? SurveyRunner.defaultThreads() : threads;
        check(workers);
        List<StarRow> rows = catalogue != null ? readCatalogue(catalogue, stars == null ? Integer.MAX_VALUE : stars)
                : SurveyBenchmark.inventedStars(stars == null ? 100 : stars, seed, scatterDex);
        if (rows.isEmpty()) {
            throw InputException.inFile(catalogue, "the catalogue has no star rows", "a header line and one row per star");
        }
        String source = catalogue != null ? "catalogue " + catalogue
                : String.format(Locale.ROOT, "invented stars, scatter %.3g dex", scatterDex);
        SurveyBenchmark.Figures f;
        try (Progress bar = context.progress("bench-survey", (long) rows.size() * draws)) {
            f = SurveyBenchmark.run(SurveyCommand::estimator, rows, draws, workers, seed, bar);
        }
        print(context.out(), f, "planet estimate of the survey command; " + source);
        return ExitCodes.OK;
    }

    private void check(final int workers) {
        if (stars != null && stars < 1) {
            throw InputException.atOption("--stars", stars, "must be at least 1", "an integer >= 1");
        }
        if (draws < 1) {
            throw InputException.atOption("--draws", draws, "must be at least 1", "an integer >= 1");
        }
        if (workers < 1) {
            throw InputException.atOption("--threads", workers, "must be at least 1", "an integer >= 1");
        }
        if (!(scatterDex >= 0 && scatterDex <= 1)) {
            throw InputException.atOption("--scatter", scatterDex, "must be between 0 and 1 dex", "a number in [0, 1]");
        }
        if (catalogue != null && !Files.isRegularFile(catalogue)) {
            throw InputException.atOption("--catalogue", catalogue, "is not a readable file", "a survey catalogue (CSV)");
        }
    }

    /** The first {@code limit} rows; the first bad row is an input error (the benchmark skips nothing). */
    private static List<StarRow> readCatalogue(final Path file, final int limit) throws IOException {
        List<StarRow> rows = new ArrayList<>();
        try (CatalogueReader reader = CatalogueReader.open(file)) {
            throwFirst(file, reader.headerProblems());
            for (CatalogueReader.Parsed p = reader.next(); p != null && rows.size() < limit; p = reader.next()) {
                throwFirst(file, p.problems());
                rows.add(p.row());
            }
        }
        return rows;
    }

    private static void throwFirst(final Path file, final List<CatalogueProblem> problems) {
        if (!problems.isEmpty()) {
            CatalogueProblem p = problems.get(0);
            throw InputException.atField(file, p.line(), p.column(), p.value(), p.problem(), p.accepted());
        }
    }

    /**
     * @param out   where to print
     * @param f     the figures
     * @param model what the estimator and the stars were
     */
    public static void print(final PrintStream out, final SurveyBenchmark.Figures f, final String model) {
        out.println("bench-survey: " + f.stars() + " stars x " + f.draws() + " draws, " + f.threads() + " threads, "
                + Runtime.getRuntime().availableProcessors() + " processors; estimator: " + model);
        out.println("load average (last minute) at the end: " + loadAverage());
        out.println(String.format(Locale.ROOT, "wall time: %.3f s", f.seconds()));
        out.println(String.format(Locale.ROOT, "draws per second: %.1f (targets on 2 cores, quiet machine: %.0f with the"
                + " defaults, %.0f with --scatter 0.3)", f.drawsPerSecond(), TARGET_DRAWS_PER_S, TARGET_SCATTER_DRAWS_PER_S));
        if (f.equilibria() > 0) {
            out.println(String.format(Locale.ROOT, "equilibria per second: %.1f (%d solved)", f.equilibriaPerSecond(),
                    f.equilibria()));
            out.println(String.format(Locale.ROOT, "equilibria per draw: %.2f (the stars' nominal estimates included)",
                    f.equilibriaPerDraw()));
        } else {
            out.println("equilibria per second: not counted by this estimator");
        }
        out.println(String.format(Locale.ROOT, "ms per draw (wall, per thread): median %.2f, 99th percentile %.2f",
                f.drawMillisAt(0.5), f.drawMillisAt(0.99)));
        out.println(Double.isNaN(f.firstEquilibriumShare()) ? "first equilibrium of each draw: not timed by this estimator"
                : String.format(Locale.ROOT, "first equilibrium of each draw: %.1f %% of the estimate time",
                        100 * f.firstEquilibriumShare()));
        if (f.failedStars() > 0 || f.failedDraws() > 0) {
            out.println("failed (recorded and left out, as in a survey): " + f.failedStars() + " stars, " + f.failedDraws()
                    + " draws");
        }
        out.println(Double.isNaN(f.cpuSeconds()) ? "CPU time: not reported by this JVM"
                : String.format(Locale.ROOT, "CPU time of the process: %.2f s (%.2f ms per draw; steadier than the wall"
                        + " clock on a shared machine)", f.cpuSeconds(), f.cpuMillisPerDraw()));
    }

    private static String loadAverage() {
        double load = java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage();
        return load >= 0 ? String.format(Locale.ROOT, "%.2f", load) : "not available on this system";
    }
}
