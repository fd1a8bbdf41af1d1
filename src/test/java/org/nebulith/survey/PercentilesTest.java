package org.nebulith.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.stat.descriptive.rank.Percentile;
import org.junit.jupiter.api.Test;

/** The percentile convention: Hyndman & Fan (1996) definition 7. */
class PercentilesTest {

    @Test
    void linearInterpolationOfOrderStatistics() {
        double[] x = {1, 2, 3, 4};
        // h = (n - 1) p: p = 0.16 -> h = 0.48 -> 1.48; p = 0.5 -> 2.5; p = 0.84 -> h = 2.52 -> 3.52
        // (the same values as R's quantile(type = 7) and NumPy's default percentile, common practice)
        assertEquals(1.48, Percentiles.ofSorted(x, 0.16), 1e-12);
        assertEquals(2.5, Percentiles.ofSorted(x, 0.5), 0);
        assertEquals(3.52, Percentiles.ofSorted(x, 0.84), 1e-12);
        assertEquals(1, Percentiles.ofSorted(x, 0), 0);
        assertEquals(4, Percentiles.ofSorted(x, 1), 0);
        assertEquals(5, Percentiles.ofSorted(new double[] {5}, 0.16), 0);
    }

    @Test
    void equalValuesGiveThatValueExactly() {
        double v = 0.1 + 0.2;
        double[] s = Percentiles.summary(new double[] {v, v, v, v, v});
        assertEquals(v, s[0], 0);
        assertEquals(v, s[1], 0);
        assertEquals(v, s[2], 0);
    }

    @Test
    void agreesWithCommonsMathDefinition7() {
        DrawRandom r = DrawRandom.forDraw(3, "percentiles", 0);
        for (int n : new int[] {2, 7, 100, 1001}) {
            double[] x = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = r.nextGaussian();
            }
            double[] ours = Percentiles.summary(x);
            Percentile cm = new Percentile().withEstimationType(Percentile.EstimationType.R_7);
            assertEquals(cm.evaluate(x, 50), ours[0], 1e-12);
            assertEquals(cm.evaluate(x, 16), ours[1], 1e-12);
            assertEquals(cm.evaluate(x, 84), ours[2], 1e-12);
        }
    }
}
