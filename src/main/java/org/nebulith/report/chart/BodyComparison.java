package org.nebulith.report.chart;

import java.awt.Color;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.Objects;

/**
 * Planet comparison as small multiples: one panel per quantity (molar ratios, core mass fraction),
 * side by side, each on its own linear axis; one row per body (predicted planets first, then the
 * host star and the reference bodies), the row names written once at the left. Planets are filled
 * circles with their error bars (16th to 84th percentile when given); reference bodies have a
 * marker of their own; the host star's value is also drawn as a dotted line through the panel. A
 * body without a value for a quantity shows "n/a" in that panel (nothing is dropped silently).
 *
 * @param quantities axis titles with units, e.g. {@code Mg/Si [mol/mol]}
 * @param bodies     the rows, top to bottom
 */
public record BodyComparison(List<String> quantities, List<Body> bodies) {

    /** What a row is. */
    public enum Kind {
        /** A predicted planet (error bars allowed). */
        PLANET,
        /** The host star (also drawn as a dotted line). */
        HOST,
        /** A reference body (the Sun, bulk Earth, ...). */
        REFERENCE
    }

    /**
     * One row.
     *
     * @param label  row name
     * @param kind   what it is
     * @param values one value per quantity; NaN where the body has none
     * @param low    lower ends of error bars (NaN = none), or null
     * @param high   upper ends, or null
     */
    public record Body(String label, Kind kind, double[] values, double[] low, double[] high) {
        public Body {
            Objects.requireNonNull(label);
            Objects.requireNonNull(kind);
            values = values.clone();
            low = low == null ? null : low.clone();
            high = high == null ? null : high.clone();
            if ((low == null) != (high == null)) {
                throw new IllegalArgumentException(label + ": give both ends of the error bars or neither");
            }
        }

        /** @param label name @param kind kind @param values values @return a row without error bars */
        public static Body of(final String label, final Kind kind, final double... values) {
            return new Body(label, kind, values, null, null);
        }

        double lowAt(final int q) {
            return low == null ? Double.NaN : low[q];
        }

        double highAt(final int q) {
            return high == null ? Double.NaN : high[q];
        }
    }

    private static final double ROW = 12;
    private static final double GAP = 9;
    private static final Marker[] REFERENCE_MARKERS = {
        Marker.DIAMOND, Marker.OPEN_SQUARE, Marker.TRIANGLE_UP, Marker.OPEN_DIAMOND, Marker.SQUARE, Marker.CROSS,
        Marker.TRIANGLE_DOWN, Marker.PLUS,
    };

    public BodyComparison {
        quantities = List.copyOf(quantities);
        bodies = List.copyOf(bodies);
        if (quantities.isEmpty() || bodies.isEmpty()) {
            throw new IllegalArgumentException("comparison: need at least one quantity and one body");
        }
        for (Body b : bodies) {
            for (double[] v : new double[][] {b.values(), b.low(), b.high()}) {
                if (v != null) {
                    new Curve(b.label(), v).check(quantities.size(), "comparison", true, -Double.MAX_VALUE,
                            Double.MAX_VALUE);
                }
            }
        }
    }

    /**
     * @param widthPt figure width [pt] (the height follows from the number of rows)
     * @return the chart
     */
    public Drawing chart(final double widthPt) {
        double labelW = 0;
        for (Body b : bodies) {
            labelW = Math.max(labelW, Fonts.width(b.label(), ChartStyle.TICK_PT));
        }
        double top = ChartStyle.PAD + 2;
        double plotH = bodies.size() * ROW;
        Drawing d = new Drawing(widthPt, top + plotH + Panel.xAxisHeight() + ChartStyle.PAD + 2);
        double left = ChartStyle.PAD + labelW + 6;
        double panelW = (widthPt - ChartStyle.PAD - left - GAP * (quantities.size() - 1)) / quantities.size();
        for (int i = 0; i < bodies.size(); i++) {
            Body b = bodies.get(i);
            d.text(b.label(), left - 4, top + (i + 0.5) * ROW + Fonts.capHeight(ChartStyle.TICK_PT) / 2,
                    ChartStyle.TICK_PT, Drawing.Align.RIGHT, Palette.AXIS);
        }
        for (int q = 0; q < quantities.size(); q++) {
            Rectangle2D box = new Rectangle2D.Double(left + q * (panelW + GAP), top, panelW, plotH);
            panel(d, box, q);
        }
        return d;
    }

    private void panel(final Drawing d, final Rectangle2D box, final int q) {
        double[] range = range(q);
        Axis x = Axis.linear(range[0], range[1], quantities.get(q)).ticks(5);
        Axis y = Axis.linear(0, bodies.size(), "");
        Panel p = new Panel(d, box, x, y);
        for (int i = 0; i < bodies.size(); i++) {
            if (i % 2 == 1) {
                d.fill(new Rectangle2D.Double(box.getMinX(), box.getMinY() + i * ROW, box.getWidth(), ROW),
                        new Color(0xF3, 0xF3, 0xF3));
            }
        }
        frameWithoutYTicks(p, d, box);
        for (Body b : bodies) {
            if (b.kind() == Kind.HOST && Double.isFinite(b.values()[q])) {
                p.vline(b.values()[q], new LineStyle(Palette.REFERENCE, 0.6, new float[] {1f, 1.5f}));
            }
        }
        int reference = 0;
        for (int i = 0; i < bodies.size(); i++) {
            Body b = bodies.get(i);
            double row = bodies.size() - i - 0.5;
            double v = b.values()[q];
            Marker m = b.kind() == Kind.PLANET ? Marker.CIRCLE : b.kind() == Kind.HOST ? Marker.STAR
                    : REFERENCE_MARKERS[reference++ % REFERENCE_MARKERS.length];
            Color c = b.kind() == Kind.PLANET ? Palette.seriesColour(0) : b.kind() == Kind.HOST
                    ? Palette.seriesColour(1) : Palette.AXIS;
            if (!Double.isFinite(v)) {
                d.text("n/a", box.getCenterX(), p.py(row) + Fonts.capHeight(ChartStyle.NOTE_PT) / 2, ChartStyle.NOTE_PT,
                        Drawing.Align.CENTRE, Palette.REFERENCE);
                continue;
            }
            p.xErrorBar(b.lowAt(q), b.highAt(q), row, c);
            p.markerAt(m, p.px(v), p.py(row), c, ChartStyle.MARKER_PT + 0.6);
        }
    }

    private static void frameWithoutYTicks(final Panel p, final Drawing d, final Rectangle2D box) {
        LineStyle grid = new LineStyle(Palette.GRID, 0.4, new float[] {1f, 1f});
        for (double t : p.x().ticks()) {
            d.stroke(new Line2D.Double(p.px(t), box.getMinY(), p.px(t), box.getMaxY()), grid);
        }
        new Panel(d, box, p.x(), Axis.linear(0, 1, "").labels(v -> "")).frameXOnly();
    }

    private double[] range(final int q) {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (Body b : bodies) {
            for (double v : new double[] {b.values()[q], b.lowAt(q), b.highAt(q)}) {
                if (Double.isFinite(v)) {
                    min = Math.min(min, v);
                    max = Math.max(max, v);
                }
            }
        }
        if (!Double.isFinite(min)) {
            return new double[] {0, 1};
        }
        double span = Math.max(max - min, 0.05 * Math.max(Math.abs(max), 1e-3));
        double lo = min - 0.12 * span;
        double hi = max + 0.12 * span;
        if (min >= 0 && lo < 0) {
            lo = 0;
        }
        return new double[] {lo, hi};
    }
}
