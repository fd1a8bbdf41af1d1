package org.nebulith.report.chart;

import java.awt.Color;
import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.Objects;

/**
 * The devolatilisation pattern: each element's abundance in a body relative to its star, normalised
 * to a refractory element, against the element's 50 % condensation temperature (the figure of,
 * e.g., Wang, Lineweaver and Ireland 2019, Icarus 328, 287, drawn our way): logarithmic ratio axis,
 * T50 increasing to the right, one marker series per body, the element symbols in a row along the top
 * above their T50, a dotted line at 1 (no depletion).
 *
 * @param elements  element symbols
 * @param t50K      their 50 % condensation temperatures [K] (NaN = not shown)
 * @param bodies    the bodies (ratios per element; NaN = none)
 * @param yTitle    ratio axis title, naming the normalising element
 * @param notes     lines written in a corner
 */
public record DevolatilisationPattern(List<String> elements, double[] t50K, List<Body> bodies, String yTitle,
                                      List<String> notes) {

    /**
     * @param label  legend text
     * @param ratios (X/ref)_body / (X/ref)_star per element
     */
    public record Body(String label, double[] ratios) {
        public Body {
            Objects.requireNonNull(label);
            ratios = ratios.clone();
        }
    }

    public DevolatilisationPattern {
        elements = List.copyOf(elements);
        t50K = t50K.clone();
        bodies = List.copyOf(bodies);
        notes = List.copyOf(notes);
        for (Body b : bodies) {
            if (b.ratios().length != elements.size()) {
                throw new IllegalArgumentException("devolatilisation: " + b.label() + " has " + b.ratios().length
                        + " ratios for " + elements.size() + " elements");
            }
        }
        if (t50K.length != elements.size()) {
            throw new IllegalArgumentException("devolatilisation: " + t50K.length + " T50 values for "
                    + elements.size() + " elements");
        }
    }

    /**
     * @param size figure size
     * @return the chart
     */
    public Drawing chart(final ChartSize size) {
        Drawing d = Drawing.of(size);
        Legend legend = new Legend();
        for (int i = 0; i < bodies.size(); i++) {
            legend.add(new Legend.Entry(bodies.get(i).label(), null, marker(i), colour(i)));
        }
        double[] yr = ratioRange();
        double[] xr = tRange();
        Axis x = Axis.linear(xr[0], xr[1], "50% condensation temperature T50 [K]").ticks(6);
        Axis y = Axis.log(yr[0], yr[1], yTitle);
        double left = ChartStyle.PAD + Panel.yAxisWidth(y);
        double right = size.widthPt() - ChartStyle.PAD - legend.columnWidth() - 6;
        Rectangle2D box = new Rectangle2D.Double(left, ChartStyle.PAD + 2, right - left,
                size.heightPt() - 2 * ChartStyle.PAD - 2 - Panel.xAxisHeight());
        Panel p = new Panel(d, box, x, y).frame(true, true);
        p.hline(1, new LineStyle(Palette.REFERENCE, 0.6, new float[] {1f, 1.5f}));
        Placement free = new Placement(box);
        for (int i = bodies.size() - 1; i >= 0; i--) {
            double[] r = bodies.get(i).ratios();
            for (int k = 0; k < r.length; k++) {
                if (Double.isFinite(r[k]) && r[k] > 0 && Double.isFinite(t50K[k])) {
                    p.markerAt(marker(i), p.px(t50K[k]), p.py(clamp(r[k], yr)), colour(i), ChartStyle.MARKER_PT + 0.6);
                    free.take(new Rectangle2D.Double(p.px(t50K[k]) - 2.5, p.py(clamp(r[k], yr)) - 2.5, 5, 5));
                }
            }
        }
        labels(d, p);
        free.take(new Rectangle2D.Double(box.getMinX(), box.getMinY(), box.getWidth(), ChartStyle.NOTE_PT + 8));
        if (!notes.isEmpty()) {
            p.cornerNote(notes, free);
        }
        legend.draw(d, right + 6, box.getMinY() + 2, 1, 0);
        return d;
    }

    /** Element symbols in a row along the top of the plot, above their T50, spread so that none overlaps. */
    private void labels(final Drawing d, final Panel p) {
        java.util.List<Integer> order = new java.util.ArrayList<>();
        for (int k = 0; k < t50K.length; k++) {
            if (Double.isFinite(t50K[k])) {
                order.add(k);
            }
        }
        order.sort(java.util.Comparator.comparingDouble(k -> t50K[k]));
        int n = order.size();
        if (n == 0) {
            return;
        }
        double[] wanted = new double[n];
        double[] gaps = new double[Math.max(0, n - 1)];
        for (int i = 0; i < n; i++) {
            wanted[i] = p.px(t50K[order.get(i)]);
            if (i > 0) {
                gaps[i - 1] = (Fonts.width(elements.get(order.get(i - 1)), ChartStyle.NOTE_PT)
                        + Fonts.width(elements.get(order.get(i)), ChartStyle.NOTE_PT)) / 2 + 2;
            }
        }
        Rectangle2D a = p.area();
        double[] at = Spread.apart(wanted, gaps, a.getMinX() + 4, a.getMaxX() - 4);
        double baseline = a.getMinY() + ChartStyle.NOTE_PT + 2;
        for (int i = 0; i < n; i++) {
            d.text(elements.get(order.get(i)), at[i], baseline, ChartStyle.NOTE_PT, Drawing.Align.CENTRE, Palette.AXIS);
            d.stroke(new java.awt.geom.Line2D.Double(at[i], baseline + 1.5, wanted[i], baseline + 5),
                    LineStyle.solid(Palette.REFERENCE, 0.3));
        }
    }

    private static Marker marker(final int i) {
        return i == 0 ? Marker.CIRCLE : Palette.marker(i + 1);
    }

    private static Color colour(final int i) {
        return Palette.seriesColour(i);
    }

    private static double clamp(final double v, final double[] range) {
        return Math.max(range[0], Math.min(range[1], v));
    }

    private double[] ratioRange() {
        double lo = 0.5;
        double hi = 2;
        for (Body b : bodies) {
            for (double v : b.ratios()) {
                if (Double.isFinite(v) && v > 0) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
        }
        // one decade of headroom above for the element symbols
        return new double[] {Math.max(1e-4, Math.pow(10, Math.floor(Math.log10(lo)))),
                Math.pow(10, Math.ceil(Math.log10(hi * 1.01)) + 1)};
    }

    private double[] tRange() {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double t : t50K) {
            if (Double.isFinite(t)) {
                lo = Math.min(lo, t);
                hi = Math.max(hi, t);
            }
        }
        if (!Double.isFinite(lo)) {
            return new double[] {0, 2000};
        }
        return new double[] {Math.floor((lo - 50) / 100) * 100, Math.ceil((hi + 50) / 100) * 100};
    }
}
