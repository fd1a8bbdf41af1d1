package org.nebulith.report.chart;

import java.util.List;
import java.util.Objects;

import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;

/**
 * Core mass fraction from a planet's mass and radius (y) against the one predicted from its star
 * (x), with 16th-84th percentile bars and the 1:1 line.
 *
 * @param planets the planets
 */
public record CoreFractionComparison(List<Point> planets) {

    /**
     * @param label     planet name
     * @param predicted star-predicted median
     * @param predLow   its 16th percentile
     * @param predHigh  its 84th percentile
     * @param measured  median from mass and radius
     * @param measLow   16th percentile
     * @param measHigh  84th percentile
     */
    public record Point(String label, double predicted, double predLow, double predHigh, double measured,
                        double measLow, double measHigh) {
        public Point {
            Objects.requireNonNull(label);
        }
    }

    public CoreFractionComparison {
        planets = List.copyOf(planets);
        if (planets.isEmpty()) {
            throw new IllegalArgumentException("core fraction chart: no planets");
        }
    }

    /**
     * @param size figure size
     * @return the chart
     */
    public XYChart chart(final ChartSize size) {
        XYChart chart = ChartStyle.newXYChart(size, "Core mass fraction predicted from the star",
                "Core mass fraction from mass and radius");
        chart.getStyler().setXAxisMin(0.0).setXAxisMax(1.0).setYAxisMin(0.0).setYAxisMax(1.0);
        chart.getStyler().setLegendPosition(Styler.LegendPosition.InsideNW);
        chart.getStyler().setXAxisDecimalPattern("0.0");
        chart.getStyler().setYAxisDecimalPattern("0.0");
        XYSeries one = chart.addSeries("1:1", new double[] {0, 1}, new double[] {0, 1});
        ChartStyle.line(one, 7);
        one.setLineColor(Palette.REFERENCE);
        int n = planets.size();
        double[] x = new double[n];
        double[] y = new double[n];
        double[] xl = new double[n];
        double[] xh = new double[n];
        double[] yl = new double[n];
        double[] yh = new double[n];
        for (int i = 0; i < n; i++) {
            Point p = planets.get(i);
            x[i] = p.predicted();
            xl[i] = p.predLow();
            xh[i] = p.predHigh();
            y[i] = p.measured();
            yl[i] = p.measLow();
            yh[i] = p.measHigh();
        }
        ErrorBars.horizontal(chart, "predicted range", x, xl, xh, y, Palette.colour(0));
        ErrorBars.vertical(chart, "measured range", x, y, yl, yh, Palette.colour(0));
        XYSeries s = chart.addSeries("planets", x, y);
        ChartStyle.points(s, 0);
        for (Point p : planets) {
            chart.addAnnotation(new AnnotationText(p.label(), Math.min(0.9, p.predicted() + 0.02), p.measured() + 0.03,
                    false));
        }
        return chart;
    }
}
