package org.nebulith.report.survey;

import java.io.IOException;
import java.util.Iterator;
import java.util.List;

import org.nebulith.errors.InputException;
import org.nebulith.progress.Progress;
import org.nebulith.survey.EstimatorCache;
import org.nebulith.survey.StarJob;
import org.nebulith.survey.StarJobException;
import org.nebulith.survey.StarRow;
import org.nebulith.survey.SurveyCsv;
import org.nebulith.survey.SurveyRow;
import org.nebulith.survey.SurveyRunner;
import org.nebulith.survey.SurveySettings;

/**
 * The first phase of {@code --resume}: walks the catalogue and an earlier survey table together,
 * copying the stars already done. The earlier table must be a prefix of what this run would
 * write: the same stars in catalogue order (stars that failed and were skipped are recomputed
 * and must fail again). To catch a table made with other settings or another seed, the first
 * star is recomputed and must match byte for byte; the last one (perhaps cut short by the
 * interruption) is recomputed, must extend what is there, and replaces it. The caller then
 * computes the remaining stars, so the result equals an uninterrupted run's.
 */
final class SurveyResume {

    private SurveyResume() {
    }

    /**
     * @return the number of stars taken over from the earlier table
     */
    static long copyDone(ExistingSurvey existing, Iterator<StarRow> rows, SurveySettings settings,
                         EstimatorCache estimators, boolean skipFailing, Progress progress,
                         SurveyRunner.Sink sink) throws IOException {
        long copied = 0;
        boolean first = true;
        while (existing.peek() != null) {
            ExistingSurvey.Block block = existing.peek();
            if (!rows.hasNext()) {
                throw mismatch(existing, "it holds star '" + block.star() + "', which does not follow in the catalogue");
            }
            StarRow row = rows.next();
            if (!row.star().equals(block.star())) {
                recomputeMissing(existing, row, block, settings, estimators, skipFailing, sink);
                progress.advance(settings.draws());
                continue;
            }
            block = existing.next();
            if (first || block.last()) {
                List<SurveyRow> fresh = StarJob.run(row, settings, estimators.get(settings.forStar(row)));
                String text = SurveyCsv.block(fresh);
                boolean ok = block.last() ? text.startsWith(block.text()) : text.equals(block.text());
                if (!ok) {
                    throw mismatch(existing, "the rows of star '" + row.star()
                            + "' differ from a recomputation (other settings, seed, catalogue values or version)");
                }
                sink.completed(row, fresh, text);
            } else {
                sink.completed(row, null, block.text());
            }
            first = false;
            copied++;
            progress.advance(settings.draws());
        }
        return copied;
    }

    private static void recomputeMissing(ExistingSurvey existing, StarRow row, ExistingSurvey.Block block,
                                         SurveySettings settings, EstimatorCache estimators, boolean skipFailing,
                                         SurveyRunner.Sink sink) throws IOException {
        try {
            StarJob.run(row, settings, estimators.get(settings.forStar(row)));
        } catch (StarJobException e) {
            if (!skipFailing) {
                throw e;
            }
            sink.failed(row, e);
            return;
        }
        throw mismatch(existing, "star '" + row.star() + "' (catalogue line " + row.line() + ") is missing there, before '"
                + block.star() + "'");
    }

    private static InputException mismatch(ExistingSurvey existing, String what) {
        return InputException.inFile(existing.file(), "--resume: this table was not made from this catalogue and these"
                + " settings: " + what, "the output of an earlier run with the same catalogue (stars may be appended),"
                + " settings and seed; or rerun without --resume (with --force)");
    }
}
