package org.nebulith.report.chart;

import java.util.Arrays;

/**
 * Places labels along one direction without overlap: each label wants a position; the result keeps
 * their order, keeps every pair at least a minimum gap apart, stays within the bounds and moves each
 * label as little as a simple pool-adjacent-violators pass allows (positions are the means of
 * blocks of labels that had to be pushed together).
 */
final class Spread {

    private Spread() {
    }

    /**
     * @param wanted wanted positions, in increasing order of the labels' anchors
     * @param gaps   gap required between label i and i+1 (length n - 1)
     * @param lo     lowest allowed position
     * @param hi     highest allowed position
     * @return the positions
     */
    static double[] apart(final double[] wanted, final double[] gaps, final double lo, final double hi) {
        int n = wanted.length;
        double[] offset = new double[n];
        for (int i = 1; i < n; i++) {
            offset[i] = offset[i - 1] + gaps[i - 1];
        }
        // positions p_i = q_i + offset_i with q non-decreasing: isotonic regression of wanted - offset
        double[] target = new double[n];
        for (int i = 0; i < n; i++) {
            target[i] = wanted[i] - offset[i];
        }
        double[] q = isotonic(target);
        double[] p = new double[n];
        for (int i = 0; i < n; i++) {
            p[i] = q[i] + offset[i];
        }
        if (n > 0) {
            double shiftUp = lo - p[0];
            double shiftDown = p[n - 1] - hi;
            if (shiftUp > 0) {
                for (int i = 0; i < n; i++) {
                    p[i] = Math.max(p[i], lo + offset[i]);
                }
            } else if (shiftDown > 0) {
                for (int i = 0; i < n; i++) {
                    p[i] = Math.min(p[i], hi - (offset[n - 1] - offset[i]));
                }
            }
        }
        return p;
    }

    private static double[] isotonic(final double[] t) {
        int n = t.length;
        double[] sum = new double[n];
        int[] count = new int[n];
        int blocks = 0;
        for (double v : t) {
            sum[blocks] = v;
            count[blocks] = 1;
            blocks++;
            while (blocks > 1 && sum[blocks - 2] / count[blocks - 2] > sum[blocks - 1] / count[blocks - 1]) {
                sum[blocks - 2] += sum[blocks - 1];
                count[blocks - 2] += count[blocks - 1];
                blocks--;
            }
        }
        double[] out = new double[n];
        int k = 0;
        for (int b = 0; b < blocks; b++) {
            Arrays.fill(out, k, k + count[b], sum[b] / count[b]);
            k += count[b];
        }
        return out;
    }
}
