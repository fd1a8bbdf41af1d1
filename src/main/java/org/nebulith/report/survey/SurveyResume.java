package org.nebulith.report.survey;

import java.io.IOException;
import java.util.Iterator;

import org.nebulith.errors.InputException;
import org.nebulith.progress.Progress;
import org.nebulith.survey.EstimatorCache;
import org.nebulith.survey.StarJob;
import org.nebulith.survey.StarJobException;
import org.nebulith.survey.StarResult;
import org.nebulith.survey.StarRow;
import org.nebulith.survey.SurveyCsv;
import org.nebulith.survey.SurveyFailures;
import org.nebulith.survey.SurveyRow;
import org.nebulith.survey.SurveyRunner;
import org.nebulith.survey.SurveySettings;

/**
 * The first phase of {@code --resume}: walks the catalogue, an earlier survey table and its failures
 * table together, copying the stars already done with their failures. The earlier table must be a
 * prefix of what this run would write: the same stars in catalogue order (a star missing there must
 * be one whose nominal estimate failed, and it must fail again). To catch a table made with other
 * settings or another seed, the first star is recomputed and must match byte for byte, failures
 * included; the last one (perhaps cut short by the interruption) is recomputed, must extend what is
 * there, and replaces it. The caller then computes the remaining stars, so the result equals an
 * uninterrupted run's.
 */
final class SurveyResume {

    private SurveyResume() {
    }

    /**
     * @return the number of stars taken over from the earlier table
     */
    static long copyDone(ExistingSurvey existing, ExistingFailures failures, Iterator<StarRow> rows,
                         SurveySettings settings, EstimatorCache estimators, Progress progress,
                         SurveyRunner.Sink sink) throws IOException {
        long copied = 0;
        boolean first = true;
        while (existing.peek() != null) {
            ExistingSurvey.Block block = existing.peek();
            if (!rows.hasNext()) {
                throw mismatch(existing, "it holds star '" + block.star() + "', which does not follow in the catalogue");
            }
            StarRow row = rows.next();
            String oldFailures = failures.take(row.star());
            if (!row.star().equals(block.star())) {
                recomputeFailed(existing, row, block, oldFailures, settings, estimators, sink);
                progress.advance(settings.draws());
                continue;
            }
            block = existing.next();
            if (first || block.last()) {
                StarResult fresh = StarJob.survey(row, settings, estimators.get(settings.forStar(row)));
                SurveyRunner.StarOutput out = SurveyRunner.StarOutput.of(row, fresh);
                boolean ok = block.last() ? out.block().startsWith(block.text()) : out.block().equals(block.text());
                if (!ok || !out.failures().equals(oldFailures)) {
                    throw mismatch(existing, "the rows or failures of star '" + row.star()
                            + "' differ from a recomputation (other settings, seed, catalogue values or version)");
                }
                sink.completed(out);
            } else {
                sink.completed(new SurveyRunner.StarOutput(row, block.text(), oldFailures,
                        SurveyFailures.failedDraws(oldFailures, settings.draws()), null));
            }
            first = false;
            copied++;
            progress.advance(settings.draws());
        }
        return copied;
    }

    private static void recomputeFailed(ExistingSurvey existing, StarRow row, ExistingSurvey.Block block,
                                        String oldFailures, SurveySettings settings, EstimatorCache estimators,
                                        SurveyRunner.Sink sink) throws IOException {
        StarResult r = StarJob.survey(row, settings, estimators.get(settings.forStar(row)));
        SurveyRunner.StarOutput out = SurveyRunner.StarOutput.of(row, r);
        if (!r.failed()) {
            throw mismatch(existing, "star '" + row.star() + "' (catalogue line " + row.line()
                    + ") is missing there, before '" + block.star() + "'");
        }
        if (!out.failures().equals(oldFailures)) {
            throw mismatch(existing, "the failure of star '" + row.star() + "' differs from a recomputation");
        }
        sink.completed(out);
    }

    private static InputException mismatch(ExistingSurvey existing, String what) {
        return InputException.inFile(existing.file(), "--resume: this table was not made from this catalogue and these"
                + " settings: " + what, "the output of an earlier run with the same catalogue (stars may be appended),"
                + " settings and seed; or rerun without --resume (with --force)");
    }
}
