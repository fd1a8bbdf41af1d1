package org.nebulith.report.chart;

import java.awt.Color;

/**
 * Colours, line patterns and markers of every Nebulith chart. The colours are those of the Okabe-Ito
 * colour-universal-design palette (M. Okabe and K. Ito, "Color Universal Design (CUD): how to
 * make figures and presentations that are friendly to colorblind people", 2008), which stay
 * distinguishable under the common colour-vision deficiencies; data series use seven of them (the
 * yellow is too weak on white for lines). Series i gets colour i mod 7, pattern i mod 4 and marker
 * (i + floor(i / 7)) mod 7, so that two series of one colour never share a marker and patterns and
 * markers together tell the first 28 series apart without colour.
 */
public final class Palette {

    /** Okabe-Ito: blue, vermillion, bluish green, reddish purple, orange, sky blue, black. */
    private static final Color[] SERIES = {
        new Color(0x00, 0x72, 0xB2),
        new Color(0xD5, 0x5E, 0x00),
        new Color(0x00, 0x9E, 0x73),
        new Color(0xCC, 0x79, 0xA7),
        new Color(0xE6, 0x9F, 0x00),
        new Color(0x56, 0xB4, 0xE9),
        new Color(0x00, 0x00, 0x00),
    };

    /** Okabe-Ito yellow, for fills only. */
    public static final Color YELLOW = new Color(0xF0, 0xE4, 0x42);

    /** Dash patterns [pt]: solid, dashed, dotted, dash-dot. */
    private static final float[][] DASHES = {{}, {4f, 2f}, {1f, 1.5f}, {5f, 1.5f, 1f, 1.5f}};

    private static final Marker[] MARKERS = {
        Marker.CIRCLE, Marker.SQUARE, Marker.TRIANGLE_UP, Marker.OPEN_CIRCLE, Marker.DIAMOND, Marker.OPEN_SQUARE,
        Marker.TRIANGLE_DOWN,
    };

    /** Line width of data series [pt]. */
    public static final double LINE_WIDTH = 1.0;

    /** Fill of a shaded band: light grey, translucent. */
    public static final Color BAND = new Color(0x99, 0x99, 0x99, 0x30);
    /** Colour of reference lines and notes. */
    public static final Color REFERENCE = new Color(0x55, 0x55, 0x55);
    /** Colour of notes. */
    public static final Color NOTE = new Color(0x33, 0x33, 0x33);
    /** Axes, ticks and their labels. */
    public static final Color AXIS = new Color(0x22, 0x22, 0x22);
    /** Grid lines. */
    public static final Color GRID = new Color(0xE4, 0xE4, 0xE4);

    private Palette() {
    }

    /** @param index series index @return its colour */
    public static Color seriesColour(final int index) {
        return SERIES[Math.floorMod(index, SERIES.length)];
    }

    /** @param index series index @return its colour (same as {@link #seriesColour}) */
    public static Color colour(final int index) {
        return seriesColour(index);
    }

    /** @param index series index @return its dash pattern (empty = solid) */
    public static float[] dash(final int index) {
        return DASHES[Math.floorMod(index, DASHES.length)].clone();
    }

    /** @param index series index @return its marker */
    public static Marker marker(final int index) {
        return MARKERS[Math.floorMod(index + Math.floorDiv(index, SERIES.length), MARKERS.length)];
    }

    /** @return the number of distinct series colours */
    public static int size() {
        return SERIES.length;
    }
}
