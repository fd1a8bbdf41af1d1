package org.nebulith.report.chart;

import java.util.List;

import org.knowm.xchart.XYChart;

/**
 * Phase assemblage: the share of each condensed phase in the condensate against temperature
 * (decreasing to the right), on a logarithmic axis from {@link #AXIS_FLOOR} up, so that the first
 * condensates and the minor phases stay visible beside the major ones. Each phase is one line with
 * its colour, line pattern and markers along it; where there is room its name is written at its peak; the legend
 * sits outside the plot.
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
    public Figure chart(final ChartSize size) {
        Figure f = new Figure(size.widthPt(), size.heightPt());
        XYChart c = ChartStyle.chart(f, size.widthPt(), size.heightPt(), ChartStyle.TEMPERATURE_TITLE, axisTitle);
        ChartStyle.temperatureAxis(f, c, temperatureK);
        ChartStyle.logAxis(f, c, false, AXIS_FLOOR, Math.max(100, largest() * 1.05));
        double[] x = new double[temperatureK.length];
        for (int k = 0; k < x.length; k++) {
            x[k] = -temperatureK[k];
        }
        double[][] shown = new double[phases.size()][];
        for (int i = 0; i < phases.size(); i++) {
            double[] v = phases.get(i).values();
            for (int k = 0; k < v.length; k++) {
                v[k] = v[k] >= AXIS_FLOOR * 0.5 ? v[k] : Double.NaN;
            }
            shown[i] = v;
            ChartStyle.Series s = ChartStyle.series(i);
            if (ChartStyle.line(c, phases.get(i).label() + " (line)", x, v, s.line(), false) != null) {
                ChartStyle.legendEntry(c, phases.get(i).label(), s.line(), s.marker());
            }
        }
        f.fill(c);
        DirectLabels labels = new DirectLabels(f, c);
        double[][][] device = new double[phases.size()][][];
        for (int i = 0; i < phases.size(); i++) {
            device[i] = labels.device(x, shown[i]);
            labels.free().line(device[i]);
        }
        for (int i = 0; i < phases.size(); i++) {
            ChartStyle.Series s = ChartStyle.series(i);
            labels.markersAlong(phases.get(i).label() + " (markers)", device[i], s.marker(), s.colour(), 34,
                    5 + 3.7 * i);
        }
        for (int i = 0; i < phases.size(); i++) {
            labelAtPeak(labels, device[i], i);
        }
        labels.note(notes);
        return f;
    }

    private void labelAtPeak(final DirectLabels labels, final double[][] dev, final int i) {
        int peak = -1;
        for (int k = 0; k < dev[1].length; k++) {
            if (Double.isFinite(dev[1][k]) && (peak < 0 || dev[1][k] < dev[1][peak])) {
                peak = k;
            }
        }
        if (peak >= 0) {
            double h = Fonts.capHeight(ChartStyle.NOTE_PT) + 1;
            labels.putFirstFree(phases.get(i).label(), i, dev[0][peak], dev[1][peak] - 3 - h / 2, dev[0][peak],
                    dev[1][peak] + 3 + h / 2);
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
