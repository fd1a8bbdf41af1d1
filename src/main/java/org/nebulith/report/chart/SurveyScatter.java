package org.nebulith.report.chart;

import java.awt.Color;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.Objects;

/**
 * Survey: molar Mg/Si against Fe/Si for host stars and their predicted planets, with their ranges
 * (16th to 84th percentile) as thin crosses; host stars as open rings and planets as smaller dots
 * drawn over them, so that a planet at its star's position shows as a dot inside a ring; labelled
 * reference bodies (the Sun, bulk Earth) as large distinct markers; the legend outside the plot.
 *
 * @param stars      the host stars
 * @param planets    the predicted planets
 * @param references reference bodies drawn as single markers (no ranges)
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

        /** @param label name @param feSi molar Fe/Si @param mgSi molar Mg/Si @return a point without ranges */
        public static Point of(final String label, final double feSi, final double mgSi) {
            return new Point(label, feSi, Double.NaN, Double.NaN, mgSi, Double.NaN, Double.NaN);
        }
    }

    private static final Marker[] REFERENCE_MARKERS = {Marker.STAR, Marker.DIAMOND, Marker.TRIANGLE_UP, Marker.SQUARE};

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
    public Drawing chart(final ChartSize size) {
        Drawing d = Drawing.of(size);
        Color starColour = Palette.seriesColour(1);
        Color planetColour = Palette.seriesColour(0);
        Legend legend = new Legend();
        if (!planets.isEmpty()) {
            legend.add(new Legend.Entry("predicted planets", null, Marker.CIRCLE, planetColour));
        }
        if (!stars.isEmpty()) {
            legend.add(new Legend.Entry("host stars", null, Marker.OPEN_CIRCLE, starColour));
        }
        for (int i = 0; i < references.size(); i++) {
            legend.add(new Legend.Entry(references.get(i).label(), null, REFERENCE_MARKERS[i % REFERENCE_MARKERS.length],
                    Palette.AXIS));
        }
        legend.add(new Legend.Entry("16th-84th pct.", LineStyle.solid(Palette.REFERENCE, 0.5), null, Palette.REFERENCE));
        double[] xr = range(true);
        double[] yr = range(false);
        Axis x = Axis.linear(xr[0], xr[1], "Fe/Si [mol/mol]").ticks(7);
        Axis y = Axis.linear(yr[0], yr[1], "Mg/Si [mol/mol]").ticks(7);
        double left = ChartStyle.PAD + Panel.yAxisWidth(y);
        double right = size.widthPt() - ChartStyle.PAD - legend.columnWidth() - 6;
        Rectangle2D box = new Rectangle2D.Double(left, ChartStyle.PAD + 2, right - left,
                size.heightPt() - 2 * ChartStyle.PAD - 2 - Panel.xAxisHeight());
        Panel p = new Panel(d, box, x, y).frame(true, true);
        Color planetFill = new Color(planetColour.getRed(), planetColour.getGreen(), planetColour.getBlue(), 150);
        Color planetBar = new Color(planetColour.getRed(), planetColour.getGreen(), planetColour.getBlue(), 80);
        Color starBar = new Color(starColour.getRed(), starColour.getGreen(), starColour.getBlue(), 110);
        for (Point pt : stars) {
            cross(p, pt, starBar);
        }
        for (Point pt : planets) {
            cross(p, pt, planetBar);
        }
        for (Point pt : stars) {
            p.markerAt(Marker.OPEN_CIRCLE, p.px(pt.feSi()), p.py(pt.mgSi()), starColour, ChartStyle.MARKER_PT + 1.6);
        }
        // planets on top, smaller than the star rings: a planet that sits on its star shows as a dot in a ring
        for (Point pt : planets) {
            p.markerAt(Marker.CIRCLE, p.px(pt.feSi()), p.py(pt.mgSi()), planetFill, ChartStyle.MARKER_PT - 1.2);
        }
        for (int i = 0; i < references.size(); i++) {
            Point r = references.get(i);
            p.markerAt(REFERENCE_MARKERS[i % REFERENCE_MARKERS.length], p.px(r.feSi()), p.py(r.mgSi()), Palette.AXIS,
                    ChartStyle.MARKER_PT + 2);
            d.text(r.label(), p.px(r.feSi()) + 4.5, p.py(r.mgSi()) - 3, ChartStyle.NOTE_PT, Drawing.Align.LEFT,
                    Palette.AXIS);
        }
        legend.draw(d, right + 6, box.getMinY() + 2, 1, 0);
        return d;
    }

    private static void cross(final Panel p, final Point pt, final Color c) {
        LineStyle s = LineStyle.solid(c, 0.5);
        Drawing d = p.drawing();
        d.clip(p.area());
        if (Double.isFinite(pt.feSiLow()) && Double.isFinite(pt.feSiHigh())) {
            d.stroke(new Line2D.Double(p.px(pt.feSiLow()), p.py(pt.mgSi()), p.px(pt.feSiHigh()), p.py(pt.mgSi())), s);
        }
        if (Double.isFinite(pt.mgSiLow()) && Double.isFinite(pt.mgSiHigh())) {
            d.stroke(new Line2D.Double(p.px(pt.feSi()), p.py(pt.mgSiLow()), p.px(pt.feSi()), p.py(pt.mgSiHigh())), s);
        }
        d.endClip();
    }

    private double[] range(final boolean fe) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (List<Point> group : List.of(stars, planets, references)) {
            for (Point pt : group) {
                for (double v : fe ? new double[] {pt.feSi(), pt.feSiLow(), pt.feSiHigh()}
                        : new double[] {pt.mgSi(), pt.mgSiLow(), pt.mgSiHigh()}) {
                    if (Double.isFinite(v)) {
                        lo = Math.min(lo, v);
                        hi = Math.max(hi, v);
                    }
                }
            }
        }
        double span = Math.max(hi - lo, 0.05);
        return new double[] {Math.max(0, lo - 0.08 * span), hi + 0.08 * span};
    }
}
