package org.nebulith.report.chart;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.style.XYStyler;

/**
 * Planet comparison as small multiples: one panel per quantity (molar ratios, core mass fraction),
 * side by side, each on its own linear axis, their plot areas of one width; one row per body
 * (predicted planets first, then the host star and the reference bodies), the row names written
 * once at the left. Planets are filled circles with their error bars (16th to 84th percentile when
 * given); reference bodies have a marker of their own; the host star's value is also drawn as a
 * dotted line through the panel. A body without a value for a quantity shows "n/a" in that panel
 * (nothing is dropped silently).
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
    private static final double GAP = 6;
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
    public Figure chart(final double widthPt) {
        double height = bodies.size() * ROW + 34;
        Figure f = new Figure(widthPt, height);
        List<XYChart> panels = new ArrayList<>();
        for (int q = 0; q < quantities.size(); q++) {
            panels.add(panel(f, widthPt / quantities.size(), height, q));
        }
        f.row(panels, height, GAP, 14);
        for (int q = 0; q < quantities.size(); q++) {
            XYChart c = panels.get(q);
            f.layOut(c);
            DirectLabels labels = new DirectLabels(f, c);
            if (q == 0) {
                for (int i = 0; i < bodies.size(); i++) {
                    String name = bodies.get(i).label();
                    labels.put(name, 2 + Fonts.width(name, ChartStyle.NOTE_PT) / 2, labels.y(row(i)));
                }
            }
            for (int i = 0; i < bodies.size(); i++) {
                if (!Double.isFinite(bodies.get(i).values()[q])) {
                    labels.put("n/a", labels.box().getCenterX(), labels.y(row(i)));
                }
            }
        }
        return f;
    }

    /** @return the y of body i (the first at the top) */
    private double row(final int i) {
        return bodies.size() - i;
    }

    private XYChart panel(final Figure f, final double width, final double height, final int q) {
        XYChart c = ChartStyle.chart(f, width, height, quantities.get(q), "");
        XYStyler s = c.getStyler();
        double[] range = range(q);
        s.setXAxisMin(range[0]);
        s.setXAxisMax(range[1]);
        s.setYAxisMin(0.4);
        s.setYAxisMax(bodies.size() + 0.6);
        s.setYAxisTickMarkSpacingHint((int) (ROW - 3));
        s.setPlotGridHorizontalLinesVisible(false);
        s.setLegendVisible(false);
        s.setXAxisTickMarkSpacingHint(32);
        s.setChartPadding(2);
        s.setYAxisTitleVisible(false);
        s.setYAxisTickLabelsFormattingFunction(v -> "");
        if (q == 0) {
            double names = 0;
            for (Body b : bodies) {
                names = Math.max(names, Fonts.width(b.label(), ChartStyle.NOTE_PT));
            }
            s.setYAxisLeftWidthHint((int) Math.ceil(names + 2));
        }
        for (Body b : bodies) {
            double v = b.values()[q];
            if (b.kind() == Kind.HOST && Double.isFinite(v)) {
                ChartStyle.line(c, "host " + q, new double[] {v, v}, new double[] {0.4, bodies.size() + 0.6},
                        new LineStyle(Palette.REFERENCE, 0.6, new float[] {1f, 1.5f}), false);
            }
        }
        errorBars(c, q);
        int reference = 0;
        for (int i = 0; i < bodies.size(); i++) {
            Body b = bodies.get(i);
            double v = b.values()[q];
            Marker m = b.kind() == Kind.PLANET ? Marker.CIRCLE : b.kind() == Kind.HOST ? Marker.STAR
                    : REFERENCE_MARKERS[reference++ % REFERENCE_MARKERS.length];
            if (Double.isFinite(v)) {
                ChartStyle.points(c, "body " + i, new double[] {v}, new double[] {row(i)}, m, colour(b), 1.15, false);
            }
        }
        return c;
    }

    private static Color colour(final Body b) {
        return b.kind() == Kind.PLANET ? Palette.seriesColour(0) : b.kind() == Kind.HOST ? Palette.seriesColour(1)
                : Palette.AXIS;
    }

    private void errorBars(final XYChart c, final int q) {
        List<double[]> bars = new ArrayList<>();
        for (int i = 0; i < bodies.size(); i++) {
            Body b = bodies.get(i);
            if (Double.isFinite(b.lowAt(q)) && Double.isFinite(b.highAt(q))) {
                bars.add(new double[] {b.lowAt(q), b.highAt(q), row(i)});
            }
        }
        if (bars.isEmpty()) {
            return;
        }
        double[] x = new double[3 * bars.size()];
        double[] y = new double[3 * bars.size()];
        for (int k = 0; k < bars.size(); k++) {
            x[3 * k] = bars.get(k)[0];
            x[3 * k + 1] = bars.get(k)[1];
            x[3 * k + 2] = bars.get(k)[1];
            y[3 * k] = bars.get(k)[2];
            y[3 * k + 1] = bars.get(k)[2];
            y[3 * k + 2] = Double.NaN;
        }
        ChartStyle.line(c, "bars " + q, x, y, LineStyle.solid(Palette.seriesColour(0), 0.8), false);
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
