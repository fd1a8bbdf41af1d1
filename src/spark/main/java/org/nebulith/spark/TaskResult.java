package org.nebulith.spark;

import java.io.Serializable;
import java.util.List;

/**
 * What a Spark task gives back for one {@link GridTask}: the star's survey rows and their CSV
 * block, or why it failed. A failure is a record, not an exception, so that one bad star never
 * loses the rows of the others in its partition.
 *
 * @param index   the task's grid index (output order)
 * @param star    the star
 * @param line    its catalogue line
 * @param disk    the effective disk (label)
 * @param zones   the effective zone file (label)
 * @param rows    the survey rows (empty for a failure)
 * @param block   the rows as survey.csv lines ({@link org.nebulith.survey.SurveyCsv#block}); empty for a failure
 * @param draw    for a failure: the failing draw, {@link org.nebulith.survey.StarJobException#NOMINAL} for the
 *                nominal estimate, or {@link #SETUP} when the estimate could not be built
 * @param failure why the star failed, or null
 * @param failures    the star's failed estimates as lines of the failures table
 *                    ({@link org.nebulith.survey.SurveyFailures#block}; a setup failure has stage {@code setup})
 * @param failedDraws draws lost (all of them when the star failed)
 */
public record TaskResult(long index, String star, long line, String disk, String zones,
                         List<org.nebulith.survey.SurveyRow> rows, String block, int draw, String failure,
                         String failures, long failedDraws)
        implements Serializable {

    /** {@link #draw()} of a failure to build the estimate (a bad disk or zone file). */
    public static final int SETUP = -2;

    /** @return whether the star was computed */
    public boolean ok() {
        return failure == null;
    }

    /** @return the failing step as written in the failures table: a draw index, {@code nominal} or {@code setup} */
    public String step() {
        return draw == SETUP ? "setup" : draw == org.nebulith.survey.StarJobException.NOMINAL ? "nominal"
                : Integer.toString(draw);
    }
}
