package org.nebulith.report.chart;

import java.awt.Color;
import java.awt.Shape;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/**
 * A chart as a list of drawing operations in points (1/72 in, origin top left, y down): stroked
 * and filled shapes, text runs and clip groups. The same list is painted to PNG and PDF (Java2D)
 * and written as SVG ({@link SvgWriter}), so the three files show the same thing, text stays text
 * and each series stays one path.
 */
public final class Drawing {

    /** Horizontal alignment of a text run on its anchor. */
    public enum Align {
        /** Text starts at the anchor. */
        LEFT,
        /** Text is centred on the anchor. */
        CENTRE,
        /** Text ends at the anchor. */
        RIGHT
    }

    /** One operation. */
    public sealed interface Op permits Stroke, Fill, Text, Clip, EndClip {
    }

    /** @param shape outline @param style line style */
    public record Stroke(Shape shape, LineStyle style) implements Op {
    }

    /** @param shape area @param colour fill colour */
    public record Fill(Shape shape, Color colour) implements Op {
    }

    /**
     * @param text    the text
     * @param x       anchor x [pt]
     * @param y       baseline y [pt]
     * @param sizePt  font size [pt]
     * @param align   alignment on the anchor
     * @param upright true for text turned 90 degrees anticlockwise (read bottom to top)
     * @param colour  colour
     */
    public record Text(String text, double x, double y, double sizePt, Align align, boolean upright, Color colour)
            implements Op {
    }

    /** @param area clip rectangle until the matching {@link EndClip} */
    public record Clip(Rectangle2D area) implements Op {
    }

    /** Ends the innermost clip group. */
    public record EndClip() implements Op {
    }

    private final double widthPt;
    private final double heightPt;
    private final List<Op> ops = new ArrayList<>();
    private int openClips;

    /**
     * @param widthPt  width [pt]
     * @param heightPt height [pt]
     */
    public Drawing(final double widthPt, final double heightPt) {
        if (!(widthPt > 0 && heightPt > 0)) {
            throw new IllegalArgumentException("drawing size must be > 0, got " + widthPt + " x " + heightPt);
        }
        this.widthPt = widthPt;
        this.heightPt = heightPt;
    }

    /** @param size a figure size @return an empty drawing of that size */
    public static Drawing of(final ChartSize size) {
        return new Drawing(size.widthPt(), size.heightPt());
    }

    /** @return width [pt] */
    public double widthPt() {
        return widthPt;
    }

    /** @return height [pt] */
    public double heightPt() {
        return heightPt;
    }

    /** @return the whole drawing's rectangle [pt] */
    public Rectangle2D bounds() {
        return new Rectangle2D.Double(0, 0, widthPt, heightPt);
    }

    /** @return the operations in painting order */
    public List<Op> ops() {
        if (openClips != 0) {
            throw new IllegalStateException(openClips + " clip group(s) left open");
        }
        return List.copyOf(ops);
    }

    /** @param shape outline @param style line style @return this */
    public Drawing stroke(final Shape shape, final LineStyle style) {
        ops.add(new Stroke(Objects.requireNonNull(shape), Objects.requireNonNull(style)));
        return this;
    }

    /** @param shape area @param colour colour @return this */
    public Drawing fill(final Shape shape, final Color colour) {
        ops.add(new Fill(Objects.requireNonNull(shape), Objects.requireNonNull(colour)));
        return this;
    }

    /**
     * @param text   the text (nothing is drawn when empty)
     * @param x      anchor x [pt]
     * @param y      baseline y [pt]
     * @param sizePt font size [pt]
     * @param align  alignment
     * @param colour colour
     * @return this
     */
    public Drawing text(final String text, final double x, final double y, final double sizePt, final Align align,
                        final Color colour) {
        if (!text.isEmpty()) {
            ops.add(new Text(text, x, y, sizePt, align, false, colour));
        }
        return this;
    }

    /**
     * Text turned 90 degrees anticlockwise, centred on (x, y) along its length, baseline at x.
     *
     * @param text   the text
     * @param x      baseline x [pt]
     * @param y      centre y [pt]
     * @param sizePt size [pt]
     * @param colour colour
     * @return this
     */
    public Drawing uprightText(final String text, final double x, final double y, final double sizePt,
                               final Color colour) {
        ops.add(new Text(text, x, y, sizePt, Align.CENTRE, true, colour));
        return this;
    }

    /** @param area clip rectangle @return this */
    public Drawing clip(final Rectangle2D area) {
        ops.add(new Clip((Rectangle2D) area.clone()));
        openClips++;
        return this;
    }

    /** @return this, the innermost clip ended */
    public Drawing endClip() {
        if (openClips == 0) {
            throw new IllegalStateException("no clip group open");
        }
        ops.add(new EndClip());
        openClips--;
        return this;
    }
}
