package org.nebulith.report.chart;

import java.awt.BasicStroke;
import java.awt.Color;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Asymmetric error bars (e.g. 16th to 84th percentile), horizontal and vertical, drawn as one
 * hidden-from-legend line series per direction whose segments are separated by NaN (XChart breaks
 * a line at a NaN y value). XChart's own error bars are symmetric and vertical only.
 */
final class ErrorBars {

    private static final BasicStroke STROKE = new BasicStroke(0.6f);

    private ErrorBars() {
    }

    /**
     * @param chart  the chart
     * @param name   unique series name
     * @param x      centre x values
     * @param y      centre y values
     * @param yLow   lower ends (NaN = no bar)
     * @param yHigh  upper ends (NaN = no bar)
     * @param colour bar colour
     */
    static void vertical(final XYChart chart, final String name, final double[] x, final double[] y,
                         final double[] yLow, final double[] yHigh, final Color colour) {
        double[] xs = new double[3 * x.length];
        double[] ys = new double[3 * x.length];
        for (int i = 0; i < x.length; i++) {
            boolean bar = Double.isFinite(yLow[i]) && Double.isFinite(yHigh[i]) && Double.isFinite(y[i]);
            xs[3 * i] = x[i];
            xs[3 * i + 1] = x[i];
            xs[3 * i + 2] = x[i];
            ys[3 * i] = bar ? yLow[i] : Double.NaN;
            ys[3 * i + 1] = bar ? yHigh[i] : Double.NaN;
            ys[3 * i + 2] = Double.NaN;
        }
        add(chart, name, xs, ys, colour);
    }

    /**
     * @param chart  the chart
     * @param name   unique series name
     * @param x      centre x values
     * @param xLow   left ends (NaN = no bar)
     * @param xHigh  right ends (NaN = no bar)
     * @param y      centre y values
     * @param colour bar colour
     */
    static void horizontal(final XYChart chart, final String name, final double[] x, final double[] xLow,
                           final double[] xHigh, final double[] y, final Color colour) {
        double[] xs = new double[3 * x.length];
        double[] ys = new double[3 * x.length];
        for (int i = 0; i < x.length; i++) {
            boolean bar = Double.isFinite(xLow[i]) && Double.isFinite(xHigh[i]) && Double.isFinite(y[i]);
            xs[3 * i] = bar ? xLow[i] : x[i];
            xs[3 * i + 1] = bar ? xHigh[i] : x[i];
            xs[3 * i + 2] = x[i];
            ys[3 * i] = bar ? y[i] : Double.NaN;
            ys[3 * i + 1] = bar ? y[i] : Double.NaN;
            ys[3 * i + 2] = Double.NaN;
        }
        add(chart, name, xs, ys, colour);
    }

    private static void add(final XYChart chart, final String name, final double[] xs, final double[] ys,
                            final Color colour) {
        XYSeries s = chart.addSeries(name, xs, ys);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setMarker(SeriesMarkers.NONE);
        s.setLineColor(colour);
        s.setLineStyle(STROKE);
        s.setShowInLegend(false);
    }
}
