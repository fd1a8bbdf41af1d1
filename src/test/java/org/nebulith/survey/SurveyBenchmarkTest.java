package org.nebulith.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.nebulith.progress.Progress;
import org.nebulith.thermo.Element;

/** The survey benchmark's figures and its invented stars (no timing is asserted). */
class SurveyBenchmarkTest {

    @Test
    void timesEveryDrawAndCountsTheProcessCpu() throws Exception {
        List<StarRow> rows = SurveyBenchmark.inventedStars(3, 7, 0.1);
        SurveyBenchmark.Figures f = SurveyBenchmark.run(s -> StandInEstimators.fullyCondensed(), rows, 4, 2, 7,
                Progress.none());
        assertEquals(12, f.totalDraws());
        assertEquals(12, f.drawMillis().length);
        for (int i = 1; i < f.drawMillis().length; i++) {
            assertTrue(f.drawMillis()[i - 1] <= f.drawMillis()[i], "sorted");
        }
        assertTrue(f.drawMillisAt(0.5) <= f.drawMillisAt(0.99));
        assertEquals(f.drawMillis()[11], f.drawMillisAt(0.99), 0.0, "nearest rank of 12 values at 0.99 is the largest");
        assertEquals(f.drawMillis()[5], f.drawMillisAt(0.5), 0.0, "nearest rank of 12 values at 0.5 is the 6th");
        assertTrue(f.cpuSeconds() >= 0 && Double.isFinite(f.cpuSeconds()), "process CPU time " + f.cpuSeconds());
        assertTrue(Double.isNaN(f.firstEquilibriumShare()), "the stand-in does not time its equilibria");
    }

    @Test
    void scatterSetsTheSpreadOfEachElementAboutIronAndZeroGivesNone() {
        for (StarRow r : SurveyBenchmark.inventedStars(20, 3, 0.0)) {
            double fe = r.abundances().get(Element.Fe).dex();
            r.abundances().forEach((el, m) -> assertEquals(fe, m.dex(), 0.0, r.star() + " " + el));
        }
        double sum2 = 0;
        int n = 0;
        for (StarRow r : SurveyBenchmark.inventedStars(400, 3, 0.3)) {
            double fe = r.abundances().get(Element.Fe).dex();
            for (Element el : List.of(Element.Mg, Element.Si, Element.Ca)) {
                double d = r.abundances().get(el).dex() - fe;
                sum2 += d * d;
                n++;
            }
        }
        double sd = Math.sqrt(sum2 / n);
        // 1200 Normal deviates: the sample standard deviation is within 0.3 x (1 +- 0.1) (common practice: ~3 sigma)
        assertEquals(0.3, sd, 0.03, "sample standard deviation of [X/H] - [Fe/H]");
    }

    @Test
    void theDefaultInventedStarsAreUnchanged() {
        assertEquals(SurveyBenchmark.inventedStars(5, 1), SurveyBenchmark.inventedStars(5, 1,
                SurveyBenchmark.DEFAULT_SCATTER_DEX));
    }
}
