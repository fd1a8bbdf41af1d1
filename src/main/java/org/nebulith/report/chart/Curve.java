package org.nebulith.report.chart;

import java.util.Objects;

/**
 * One named series of values along a shared x grid (temperatures, radii). NaN marks a gap
 * (no value there), where a chart allows it.
 *
 * @param label  legend text (an element symbol, a phase name)
 * @param values one value per grid point
 */
public record Curve(String label, double[] values) {

    public Curve {
        Objects.requireNonNull(label, "label");
        values = values.clone();
    }

    @Override
    public double[] values() {
        return values.clone();
    }

    /**
     * @param grid  length of the shared grid
     * @param what  chart name, for messages
     * @param allowGaps whether NaN values are accepted
     * @param min   smallest accepted value
     * @param max   largest accepted value
     */
    void check(final int grid, final String what, final boolean allowGaps, final double min, final double max) {
        if (values.length != grid) {
            throw new IllegalArgumentException(what + ": series " + label + " has " + values.length
                    + " values for " + grid + " grid points");
        }
        for (int i = 0; i < values.length; i++) {
            double v = values[i];
            boolean gap = Double.isNaN(v) && allowGaps;
            if (!gap && !(v >= min && v <= max)) {
                throw new IllegalArgumentException(what + ": series " + label + ", point " + i + ": value " + v
                        + " outside [" + min + ", " + max + "]");
            }
        }
    }

    /**
     * @param values values to check
     * @param what   name for messages
     */
    static void checkGrid(final double[] values, final String what) {
        if (values.length < 2) {
            throw new IllegalArgumentException(what + ": at least 2 grid points are needed, got " + values.length);
        }
        for (double v : values) {
            if (!Double.isFinite(v)) {
                throw new IllegalArgumentException(what + ": grid value " + v + " is not finite");
            }
        }
    }
}
