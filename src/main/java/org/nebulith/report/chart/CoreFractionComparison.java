package org.nebulith.report.chart;

import java.util.List;
import java.util.Objects;

import org.knowm.xchart.XYChart;


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
    public Figure chart(final ChartSize size) {
        Figure f = new Figure(size.widthPt(), size.heightPt());
        XYChart c = ChartStyle.chart(f, size.widthPt(), size.heightPt(), "Core mass fraction predicted from the star",
                "Core mass fraction from mass and radius");
        c.getStyler().setXAxisMin(0.0);
        c.getStyler().setXAxisMax(1.0);
        c.getStyler().setYAxisMin(0.0);
        c.getStyler().setYAxisMax(1.0);
        ChartStyle.line(c, "1:1", new double[] {0, 1}, new double[] {0, 1},
                new LineStyle(Palette.REFERENCE, 0.7, new float[] {3f, 2f}), true);
        double[] x = new double[6 * planets.size()];
        double[] y = new double[6 * planets.size()];
        for (int k = 0; k < planets.size(); k++) {
            Point pt = planets.get(k);
            double[] xs = {pt.predLow(), pt.predHigh(), pt.predHigh(), pt.predicted(), pt.predicted(), pt.predicted()};
            double[] ys = {pt.measured(), pt.measured(), Double.NaN, pt.measLow(), pt.measHigh(), Double.NaN};
            System.arraycopy(xs, 0, x, 6 * k, 6);
            System.arraycopy(ys, 0, y, 6 * k, 6);
        }
        ChartStyle.line(c, "ranges", x, y, LineStyle.solid(Palette.colour(0), 0.6), false);
        ChartStyle.points(c, "planets", planets.stream().mapToDouble(Point::predicted).toArray(),
                planets.stream().mapToDouble(Point::measured).toArray(), Marker.CIRCLE, Palette.colour(0), 1, true);
        f.fill(c);
        DirectLabels labels = new DirectLabels(f, c);
        for (Point pt : planets) {
            labels.beside(pt.label(), labels.x(pt.predicted()), labels.y(pt.measured()));
        }
        return f;
    }
}
