package org.nebulith.report.survey;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.TreeMap;
import java.util.function.LongFunction;

import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;
import org.nebulith.errors.NumericalException;
import org.nebulith.progress.Progress;
import org.nebulith.files.AtomicOutput;
import org.nebulith.files.RunInputs;
import org.nebulith.survey.CatalogueCheck;
import org.nebulith.survey.CatalogueProblem;
import org.nebulith.survey.CatalogueReader;
import org.nebulith.survey.EstimatorCache;
import org.nebulith.survey.StarJobException;
import org.nebulith.survey.StarRow;
import org.nebulith.survey.SurveyCsv;
import org.nebulith.survey.SurveyFailures;
import org.nebulith.survey.SurveyRow;
import org.nebulith.survey.SurveyRunner;
import org.nebulith.survey.SurveySettings;
import org.nebulith.files.OutputWriteException;
import org.nebulith.files.RunFolder;
import org.nebulith.files.RunMarker;
import org.nebulith.files.RunInputs;

/**
 * A whole survey on this machine: validating pass over the catalogue, then the streaming compute
 * pass ({@link SurveyResume} for stars already done, {@link SurveyRunner} for the rest). Every file
 * is built in the run's hidden, resumable folder ({@link RunFolder#openResumable}, checked and
 * locked before anything is computed) and all appear together when it is renamed into place:
 * <ul>
 * <li>{@code survey.csv} ({@link SurveyCsv}), streamed into {@code .survey.csv.partial} there
 *     (flushed after every star); an interrupted or failed run keeps that folder for
 *     {@code --resume} and leaves nothing under the final name;</li>
 * <li>{@code failures.csv} ({@link SurveyFailures}): every failed estimate, streamed the same way
 *     into {@code .failures.csv.partial} (a star's failures before its rows);</li>
 * <li>{@code survey-stars.csv} ({@link StarsTable}), {@code survey-notes.txt} (settings, counts,
 *     cautions), {@code survey-chart.png/.svg/.pdf} ({@link SurveyChart}), {@code report.html} and
 *     {@code summary.md}, written at the end.</li>
 * </ul>
 * A failed draw does not stop the run; the run stops (a {@link NumericalException}, exit 3, the
 * partial files kept for {@code --resume}) when the failed draws exceed the request's fraction of
 * the run's draws, or at the first failure when it is strict.
 * The files do not depend on the thread count. Files named in the catalogue's disk and zones
 * columns are registered as inputs first, so no output can replace them.
 */
public final class LocalSurvey {

    static final String PARTIAL = ".survey.csv.partial";
    static final String NEXT = ".survey.csv.next";
    static final String NOTES = "survey-notes.txt";
    static final String FAILURES_PARTIAL = ".failures.csv.partial";
    static final String FAILURES_NEXT = ".failures.csv.next";
    /** Default of {@code --max-failed-fraction}. */
    public static final double DEFAULT_MAX_FAILED_FRACTION = 0.01;
    private static final int SHOWN_PROBLEMS = 100;

    /**
     * @param catalogue the catalogue file
     * @param shownName the catalogue as the user named it (messages, notes)
     * @param folder    the output folder
     * @param settings  the run settings
     * @param threads   worker threads
     * @param skipBad   skip bad catalogue rows (listed) instead of stopping
     * @param resume    continue an earlier run in the folder
     * @param force     replace an earlier run in the folder
     * @param maxFailedFraction stop once the failed draws exceed this fraction of the run's draws, in [0, 1]
     * @param strict    stop at the first failed estimate
     */
    public record Request(Path catalogue, String shownName, Path folder, SurveySettings settings, int threads,
                          boolean skipBad, boolean resume, boolean force, double maxFailedFraction, boolean strict) {
        public Request {
            if (!(maxFailedFraction >= 0 && maxFailedFraction <= 1)) {
                throw new IllegalArgumentException("max failed fraction must be in [0, 1], got " + maxFailedFraction);
            }
        }

        /** A request with the default failure policy ({@value #DEFAULT_MAX_FAILED_FRACTION}, not strict). */
        public Request(Path catalogue, String shownName, Path folder, SurveySettings settings, int threads,
                       boolean skipBad, boolean resume, boolean force) {
            this(catalogue, shownName, folder, settings, threads, skipBad, resume, force, DEFAULT_MAX_FAILED_FRACTION,
                    false);
        }
    }

    /** Where messages go. */
    public interface Log {
        /** @param line a note for the user */
        void info(String line);

