package org.nebulith.report.chart;

import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.function.Function;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.XYStyler;

/**
 * One figure: one or more XChart {@link XYChart}s laid out on one canvas in points (a single chart,
 * stacked panels sharing an x axis, small multiples side by side), and every label they can draw,
 * so that vector output can keep the labels as text ({@link VectorCanvas}).
 */
public final class Figure {

    /** A chart and where it sits [pt]. */
    private record Cell(XYChart chart, double x, double y, int width, int height) {
    }

    /** Least space right of stacked plots, for the last tick label [pt]. */
    private static final double RIGHT_MARGIN = 6;

    private final double widthPt;
    private final double heightPt;
    private final List<Cell> cells = new ArrayList<>();
    private final Set<String> texts = ConcurrentHashMap.newKeySet();

    /**
     * @param widthPt  width [pt]
     * @param heightPt height [pt]
     */
    public Figure(final double widthPt, final double heightPt) {
        if (!(widthPt > 0 && heightPt > 0)) {
            throw new IllegalArgumentException("figure size must be > 0, got " + widthPt + " x " + heightPt);
        }
        this.widthPt = widthPt;
        this.heightPt = heightPt;
    }

    /** @return width [pt] */
    public double widthPt() {
        return widthPt;
    }

    /** @return height [pt] */
    public double heightPt() {
        return heightPt;
    }

    /** @return the charts, in painting order */
    public List<XYChart> charts() {
        return cells.stream().map(Cell::chart).toList();
    }

    /**
     * @param chart  a chart
     * @param x      left [pt]
     * @param y      top [pt]
     * @param width  width [pt]
     * @param height height [pt]
     */
    void add(final XYChart chart, final double x, final double y, final double width, final double height) {
        ChartStyle.neverEmpty(chart);
        cells.add(new Cell(chart, x, y, (int) Math.round(width), (int) Math.round(height)));
    }

    /**
     * Makes a chart fill the figure and lays it out, so that labels can be placed on it.
     *
     * @param chart the chart, of the figure's size
     */
    void fill(final XYChart chart) {
        add(chart, 0, 0, widthPt, heightPt);
        layOut(chart);
    }

    /**
     * Stacks charts from the top, each the full width, moved and narrowed so that their plot areas
     * share left and right edges (the charts must share the x range).
     *
     * @param charts  the panels, top first
     * @param heights their heights [pt]
     * @param top     where the first starts [pt]
     */
    void stack(final List<XYChart> charts, final double[] heights, final double top) {
        int n = charts.size();
        double[] left = new double[n];
        double[] right = new double[n];
        double maxLeft = 0;
        double maxRight = RIGHT_MARGIN;
        for (int i = 0; i < n; i++) {
            XYChart c = charts.get(i);
            double[] edges = plotEdges(c, (int) Math.round(widthPt), (int) Math.round(heights[i]));
            left[i] = edges[0];
            right[i] = widthPt - edges[1];
            maxLeft = Math.max(maxLeft, left[i]);
            maxRight = Math.max(maxRight, right[i]);
        }
        double y = top;
        for (int i = 0; i < n; i++) {
            double x = maxLeft - left[i];
            add(charts.get(i), x, y, widthPt - x - (maxRight - right[i]), heights[i]);
            y += heights[i];
        }
    }

    /**
     * Adds a chart so that its plot area covers a given rectangle of the figure (the chart itself may
     * reach beyond it: give it a transparent background). Its axis insets are measured once, at a
     * size larger than the rectangle.
     *
     * @param chart the chart
     * @param plot  where its plot area must be [pt]
     */
    void overlay(final XYChart chart, final java.awt.geom.Rectangle2D plot) {
        int w0 = (int) Math.round(plot.getWidth()) + 200;
        int h0 = (int) Math.round(plot.getHeight()) + 200;
        layOut(chart, w0, h0);
        java.awt.geom.Rectangle2D box = DirectLabels.plotBox(chart);
        double left = box.getMinX();
        double top = box.getMinY();
        double right = w0 - box.getMaxX();
        double bottom = h0 - box.getMaxY();
        add(chart, plot.getMinX() - left, plot.getMinY() - top, left + plot.getWidth() + right,
                top + plot.getHeight() + bottom);
    }

    /** @return where a chart added to this figure sits and how large it is [pt], or null */
    java.awt.geom.Rectangle2D cell(final XYChart chart) {
        for (Cell c : cells) {
            if (c.chart() == chart) {
                return new java.awt.geom.Rectangle2D.Double(c.x(), c.y(), c.width(), c.height());
            }
        }
        return null;
    }

