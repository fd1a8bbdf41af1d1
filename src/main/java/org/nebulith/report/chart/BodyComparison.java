package org.nebulith.report.chart;

import java.util.List;
import java.util.Objects;

import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;

/**
 * Planet comparison: a dot plot of key quantities (molar ratios, core mass fraction) for the
 * predicted planet beside its host star, bulk Earth and CI chondrite. Quantities are the
 * categories along x; each body is one marker series, shifted sideways so that equal values stay
 * visible; optional error bars. The y axis is logarithmic (the ratios span 0.05 to 2).
 *
 * @param quantities category labels, e.g. {@code Mg/Si}, {@code Fe/Si}, {@code core mass fraction}
 * @param bodies     the bodies compared
 */
public record BodyComparison(List<String> quantities, List<Body> bodies) {

    /**
     * One body.
     *
     * @param label  legend text, e.g. {@code Keroa b (predicted)}, {@code bulk Earth}
     * @param values one value per quantity, &gt; 0; NaN where the body has no value (a star has no core)
     * @param low    lower ends of error bars, or null for none (NaN entries = no bar)
     * @param high   upper ends of error bars, or null for none
     */
    public record Body(String label, double[] values, double[] low, double[] high) {
        public Body {
            Objects.requireNonNull(label);
            values = values.clone();
            low = low == null ? null : low.clone();
            high = high == null ? null : high.clone();
            if ((low == null) != (high == null)) {
                throw new IllegalArgumentException(label + ": give both ends of the error bars or neither");
            }
        }

        /**
         * @param label  legend text
         * @param values one value per quantity (NaN = none)
         * @return a body without error bars
         */
        public static Body of(final String label, final double... values) {
            return new Body(label, values, null, null);
        }
    }

    private static final double DODGE = 0.12;

    public BodyComparison {
        quantities = List.copyOf(quantities);
        bodies = List.copyOf(bodies);
        if (quantities.isEmpty() || bodies.isEmpty()) {
            throw new IllegalArgumentException("comparison: need at least one quantity and one body");
        }
        for (Body b : bodies) {
            new Curve(b.label(), b.values()).check(quantities.size(), "comparison", true, Double.MIN_VALUE,
                    Double.MAX_VALUE);
            if (b.low() != null) {
                new Curve(b.label(), b.low()).check(quantities.size(), "comparison", true, Double.MIN_VALUE,
                        Double.MAX_VALUE);
                new Curve(b.label(), b.high()).check(quantities.size(), "comparison", true, Double.MIN_VALUE,
                        Double.MAX_VALUE);
            }
        }
    }

    /**
     * @param size figure size
     * @return the chart
     */
    public XYChart chart(final ChartSize size) {
        XYChart chart = ChartStyle.newXYChart(size, "", "Value (molar ratio, or mass fraction)");
        chart.getStyler().setYAxisLogarithmic(true);
        chart.getStyler().setLegendPosition(Styler.LegendPosition.OutsideS);
        chart.getStyler().setLegendLayout(Styler.LegendLayout.Vertical);
        chart.getStyler().setXAxisMin(-0.5).setXAxisMax(quantities.size() - 0.5);
        chart.getStyler().setPlotGridVerticalLinesVisible(false);
        chart.getStyler().setYAxisDecimalPattern("0.###");
        double centre = (bodies.size() - 1) / 2.0;
        for (int b = 0; b < bodies.size(); b++) {
            Body body = bodies.get(b);
            double[] x = new double[quantities.size()];
            for (int q = 0; q < x.length; q++) {
                x[q] = q + (b - centre) * DODGE;
            }
            if (body.low() != null) {
                ErrorBars.vertical(chart, body.label() + " error", x, body.values(), body.low(), body.high(),
                        Palette.colour(b));
            }
            XYSeries s = chart.addSeries(body.label(), x, body.values());
            ChartStyle.points(s, b);
        }
        // category names are written inside the plot, above the x axis: XChart 4.0.3 cannot be made to
        // put its own ticks on the category positions once long labels do not fit its tick spacing
        double[] range = valueRange();
        double bottom = Math.pow(10, Math.floor(Math.log10(range[0] / 1.6)));
        double top = range[1] * 1.4;
        chart.getStyler().setYAxisMin(bottom).setYAxisMax(top);
        chart.getStyler().setXAxisTicksVisible(false);
        for (int q = 0; q < quantities.size(); q++) {
            chart.addAnnotation(new AnnotationText(quantities.get(q), q, bottom * 1.25, false));
        }
        return chart;
    }

    private double[] valueRange() {
        double min = Double.POSITIVE_INFINITY;
        double max = 0;
        for (Body b : bodies) {
            for (double[] series : new double[][] {b.values(), b.low(), b.high()}) {
                if (series == null) {
                    continue;
                }
                for (double v : series) {
                    if (v > 0) {
                        min = Math.min(min, v);
                        max = Math.max(max, v);
                    }
                }
            }
        }
        return max > 0 ? new double[] {min, max} : new double[] {0.1, 1};
    }
}
