package org.nebulith.survey;

import java.util.Arrays;

/**
 * Sample percentiles by linear interpolation between order statistics: for sorted values
 * x[0..n-1] and probability p, h = (n - 1) p and the percentile is
 * x[floor h] + (h - floor h) (x[floor h + 1] - x[floor h]). This is definition 7 of Hyndman &amp;
 * Fan (1996, Am. Stat. 50, 361), the default of R and NumPy. Equal values give that value exactly.
 */
public final class Percentiles {

    private Percentiles() {
    }

    /**
     * @param sorted values in ascending order, at least one
     * @param p      probability in [0, 1]
     * @return the percentile
     */
    public static double ofSorted(double[] sorted, double p) {
        if (sorted.length == 0 || !(p >= 0 && p <= 1)) {
            throw new IllegalArgumentException("percentile needs values and p in [0, 1]");
        }
        double h = (sorted.length - 1) * p;
        int low = (int) Math.floor(h);
        if (low >= sorted.length - 1) {
            return sorted[sorted.length - 1];
        }
        double a = sorted[low];
        double b = sorted[low + 1];
        return a == b ? a : a + (h - low) * (b - a);
    }

    /**
     * @param values values in any order (not modified)
     * @return {median, 16th, 84th percentile}
     */
    public static double[] summary(double[] values) {
        double[] s = values.clone();
        Arrays.sort(s);
        return new double[] {ofSorted(s, 0.5), ofSorted(s, 0.16), ofSorted(s, 0.84)};
    }
}