        /** @param line a problem or caution, always shown */
        void warn(String line);
    }

    /**
     * @param stars    stars in survey.csv
     * @param resumed  of which taken over from an earlier run
     * @param skipped  bad catalogue rows skipped
     * @param failed   stars whose nominal estimate failed
     * @param draws    draws computed in this run
     * @param failedDraws draws that failed, in the whole survey (resumed stars included)
     * @param runDraws    draws of the whole survey (stars x draws)
     * @param survey   the survey table
     */
    public record Result(long stars, long resumed, long skipped, long failed, long draws, long failedDraws,
                         long runDraws, Path survey) {
        /** @return the closing line: "k of N draws failed (failures.csv)" */
        public String failureLine() {
            return failedDraws + " of " + runDraws + " draws failed (" + SurveyFailures.FILE + ")";
        }
    }

    private LocalSurvey() {
    }

    /**
     * @param request    what to run
     * @param estimators the planet estimates
     * @param inputs     the run's inputs (never overwritten)
     * @param progress   opens the progress display for a total number of draws
     * @param log        messages
     * @return what was done
     * @throws IOException on read or write failures
     * @throws InputException for a bad catalogue (every problem is logged first), bad resume state or existing output
     */
    public static Result run(Request request, EstimatorCache estimators, RunInputs inputs, LongFunction<Progress> progress,
                             Log log) throws IOException {
        long stars = CatalogueCheck.registerNamedFiles(request.catalogue(), request.shownName(), inputs);
        checkWork(stars, request.settings().draws());
        try (RunFolder run = RunFolder.openResumable(request.folder(), request.force(), request.resume(), inputs,
                RunMarker.now("survey", version()))) {
            boolean unfinished = run.resumed();
            Result result;
            try {
                result = compute(request, estimators, inputs, progress, log, run);
            } catch (IOException | RuntimeException | Error e) {
                if (Files.exists(run.workingFolder().resolve(PARTIAL)) && hasStars(run.workingFolder().resolve(PARTIAL))) {
                    log.warn("the survey stopped; the stars done so far are kept in " + run.workingFolder()
                            + "; run again with --resume to continue");
                } else if (!unfinished) {
                    run.discardOnClose();
                }
                throw e;
            }
            return result;
        }
    }

