package org.nebulith.report.chart;

import java.util.List;
import java.util.Objects;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/**
 * Survey: molar Mg/Si against Fe/Si for host stars and their predicted planets, with asymmetric
 * error bars (16th to 84th percentile, or the stellar 1-sigma range), plus optional labelled
 * reference bodies (the Sun, bulk Earth, CI chondrite).
 *
 * @param stars      the host stars
 * @param planets    the predicted planets
 * @param references reference bodies drawn as single markers (no error bars)
 */
public record SurveyScatter(List<Point> stars, List<Point> planets, List<Point> references) {

    /**
     * One body with its ratios and their ranges.
     *
     * @param label    name (a star, a planet, a reference body)
     * @param feSi     molar Fe/Si (x)
     * @param feSiLow  lower end of the Fe/Si range (NaN = none)
     * @param feSiHigh upper end
     * @param mgSi     molar Mg/Si (y)
     * @param mgSiLow  lower end of the Mg/Si range (NaN = none)
     * @param mgSiHigh upper end
     */
    public record Point(String label, double feSi, double feSiLow, double feSiHigh, double mgSi, double mgSiLow,
                        double mgSiHigh) {
        public Point {
            Objects.requireNonNull(label);
            if (!(feSi > 0 && mgSi > 0 && Double.isFinite(feSi) && Double.isFinite(mgSi))) {
                throw new IllegalArgumentException(label + ": Fe/Si and Mg/Si must be finite and > 0, got "
                        + feSi + ", " + mgSi);
            }
        }

        /**
         * @param label name
         * @param feSi  molar Fe/Si
         * @param mgSi  molar Mg/Si
         * @return a point without ranges
         */
        public static Point of(final String label, final double feSi, final double mgSi) {
            return new Point(label, feSi, Double.NaN, Double.NaN, mgSi, Double.NaN, Double.NaN);
        }
    }

    public SurveyScatter {
        stars = List.copyOf(stars);
        planets = List.copyOf(planets);
        references = List.copyOf(references);
        if (stars.isEmpty() && planets.isEmpty()) {
            throw new IllegalArgumentException("survey chart: no stars and no planets");
        }
    }

    /**
     * @param size figure size
     * @return the chart
     */
    public XYChart chart(final ChartSize size) {
        XYChart chart = ChartStyle.newXYChart(size, "Fe/Si (molar)", "Mg/Si (molar)");
        chart.getStyler().setXAxisDecimalPattern("0.0#");
        chart.getStyler().setYAxisDecimalPattern("0.0#");
        addGroup(chart, "host stars", stars, 0);
        addGroup(chart, "predicted planets", planets, 1);
        for (int i = 0; i < references.size(); i++) {
            Point p = references.get(i);
            XYSeries s = chart.addSeries(p.label(), new double[] {p.feSi()}, new double[] {p.mgSi()});
            ChartStyle.points(s, 6 + i); // black, then yellow markers: kept apart from the two groups
            s.setMarker(i % 2 == 0 ? org.knowm.xchart.style.markers.SeriesMarkers.CROSS
                    : org.knowm.xchart.style.markers.SeriesMarkers.PLUS);
            s.setMarkerColor(Palette.colour(6));
        }
        return chart;
    }

    private static void addGroup(final XYChart chart, final String name, final List<Point> points, final int style) {
        if (points.isEmpty()) {
            return;
        }
        int n = points.size();
        double[] x = new double[n];
        double[] y = new double[n];
        double[] xLow = new double[n];
        double[] xHigh = new double[n];
        double[] yLow = new double[n];
        double[] yHigh = new double[n];
        for (int i = 0; i < n; i++) {
            Point p = points.get(i);
            x[i] = p.feSi();
            y[i] = p.mgSi();
            xLow[i] = p.feSiLow();
            xHigh[i] = p.feSiHigh();
            yLow[i] = p.mgSiLow();
            yHigh[i] = p.mgSiHigh();
        }
        java.awt.Color light = Palette.colour(style);
        ErrorBars.horizontal(chart, name + " Fe/Si range", x, xLow, xHigh, y, light);
        ErrorBars.vertical(chart, name + " Mg/Si range", x, y, yLow, yHigh, light);
        XYSeries s = chart.addSeries(name, x, y);
        ChartStyle.points(s, style);
    }
}
