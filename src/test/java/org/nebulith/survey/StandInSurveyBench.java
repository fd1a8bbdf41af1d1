package org.nebulith.survey;

import org.nebulith.cli.SurveyBenchCommand;

/**
 * Not a test: prints the survey benchmark figures with the TEST-ONLY fully condensed stand-in,
 * until the real planet estimate is wired into {@code SurveyCommand.estimator}. Run with
 * {@code java -cp target/classes:target/test-classes:<dependencies> org.nebulith.survey.StandInSurveyBench [threads]}.
 */
public final class StandInSurveyBench {

    private StandInSurveyBench() {
    }

    public static void main(String[] args) throws Exception {
        int threads = args.length > 0 ? Integer.parseInt(args[0]) : SurveyRunner.defaultThreads();
        SurveyBenchmark.run(s -> new FullyCondensedEstimator(), 100, 100, threads, 1); // warm-up
        SurveyBenchmark.Figures f = SurveyBenchmark.run(s -> new FullyCondensedEstimator(), 100, 100, threads, 1);
        SurveyBenchCommand.print(System.out, f, "TEST STAND-IN (fully condensed mass balance), not the planet estimate");
    }
}
