package org.nebulith.report.chart;

import java.util.Locale;

import org.knowm.xchart.XYChart;
import org.nebulith.format.Decimal;

/**
 * A temperature axis that decreases to the right, as condensation diagrams are read (a gas cools
 * from left to right). XChart 4.0.3 has no reversed axis, so the series are plotted against
 * {@code -T} and the tick labels show {@code T}.
 */
final class TemperatureAxis {

    /** Axis title. */
    static final String TITLE = "Temperature T [K]";

    private TemperatureAxis() {
    }

    /**
     * @param temperatureK temperatures [K]
     * @return the plotted x values, {@code -T}
     */
    static double[] plotted(final double[] temperatureK) {
        double[] x = new double[temperatureK.length];
        for (int i = 0; i < x.length; i++) {
            x[i] = -temperatureK[i];
        }
        return x;
    }

    /**
     * Relabels the ticks of a chart plotted against {@code -T}.
     *
     * @param chart        the chart
     * @param temperatureK the plotted temperatures [K]
     */
    static void relabel(final XYChart chart, final double[] temperatureK) {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double t : temperatureK) {
            min = Math.min(min, t);
            max = Math.max(max, t);
        }
        // round limits make XChart put its ticks on round temperatures
        chart.getStyler().setXAxisMin(-Math.ceil(max / 100) * 100).setXAxisMax(-Math.floor(min / 100) * 100);
        chart.getStyler().setXAxisTickMarkSpacingHint(44);
        NiceTicks.force(chart, -max, -min);
        chart.setCustomXAxisTickLabelsFormatter(x -> label(-x));
    }

    private static String label(final double t) {
        double rounded = Math.rint(t * 1000) / 1000;
        return rounded == Math.rint(rounded) ? String.format(Locale.ROOT, "%.0f", rounded)
                : Decimal.format(rounded);
    }
}
