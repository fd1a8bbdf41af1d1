package org.nebulith.report.chart;

/**
 * A temperature axis decreasing to the right, as condensation diagrams are read (a gas cools from
 * left to right), its ends rounded out to 100 K.
 */
final class TemperatureAxis {

    /** Axis title. */
    static final String TITLE = "Temperature T [K]";

    private TemperatureAxis() {
    }

    /**
     * @param temperatureK the plotted temperatures [K]
     * @return the axis
     */
    static Axis of(final double[] temperatureK) {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double t : temperatureK) {
            min = Math.min(min, t);
            max = Math.max(max, t);
        }
        double lo = Math.floor(min / 100) * 100;
        double hi = Math.ceil(max / 100) * 100;
        if (hi <= lo) {
            hi = lo + 100;
        }
        return Axis.linear(lo, hi, TITLE).reversed().ticks(7);
    }

    /** @param temperatureK temperatures @return the same values (the axis itself is reversed) */
    static double[] values(final double[] temperatureK) {
        return temperatureK.clone();
    }
}
