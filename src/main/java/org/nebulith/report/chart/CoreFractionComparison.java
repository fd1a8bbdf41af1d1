package org.nebulith.report.chart;

import java.util.List;
import java.util.Objects;


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
    public Drawing chart(final ChartSize size) {
        Drawing d = Drawing.of(size);
        Axis x = Axis.linear(0, 1, "Core mass fraction predicted from the star").ticks(5);
        Axis y = Axis.linear(0, 1, "Core mass fraction from mass and radius").ticks(5);
        Legend legend = new Legend().add(new Legend.Entry("planets", null, Marker.CIRCLE, Palette.colour(0)))
                .add(new Legend.Entry("1:1", new LineStyle(Palette.REFERENCE, 0.7, new float[] {3f, 2f}), null,
                        Palette.REFERENCE));
        double left = ChartStyle.PAD + Panel.yAxisWidth(y);
        double right = size.widthPt() - ChartStyle.PAD - legend.columnWidth() - 6;
        java.awt.geom.Rectangle2D box = new java.awt.geom.Rectangle2D.Double(left, ChartStyle.PAD + 2, right - left,
                size.heightPt() - 2 * ChartStyle.PAD - 2 - Panel.xAxisHeight());
        Panel p = new Panel(d, box, x, y).frame(true, true);
        p.line(new double[] {0, 1}, new double[] {0, 1}, new LineStyle(Palette.REFERENCE, 0.7, new float[] {3f, 2f}));
        for (Point pt : planets) {
            p.xErrorBar(pt.predLow(), pt.predHigh(), pt.measured(), Palette.colour(0));
            p.yErrorBar(pt.predicted(), pt.measLow(), pt.measHigh(), Palette.colour(0));
            p.point(Marker.CIRCLE, pt.predicted(), pt.measured(), Palette.colour(0));
            p.label(pt.label(), Math.min(0.9, pt.predicted()), pt.measured(), 4, -3, Drawing.Align.LEFT);
        }
        legend.draw(d, right + 6, box.getMinY() + 2, 1, 0);
        return d;
    }
}
