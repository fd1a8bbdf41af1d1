package org.nebulith.spark;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;

import org.apache.spark.api.java.function.FlatMapFunction;
import org.nebulith.survey.PlanetEstimator;
import org.nebulith.survey.StarJob;
import org.nebulith.survey.StarJobException;
import org.nebulith.files.CsvTableWriter;
import org.nebulith.survey.StarResult;
import org.nebulith.survey.StarRow;
import org.nebulith.survey.SurveyRunner;
import org.nebulith.survey.SurveyRow;
import org.nebulith.survey.SurveySettings;

/**
 * The work of one Spark partition: {@link StarJob#run} for each of its tasks, the same pure function
 * as the local survey (no second implementation of the science). Estimators are built lazily, once
 * per partition and distinct effective settings (disk, zones); they stay on the executor.
 *
 * <p>Failed draws are part of a star's result, as in the local survey (recorded, left out of the
 * percentiles). Every failure of a star as a whole (its estimate cannot be built, its nominal
 * estimate does not converge, a value is not finite) is caught here and returned as a
 * {@link TaskResult} naming the star and the reason; the other stars of the partition are unaffected.
 */
public final class StarTasks implements FlatMapFunction<Iterator<GridTask>, TaskResult> {

    private static final long serialVersionUID = 1L;

    private final SurveySettings settings;
    private final EstimatorFactory factory;

    /**
     * @param settings the run's settings (draws, seed, solar reference; disk/zones as defaults)
     * @param factory  builds the estimators on the executor
     */
    public StarTasks(SurveySettings settings, EstimatorFactory factory) {
        this.settings = settings;
        this.factory = factory;
    }

    @Override
    public Iterator<TaskResult> call(Iterator<GridTask> tasks) {
        Map<SurveySettings, Object> built = new HashMap<>();
        return new Iterator<>() {
            @Override
            public boolean hasNext() {
                return tasks.hasNext();
            }

            @Override
            public TaskResult next() {
                return run(tasks.next(), built);
            }
        };
    }

    /**
     * @param task  a task
     * @param built estimators (or the message of their failure) per effective settings, filled lazily
     * @return its result
     */
    TaskResult run(GridTask task, Map<SurveySettings, Object> built) {
        StarRow row = task.row();
        SurveySettings own = settings.forStar(row);
        String disk = SurveyGrid.diskLabel(own);
        String zones = SurveyGrid.zonesLabel(own);
        Object estimator = built.computeIfAbsent(own, this::build);
        if (estimator instanceof String why) {
            return failed(task, disk, zones, TaskResult.SETUP, "star '" + row.star() + "' (catalogue line " + row.line()
                    + "), setup: cannot build the planet estimate for disk '" + disk
                    + "' and zones '" + zones + "': " + why);
        }
        try {
            StarResult r = StarJob.survey(row, settings, (PlanetEstimator) estimator);
            SurveyRunner.StarOutput out = SurveyRunner.StarOutput.of(row, r);
            List<SurveyRow> rows = r.rows();
            return new TaskResult(task.index(), row.star(), row.line(), disk, zones, rows, out.block(),
                    r.failed() ? StarJobException.NOMINAL : 0, out.starFailure() == null ? null
                    : "star '" + row.star() + "' (catalogue line " + row.line() + "), " + out.starFailure(),
                    out.failures(), out.failedDraws());
        } catch (StarJobException e) {
            return failed(task, disk, zones, e.draw(), e.getMessage());
        } catch (RuntimeException e) {
            return failed(task, disk, zones, StarJobException.NOMINAL, "star '" + row.star() + "' (catalogue line "
                    + row.line() + "), output: " + describe(e));
        }
    }

    private Object build(SurveySettings own) {
        try {
            return factory.create(own);
        } catch (IOException | UncheckedIOException | IllegalArgumentException | IllegalStateException
                 | org.nebulith.errors.NebulithException e) {
            return describe(e);
        }
    }

    private TaskResult failed(GridTask task, String disk, String zones, int draw, String why) {
        StarRow row = task.row();
        String stage = draw == TaskResult.SETUP ? "setup" : draw == StarJobException.NOMINAL ? "nominal" : "draw";
        String line = CsvTableWriter.FORMAT.format(row.star(), draw < 0 ? "" : Integer.toString(draw), "", "", "", stage,
                why.replaceAll("\\s*[\\r\\n]+\\s*", " ")) + "\n";
        return new TaskResult(task.index(), row.star(), row.line(), disk, zones, List.of(), "", draw, why, line,
                settings.draws());
    }

    private static String describe(Throwable e) {
        String m = e.getMessage();
        return m == null || m.isBlank() ? e.getClass().getSimpleName() : m;
    }
}
