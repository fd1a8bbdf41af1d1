package org.nebulith.report.chart;

import java.awt.Shape;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;

/** Marker shapes, each recognisable without colour. Open shapes are drawn as outlines, the others filled. */
public enum Marker {
    /** Filled circle. */
    CIRCLE(true),
    /** Filled square. */
    SQUARE(true),
    /** Filled triangle, point up. */
    TRIANGLE_UP(true),
    /** Filled diamond. */
    DIAMOND(true),
    /** Filled triangle, point down. */
    TRIANGLE_DOWN(true),
    /** Open circle. */
    OPEN_CIRCLE(false),
    /** Open square. */
    OPEN_SQUARE(false),
    /** Diagonal cross (outline). */
    CROSS(false),
    /** Plus sign (outline). */
    PLUS(false),
    /** Open diamond. */
    OPEN_DIAMOND(false),
    /** Five-pointed star, filled. */
    STAR(true);

    private final boolean filled;

    Marker(final boolean filled) {
        this.filled = filled;
    }

    /** @return whether the shape is filled (else stroked) */
    public boolean filled() {
        return filled;
    }

    /**
     * @param scale size relative to the chart's marker size
     * @return this shape as an XChart series marker
     */
    org.knowm.xchart.style.markers.Marker sized(final double scale) {
        return new SeriesMarker(this, scale);
    }

    /** An XChart marker drawing one of these shapes, filled or as a thin outline. */
    private static final class SeriesMarker extends org.knowm.xchart.style.markers.Marker {
        private static final java.awt.BasicStroke OUTLINE = new java.awt.BasicStroke(0.7f);
        private final Marker shape;
        private final double scale;

        SeriesMarker(final Marker shape, final double scale) {
            this.shape = shape;
            this.scale = scale;
        }

        @Override
        public void paint(final java.awt.Graphics2D g, final double x, final double y, final int size) {
            Shape s = shape.at(x, y, size * scale);
            if (shape.filled()) {
                g.fill(s);
                return;
            }
            java.awt.Stroke old = g.getStroke();
            g.setStroke(OUTLINE);
            g.draw(s);
            g.setStroke(old);
        }
    }

    /**
     * @param x    centre x [pt]
     * @param y    centre y [pt]
     * @param size overall size [pt]
     * @return the shape
     */
    public Shape at(final double x, final double y, final double size) {
        double h = size / 2;
        switch (this) {
            case CIRCLE:
            case OPEN_CIRCLE:
                return new Ellipse2D.Double(x - h, y - h, size, size);
            case SQUARE:
            case OPEN_SQUARE:
                return new Rectangle2D.Double(x - h * 0.9, y - h * 0.9, size * 0.9, size * 0.9);
            case TRIANGLE_UP:
                return polygon(x, y, new double[] {0, h * 1.1, -h * 1.1}, new double[] {-h * 1.1, h * 0.8, h * 0.8});
            case TRIANGLE_DOWN:
                return polygon(x, y, new double[] {0, h * 1.1, -h * 1.1}, new double[] {h * 1.1, -h * 0.8, -h * 0.8});
            case DIAMOND:
            case OPEN_DIAMOND:
                return polygon(x, y, new double[] {0, h * 1.2, 0, -h * 1.2}, new double[] {-h * 1.2, 0, h * 1.2, 0});
            case CROSS:
                return lines(x, y, new double[] {-h, h, -h, h}, new double[] {-h, h, h, -h});
            case PLUS:
                return lines(x, y, new double[] {-h * 1.2, h * 1.2, 0, 0}, new double[] {0, 0, -h * 1.2, h * 1.2});
            default:
                return star(x, y, h * 1.3);
        }
    }

    private static Shape polygon(final double x, final double y, final double[] dx, final double[] dy) {
        Path2D.Double p = new Path2D.Double();
        p.moveTo(x + dx[0], y + dy[0]);
        for (int i = 1; i < dx.length; i++) {
            p.lineTo(x + dx[i], y + dy[i]);
        }
        p.closePath();
        return p;
    }

    private static Shape lines(final double x, final double y, final double[] dx, final double[] dy) {
        Path2D.Double p = new Path2D.Double();
        for (int i = 0; i < dx.length; i += 2) {
            p.moveTo(x + dx[i], y + dy[i]);
            p.lineTo(x + dx[i + 1], y + dy[i + 1]);
        }
        return p;
    }

    private static Shape star(final double x, final double y, final double r) {
        Path2D.Double p = new Path2D.Double();
        for (int i = 0; i < 10; i++) {
            double a = -Math.PI / 2 + i * Math.PI / 5;
            double rr = i % 2 == 0 ? r : r * 0.45;
            if (i == 0) {
                p.moveTo(x + rr * Math.cos(a), y + rr * Math.sin(a));
            } else {
                p.lineTo(x + rr * Math.cos(a), y + rr * Math.sin(a));
            }
        }
        p.closePath();
        return p;
    }
}
