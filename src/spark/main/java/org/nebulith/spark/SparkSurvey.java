package org.nebulith.spark;

import java.util.List;

import org.apache.spark.api.java.JavaRDD;
import org.apache.spark.api.java.JavaSparkContext;
import org.nebulith.survey.SurveySettings;

/**
 * The distributed survey: the grid's tasks as an RDD, split into contiguous partitions, each
 * computed by {@link StarTasks}. Results do not depend on the partitioning: each task is a pure
 * function of its row, the settings and the seed (draw d of star S uses the stream of (seed, S, d),
 * as in the local survey), and the RDD keeps the order of the tasks.
 */
public final class SparkSurvey {

    /** Draws aimed at per partition by {@link #defaultPartitions}: minutes of work, so the setup is negligible. */
    public static final long DRAWS_PER_PARTITION = 5_000;

    private SparkSurvey() {
    }

    /**
     * The default partitioning: at least two partitions per core (so that uneven stars balance),
     * and more for big runs, about {@value #DRAWS_PER_PARTITION} draws each (a failed or lost task
     * then costs little to recompute); never more partitions than tasks.
     *
     * @param tasks       number of tasks
     * @param draws       draws per task
     * @param parallelism the cluster's default parallelism (its cores)
     * @return the number of partitions
     */
    public static int defaultPartitions(long tasks, int draws, int parallelism) {
        long byWork = (tasks * draws + DRAWS_PER_PARTITION - 1) / DRAWS_PER_PARTITION;
        long n = Math.min(tasks, Math.max(2L * parallelism, byWork));
        return (int) Math.max(1, Math.min(Integer.MAX_VALUE, n));
    }

    /**
     * @param spark      the Spark context
     * @param tasks      the grid's tasks, in grid order
     * @param settings   the run's settings
     * @param factory    builds the estimators on the executors
     * @param partitions number of partitions (contiguous runs of tasks)
     * @return the results, one per task, in task order (lazy: computed by the first action)
     */
    public static JavaRDD<TaskResult> results(JavaSparkContext spark, List<GridTask> tasks, SurveySettings settings,
                                              EstimatorFactory factory, int partitions) {
        return spark.parallelize(tasks, partitions).mapPartitions(new StarTasks(settings, factory));
    }
}
