package org.nebulith.report.chart;

import java.util.List;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/**
 * Condensation curves: the fraction of each element condensed against temperature, the
 * temperature axis decreasing to the right.
 *
 * @param temperatureK the temperature grid [K], any order
 * @param elements     one curve per element: fraction condensed in [0, 1] (1e-9 slack)
 * @param pressureNote pressure or path shown in the corner, e.g. {@code P = 1e-4 bar}; may be empty
 */
public record CondensationCurves(double[] temperatureK, List<Curve> elements, String pressureNote) {

    private static final double SLACK = 1e-9;

    public CondensationCurves {
        temperatureK = temperatureK.clone();
        elements = List.copyOf(elements);
        Curve.checkGrid(temperatureK, "condensation curves");
        for (Curve c : elements) {
            c.check(temperatureK.length, "condensation curves", false, -SLACK, 1 + SLACK);
        }
    }

    /**
     * @param size figure size
     * @return the chart
     */
    public XYChart chart(final ChartSize size) {
        XYChart chart = ChartStyle.newXYChart(size, TemperatureAxis.TITLE, "Fraction condensed");
        double[] x = TemperatureAxis.plotted(temperatureK);
        for (int i = 0; i < elements.size(); i++) {
            XYSeries s = chart.addSeries(elements.get(i).label(), x, elements.get(i).values());
            ChartStyle.line(s, i);
        }
        chart.getStyler().setYAxisMin(0.0).setYAxisMax(1.0);
        chart.getStyler().setYAxisDecimalPattern("0.0");
        TemperatureAxis.relabel(chart, temperatureK);
        Notes.corner(chart, pressureNote, x, 1.0);
        return chart;
    }
}