    /**
     * Lays charts side by side, their plot areas of equal width.
     *
     * @param charts the panels, left first
     * @param height their height [pt]
     * @param gap    space between two panels [pt]
     * @param margin space kept free at the right (for the last axis title) [pt]
     */
    void row(final List<XYChart> charts, final double height, final double gap, final double margin) {
        int n = charts.size();
        double[] insets = new double[n];
        double total = 0;
        // insets measured at a width where every axis fits (they do not depend on the width)
        int trial = (int) Math.round(widthPt);
        for (int i = 0; i < n; i++) {
            double[] edges = plotEdges(charts.get(i), trial, (int) Math.round(height));
            insets[i] = trial - (edges[1] - edges[0]);
            total += insets[i];
        }
        double plot = (widthPt - margin - total - gap * (n - 1)) / n;
        double x = 0;
        for (int i = 0; i < n; i++) {
            double w = Math.floor(plot + insets[i]);
            add(charts.get(i), x, 0, w, height);
            x += w + gap;
        }
    }

    /**
     * @param chart  a chart
     * @param width  its width [pt]
     * @param height its height [pt]
     * @return the left and right device x of its plot area when painted at that size [pt]
     */
    static double[] plotEdges(final XYChart chart, final int width, final int height) {
        ChartStyle.neverEmpty(chart);
        layOut(chart, width, height);
        double[] range = xRange(chart);
        double a = chart.getScreenXFromChart(range[0]);
        double b = chart.getScreenXFromChart(range[1]);
        return new double[] {Math.min(a, b), Math.max(a, b)};
    }

    /**
     * Lays a chart of this figure out at the size of its cell (after which its screen coordinates
     * are those it is painted with).
     *
     * @param chart a chart added to this figure
     */
    void layOut(final XYChart chart) {
        for (Cell c : cells) {
            if (c.chart() == chart) {
                layOut(chart, c.width(), c.height());
                return;
            }
        }
        throw new IllegalArgumentException("chart not in this figure");
    }

    /** Paints a chart on a scratch image so that XChart computes its layout (and its screen coordinates). */
    static void layOut(final XYChart chart, final int width, final int height) {
        BufferedImage scratch = new BufferedImage(1, 1, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = scratch.createGraphics();
        try {
            chart.paint(g, width, height);
        } finally {
            g.dispose();
        }
    }

    private static double[] xRange(final XYChart chart) {
        XYStyler s = chart.getStyler();
        if (s.getXAxisMin() != null && s.getXAxisMax() != null) {
            return new double[] {s.getXAxisMin(), s.getXAxisMax()};
        }
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (XYSeries series : chart.getSeriesCollection()) {
            lo = Math.min(lo, series.getXMin());
            hi = Math.max(hi, series.getXMax());
        }
        return new double[] {lo, hi};
    }

    /** @param text a label drawn on the figure (annotations, row names) */
    void text(final String text) {
        texts.add(text);
    }

    /**
     * @param format a tick-label format
     * @return the same format, recording every label it makes as a text of this figure
     */
    Function<Double, String> recording(final Function<Double, String> format) {
        return v -> {
            String s = format.apply(v);
            texts.add(s);
            return s;
        };
    }

    /** @return every label of the figure: recorded ones, titles and the names of the series in legends */
    Collection<String> texts() {
        for (Cell c : cells) {
            XYChart chart = c.chart();
            add(chart.getTitle());
            add(chart.getXAxisTitle());
            add(chart.getYAxisTitle());
            for (int g = 0; g < 4; g++) {
                add(chart.getYAxisGroupTitle(g));
            }
            for (XYSeries s : chart.getSeriesCollection()) {
                if (s.isShowInLegend()) {
                    add(s.getName());
                }
            }
        }
        return texts;
    }

    private void add(final String s) {
        if (s != null) {
            for (String line : s.split("\n")) {
                texts.add(line);
            }
        }
    }

    /** @return the fonts the charts draw text in */
    Collection<Font> fonts() {
        Set<Font> fonts = new LinkedHashSet<>();
        for (Cell c : cells) {
            XYStyler s = c.chart().getStyler();
            fonts.add(s.getAxisTitleFont());
            fonts.add(s.getAxisTickLabelsFont());
            fonts.add(s.getLegendFont());
            fonts.add(s.getAnnotationTextFont());
            fonts.add(s.getAnnotationTextPanelFont());
            fonts.add(s.getChartTitleFont());
        }
        return fonts;
    }

    /** @param g the canvas, in points; every chart is painted at its place */
    public void paint(final Graphics2D g) {
        for (Cell c : cells) {
            g.translate(c.x(), c.y());
            c.chart().paint(g, c.width(), c.height());
            g.translate(-c.x(), -c.y());
        }
    }
}
