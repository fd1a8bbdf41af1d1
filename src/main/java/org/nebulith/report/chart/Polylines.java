package org.nebulith.report.chart;

import java.awt.geom.PathIterator;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.style.XYStyler;

import java.awt.geom.Path2D;
import java.util.ArrayList;
import java.util.List;

/**
 * Polyline reduction to what a figure can show: Douglas-Peucker in device coordinates (points),
 * dropping every vertex within {@link #TOLERANCE_PT} of the simplified line. At 300 dpi that is
 * under one pixel, so the reduced line is indistinguishable from the full one at print size. The
 * device coordinates of a chart's data are estimated from its axis ranges and its whole size (a
 * little larger than its plot, so the estimate keeps slightly more vertices than needed).
 */
final class Polylines {

    /** Largest distance of a dropped vertex from the reduced line [pt] (0.1 pt = 0.4 px at 300 dpi). */
    static final double TOLERANCE_PT = 0.1;

    private Polylines() {
    }

    /**
     * @param chart a chart whose axis ranges are set (else the data's ranges are used)
     * @param x     x values; NaN breaks the line
     * @param y     y values; NaN breaks the line
     * @return the kept x and y values, one NaN between two unbroken runs
     */
    static double[][] reduce(final XYChart chart, final double[] x, final double[] y) {
        XYStyler s = chart.getStyler();
        double[] xd = device(x, s.getXAxisMin(), s.getXAxisMax(), s.isXAxisLogarithmic(), chart.getWidth());
        double[] yd = device(y, s.getYAxisMin(), s.getYAxisMax(), s.isYAxisLogarithmic(), chart.getHeight());
        Path2D.Double p = path(xd, yd);
        List<double[]> out = new ArrayList<>();
        int i = 0;
        double[] c = new double[6];
        for (PathIterator it = p.getPathIterator(null); !it.isDone(); it.next()) {
            if (it.currentSegment(c) == PathIterator.SEG_MOVETO && !out.isEmpty()) {
                out.add(new double[] {Double.NaN, Double.NaN});
            }
            // find the source index of this vertex (vertices come in order)
            while (xd[i] != c[0] || yd[i] != c[1]) {
                i++;
            }
            out.add(new double[] {x[i], y[i]});
        }
        double[][] kept = new double[2][out.size()];
        for (int k = 0; k < out.size(); k++) {
            kept[0][k] = out.get(k)[0];
            kept[1][k] = out.get(k)[1];
        }
        return kept;
    }

    private static double[] device(final double[] v, final Double min, final Double max, final boolean log,
                                   final int size) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double a : v) {
            if (Double.isFinite(a) && (!log || a > 0)) {
                lo = Math.min(lo, a);
                hi = Math.max(hi, a);
            }
        }
        lo = min != null ? min : lo;
        hi = max != null ? max : hi;
        double[] d = new double[v.length];
        double f0 = log ? Math.log10(lo) : lo;
        double span = (log ? Math.log10(hi) : hi) - f0;
        double scale = span > 0 && Double.isFinite(span) ? size / span : 1;
        for (int i = 0; i < v.length; i++) {
            double a = log ? (v[i] > 0 ? Math.log10(v[i]) : Double.NaN) : v[i];
            d[i] = (a - f0) * scale;
        }
        return d;
    }

    /**
     * @param x device x [pt]; NaN breaks the line
     * @param y device y [pt]; NaN breaks the line
     * @return one path with a subpath per unbroken run, each reduced
     */
    static Path2D.Double path(final double[] x, final double[] y) {
        Path2D.Double p = new Path2D.Double();
        int start = -1;
        for (int i = 0; i <= x.length; i++) {
            boolean ok = i < x.length && Double.isFinite(x[i]) && Double.isFinite(y[i]);
            if (ok && start < 0) {
                start = i;
            } else if (!ok && start >= 0) {
                append(p, x, y, start, i - 1);
                start = -1;
            }
        }
        return p;
    }

    private static void append(final Path2D.Double p, final double[] x, final double[] y, final int from,
                               final int to) {
        List<Integer> kept = new ArrayList<>();
        kept.add(from);
        reduce(x, y, from, to, kept);
        kept.add(to);
        p.moveTo(x[from], y[from]);
        if (from == to) {
            p.lineTo(x[from], y[from]);
            return;
        }
        for (int k = 1; k < kept.size(); k++) {
            p.lineTo(x[kept.get(k)], y[kept.get(k)]);
        }
    }

    /** Adds, in order, the kept vertices strictly between a and b (recursion depth at most b - a). */
    private static void reduce(final double[] x, final double[] y, final int a, final int b, final List<Integer> kept) {
        int far = farthest(x, y, a, b);
        if (far < 0) {
            return;
        }
        reduce(x, y, a, far, kept);
        kept.add(far);
        reduce(x, y, far, b, kept);
    }

    private static int farthest(final double[] x, final double[] y, final int a, final int b) {
        if (b - a < 2) {
            return -1;
        }
        double dx = x[b] - x[a];
        double dy = y[b] - y[a];
        double len = Math.hypot(dx, dy);
        double best = TOLERANCE_PT;
        int at = -1;
        for (int i = a + 1; i < b; i++) {
            double d = len == 0 ? Math.hypot(x[i] - x[a], y[i] - y[a])
                    : Math.abs(dy * (x[i] - x[a]) - dx * (y[i] - y[a])) / len;
            if (d > best) {
                best = d;
                at = i;
            }
        }
        return at;
    }
}
