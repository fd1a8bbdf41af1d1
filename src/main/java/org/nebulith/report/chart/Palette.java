package org.nebulith.report.chart;

import java.awt.BasicStroke;
import java.awt.Color;

/**
 * Colours and line patterns of every Nebulith chart. The colours are the eight of the Okabe-Ito
 * colour-universal-design palette (M. Okabe and K. Ito, "Color Universal Design (CUD): how to
 * make figures and presentations that are friendly to colorblind people", 2008), which stay
 * distinguishable under the common colour-vision deficiencies; our order puts the strongest
 * colours first and yellow last (weak on white). Beyond eight series the dash pattern changes, so
 * that series 9 to 32 differ by pattern as well as colour and remain readable in greyscale print.
 */
public final class Palette {

    /** Okabe-Ito colours in Nebulith's order: blue, vermillion, bluish green, reddish purple, orange, sky blue, black, yellow. */
    private static final Color[] COLOURS = {
        new Color(0x00, 0x72, 0xB2),
        new Color(0xD5, 0x5E, 0x00),
        new Color(0x00, 0x9E, 0x73),
        new Color(0xCC, 0x79, 0xA7),
        new Color(0xE6, 0x9F, 0x00),
        new Color(0x56, 0xB4, 0xE9),
        new Color(0x00, 0x00, 0x00),
        new Color(0xF0, 0xE4, 0x42),
    };

    /** Dash patterns [pt]: solid, dashed, dotted, dash-dot. */
    private static final float[][] DASHES = {null, {4f, 2f}, {1f, 1.5f}, {4f, 1.5f, 1f, 1.5f}};

    /** Line width of data series [pt]. */
    public static final float LINE_WIDTH = 1.0f;

    /** Fill of a shaded band (feeding zone): light grey, translucent. */
    public static final Color BAND = new Color(0x99, 0x99, 0x99, 0x40);

    /** Colour of reference lines (condensation fronts). */
    public static final Color REFERENCE = new Color(0x55, 0x55, 0x55);

    private Palette() {
    }

    /**
     * @param index series index (0-based)
     * @return its colour
     */
    public static Color colour(final int index) {
        return COLOURS[Math.floorMod(index, COLOURS.length)];
    }

    /**
     * @param index series index (0-based)
     * @return its stroke: the pattern changes every eight series
     */
    public static BasicStroke stroke(final int index) {
        float[] dash = DASHES[Math.floorMod(index / COLOURS.length, DASHES.length)];
        return dash == null
                ? new BasicStroke(LINE_WIDTH, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND)
                : new BasicStroke(LINE_WIDTH, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f);
    }

    /** @return the number of distinct colours */
    public static int size() {
        return COLOURS.length;
    }
}
