package org.nebulith.report.chart;

import java.awt.Color;
import java.awt.Composite;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.GraphicsConfiguration;
import java.awt.Image;
import java.awt.Paint;
import java.awt.Rectangle;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.font.FontRenderContext;
import java.awt.font.GlyphVector;
import java.awt.geom.AffineTransform;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.image.BufferedImage;
import java.awt.image.BufferedImageOp;
import java.awt.image.ImageObserver;
import java.awt.image.RenderedImage;
import java.awt.image.renderable.RenderableImage;
import java.text.AttributedCharacterIterator;
import java.util.Map;
import java.util.Objects;

/**
 * The canvas XChart paints on when a chart is written as SVG or PDF: a {@link Graphics2D} that
 * passes everything to a vector backend with two repairs. XChart draws every text as the filled
 * outline of its glyphs; a filled shape that is the outline of a known label ({@link TextOutlines})
 * is drawn as that text instead, so the file keeps live, editable text. XChart draws a line series
 * segment by segment; consecutive segments with the same stroke, paint, transform and clip are
 * collected into one path drawn once, so that each series is one path and its dash pattern runs on
 * along it. Any other drawing call or change of stroke, transform or clip draws the collected path
 * first; paint reaches the backend only when something is drawn.
 */
final class VectorCanvas extends Graphics2D {

    /** The render context of every measured and matched outline. */
    static final FontRenderContext FRC = new FontRenderContext(null, true, true);

    private final Graphics2D backend;
    private final TextOutlines labels;
    private Path2D.Double pending;
    private double endX;
    private double endY;
    private int texts;
    private Paint paint;
    private Paint applied;

    /**
     * @param backend the vector graphics that receives the drawing
     * @param labels  the labels to recover from their outlines
     */
    VectorCanvas(final Graphics2D backend, final TextOutlines labels) {
        this.backend = Objects.requireNonNull(backend);
        this.labels = Objects.requireNonNull(labels);
    }

    /** @return how many outlines were written as text so far */
    int textsRecovered() {
        return texts;
    }

    /** Draws the collected path, if any. */
    void flush() {
        if (pending != null) {
            Path2D.Double p = pending;
            pending = null;
            backend.draw(p);
        }
    }

    @Override
    public void draw(final Shape s) {
        if (s instanceof Line2D l) {
            join(l.getX1(), l.getY1(), l.getX2(), l.getY2());
            return;
        }
        ready();
        backend.draw(s);
    }

    private void join(final double x1, final double y1, final double x2, final double y2) {
        if (pending != null && paint != null && !paint.equals(applied)) {
            flush();
        }
        applyPaint();
        if (pending == null) {
            pending = new Path2D.Double();
            pending.moveTo(x1, y1);
        } else if (x1 != endX || y1 != endY) {
            pending.moveTo(x1, y1);
        }
        pending.lineTo(x2, y2);
        endX = x2;
        endY = y2;
    }

    @Override
    public void fill(final Shape s) {
        ready();
        TextOutlines.Match m = labels.find(s);
        if (m == null) {
            backend.fill(s);
            return;
        }
        Font font = backend.getFont();
        backend.setFont(m.font());
        if (m.turn() == 0) {
            backend.drawString(m.text(), (float) m.dx(), (float) m.dy());
        } else {
            AffineTransform t = backend.getTransform();
            backend.translate(m.dx(), m.dy());
            backend.rotate(m.turn());
            backend.drawString(m.text(), 0f, 0f);
            backend.setTransform(t);
        }
        backend.setFont(font);
        texts++;
    }

    @Override
    public void setColor(final Color c) {
        setPaint(c);
    }

    /**
     * Paint is passed on only when something is drawn: XChart sets the fill colour of a series at
     * every gap of a line without filling anything, which must not end the line's path.
     */
    @Override
    public void setPaint(final Paint paint) {
        this.paint = paint;
    }

    /** Draws the collected path, then brings the backend's paint up to date. */
    private void ready() {
        flush();
        applyPaint();
    }

    private void applyPaint() {
        if (paint != null && !paint.equals(applied)) {
            backend.setPaint(paint);
            applied = paint;
        }
    }

    @Override
    public void setStroke(final Stroke s) {
        if (!Objects.equals(s, backend.getStroke())) {
            flush();
        }
        backend.setStroke(s);
    }

    @Override
    public void setComposite(final Composite comp) {
        if (!Objects.equals(comp, backend.getComposite())) {
            flush();
        }
        backend.setComposite(comp);
    }

    @Override
    public void setTransform(final AffineTransform tx) {
        if (!Objects.equals(tx, backend.getTransform())) {
            flush();
        }
        backend.setTransform(tx);
    }

