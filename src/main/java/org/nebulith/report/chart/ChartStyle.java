package org.nebulith.report.chart;

/**
 * Nebulith's chart look: white background, thin dark axes box, light dotted grid, DejaVu Sans
 * sized for a journal column (7 pt ticks, 8 pt axis titles, 6.5 pt notes), no chart title
 * (captions belong to the paper or report), {@link Palette} colours, line patterns and markers.
 */
public final class ChartStyle {

    /** Resolution of PNG output [dots per inch]. */
    public static final int PNG_DPI = 300;
    /** Tick-label size [pt]. */
    public static final double TICK_PT = 7;
    /** Axis-title size [pt]. */
    public static final double TITLE_PT = 8;
    /** Legend size [pt]. */
    public static final double LEGEND_PT = 7;
    /** Note and direct-label size [pt]. */
    public static final double NOTE_PT = 6.5;
    /** Marker size [pt]. */
    public static final double MARKER_PT = 3.8;
    /** Margin around the figure [pt]. */
    public static final double PAD = 4;

    private ChartStyle() {
    }

    /**
     * The style of data series i: colour, line pattern and marker together, so that any two of the
     * first 28 series differ in pattern or marker even in greyscale.
     *
     * @param index series index
     * @return its style
     */
    public static Series series(final int index) {
        return new Series(Palette.seriesColour(index), Palette.dash(index), Palette.marker(index));
    }

    /**
     * @param colour colour
     * @param dash   dash pattern [pt] (empty for solid)
     * @param marker marker shape
     */
    public record Series(java.awt.Color colour, float[] dash, Marker marker) {
        /** @return the line style */
        public LineStyle line() {
            return new LineStyle(colour, Palette.LINE_WIDTH, dash);
        }
    }
}
