package org.nebulith.report.chart;

import java.awt.Font;
import java.awt.Shape;
import java.awt.font.TextLayout;
import java.awt.geom.AffineTransform;
import java.awt.geom.PathIterator;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The glyph outlines of every label a chart can draw, in each of its fonts, measured with
 * {@link VectorCanvas#FRC}, so that a filled outline can be recognised as the text it shows: the
 * same segments, exactly or moved by a translation, upright or turned by a right angle (XChart
 * turns the y-axis titles in the outline itself). New labels (tick labels are made while the
 * chart paints) are measured when an outline is not found.
 */
final class TextOutlines {

    /** Largest difference of a matched coordinate, relative to the outline's first point [pt]. */
    private static final double TOLERANCE = 1e-3;

    /**
     * A recognised label.
     *
     * @param text the label
     * @param font its font
     * @param dx   x of its baseline origin in the current user space
     * @param dy   y of its baseline origin
     * @param turn rotation of the text about its origin [rad], 0 for upright text
     */
    record Match(String text, Font font, double dx, double dy, double turn) {
    }

    /** Rotations in which labels are looked for: upright, and read bottom to top or top to bottom. */
    private static final double[] TURNS = {0, -Math.PI / 2, Math.PI / 2};

    private record Outline(int[] types, double[] coords) {
        static Outline of(final Shape s) {
            int n = 0;
            int[] types = new int[32];
            double[] coords = new double[192];
            double[] c = new double[6];
            int k = 0;
            for (PathIterator it = s.getPathIterator(null); !it.isDone(); it.next()) {
                int type = it.currentSegment(c);
                if (n == types.length) {
                    types = Arrays.copyOf(types, 2 * n);
                }
                types[n++] = type;
                int points = type == PathIterator.SEG_CUBICTO ? 3 : type == PathIterator.SEG_QUADTO ? 2
                        : type == PathIterator.SEG_CLOSE ? 0 : 1;
                if (k + 2 * points > coords.length) {
                    coords = Arrays.copyOf(coords, 2 * coords.length + 6);
                }
                System.arraycopy(c, 0, coords, k, 2 * points);
                k += 2 * points;
            }
            return n == 0 || k < 2 ? null : new Outline(Arrays.copyOf(types, n), Arrays.copyOf(coords, k));
        }

        int key() {
            return 31 * Arrays.hashCode(types) + coords.length;
        }

        boolean sameShape(final Outline o) {
            if (!Arrays.equals(types, o.types) || coords.length != o.coords.length) {
                return false;
            }
            double dx = coords[0] - o.coords[0];
            double dy = coords[1] - o.coords[1];
            for (int i = 0; i < coords.length; i += 2) {
                if (Math.abs(coords[i] - o.coords[i] - dx) > TOLERANCE
                        || Math.abs(coords[i + 1] - o.coords[i + 1] - dy) > TOLERANCE) {
                    return false;
                }
            }
            return true;
        }
    }

    private record Label(String text, Font font, Outline outline, double turn) {
    }

    private final Collection<String> texts;
    private final Collection<Font> fonts;
    private final Set<String> measured = new HashSet<>();
    private final Map<Integer, List<Label>> byKey = new HashMap<>();

    /**
     * @param texts every label the chart may draw (a live view: labels added later are measured when needed)
     * @param fonts the fonts it draws them in
     */
    TextOutlines(final Collection<String> texts, final Collection<Font> fonts) {
        this.texts = texts;
        this.fonts = List.copyOf(fonts);
    }

    /**
     * @param s a shape about to be filled
     * @return the label it is the outline of, or null
     */
    Match find(final Shape s) {
        if (!(s instanceof java.awt.geom.Path2D)) {
            return null;
        }
        Outline o = Outline.of(s);
        if (o == null) {
            return null;
        }
        Match m = lookUp(o);
        if (m == null && measureNew()) {
            m = lookUp(o);
        }
        return m;
    }

    private Match lookUp(final Outline o) {
        for (Label l : byKey.getOrDefault(o.key(), List.of())) {
            if (o.sameShape(l.outline())) {
                return new Match(l.text(), l.font(), o.coords[0] - l.outline().coords[0],
                        o.coords[1] - l.outline().coords[1], l.turn());
            }
        }
        return null;
    }

    private boolean measureNew() {
        boolean added = false;
        for (String t : List.copyOf(texts)) {
            if (t == null || t.isBlank() || !measured.add(t)) {
                continue;
            }
            for (Font f : fonts) {
                TextLayout layout = new TextLayout(t, f, VectorCanvas.FRC);
                for (double turn : TURNS) {
                    Outline o = Outline.of(layout.getOutline(turn == 0 ? null : AffineTransform.getRotateInstance(turn)));
                    if (o != null) {
                        byKey.computeIfAbsent(o.key(), k -> new ArrayList<>()).add(new Label(t, f, o, turn));
                        added = true;
                    }
                }
            }
        }
        return added;
    }
}
