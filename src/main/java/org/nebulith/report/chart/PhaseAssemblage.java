package org.nebulith.report.chart;

import java.util.List;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;

/**
 * Phase assemblage: the amount of each condensed phase against temperature (decreasing to the
 * right), on a linear or logarithmic amount axis. A phase that is absent has amount 0 (or NaN);
 * on the log axis amounts below {@link #LOG_FLOOR_RATIO} times the largest amount are left out
 * (drawn as gaps) so that trace amounts do not flatten the figure.
 *
 * @param temperatureK the temperature grid [K]
 * @param phases       one curve per phase, amounts &ge; 0 (NaN = absent)
 * @param amountUnit   unit of the amounts, e.g. {@code mol per 10^6 Si}
 */
public record PhaseAssemblage(double[] temperatureK, List<Curve> phases, String amountUnit) {

    /** Lower limit of the log axis relative to the largest amount. */
    public static final double LOG_FLOOR_RATIO = 1e-6;

    public PhaseAssemblage {
        temperatureK = temperatureK.clone();
        phases = List.copyOf(phases);
        Curve.checkGrid(temperatureK, "phase assemblage");
        for (Curve c : phases) {
            c.check(temperatureK.length, "phase assemblage", true, 0.0, Double.MAX_VALUE);
        }
    }

    /**
     * @param size     figure size
     * @param logScale whether the amount axis is logarithmic
     * @return the chart
     */
    public XYChart chart(final ChartSize size, final boolean logScale) {
        XYChart chart = ChartStyle.newXYChart(size, TemperatureAxis.TITLE, "Amount [" + amountUnit + "]");
        double[] x = TemperatureAxis.plotted(temperatureK);
        double max = largest();
        double floor = logScale ? max * LOG_FLOOR_RATIO : 0.0;
        for (int i = 0; i < phases.size(); i++) {
            double[] y = phases.get(i).values();
            for (int k = 0; k < y.length; k++) {
                if (logScale && !(y[k] >= floor && y[k] > 0)) {
                    y[k] = Double.NaN;
                }
            }
            XYSeries s = chart.addSeries(phases.get(i).label(), x, y);
            ChartStyle.line(s, i);
        }
        if (logScale) {
            chart.getStyler().setYAxisLogarithmic(true);
            if (max > 0) {
                double smallest = smallestAbove(floor);
                chart.getStyler().setYAxisMin(Math.pow(10, Math.floor(Math.log10(smallest))))
                        .setYAxisMax(Math.pow(10, Math.ceil(Math.log10(max * 1.01))));
            }
        } else {
            chart.getStyler().setYAxisMin(0.0);
        }
        if (logScale) {
            chart.setCustomYAxisTickLabelsFormatter(PhaseAssemblage::decade);
        } else {
            chart.getStyler().setYAxisDecimalPattern("0.##");
        }
        TemperatureAxis.relabel(chart, temperatureK);
        return chart;
    }

    /** Labels decades as powers of ten with superscript exponents (10³); other ticks stay blank. */
    static String decade(final double y) {
        double exponent = Math.log10(y);
        long rounded = Math.round(exponent);
        if (Math.abs(exponent - rounded) > 1e-9) {
            return " ";
        }
        String superscripts = "\u2070\u00b9\u00b2\u00b3\u2074\u2075\u2076\u2077\u2078\u2079";
        StringBuilder text = new StringBuilder("10");
        if (rounded < 0) {
            text.append('\u207b');
        }
        for (char c : Long.toString(Math.abs(rounded)).toCharArray()) {
            text.append(superscripts.charAt(c - '0'));
        }
        return text.toString();
    }

    private double smallestAbove(final double floor) {
        double min = Double.POSITIVE_INFINITY;
        for (Curve c : phases) {
            for (double v : c.values()) {
                if (v >= floor && v > 0 && v < min) {
                    min = v;
                }
            }
        }
        return min;
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
