package org.nebulith.survey;

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
import org.nebulith.progress.Progress;
import org.nebulith.report.AtomicOutput;
import org.nebulith.report.RunInputs;

/**
 * A whole survey on this machine: validating pass over the catalogue, then the streaming compute
 * pass ({@link SurveyResume} for stars already done, {@link SurveyRunner} for the rest), writing
 * into the output folder:
 * <ul>
 * <li>{@code survey.csv} ({@link SurveyCsv}), streamed into the hidden {@code .survey.csv.partial}
 *     (flushed after every star) and renamed at the end; an interrupted or failed run leaves the
 *     partial file for {@code --resume} and nothing under the final name;</li>
 * <li>{@code survey-stars.csv} ({@link StarsTable}), {@code survey-notes.txt} (settings, counts,
 *     cautions) and {@code survey-chart.png/.svg} ({@link SurveyChart}), written at the end.</li>
 * </ul>
 * The files do not depend on the thread count.
 */
public final class LocalSurvey {

    static final String PARTIAL = ".survey.csv.partial";
    static final String NEXT = ".survey.csv.next";
    static final String NOTES = "survey-notes.txt";
    private static final int SHOWN_PROBLEMS = 100;

    /**
     * @param catalogue the catalogue file
     * @param shownName the catalogue as the user named it (messages, notes)
     * @param folder    the output folder
     * @param settings  the run settings
     * @param threads   worker threads
     * @param skipBad   skip bad rows and failing stars (listed) instead of stopping
     * @param resume    continue an earlier run in the folder
     * @param force     replace an earlier run in the folder
     */
    public record Request(Path catalogue, String shownName, Path folder, SurveySettings settings, int threads,
                          boolean skipBad, boolean resume, boolean force) {
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
     * @param failed   stars whose estimate failed (skipped)
     * @param draws    draws computed in this run
     * @param survey   the survey table
     */
    public record Result(long stars, long resumed, long skipped, long failed, long draws, Path survey) {
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
        java.time.Instant started = java.time.Instant.now();
        CatalogueCheck check = CatalogueCheck.run(request.catalogue(), request.settings(), estimators);
        reportProblems(request, check, log);
        Path folder = request.folder();
        Path partial = folder.resolve(PARTIAL);
        Path survey = folder.resolve(SurveyCsv.FILE);
        checkOutputs(request, inputs, partial, survey);
        Files.createDirectories(folder);
        Path source = !request.resume() ? null : Files.exists(partial) ? partial : Files.exists(survey) ? survey : null;
        if (request.resume() && source == null) {
            log.info("--resume: no earlier survey in " + folder + "; starting with the first star");
        }
        Map<Long, String> reasons = new TreeMap<>();
        check.problems().forEach(p -> reasons.putIfAbsent(p.line(), p.text(request.shownName())));
        Path starsPartial = folder.resolve("." + StarsTable.FILE + ".partial");
        Path writing = source == null ? partial : folder.resolve(NEXT);
        Counter counter = new Counter();
        boolean finished = false;
        try (Progress bar = progress.apply(check.goodRows() * request.settings().draws());
             CatalogueReader reader = CatalogueReader.open(request.catalogue());
             BufferedWriter starsOut = Files.newBufferedWriter(starsPartial, StandardCharsets.UTF_8)) {
            StarsTable stars = new StarsTable(starsOut, check.bad(), reasons, request.settings().solar());
            Iterator<StarRow> rows = goodRows(reader, check.bad());
            OutputSink sink = new OutputSink(Files.newBufferedWriter(writing, StandardCharsets.UTF_8), stars, counter, log);
            try {
                sink.header();
                if (source != null) {
                    try (ExistingSurvey existing = ExistingSurvey.open(source)) {
                        counter.resumed = SurveyResume.copyDone(existing, rows, request.settings(), estimators,
                                request.skipBad(), bar, sink);
                    }
                    sink.close();
                    Files.move(writing, partial, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
                    sink = new OutputSink(Files.newBufferedWriter(partial, StandardCharsets.UTF_8,
                            StandardOpenOption.APPEND), stars, counter, log);
                }
                SurveyRunner.Summary s = SurveyRunner.run(rows, request.settings(), estimators, request.threads(),
                        request.skipBad(), bar, sink);
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
                if (Files.exists(partial)) {
                    log.warn("the survey stopped; the stars done so far are kept in " + partial
                            + "; run again with --resume to continue");
                }
            }
        }
        long skipped = check.bad().size();
        AtomicOutput.writeText(folder.resolve(NOTES), SurveyNotes.text(request, counter.stars, skipped, counter.failed),
                true, inputs);
        Files.move(starsPartial, folder.resolve(StarsTable.FILE), java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        byte[] png = SurveyChart.write(partial, folder, inputs);
        String notes = SurveyNotes.text(request, counter.stars, skipped, counter.failed);
        SurveyReport.write(new SurveyReport.Run(folder, request, started, notes, png, folder.resolve(StarsTable.FILE),
                partial, inputs));
        Files.move(partial, survey, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        return new Result(counter.stars, counter.resumed, skipped, counter.failed, counter.draws, survey);
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

    private static void checkOutputs(Request request, RunInputs inputs, Path partial, Path survey) {
        for (String name : List.of(SurveyCsv.FILE, StarsTable.FILE, NOTES, PARTIAL, NEXT)) {
            inputs.checkNotInput(request.folder().resolve(name));
        }
        if (request.resume() || request.force()) {
            return;
        }
        if (Files.exists(survey)) {
            throw new InputException(Messages.OUTPUT_EXISTS, null, survey);
        }
        if (Files.exists(partial)) {
            throw InputException.inFile(partial, "an interrupted survey left its partial results here",
                    "--resume to continue it, or --force to start again");
        }
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
    }

    /** Writes each star's block (flushed, so an interruption keeps whole stars) and its notes row. */
    private static final class OutputSink implements SurveyRunner.Sink {
        private final BufferedWriter out;
        private final StarsTable stars;
        private final Counter counter;
        private final Log log;
        private boolean closed;

        OutputSink(BufferedWriter out, StarsTable stars, Counter counter, Log log) {
            this.out = out;
            this.stars = stars;
            this.counter = counter;
            this.log = log;
        }

        void header() throws IOException {
            out.write(SurveyCsv.HEADER);
            out.flush();
        }

        @Override
        public void completed(StarRow row, List<SurveyRow> rows, String block) throws IOException {
            out.write(block);
            out.flush();
            stars.computed(row);
            counter.stars++;
        }

        @Override
        public void failed(StarRow row, StarJobException failure) throws IOException {
            log.warn("--skip-bad: skipping " + failure.getMessage());
            stars.failed(row, failure);
            counter.failed++;
        }

        void close() throws IOException {
            if (!closed) {
                closed = true;
                out.close();
            }
        }
    }
}