    @Override
    public void transform(final AffineTransform tx) {
        if (!tx.isIdentity()) {
            flush();
        }
        backend.transform(tx);
    }

    @Override
    public void translate(final int x, final int y) {
        translate((double) x, (double) y);
    }

    @Override
    public void translate(final double tx, final double ty) {
        if (tx != 0 || ty != 0) {
            flush();
        }
        backend.translate(tx, ty);
    }

    @Override
    public void rotate(final double theta) {
        flush();
        backend.rotate(theta);
    }

    @Override
    public void rotate(final double theta, final double x, final double y) {
        flush();
        backend.rotate(theta, x, y);
    }

    @Override
    public void scale(final double sx, final double sy) {
        flush();
        backend.scale(sx, sy);
    }

    @Override
    public void shear(final double shx, final double shy) {
        flush();
        backend.shear(shx, shy);
    }

    @Override
    public void clip(final Shape s) {
        flush();
        backend.clip(s);
    }

    @Override
    public void setClip(final Shape clip) {
        flush();
        backend.setClip(clip);
    }

    @Override
    public void setClip(final int x, final int y, final int width, final int height) {
        flush();
        backend.setClip(x, y, width, height);
    }

    @Override
    public void clipRect(final int x, final int y, final int width, final int height) {
        flush();
        backend.clipRect(x, y, width, height);
    }

    @Override
    public void setBackground(final Color color) {
        backend.setBackground(color);
    }

    @Override
    public void setRenderingHint(final RenderingHints.Key hintKey, final Object hintValue) {
        backend.setRenderingHint(hintKey, hintValue);
    }

    @Override
    public void setRenderingHints(final Map<?, ?> hints) {
        backend.setRenderingHints(hints);
    }

    @Override
    public void addRenderingHints(final Map<?, ?> hints) {
        backend.addRenderingHints(hints);
    }

    @Override
    public void setFont(final Font font) {
        backend.setFont(font);
    }

    @Override
    public void setPaintMode() {
        flush();
        backend.setPaintMode();
    }

    @Override
    public void setXORMode(final Color c1) {
        flush();
        backend.setXORMode(c1);
    }

    // ---- drawing calls that pass through (after the collected path) ----

    @Override
    public void drawString(final String str, final int x, final int y) {
        ready();
        backend.drawString(str, x, y);
    }

    @Override
    public void drawString(final String str, final float x, final float y) {
        ready();
        backend.drawString(str, x, y);
    }

    @Override
    public void drawString(final AttributedCharacterIterator iterator, final int x, final int y) {
        ready();
        backend.drawString(iterator, x, y);
    }

    @Override
    public void drawString(final AttributedCharacterIterator iterator, final float x, final float y) {
        ready();
        backend.drawString(iterator, x, y);
    }

    @Override
    public void drawGlyphVector(final GlyphVector g, final float x, final float y) {
        ready();
        backend.drawGlyphVector(g, x, y);
    }

    @Override
    public boolean drawImage(final Image img, final AffineTransform xform, final ImageObserver obs) {
        ready();
        return backend.drawImage(img, xform, obs);
    }

    @Override
    public void drawImage(final BufferedImage img, final BufferedImageOp op, final int x, final int y) {
        ready();
        backend.drawImage(img, op, x, y);
    }

    @Override
    public void drawRenderedImage(final RenderedImage img, final AffineTransform xform) {
        ready();
        backend.drawRenderedImage(img, xform);
    }

    @Override
    public void drawRenderableImage(final RenderableImage img, final AffineTransform xform) {
        ready();
        backend.drawRenderableImage(img, xform);
    }

    @Override
    public boolean drawImage(final Image img, final int x, final int y, final ImageObserver observer) {
        ready();
        return backend.drawImage(img, x, y, observer);
    }

    @Override
    public boolean drawImage(final Image img, final int x, final int y, final int width, final int height,
                             final ImageObserver observer) {
        ready();
        return backend.drawImage(img, x, y, width, height, observer);
    }

    @Override
    public boolean drawImage(final Image img, final int x, final int y, final Color bgcolor,
                             final ImageObserver observer) {
        ready();
        return backend.drawImage(img, x, y, bgcolor, observer);
    }

    @Override
    public boolean drawImage(final Image img, final int x, final int y, final int width, final int height,
                             final Color bgcolor, final ImageObserver observer) {
        ready();
        return backend.drawImage(img, x, y, width, height, bgcolor, observer);
    }

    @Override
    public boolean drawImage(final Image img, final int dx1, final int dy1, final int dx2, final int dy2,
                             final int sx1, final int sy1, final int sx2, final int sy2, final ImageObserver observer) {
        ready();
        return backend.drawImage(img, dx1, dy1, dx2, dy2, sx1, sy1, sx2, sy2, observer);
    }

