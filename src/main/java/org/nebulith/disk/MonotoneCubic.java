package org.nebulith.disk;

import java.util.Arrays;

/**
 * Monotone piecewise-cubic Hermite interpolation (Fritsch &amp; Carlson 1980, SIAM J. Numer. Anal.
 * 17, 238): between two nodes the interpolant stays within their values, so it never overshoots
 * the data; it reproduces a straight line exactly. Nodes x must increase strictly. At a node, and
 * everywhere on a flat segment (two neighbouring nodes of equal value), it returns the node's value
 * exactly: a table held at one temperature gives that temperature bit for bit, not a value one
 * rounding error above or below it (which matters where thermodynamic data change piece there).
 */
public final class MonotoneCubic {
    private final double[] x;
    private final double[] y;
    private final double[] m;

    /**
     * @param x strictly increasing abscissae (at least 2)
     * @param y ordinates
     */
    public MonotoneCubic(double[] x, double[] y) {
        if (x.length != y.length || x.length < 2) {
            throw new IllegalArgumentException("need at least 2 points of equal-length x and y");
        }
        for (int i = 1; i < x.length; i++) {
            if (!(x[i] > x[i - 1])) {
                throw new IllegalArgumentException("x must increase strictly (index " + i + ")");
            }
        }
        this.x = x.clone();
        this.y = y.clone();
        this.m = slopes(this.x, this.y);
    }

    private static double[] slopes(double[] x, double[] y) {
        int n = x.length;
        double[] d = new double[n - 1];
        for (int i = 0; i < n - 1; i++) {
            d[i] = (y[i + 1] - y[i]) / (x[i + 1] - x[i]);
        }
        double[] m = new double[n];
        m[0] = d[0];
        m[n - 1] = d[n - 2];
        for (int i = 1; i < n - 1; i++) {
            m[i] = d[i - 1] * d[i] <= 0 ? 0.0 : (d[i - 1] + d[i]) / 2;
        }
        for (int i = 0; i < n - 1; i++) {
            if (d[i] == 0) {
                m[i] = 0;
                m[i + 1] = 0;
                continue;
            }
            double a = m[i] / d[i];
            double b = m[i + 1] / d[i];
            double h = a * a + b * b;
            if (h > 9) {
                double t = 3 / Math.sqrt(h);
                m[i] = t * a * d[i];
                m[i + 1] = t * b * d[i];
            }
        }
        return m;
    }

    /**
     * @param xq a point within [x_0, x_last]
     * @return the interpolated value
     */
    public double value(double xq) {
        int node = exactNode(xq);
        if (node >= 0) {
            return y[node];
        }
        int k = segment(xq);
        double h = x[k + 1] - x[k];
        double t = (xq - x[k]) / h;
        double t2 = t * t;
        double t3 = t2 * t;
        return (2 * t3 - 3 * t2 + 1) * y[k] + (t3 - 2 * t2 + t) * h * m[k]
                + (-2 * t3 + 3 * t2) * y[k + 1] + (t3 - t2) * h * m[k + 1];
    }

    /**
     * @param xq a point within [x_0, x_last]
     * @return the index of a node whose value the interpolant takes exactly at xq (xq is that node,
     *         or lies on a flat segment starting there), or -1
     */
    public int exactNode(double xq) {
        int i = Arrays.binarySearch(x, xq);
        if (i >= 0) {
            return i;
        }
        int k = segment(xq);
        return y[k] == y[k + 1] ? k : -1;
    }

    private int segment(double xq) {
        int i = Arrays.binarySearch(x, xq);
        return Math.max(0, Math.min(x.length - 2, i >= 0 ? i : -i - 2));
    }
}
