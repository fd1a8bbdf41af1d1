package org.nebulith.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

import org.nebulith.composition.SolarReference;
import org.nebulith.disk.DiskPresets;
import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;
import org.nebulith.survey.EstimatorCache;
import org.nebulith.report.survey.LocalSurvey;
import org.nebulith.survey.PlanetEstimator;
import org.nebulith.survey.SurveyRunner;
import org.nebulith.survey.SurveySettings;

import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code nebulith survey}: predicted rocky planets for a catalogue of host stars, with Monte Carlo
 * uncertainties (see {@link LocalSurvey}).
 *
 * <p>The science of each draw comes from {@link #estimator(SurveySettings)}: the one seam where the
 * planet estimate is plugged in.
 */
@Command(name = "survey",
        description = {
            "Host-star survey: predicted rocky planets for a catalogue of stars.",
            "Monte Carlo over the abundance errors: median, 16th and 84th percentiles of",
            "every quantity; parallel, and reproducible for a given seed.",
            "Catalogue CSV: star, X_H and X_H_err ([X/H] and 1-sigma error in dex) for any",
            "elements X (Fe_H required; elements a star lacks follow its [Fe/H]); optional",
            "disk, zones (the star's own) and err_corr (common error correlation, 0..1).",
            "Writes into --out (default reports/survey-<yyyyMMdd-HHmmss>/): survey.csv,",
            "  survey-stars.csv (per star), survey-notes.txt, survey-chart (.png/.svg/.pdf),",
            "  failures.csv (failed draws), report.html and summary.md.",
            "Time grows with stars x draws: the 20 demo stars take about 25 s with the",
            "default 1000 draws on a quiet 2-core machine, about 5 s with 100.",
        },
        footerHeading = "%nExamples (from the repository folder):%n",
        footer = {
            "  nebulith survey --catalogue presets/demo-catalogue.csv --draws 20 --skip-bad",
            "  nebulith survey --catalogue presets/demo-catalogue.csv --preset quick-survey",
            "  nebulith survey --catalogue CATALOGUE.csv --threads 2 --run-name my-survey",
            "  nebulith survey --catalogue CATALOGUE.csv --run-name my-survey --resume",
        })
public class SurveyCommand extends RunCommand {

    @Mixin
    private RunOptions output;

    @Override
    protected OutputTarget outputTarget() {
        return output;
    }

    @Option(names = "--catalogue", required = true, paramLabel = "FILE",
            description = "Star catalogue (CSV; see above).")
    private Path catalogue;

    @Option(names = "--draws", paramLabel = "N", defaultValue = "1000",
            description = "Monte Carlo draws per star, at most 100000, and at most 1e8 in all (default: ${DEFAULT-VALUE}).")
    private int draws;

    @Option(names = "--seed", paramLabel = "S", defaultValue = "1",
            description = "Seed of the draws (default: ${DEFAULT-VALUE}); same seed, same results.")
    private long seed;

    @Option(names = "--threads", paramLabel = "N",
            description = "Worker threads, at most 4 per processor (default: all processors); results do not depend on it.")
    private Integer threads;

    @Option(names = "--disk", paramLabel = "NAME|FILE", description = "Disk preset or file (default: the planet estimate's).")
    private String disk;

    @Option(names = "--zones", paramLabel = "FILE", description = "Feeding-zone file (default: the planet estimate's zone).")
    private String zones;

    @Option(names = "--solar-reference", paramLabel = "REF", defaultValue = "asplund2009",
            description = "Solar reference of the catalogue's [X/H]: asplund2009 (default) or lodders2003.")
    private String solarReference;

    @Mixin
    private SystemOptions system = new SystemOptions();

    @Mixin
    private PlanetOptions planet = new PlanetOptions();

    @Option(names = "--skip-bad", description = "Skip bad catalogue rows (listed in survey-stars.csv) instead of stopping.")
    private boolean skipBad;

    @Option(names = "--max-failed-fraction", paramLabel = "F", defaultValue = "0.01",
            description = "Stop (exit 3, resumable) once failed draws exceed this fraction of the run's draws"
                    + " (default: ${DEFAULT-VALUE}); failed draws are listed in failures.csv.")
    private double maxFailedFraction;

    @Option(names = "--strict", description = "Stop (exit 3, resumable) at the first failed draw or star.")
    private boolean strict;

    @Option(names = "--resume", description = "Continue an earlier or interrupted run in the output folder.")
    private boolean resume;

    @Spec
    private CommandSpec spec;

    /**
     * THE SEAM: builds the planet estimate that every draw runs.
     *
     * @param settings the effective settings of a star: {@link SurveySettings#disk()} (preset name or
     *                 file, null for the default disk), {@link SurveySettings#zones()} (feeding-zone file,
     *                 null for the default zone) and the solar reference; called once per distinct
     *                 disk/zones, before anything is computed (an {@link InputException} for a bad disk
     *                 or zone file is reported against the catalogue row that names it)
     * @return a pure, thread-safe estimator
     */
    public static PlanetEstimator estimator(final SurveySettings settings) {
        try {
            return org.nebulith.survey.PlanetSurveyEstimator.create(settings);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    /**
     * @param settings effective settings
     * @return the estimator (tests override this to run the command with a stand-in)
     */
    protected PlanetEstimator estimatorFor(final SurveySettings settings) {
        return estimator(settings);
    }

    @Override
    protected int execute(final RunContext context) throws Exception {
        if (draws < 1) {
            throw InputException.atOption("--draws", draws, "must be at least 1", "an integer >= 1");
        }
        int workers = threads == null ? SurveyRunner.defaultThreads() : threads;
        if (workers < 1 || workers > maxThreads()) {
            throw InputException.atOption("--threads", workers, workers < 1 ? "must be at least 1"
                    : "more than 4 per processor", "an integer from 1 to " + maxThreads() + " (4 x "
                    + Runtime.getRuntime().availableProcessors() + " processors)");
        }
        if (!(maxFailedFraction >= 0 && maxFailedFraction <= 1)) {
            throw InputException.atOption("--max-failed-fraction", maxFailedFraction, "must be a fraction",
                    "a number from 0 to 1");
        }
        context.input(catalogue, "catalogue");
        disk = workingCopy(PresetCatalogue.Kind.DISK, disk);
        zones = workingCopy(PresetCatalogue.Kind.ZONES, zones);
        if (disk != null && !DiskPresets.NAMES.contains(disk) && !Files.isRegularFile(Path.of(disk))) {
            throw InputException.atOption("--disk", disk, "neither a disk preset nor a file",
                    String.join(", ", DiskPresets.NAMES) + ", or a disk file");
        }
        registerIfFile(context, disk, "disk");
        registerIfFile(context, zones, "feeding zones");
        SurveySettings settings = new SurveySettings(draws, seed, solar(), disk, zones,
                planet.formationOptions(system, context));
        if (resume && context.outOption().isEmpty() && !context.hasRunName()) {
            throw InputException.atOption("--resume", "", "needs the folder of the earlier run",
                    "--resume together with --out DIR or --run-name NAME of that run");
        }
        Path folder = context.outputFolder(context.defaultRunName());
        LocalSurvey.Request request = new LocalSurvey.Request(catalogue, catalogue.toString(), folder, settings, workers,
                skipBad, resume, context.force(), maxFailedFraction, strict);
        NebulithCommand root = (NebulithCommand) spec.root().userObject();
        LocalSurvey.Log log = new LocalSurvey.Log() {
            @Override
            public void info(final String line) {
                context.info(line);
            }

            @Override
            public void warn(final String line) {
                root.err().println(line);
            }
        };
        long start = System.nanoTime();
        LocalSurvey.Result r = LocalSurvey.run(request, new EstimatorCache(this::estimatorFor), context.inputs(),
                total -> context.progress("survey", total), log);
        double seconds = (System.nanoTime() - start) / 1e9;
        context.info(String.format(Locale.ROOT, "survey: %d stars (%d taken over with --resume), %d skipped, %d failed;"
                + " %d draws in %.1f s on %d threads", r.stars(), r.resumed(), r.skipped(), r.failed(), r.draws(),
                seconds, workers));
        context.info("wrote " + r.survey() + " with failures.csv, survey-stars.csv, survey-notes.txt,"
                + " survey-chart.png/.svg/.pdf, report.html and summary.md");
        context.out().println(r.failureLine());
        return ExitCodes.OK;
    }

    /** @return the most worker threads accepted: 4 per processor */
    static int maxThreads() {
        return 4 * Runtime.getRuntime().availableProcessors();
    }

    private SolarReference solar() {
        return SolarReferences.parse(solarReference);
    }

    private static void registerIfFile(final RunContext context, final String value, final String role) {
        if (value != null && Files.isRegularFile(Path.of(value))) {
            context.input(Path.of(value), role);
        }
    }

    /**
     * @param kind the kind of named input
     * @param name a preset name, a file or null
     * @return the working folder's copy of a named preset as a file path (it wins over the built-in
     *         copy, as for the other commands), else the value unchanged
     */
    private static String workingCopy(final PresetCatalogue.Kind kind, final String name) {
        if (name == null) {
            return null;
        }
        return PresetCatalogue.here().find(kind, name).filter(e -> !e.builtIn()).map(e -> e.file().toString())
                .orElse(name);
    }
}