    @Override
    public boolean drawImage(final Image img, final int dx1, final int dy1, final int dx2, final int dy2,
                             final int sx1, final int sy1, final int sx2, final int sy2, final Color bgcolor,
                             final ImageObserver observer) {
        ready();
        return backend.drawImage(img, dx1, dy1, dx2, dy2, sx1, sy1, sx2, sy2, bgcolor, observer);
    }

    @Override
    public void copyArea(final int x, final int y, final int width, final int height, final int dx, final int dy) {
        ready();
        backend.copyArea(x, y, width, height, dx, dy);
    }

    @Override
    public void drawLine(final int x1, final int y1, final int x2, final int y2) {
        draw(new Line2D.Double(x1, y1, x2, y2));
    }

    @Override
    public void fillRect(final int x, final int y, final int width, final int height) {
        ready();
        backend.fillRect(x, y, width, height);
    }

    @Override
    public void clearRect(final int x, final int y, final int width, final int height) {
        ready();
        backend.clearRect(x, y, width, height);
    }

    @Override
    public void drawRoundRect(final int x, final int y, final int width, final int height, final int arcWidth,
                              final int arcHeight) {
        ready();
        backend.drawRoundRect(x, y, width, height, arcWidth, arcHeight);
    }

    @Override
    public void fillRoundRect(final int x, final int y, final int width, final int height, final int arcWidth,
                              final int arcHeight) {
        ready();
        backend.fillRoundRect(x, y, width, height, arcWidth, arcHeight);
    }

    @Override
    public void drawOval(final int x, final int y, final int width, final int height) {
        ready();
        backend.drawOval(x, y, width, height);
    }

    @Override
    public void fillOval(final int x, final int y, final int width, final int height) {
        ready();
        backend.fillOval(x, y, width, height);
    }

    @Override
    public void drawArc(final int x, final int y, final int width, final int height, final int startAngle,
                        final int arcAngle) {
        ready();
        backend.drawArc(x, y, width, height, startAngle, arcAngle);
    }

    @Override
    public void fillArc(final int x, final int y, final int width, final int height, final int startAngle,
                        final int arcAngle) {
        ready();
        backend.fillArc(x, y, width, height, startAngle, arcAngle);
    }

    @Override
    public void drawPolyline(final int[] xPoints, final int[] yPoints, final int nPoints) {
        ready();
        backend.drawPolyline(xPoints, yPoints, nPoints);
    }

    @Override
    public void drawPolygon(final int[] xPoints, final int[] yPoints, final int nPoints) {
        ready();
        backend.drawPolygon(xPoints, yPoints, nPoints);
    }

    @Override
    public void fillPolygon(final int[] xPoints, final int[] yPoints, final int nPoints) {
        ready();
        backend.fillPolygon(xPoints, yPoints, nPoints);
    }

    // ---- queries ----

    @Override
    public FontRenderContext getFontRenderContext() {
        return FRC;
    }

    @Override
    public Graphics create() {
        ready();
        return new VectorCanvas((Graphics2D) backend.create(), labels);
    }

    @Override
    public void dispose() {
        flush();
    }

    @Override
    public boolean hit(final Rectangle rect, final Shape s, final boolean onStroke) {
        return backend.hit(rect, s, onStroke);
    }

    @Override
    public GraphicsConfiguration getDeviceConfiguration() {
        return backend.getDeviceConfiguration();
    }

    @Override
    public Object getRenderingHint(final RenderingHints.Key hintKey) {
        return backend.getRenderingHint(hintKey);
    }

    @Override
    public RenderingHints getRenderingHints() {
        return backend.getRenderingHints();
    }

    @Override
    public AffineTransform getTransform() {
        return backend.getTransform();
    }

    @Override
    public Paint getPaint() {
        return paint != null ? paint : backend.getPaint();
    }

    @Override
    public Composite getComposite() {
        return backend.getComposite();
    }

    @Override
    public Color getBackground() {
        return backend.getBackground();
    }

    @Override
    public Stroke getStroke() {
        return backend.getStroke();
    }

    @Override
    public Color getColor() {
        return paint instanceof Color c ? c : backend.getColor();
    }

    @Override
    public Font getFont() {
        return backend.getFont();
    }

    @Override
    public FontMetrics getFontMetrics(final Font f) {
        return backend.getFontMetrics(f);
    }

    @Override
    public Rectangle getClipBounds() {
        return backend.getClipBounds();
    }

    @Override
    public Shape getClip() {
        return backend.getClip();
    }
}
