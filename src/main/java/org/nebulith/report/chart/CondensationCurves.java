package org.nebulith.report.chart;

import java.util.List;

import org.knowm.xchart.XYChart;

/**
 * Condensation curves: the fraction of each element condensed against temperature, the temperature
 * axis decreasing to the right (a gas cools from left to right). Each element is one line with its
 * colour, line pattern and marker (every {@value #MARKER_SPACING_PT} pt along its rise), its 50 %
 * condensation temperature marked by a ring on the curve, and, where there is room, its symbol
 * written beside the curve; the legend sits outside the plot, the
 * notes in the emptiest corner of the plot.
 *
 * @param temperatureK the temperature grid [K], any order
 * @param elements     one curve per element: fraction condensed in [0, 1] (1e-9 slack)
 * @param t50K         50 % condensation temperature per element [K], NaN where not reached
 * @param notes        lines written in a corner (pressure, mode), may be empty
 */
public record CondensationCurves(double[] temperatureK, List<Curve> elements, double[] t50K, List<String> notes) {

    private static final double SLACK = 1e-9;
    /** Distance between markers along a curve [pt]. */
    static final double MARKER_SPACING_PT = 30;
    private static final double[] LABEL_HEIGHTS = {0.5, 0.62, 0.38, 0.74, 0.26, 0.86, 0.14, 0.93, 0.07};

    public CondensationCurves {
        temperatureK = temperatureK.clone();
        elements = List.copyOf(elements);
        t50K = t50K.clone();
        notes = List.copyOf(notes);
        Curve.checkGrid(temperatureK, "condensation curves");
        if (t50K.length != elements.size()) {
            throw new IllegalArgumentException("condensation curves: " + t50K.length + " T50 values for "
                    + elements.size() + " elements");
        }
        for (Curve c : elements) {
            c.check(temperatureK.length, "condensation curves", false, -SLACK, 1 + SLACK);
        }
    }

    /**
     * @param size figure size
     * @return the chart
     */
    public Figure chart(final ChartSize size) {
        Figure f = new Figure(size.widthPt(), size.heightPt());
        XYChart c = ChartStyle.chart(f, size.widthPt(), size.heightPt(), ChartStyle.TEMPERATURE_TITLE,
                "Fraction of the element condensed");
        ChartStyle.temperatureAxis(f, c, temperatureK);
        // a little beyond 0 and 1, so that the ends are labelled and the floors and ceilings stay visible
        c.getStyler().setYAxisMin(-0.02);
        c.getStyler().setYAxisMax(1.02);
        double[] x = negated(temperatureK);
        for (int i = 0; i < elements.size(); i++) {
            ChartStyle.Series s = ChartStyle.series(i);
            ChartStyle.line(c, elements.get(i).label() + " (line)", x, elements.get(i).values(), s.line(), false);
            ChartStyle.legendEntry(c, elements.get(i).label(), s.line(), s.marker());
        }
        double[] tx = new double[elements.size()];
        double[] ty = new double[elements.size()];
        int n = 0;
        for (int i = 0; i < elements.size(); i++) {
            if (Double.isFinite(t50K[i]) && -t50K[i] >= c.getStyler().getXAxisMin()
                    && -t50K[i] <= c.getStyler().getXAxisMax()) {
                tx[n] = -t50K[i];
                ty[n++] = 0.5;
            }
        }
        if (n > 0) {
            ChartStyle.points(c, "T50", java.util.Arrays.copyOf(tx, n), java.util.Arrays.copyOf(ty, n),
                    Marker.OPEN_CIRCLE, Palette.AXIS, 1.3, true);
        }
        f.fill(c);
        DirectLabels labels = new DirectLabels(f, c);
        double[][][] device = new double[elements.size()][][];
        for (int i = 0; i < elements.size(); i++) {
            device[i] = labels.device(x, elements.get(i).values());
            labels.free().line(device[i]);
        }
        for (int k = 0; k < n; k++) {
            labels.free().take(DirectLabels.bounds("o", labels.x(tx[k]), labels.y(0.5)));
        }
        for (int i = 0; i < elements.size(); i++) {
            ChartStyle.Series s = ChartStyle.series(i);
            labels.markersAlong(elements.get(i).label() + " (markers)", device[i], s.marker(), s.colour(),
                    MARKER_SPACING_PT, 6 + 4.3 * i);
        }
        for (int i = 0; i < elements.size(); i++) {
            label(labels, device[i], i);
        }
        labels.note(notes);
        return f;
    }

    private void label(final DirectLabels labels, final double[][] dev, final int i) {
        String text = elements.get(i).label();
        double w = Fonts.width(text, ChartStyle.NOTE_PT) + 1;
        for (double h : LABEL_HEIGHTS) {
            double yd = labels.y(h);
            double xd = crossing(dev, yd);
            if (Double.isFinite(xd) && labels.putFirstFree(text, i, xd - 2 - w / 2, yd, xd + 2 + w / 2, yd)) {
                return;
            }
        }
    }

    private static double[] negated(final double[] v) {
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = -v[i];
        }
        return out;
    }

    /** @return device x where the curve first reaches device height yd, scanning from the hot side */
    private static double crossing(final double[][] dev, final double yd) {
        double[] x = dev[0];
        double[] y = dev[1];
        for (int k = 1; k < x.length; k++) {
            if (Double.isFinite(y[k]) && Double.isFinite(y[k - 1]) && (y[k - 1] - yd) * (y[k] - yd) <= 0
                    && y[k] != y[k - 1]) {
                return x[k - 1] + (yd - y[k - 1]) / (y[k] - y[k - 1]) * (x[k] - x[k - 1]);
            }
        }
        return Double.NaN;
    }
}
