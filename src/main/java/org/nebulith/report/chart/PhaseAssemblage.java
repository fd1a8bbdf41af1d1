package org.nebulith.report.chart;

import java.awt.geom.Rectangle2D;
import java.util.List;

/**
 * Phase assemblage: the share of each condensed phase in the condensate against temperature
 * (decreasing to the right), on a logarithmic axis from {@link #AXIS_FLOOR} up, so that the first
 * condensates and the minor phases stay visible beside the major ones. Each phase has its colour,
 * line pattern and marker; where there is room its name is written at its peak; the legend sits
 * outside the plot.
 *
 * @param temperatureK the temperature grid [K]
 * @param phases       one curve per phase, shares &ge; 0 (NaN = absent)
 * @param axisTitle    title of the share axis with its unit, e.g. {@code Share of the condensate [wt%]}
 * @param notes        lines written in a corner, may be empty
 */
public record PhaseAssemblage(double[] temperatureK, List<Curve> phases, String axisTitle, List<String> notes) {

    /** Lowest value of the share axis (same unit as the curves). */
    public static final double AXIS_FLOOR = 0.1;

    public PhaseAssemblage {
        temperatureK = temperatureK.clone();
        phases = List.copyOf(phases);
        notes = List.copyOf(notes);
        Curve.checkGrid(temperatureK, "phase assemblage");
        for (Curve c : phases) {
            c.check(temperatureK.length, "phase assemblage", true, 0.0, Double.MAX_VALUE);
        }
    }

    /**
     * @param size figure size
     * @return the chart
     */
    public Drawing chart(final ChartSize size) {
        Drawing d = Drawing.of(size);
        Legend legend = new Legend();
        for (int i = 0; i < phases.size(); i++) {
            legend.add(Legend.Entry.of(phases.get(i).label(), ChartStyle.series(i)));
        }
        Axis x = TemperatureAxis.of(temperatureK);
        Axis y = Axis.log(AXIS_FLOOR, Math.max(100, largest() * 1.05), axisTitle);
        double left = ChartStyle.PAD + Panel.yAxisWidth(y);
        double right = size.widthPt() - ChartStyle.PAD - legend.columnWidth() - 6;
        Rectangle2D box = new Rectangle2D.Double(left, ChartStyle.PAD + 2, right - left,
                size.heightPt() - 2 * ChartStyle.PAD - 2 - Panel.xAxisHeight());
        Panel p = new Panel(d, box, x, y).frame(true, true);
        Placement free = new Placement(box);
        double[][][] device = new double[phases.size()][][];
        for (int i = 0; i < phases.size(); i++) {
            ChartStyle.Series s = ChartStyle.series(i);
            double[] v = phases.get(i).values();
            for (int k = 0; k < v.length; k++) {
                v[k] = v[k] >= AXIS_FLOOR * 0.5 ? v[k] : Double.NaN;
            }
            device[i] = p.line(temperatureK, v, s.line());
            free.line(device[i]);
            p.markersAlong(device[i], s.marker(), s.colour(), 34, 5 + 3.7 * i);
        }
        for (int i = 0; i < phases.size(); i++) {
            labelAtPeak(d, free, device[i], i);
        }
        if (!notes.isEmpty()) {
            p.cornerNote(notes, free);
        }
        legend.draw(d, right + 6, box.getMinY() + 2, 1, 0);
        return d;
    }

    private void labelAtPeak(final Drawing d, final Placement free, final double[][] dev, final int i) {
        int peak = -1;
        for (int k = 0; k < dev[1].length; k++) {
            if (Double.isFinite(dev[1][k]) && (peak < 0 || dev[1][k] < dev[1][peak])) {
                peak = k;
            }
        }
        if (peak < 0) {
            return;
        }
        String text = phases.get(i).label();
        double w = Fonts.width(text, ChartStyle.NOTE_PT) + 1;
        double h = Fonts.capHeight(ChartStyle.NOTE_PT) + 1;
        for (double dy : new double[] {-3 - h, 3}) {
            Rectangle2D box = new Rectangle2D.Double(dev[0][peak] - w / 2, dev[1][peak] + dy, w, h);
            if (free.free(box, -1)) {
                free.take(box);
                d.text(text, dev[0][peak], box.getMaxY() - 0.5, ChartStyle.NOTE_PT, Drawing.Align.CENTRE,
                        ChartStyle.series(i).colour().darker());
                return;
            }
        }
    }

    private double largest() {
        double max = 0;
        for (Curve c : phases) {
            for (double v : c.values()) {
                if (v > max) {
                    max = v;
                }
            }
        }
        return max;
    }
}
