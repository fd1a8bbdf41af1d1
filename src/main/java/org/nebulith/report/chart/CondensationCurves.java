package org.nebulith.report.chart;

import java.awt.geom.Rectangle2D;
import java.util.List;

/**
 * Condensation curves: the fraction of each element condensed against temperature, the temperature
 * axis decreasing to the right (a gas cools from left to right). Each element has its colour, line
 * pattern and marker (markers every {@value #MARKER_SPACING_PT} pt along the rise), its 50 %
 * condensation temperature marked by a ring on the curve, and, where there is room, its symbol
 * written beside the curve; the legend sits outside the plot, the notes in the emptiest corner.
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
    public Drawing chart(final ChartSize size) {
        Drawing d = Drawing.of(size);
        Legend legend = new Legend();
        for (int i = 0; i < elements.size(); i++) {
            legend.add(Legend.Entry.of(elements.get(i).label(), ChartStyle.series(i)));
        }
        legend.add(new Legend.Entry("T50", null, Marker.OPEN_CIRCLE, Palette.AXIS));
        Axis x = TemperatureAxis.of(temperatureK);
        Axis y = Axis.linear(0, 1, "Fraction of the element condensed").ticks(5);
        double left = ChartStyle.PAD + Panel.yAxisWidth(y);
        double right = size.widthPt() - ChartStyle.PAD - legend.columnWidth() - 6;
        Rectangle2D box = new Rectangle2D.Double(left, ChartStyle.PAD + 2, right - left,
                size.heightPt() - 2 * ChartStyle.PAD - 2 - Panel.xAxisHeight());
        Panel p = new Panel(d, box, x, y).frame(true, true);
        Placement free = new Placement(box);
        double[][][] device = new double[elements.size()][][];
        for (int i = 0; i < elements.size(); i++) {
            ChartStyle.Series s = ChartStyle.series(i);
            device[i] = p.line(TemperatureAxis.values(temperatureK), elements.get(i).values(), s.line());
            free.line(device[i]);
            p.markersAlong(rise(device[i], p), s.marker(), s.colour(), MARKER_SPACING_PT, 6 + 4.3 * i);
        }
        for (int i = 0; i < elements.size(); i++) {
            if (Double.isFinite(t50K[i]) && x.contains(t50K[i])) {
                p.markerAt(Marker.OPEN_CIRCLE, p.px(t50K[i]), p.py(0.5), ChartStyle.series(i).colour(), 5);
                free.take(ring(p.px(t50K[i]), p.py(0.5)));
            }
        }
        for (int i = 0; i < elements.size(); i++) {
            label(d, p, free, device[i], i);
        }
        if (!notes.isEmpty()) {
            p.cornerNote(notes, free);
        }
        legend.draw(d, right + 6, box.getMinY() + 2, 1, 0);
        return d;
    }

    private static Rectangle2D ring(final double x, final double y) {
        return new Rectangle2D.Double(x - 2.5, y - 2.5, 5, 5);
    }

    /** The part of a drawn curve strictly inside the box (markers are not put on the 0 and 1 floors). */
    private static double[][] rise(final double[][] dev, final Panel p) {
        double top = p.area().getMinY() + 1.5;
        double bottom = p.area().getMaxY() - 1.5;
        double[] x = dev[0].clone();
        double[] y = dev[1].clone();
        for (int i = 0; i < x.length; i++) {
            if (!(y[i] > top && y[i] < bottom)) {
                x[i] = Double.NaN;
                y[i] = Double.NaN;
            }
        }
        return new double[][] {x, y};
    }

    private void label(final Drawing d, final Panel p, final Placement free, final double[][] dev, final int i) {
        String text = elements.get(i).label();
        double w = Fonts.width(text, ChartStyle.NOTE_PT) + 1;
        double h = Fonts.capHeight(ChartStyle.NOTE_PT) + 1;
        for (double f : LABEL_HEIGHTS) {
            double yd = p.py(f);
            double xd = crossing(dev, yd);
            if (!Double.isFinite(xd)) {
                continue;
            }
            for (int side : new int[] {-1, 1}) {
                double x0 = side < 0 ? xd - 2 - w : xd + 2;
                Rectangle2D box = new Rectangle2D.Double(x0, yd - h / 2, w, h);
                if (free.free(box, -1)) {
                    free.take(box);
                    d.text(text, x0 + 0.5, yd + Fonts.capHeight(ChartStyle.NOTE_PT) / 2, ChartStyle.NOTE_PT,
                            Drawing.Align.LEFT, ChartStyle.series(i).colour().darker());
                    return;
                }
            }
        }
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
