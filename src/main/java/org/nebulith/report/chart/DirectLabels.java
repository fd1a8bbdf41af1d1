package org.nebulith.report.chart;

import java.awt.geom.Rectangle2D;
import java.util.List;

import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.AnnotationTextPanel;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.style.XYStyler;

/**
 * Labels written on a laid-out XChart chart, placed in device coordinates [pt] where they overlap
 * nothing ({@link Placement}) and added as XChart text annotations in screen space: series names
 * beside their curves, notes in the emptiest corner of the plot.
 */
final class DirectLabels {

    /** Steps of the grid of note positions across the plot. */
    private static final int GRID = 12;

    private final Figure figure;
    private final XYChart chart;
    private final Rectangle2D box;
    private final Placement free;

    /**
     * @param figure the figure (labels are recorded as its texts)
     * @param chart  the chart, already laid out at its final size ({@link Figure#layOut})
     */
    DirectLabels(final Figure figure, final XYChart chart) {
        this.figure = figure;
        this.chart = chart;
        this.box = plotBox(chart);
        this.free = new Placement(box);
    }

    /** @param chart a laid-out chart with its axis ranges set @return its plot area [pt] */
    static Rectangle2D plotBox(final XYChart chart) {
        XYStyler s = chart.getStyler();
        double x0 = chart.getScreenXFromChart(s.getXAxisMin());
        double x1 = chart.getScreenXFromChart(s.getXAxisMax());
        double y0 = chart.getScreenYFromChart(s.getYAxisMin());
        double y1 = chart.getScreenYFromChart(s.getYAxisMax());
        return new Rectangle2D.Double(Math.min(x0, x1), Math.min(y0, y1), Math.abs(x1 - x0), Math.abs(y1 - y0));
    }

    /** @return the plot area [pt] */
    Rectangle2D box() {
        return box;
    }

    /** @return the free-space bookkeeping */
    Placement free() {
        return free;
    }

    /** @param v an x value @return its device x [pt] */
    double x(final double v) {
        return chart.getScreenXFromChart(v);
    }

    /** @param v a y value @return its device y [pt] */
    double y(final double v) {
        return chart.getScreenYFromChart(v);
    }

    /** @param dev a device x [pt] @return the x value there */
    double dataX(final double dev) {
        XYStyler s = chart.getStyler();
        return inverse((dev - box.getMinX()) / box.getWidth(), s.getXAxisMin(), s.getXAxisMax(),
                s.isXAxisLogarithmic());
    }

    /** @param dev a device y [pt] @return the y value there */
    double dataY(final double dev) {
        XYStyler s = chart.getStyler();
        return inverse((box.getMaxY() - dev) / box.getHeight(), s.getYAxisMin(), s.getYAxisMax(),
                s.isYAxisLogarithmic());
    }

    private static double inverse(final double fraction, final double min, final double max, final boolean log) {
        return log ? Math.pow(10, Math.log10(min) + fraction * (Math.log10(max) - Math.log10(min)))
                : min + fraction * (max - min);
    }

    /**
     * @param xs x values (NaN = gap)
     * @param ys y values (NaN = gap)
     * @return their device coordinates, NaN kept
     */
    double[][] device(final double[] xs, final double[] ys) {
        double[][] d = new double[2][xs.length];
        boolean logY = chart.getStyler().isYAxisLogarithmic();
        for (int i = 0; i < xs.length; i++) {
            boolean ok = Double.isFinite(xs[i]) && Double.isFinite(ys[i]) && (!logY || ys[i] > 0);
            d[0][i] = ok ? x(xs[i]) : Double.NaN;
            d[1][i] = ok ? y(ys[i]) : Double.NaN;
        }
        return d;
    }

    /**
     * Puts markers along a drawn line, one every {@code spacing} pt of its length, skipping the parts
     * on the plot's edges (floors and ceilings), as a series of its own outside the legend.
     *
     * @param name    series name
     * @param dev     the line in device coordinates (NaN = gap)
     * @param marker  the marker
     * @param colour  its colour
     * @param spacing distance between markers along the line [pt]
     * @param offset  distance to the first marker [pt] (staggered between series)
     */
    void markersAlong(final String name, final double[][] dev, final Marker marker, final java.awt.Color colour,
                      final double spacing, final double offset) {
        List<double[]> at = new java.util.ArrayList<>();
        double next = offset;
        double run = 0;
        for (int k = 1; k < dev[0].length; k++) {
            double x0 = dev[0][k - 1];
            double y0 = dev[1][k - 1];
            double x1 = dev[0][k];
            double y1 = dev[1][k];
            if (!(Double.isFinite(x0) && Double.isFinite(y0) && Double.isFinite(x1) && Double.isFinite(y1))
                    || onEdge(y0) && onEdge(y1)) {
                continue;
            }
            double len = Math.hypot(x1 - x0, y1 - y0);
            while (run + len >= next) {
                double f = (next - run) / len;
                at.add(new double[] {dataX(x0 + f * (x1 - x0)), dataY(y0 + f * (y1 - y0))});
                next += spacing;
            }
            run += len;
        }
        if (!at.isEmpty()) {
            ChartStyle.points(chart, name, at.stream().mapToDouble(p -> p[0]).toArray(),
                    at.stream().mapToDouble(p -> p[1]).toArray(), marker, colour, 0.9, false);
        }
    }

