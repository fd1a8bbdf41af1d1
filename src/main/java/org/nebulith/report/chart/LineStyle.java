package org.nebulith.report.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.Objects;

/**
 * How a line is stroked.
 *
 * @param colour colour (alpha allowed)
 * @param width  width [pt]
 * @param dash   dash pattern [pt], on-off pairs; empty for a solid line
 */
public record LineStyle(Color colour, double width, float[] dash) {

    public LineStyle {
        Objects.requireNonNull(colour);
        dash = dash == null ? new float[0] : dash.clone();
        if (!(width > 0)) {
            throw new IllegalArgumentException("line width must be > 0, got " + width);
        }
    }

    /**
     * @param colour colour
     * @param width  width [pt]
     * @return a solid line
     */
    public static LineStyle solid(final Color colour, final double width) {
        return new LineStyle(colour, width, null);
    }

    /** @return a copy of the dash pattern */
    @Override
    public float[] dash() {
        return dash.clone();
    }

    /**
     * @param newWidth width [pt]
     * @return this style with another width
     */
    public LineStyle withWidth(final double newWidth) {
        return new LineStyle(colour, newWidth, dash);
    }

    /** @return the Java2D stroke */
    BasicStroke stroke() {
        return dash.length == 0
                ? new BasicStroke((float) width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND)
                : new BasicStroke((float) width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f);
    }
}