    private static Result compute(Request request, EstimatorCache estimators, RunInputs inputs,
                                  LongFunction<Progress> progress, Log log, RunFolder run) throws IOException {
        java.time.Instant started = java.time.Instant.now();
        CatalogueCheck check = CatalogueCheck.run(request.catalogue(), request.settings(), estimators);
        reportProblems(request, check, log);
        Path folder = run.workingFolder();
        Path partial = folder.resolve(PARTIAL);
        Path earlier = request.folder().resolve(SurveyCsv.FILE);
        Path source = !request.resume() ? null : Files.exists(partial) ? partial : Files.exists(earlier) ? earlier : null;
        if (request.resume() && source == null) {
            log.info("--resume: no earlier survey in " + request.folder() + "; starting with the first star");
        }
        if (source != null) {
            RunInputs.checkText(source, source == partial ? run.target().resolve(SurveyCsv.FILE) + " (unfinished, in "
                    + folder + ")" : source.toString());
        }
        Map<Long, String> reasons = new TreeMap<>();
        check.problems().forEach(p -> reasons.putIfAbsent(p.line(), p.text(request.shownName())));
        Path starsPartial = folder.resolve("." + StarsTable.FILE + ".partial");
        Path writing = source == null ? partial : folder.resolve(NEXT);
        Path failuresPartial = folder.resolve(FAILURES_PARTIAL);
        Path failuresWriting = source == null ? failuresPartial : folder.resolve(FAILURES_NEXT);
        Counter counter = new Counter();
        counter.runDraws = check.goodRows() * request.settings().draws();
        boolean finished = false;
        long skipped = check.bad().size();
        try (Progress bar = progress.apply(check.goodRows() * request.settings().draws() + REPORT_STEPS)) {
            try (CatalogueReader reader = CatalogueReader.open(request.catalogue());
                 BufferedWriter starsOut = writer(starsPartial, run.target().resolve(StarsTable.FILE))) {
                StarsTable stars = new StarsTable(starsOut, check.bad(), reasons, request.settings().solar());
                Iterator<StarRow> rows = goodRows(reader, check.bad());
                OutputSink sink = new OutputSink(writer(writing, run.target().resolve(SurveyCsv.FILE)),
                        writer(failuresWriting, run.target().resolve(SurveyFailures.FILE)), stars, counter, request);
                try {
                    sink.header();
                    if (source != null) {
                        Path oldFailures = source.equals(partial) ? failuresPartial
                                : request.folder().resolve(SurveyFailures.FILE);
                        try (ExistingSurvey existing = ExistingSurvey.open(source);
                             ExistingFailures old = ExistingFailures.open(oldFailures)) {
                            counter.resumed = SurveyResume.copyDone(existing, old, rows, request.settings(), estimators,
                                    bar, sink);
                        }
                        sink.close();
                        Files.move(writing, partial, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
                        Files.move(failuresWriting, failuresPartial, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
                        sink = new OutputSink(appender(partial, run.target().resolve(SurveyCsv.FILE)),
                                appender(failuresPartial, run.target().resolve(SurveyFailures.FILE)), stars, counter, request);
                    }
                    SurveyRunner.Summary s = SurveyRunner.run(rows, request.settings(), estimators, request.threads(),
                            bar, sink);
                    counter.draws = s.draws();
                } finally {
                    sink.close();
                }
                stars.finish();
                finished = true;
            } finally {
                if (!finished) {
                    Files.deleteIfExists(starsPartial);
                    Files.deleteIfExists(folder.resolve(NEXT));
                    Files.deleteIfExists(folder.resolve(FAILURES_NEXT));
                }
            }
            String notes = SurveyNotes.text(request, counter.stars, skipped, counter.failed, counter.failedDraws,
                    counter.runDraws);
            run.writeText(NOTES, notes);
            rename(starsPartial, run.file(StarsTable.FILE), run.target().resolve(StarsTable.FILE));
            byte[] png = SurveyChart.write(partial, request.catalogue(), run);
            SurveyReport.write(new SurveyReport.Run(run, request, started, notes, png, run.file(StarsTable.FILE),
                    partial, inputs));
            rename(failuresPartial, run.file(SurveyFailures.FILE), run.target().resolve(SurveyFailures.FILE));
            rename(partial, run.file(SurveyCsv.FILE), run.target().resolve(SurveyCsv.FILE));
            bar.advance(REPORT_STEPS);
        }
        Path done = run.commit();
        return new Result(counter.stars, counter.resumed, skipped, counter.failed, counter.draws, counter.failedDraws,
                counter.runDraws, done.resolve(SurveyCsv.FILE));
    }

    /**
     * Weight of the tables, chart and report written at the end, in draws, so that the progress
     * display's time estimate includes them (about 1-2 s, some 50 draws of 20-40 ms on this kind of
     * machine).
     */
    static final long REPORT_STEPS = 50;

    /** Most draws per star (memory: about 500 bytes a draw per star in flight). */
    public static final int MAX_DRAWS = 100_000;

    /** Most draws of one survey, draws per star times stars (weeks of work beyond). */
    public static final long MAX_TOTAL_DRAWS = 100_000_000L;

    private static void checkWork(long stars, int draws) {
        if (draws < 1 || draws > MAX_DRAWS) {
            throw InputException.atOption("--draws", draws, "outside 1 to " + MAX_DRAWS + " draws per star",
                    "an integer from 1 to " + MAX_DRAWS);
        }
        if (stars * (long) draws > MAX_TOTAL_DRAWS) {
            throw InputException.atOption("--draws", draws, stars + " stars x " + draws + " draws = " + stars * draws
                    + " draws, more than " + MAX_TOTAL_DRAWS, "at most " + Math.max(1, MAX_TOTAL_DRAWS / stars)
                    + " draws per star for this catalogue, or a catalogue split into parts");
        }
    }

    private static void rename(Path from, Path to, Path shown) {
        try {
            Files.move(from, to, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        } catch (IOException e) {
            throw new OutputWriteException(shown, e);
        }
    }

    private static BufferedWriter writer(Path file, Path shown) throws IOException {
        return new BufferedWriter(RunFolder.named(Files.newBufferedWriter(file, StandardCharsets.UTF_8), shown));
    }

    private static BufferedWriter appender(Path file, Path shown) throws IOException {
        return new BufferedWriter(RunFolder.named(Files.newBufferedWriter(file, StandardCharsets.UTF_8,
                StandardOpenOption.APPEND), shown));
    }

    private static boolean hasStars(Path partial) {
        try (var lines = Files.lines(partial, StandardCharsets.UTF_8)) {
            return lines.limit(2).count() > 1;
        } catch (IOException | java.io.UncheckedIOException e) {
            return true;
        }
    }

    private static String version() {
        String v = LocalSurvey.class.getPackage().getImplementationVersion();
        return v == null || v.isBlank() ? "dev" : v;
    }

    /**
     * @param folder a survey's output folder
     * @return where an interrupted run keeps its partial survey table (for --resume)
     */
    public static Path partialTable(Path folder) {
        return RunFolder.unfinished(folder).resolve(PARTIAL);
    }

    private static void reportProblems(Request request, CatalogueCheck check, Log log) {
        List<CatalogueProblem> problems = check.problems();
        for (int i = 0; i < Math.min(SHOWN_PROBLEMS, problems.size()); i++) {
            log.warn(problems.get(i).text(request.shownName()));
        }
        if (problems.size() > SHOWN_PROBLEMS) {
            log.warn("... and " + (problems.size() - SHOWN_PROBLEMS) + " more problems");
        }
        if (problems.isEmpty() && check.goodRows() == 0) {
            throw InputException.inFile(request.shownName(), "the catalogue has no star rows",
                    "a header line and one row per star");
        }
        if (problems.isEmpty()) {
            return;
        }
        if (!request.skipBad() || !check.skippable()) {
            String why = check.headerOk() ? problems.size() + " problem(s) in " + check.bad().size() + " row(s), listed above;"
                    + " nothing was computed" : "the header has problems, listed above; nothing was computed";
            throw InputException.inFile(request.shownName(), why, check.headerOk()
                    ? "a corrected catalogue, or --skip-bad to skip the bad rows (listed in " + StarsTable.FILE + ")"
                    : "a header of star, X_H, X_H_err columns (header problems cannot be skipped)");
        }
        log.warn("--skip-bad: skipping " + check.bad().size() + " bad row(s); they are listed in " + StarsTable.FILE);
    }

    private static Iterator<StarRow> goodRows(CatalogueReader reader, Map<Long, String> bad) {
        return new Iterator<>() {
            private StarRow next = advance();

            private StarRow advance() {
                try {
                    for (CatalogueReader.Parsed p = reader.next(); p != null; p = reader.next()) {
                        if (p.row() != null && !bad.containsKey(p.line())) {
                            return p.row();
                        }
                    }
                    return null;
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            }

            @Override
            public boolean hasNext() {
                return next != null;
            }

            @Override
            public StarRow next() {
                if (next == null) {
                    throw new NoSuchElementException();
                }
                StarRow r = next;
                next = advance();
                return r;
            }
        };
    }

    /** Counts of the run. */
    private static final class Counter {
        long stars;
        long resumed;
        long failed;
        long draws;
        long failedDraws;
        long runDraws;
    }

    /**
     * Writes each star's failures, then its block (both flushed, so an interruption keeps whole stars),
     * and its stars-table row; stops the run when the failure policy says so.
     */
    private static final class OutputSink implements SurveyRunner.Sink {
        private final BufferedWriter out;
        private final BufferedWriter failures;
        private final StarsTable stars;
        private final Counter counter;
        private final Request request;
        private boolean closed;

        OutputSink(BufferedWriter out, BufferedWriter failures, StarsTable stars, Counter counter, Request request) {
            this.out = out;
            this.failures = failures;
            this.stars = stars;
            this.counter = counter;
            this.request = request;
        }

        void header() throws IOException {
            out.write(SurveyCsv.HEADER);
            out.flush();
            failures.write(SurveyFailures.HEADER);
            failures.flush();
        }

        @Override
        public void completed(SurveyRunner.StarOutput star) throws IOException {
            failures.write(star.failures());
            failures.flush();
            out.write(star.block());
            out.flush();
            int draws = request.settings().draws();
            if (star.starFailure() == null) {
                stars.computed(star.row(), star.failedDraws(), draws);
                counter.stars++;
            } else {
                stars.failed(star.row(), star.starFailure());
                counter.failed++;
            }
            counter.failedDraws += star.failedDraws();
            if (request.strict() && !star.failures().isEmpty()) {
                throw new NumericalException(Messages.STRICT_FAILURE, null, SurveyFailures.describeFirst(star.failures()));
            }
            if (counter.failedDraws > request.maxFailedFraction() * counter.runDraws) {
                throw new NumericalException(Messages.TOO_MANY_FAILED_DRAWS, null, counter.failedDraws,
                        counter.runDraws, request.maxFailedFraction());
            }
        }

        void close() throws IOException {
            if (!closed) {
                closed = true;
                try {
                    out.close();
                } finally {
                    failures.close();
                }
            }
        }
    }
}