    private boolean onEdge(final double y) {
        return y < box.getMinY() + 5 || y > box.getMaxY() - 5;
    }

    /**
     * @param text a label
     * @param cx   its centre x [pt]
     * @param cy   its centre y [pt]
     * @return the box it covers [pt]
     */
    static Rectangle2D bounds(final String text, final double cx, final double cy) {
        double w = Fonts.width(text, ChartStyle.NOTE_PT) + 1;
        double h = Fonts.capHeight(ChartStyle.NOTE_PT) + 1.5;
        return new Rectangle2D.Double(cx - w / 2, cy - h / 2, w, h);
    }

    /**
     * Writes a label centred on a device point and marks its box as taken.
     *
     * @param text the label
     * @param cx   centre x [pt]
     * @param cy   centre y [pt]
     */
    void put(final String text, final double cx, final double cy) {
        free.take(bounds(text, cx, cy));
        figure.text(text);
        chart.addAnnotation(new AnnotationText(text, cx, chart.getHeight() - cy, true));
    }

    /**
     * Writes a label at the first free place among candidate centres.
     *
     * @param text   the label
     * @param except index of a line the label may touch (its own), or -1
     * @param xy     candidate centres, x and y alternating [pt]
     * @return whether it was placed
     */
    boolean putFirstFree(final String text, final int except, final double... xy) {
        for (int i = 0; i + 1 < xy.length; i += 2) {
            if (free.free(bounds(text, xy[i], xy[i + 1]), except)) {
                put(text, xy[i], xy[i + 1]);
                return true;
            }
        }
        return false;
    }

    /**
     * Writes a point's label beside it: right and above, left and above, right and below, or left
     * and below, the first place free.
     *
     * @param text the label
     * @param px   the point's device x [pt]
     * @param py   the point's device y [pt]
     */
    void beside(final String text, final double px, final double py) {
        double w = Fonts.width(text, ChartStyle.NOTE_PT) / 2 + 5;
        putFirstFree(text, -1, px + w, py - 4, px - w, py - 4, px + w, py + 5, px - w, py + 5);
    }

    /**
     * Writes note lines, left-aligned, in a corner of the plot that touches no line or label, else
     * elsewhere in the plot where it touches none, else where it touches the fewest.
     *
     * @param lines the note lines
     */
    void note(final List<String> lines) {
        if (lines.isEmpty()) {
            return;
        }
        double lineH = ChartStyle.NOTE_PT + 1.5;
        double w = 2 * ChartStyle.NOTE_PADDING;
        for (String l : lines) {
            w = Math.max(w, Fonts.width(l, ChartStyle.NOTE_PT) + 2 * ChartStyle.NOTE_PADDING);
        }
        double h = lines.size() * lineH + 2 * ChartStyle.NOTE_PADDING;
        // the corners first, then a grid over the plot: the first box that touches nothing, else the least crowded
        List<double[]> at = new java.util.ArrayList<>();
        for (double fy : new double[] {0, 1}) {
            for (double fx : new double[] {1, 0}) {
                at.add(new double[] {fx, fy});
            }
        }
        for (int gy = 0; gy <= GRID; gy++) {
            for (int gx = GRID; gx >= 0; gx--) {
                at.add(new double[] {gx / (double) GRID, gy / (double) GRID});
            }
        }
        Rectangle2D best = null;
        int fewest = Integer.MAX_VALUE;
        for (double[] f : at) {
            Rectangle2D r = new Rectangle2D.Double(box.getMinX() + 3 + f[0] * (box.getWidth() - w - 6),
                    box.getMinY() + 3 + f[1] * (box.getHeight() - h - 6), w, h);
            int hits = free.hits(r);
            if (hits < fewest) {
                fewest = hits;
                best = r;
                if (hits == 0) {
                    break;
                }
            }
        }
        free.take(best);
        lines.forEach(figure::text);
        // a panel on a light background, so that a note over a line stays readable
        chart.addAnnotation(new AnnotationTextPanel(String.join("\n", lines), best.getMinX(),
                chart.getHeight() - best.getMaxY(), true));
    }
}
