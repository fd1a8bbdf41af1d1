package org.nebulith.cli;

import java.io.PrintStream;
import java.util.Locale;

import org.nebulith.errors.InputException;
import org.nebulith.progress.Progress;
import org.nebulith.survey.SurveyBenchmark;
import org.nebulith.survey.SurveyRunner;

import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/**
 * {@code nebulith bench-survey}: times the survey on invented benchmark stars with the planet
 * estimate of {@link SurveyCommand#estimator} and the default disk and zone. Target: 100 stars x
 * 100 draws in under 60 s of wall time on 2 cores.
 */
@Command(name = "bench-survey",
        description = {
            "Benchmark of the survey: invented stars x draws with the default disk and zone;",
            "prints wall time, draws per second and equilibria per second.",
            "Target: 100 stars x 100 draws under 60 s on 2 cores.",
        },
        footerHeading = "%nExamples:%n",
        footer = {"  nebulith bench-survey", "  nebulith bench-survey --stars 20 --draws 50 --threads 1"})
public final class SurveyBenchCommand extends RunCommand {

    @Option(names = "--stars", defaultValue = "100", description = "Invented stars (default: ${DEFAULT-VALUE}).")
    private int stars;

    @Option(names = "--draws", defaultValue = "100", description = "Draws per star (default: ${DEFAULT-VALUE}).")
    private int draws;

    @Option(names = "--threads", description = "Worker threads (default: all processors).")
    private Integer threads;

    @Option(names = "--seed", defaultValue = "1", description = "Seed (default: ${DEFAULT-VALUE}).")
    private long seed;

    @Override
    protected int execute(final RunContext context) throws Exception {
        if (stars < 1 || draws < 1) {
            throw InputException.atOption(stars < 1 ? "--stars" : "--draws", stars < 1 ? stars : draws,
                    "must be at least 1", "an integer >= 1");
        }
        int workers = threads == null ? SurveyRunner.defaultThreads() : threads;
        SurveyBenchmark.Figures f;
        try (Progress progress = context.progress("bench-survey", (long) stars * draws)) {
            f = SurveyBenchmark.run(SurveyCommand::estimator, stars, draws, workers, seed, progress);
        }
        print(context.out(), f, "planet estimate of the survey command");
        return ExitCodes.OK;
    }

    /**
     * @param out   where to print
     * @param f     the figures
     * @param model what the estimator was
     */
    public static void print(final PrintStream out, final SurveyBenchmark.Figures f, final String model) {
        out.println("bench-survey: " + f.stars() + " stars x " + f.draws() + " draws, " + f.threads() + " threads, "
                + Runtime.getRuntime().availableProcessors() + " processors; estimator: " + model);
        out.println(String.format(Locale.ROOT, "wall time: %.3f s (target: under 60 s for 100 x 100 on 2 cores)", f.seconds()));
        out.println(String.format(Locale.ROOT, "draws per second: %.1f", f.drawsPerSecond()));
        out.println(f.equilibria() > 0 ? String.format(Locale.ROOT, "equilibria per second: %.1f (%d solved)",
                f.equilibriaPerSecond(), f.equilibria()) : "equilibria per second: not counted by this estimator");
    }
}
