package org.nebulith.report.chart;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.geom.AffineTransform;
import java.util.ArrayDeque;
import java.util.Deque;

/** Paints a {@link Drawing} on a Java2D surface (a PNG image, or a PDF page through pdfbox-graphics2d). */
final class Java2dPainter {

    private Java2dPainter() {
    }

    /**
     * @param drawing the drawing
     * @param g       the surface, already scaled so that one unit is one point
     */
    static void paint(final Drawing drawing, final Graphics2D g) {
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        Deque<Shape> clips = new ArrayDeque<>();
        for (Drawing.Op op : drawing.ops()) {
            if (op instanceof Drawing.Stroke s) {
                g.setColor(s.style().colour());
                g.setStroke(s.style().stroke());
                g.draw(s.shape());
            } else if (op instanceof Drawing.Fill f) {
                g.setColor(f.colour());
                g.fill(f.shape());
            } else if (op instanceof Drawing.Text t) {
                text(g, t);
            } else if (op instanceof Drawing.Clip c) {
                clips.push(g.getClip() == null ? drawing.bounds() : g.getClip());
                g.clip(c.area());
            } else {
                g.setClip(clips.pop());
            }
        }
    }

    private static void text(final Graphics2D g, final Drawing.Text t) {
        g.setColor(t.colour());
        g.setFont(Fonts.at(t.sizePt()));
        double w = Fonts.width(t.text(), t.sizePt());
        double shift = t.align() == Drawing.Align.LEFT ? 0 : t.align() == Drawing.Align.CENTRE ? w / 2 : w;
        if (!t.upright()) {
            g.drawString(t.text(), (float) (t.x() - shift), (float) t.y());
            return;
        }
        AffineTransform saved = g.getTransform();
        g.translate(t.x(), t.y());
        g.rotate(-Math.PI / 2);
        g.drawString(t.text(), (float) -shift, 0f);
        g.setTransform(saved);
    }
}
