package org.nebulith.report.chart;

import java.awt.Color;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Objects;

import org.knowm.xchart.XYChart;

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
    public Figure chart(final ChartSize size) {
        Figure f = new Figure(size.widthPt(), size.heightPt());
        XYChart c = ChartStyle.chart(f, size.widthPt(), size.heightPt(), "50% condensation temperature T50 [K]",
                yTitle);
        double[] yr = ratioRange();
        double[] xr = tRange();
        c.getStyler().setXAxisMin(xr[0]);
        c.getStyler().setXAxisMax(xr[1]);
        ChartStyle.logAxis(f, c, false, yr[0], yr[1]);
        ChartStyle.line(c, "no depletion", new double[] {xr[0], xr[1]}, new double[] {1, 1},
                new LineStyle(Palette.REFERENCE, 0.6, new float[] {1f, 1.5f}), false);
        for (int i = 0; i < bodies.size(); i++) {
            double[] r = bodies.get(i).ratios();
            double[] x = new double[r.length];
            double[] y = new double[r.length];
            int n = 0;
            for (int k = 0; k < r.length; k++) {
                if (Double.isFinite(r[k]) && r[k] > 0 && Double.isFinite(t50K[k])) {
                    x[n] = t50K[k];
                    y[n++] = clamp(r[k], yr);
                }
            }
            if (n > 0) {
                ChartStyle.points(c, bodies.get(i).label(), Arrays.copyOf(x, n), Arrays.copyOf(y, n), marker(i),
                        colour(i), 1.15, true);
            }
        }
        f.fill(c);
        DirectLabels labels = new DirectLabels(f, c);
        for (int i = 0; i < bodies.size(); i++) {
            double[] r = bodies.get(i).ratios();
            for (int k = 0; k < r.length; k++) {
                if (Double.isFinite(r[k]) && r[k] > 0 && Double.isFinite(t50K[k])) {
                    double px = labels.x(t50K[k]);
                    double py = labels.y(clamp(r[k], yr));
                    labels.free().take(new java.awt.geom.Rectangle2D.Double(px - 2.5, py - 2.5, 5, 5));
                }
            }
        }
        symbols(c, labels);
        java.awt.geom.Rectangle2D box = labels.box();
        labels.free().take(new java.awt.geom.Rectangle2D.Double(box.getMinX(), box.getMinY(), box.getWidth(),
                ChartStyle.NOTE_PT + 8));
        labels.note(notes);
        return f;
    }

    /** Element symbols in a row along the top of the plot, above their T50, spread so that none overlaps. */
    private void symbols(final XYChart c, final DirectLabels labels) {
        List<Integer> order = new ArrayList<>();
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
            wanted[i] = labels.x(t50K[order.get(i)]);
            if (i > 0) {
                gaps[i - 1] = (Fonts.width(elements.get(order.get(i - 1)), ChartStyle.NOTE_PT)
                        + Fonts.width(elements.get(order.get(i)), ChartStyle.NOTE_PT)) / 2 + 2;
            }
        }
        java.awt.geom.Rectangle2D a = labels.box();
        double[] at = Spread.apart(wanted, gaps, a.getMinX() + 4, a.getMaxX() - 4);
        double cy = a.getMinY() + ChartStyle.NOTE_PT / 2 + 2;
        double[] x = new double[3 * n];
        double[] y = new double[3 * n];
        for (int i = 0; i < n; i++) {
            labels.put(elements.get(order.get(i)), at[i], cy);
            x[3 * i] = labels.dataX(at[i]);
            y[3 * i] = labels.dataY(cy + ChartStyle.NOTE_PT / 2 + 0.5);
            x[3 * i + 1] = t50K[order.get(i)];
            y[3 * i + 1] = labels.dataY(cy + ChartStyle.NOTE_PT / 2 + 4);
            x[3 * i + 2] = x[3 * i + 1];
            y[3 * i + 2] = Double.NaN;
        }
        ChartStyle.line(c, "symbol leaders", x, y, LineStyle.solid(Palette.REFERENCE, 0.3), false);
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
