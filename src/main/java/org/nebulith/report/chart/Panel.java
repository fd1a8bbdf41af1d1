package org.nebulith.report.chart;

import java.awt.Color;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.List;

/**
 * One plot box of a figure: its rectangle on the drawing, its x and y axes (and optionally a
 * second y axis on the right), the frame, grid, ticks and labels, and the data drawn inside,
 * clipped to the box. Every data method takes data coordinates.
 */
public final class Panel {

    /** Length of a major tick mark [pt]. */
    static final double TICK = 3;
    /** Gap between a tick mark and its label [pt]. */
    static final double TICK_GAP = 1.5;

    private final Drawing d;
    private final Rectangle2D area;
    private final Axis x;
    private final Axis y;
    private Axis right;

    /**
     * @param drawing the drawing
     * @param area    the plot box [pt]
     * @param x       x axis
     * @param y       y axis (left)
     */
    public Panel(final Drawing drawing, final Rectangle2D area, final Axis x, final Axis y) {
        this.d = drawing;
        this.area = (Rectangle2D) area.clone();
        this.x = x;
        this.y = y;
    }

    /** @param axis a second y axis, drawn on the right @return this */
    public Panel rightAxis(final Axis axis) {
        this.right = axis;
        return this;
    }

    /** @return the plot box [pt] */
    public Rectangle2D area() {
        return (Rectangle2D) area.clone();
    }

    /** @return the x axis */
    public Axis x() {
        return x;
    }

    /** @return the y axis */
    public Axis y() {
        return y;
    }

    /** @return the drawing */
    public Drawing drawing() {
        return d;
    }

    /** @param v x value @return device x [pt] */
    public double px(final double v) {
        return area.getMinX() + x.fraction(v) * area.getWidth();
    }

    /** @param v y value @return device y [pt] */
    public double py(final double v) {
        return area.getMaxY() - y.fraction(v) * area.getHeight();
    }

    /** @param v value on the right axis @return device y [pt] */
    public double pyRight(final double v) {
        return area.getMaxY() - right.fraction(v) * area.getHeight();
    }

    /**
     * Draws grid, frame, ticks, tick labels and axis titles.
     *
     * @param xLabels whether to label the x ticks and write the x title
     * @param yLabels whether to label the y ticks and write the y title
     * @return this
     */
    public Panel frame(final boolean xLabels, final boolean yLabels) {
        LineStyle grid = new LineStyle(Palette.GRID, 0.4, new float[] {1f, 1f});
        LineStyle axis = LineStyle.solid(Palette.AXIS, 0.6);
        for (double t : x.ticks()) {
            d.stroke(new Line2D.Double(px(t), area.getMinY(), px(t), area.getMaxY()), grid);
        }
        for (double t : y.ticks()) {
            d.stroke(new Line2D.Double(area.getMinX(), py(t), area.getMaxX(), py(t)), grid);
        }
        d.stroke(area, axis);
        xTicks(xLabels, axis);
        yTicks(y, area.getMinX(), -1, yLabels, axis);
        if (right != null) {
            yTicks(right, area.getMaxX(), 1, true, axis);
        }
        return this;
    }

    /** Draws the frame, the x ticks, their labels and the x title only. @return this */
    public Panel frameXOnly() {
        LineStyle axis = LineStyle.solid(Palette.AXIS, 0.6);
        d.stroke(area, axis);
        xTicks(true, axis);
        return this;
    }

    private void xTicks(final boolean labels, final LineStyle axis) {
        double base = area.getMaxY();
        for (double t : x.minorTicks()) {
            d.stroke(new Line2D.Double(px(t), base, px(t), base + TICK * 0.6), axis);
        }
        for (double t : x.ticks()) {
            d.stroke(new Line2D.Double(px(t), base, px(t), base + TICK), axis);
            if (labels) {
                d.text(x.label(t), px(t), base + TICK + TICK_GAP + Fonts.capHeight(ChartStyle.TICK_PT),
                        ChartStyle.TICK_PT, Drawing.Align.CENTRE, Palette.AXIS);
            }
        }
        if (labels) {
            d.text(x.title(), area.getCenterX(), base + TICK + 2 * TICK_GAP + Fonts.capHeight(ChartStyle.TICK_PT)
                    + ChartStyle.TITLE_PT + 1, ChartStyle.TITLE_PT, Drawing.Align.CENTRE, Palette.AXIS);
        }
    }

    private void yTicks(final Axis axisY, final double edge, final int side, final boolean labels,
                        final LineStyle axis) {
        double widest = 0;
        for (double t : axisY.minorTicks()) {
            double yy = area.getMaxY() - axisY.fraction(t) * area.getHeight();
            d.stroke(new Line2D.Double(edge, yy, edge + side * TICK * 0.6, yy), axis);
        }
        for (double t : axisY.ticks()) {
            double yy = area.getMaxY() - axisY.fraction(t) * area.getHeight();
            d.stroke(new Line2D.Double(edge, yy, edge + side * TICK, yy), axis);
            if (labels) {
                String text = axisY.label(t);
                widest = Math.max(widest, Fonts.width(text, ChartStyle.TICK_PT));
                d.text(text, edge + side * (TICK + TICK_GAP), yy + Fonts.capHeight(ChartStyle.TICK_PT) / 2,
                        ChartStyle.TICK_PT, side < 0 ? Drawing.Align.RIGHT : Drawing.Align.LEFT, Palette.AXIS);
            }
        }
        if (labels && !axisY.title().isEmpty()) {
            double at = edge + side * (TICK + TICK_GAP + widest + 2.5);
            d.uprightText(axisY.title(), side < 0 ? at : at + ChartStyle.TITLE_PT * 0.8, area.getCenterY(),
                    ChartStyle.TITLE_PT, Palette.AXIS);
        }
    }

    /**
     * Space a y axis needs left of its box: ticks, the widest label and the title.
     *
     * @param axisY the axis
     * @return width [pt]
     */
    public static double yAxisWidth(final Axis axisY) {
        double widest = 0;
        for (double t : axisY.ticks()) {
            widest = Math.max(widest, Fonts.width(axisY.label(t), ChartStyle.TICK_PT));
        }
        return TICK + TICK_GAP + widest + 3 + (axisY.title().isEmpty() ? 0 : ChartStyle.TITLE_PT + 1);
    }

    /** @return space an x axis with labels and title needs below its box [pt] */
    public static double xAxisHeight() {
        return TICK + 2 * TICK_GAP + Fonts.capHeight(ChartStyle.TICK_PT) + ChartStyle.TITLE_PT + 4;
    }

    /**
     * One line, one path: NaN breaks it, points are reduced to the figure's resolution.
     *
     * @param xs    x values
     * @param ys    y values
     * @param style line style
     * @return the device coordinates (x then y) used, for markers and labels
     */
    public double[][] line(final double[] xs, final double[] ys, final LineStyle style) {
        return lineOn(xs, ys, style, false);
    }

    /**
     * @param xs    x values
     * @param ys    values on the right axis
     * @param style line style
     * @return the device coordinates used
     */
    public double[][] lineRight(final double[] xs, final double[] ys, final LineStyle style) {
        return lineOn(xs, ys, style, true);
    }

    private double[][] lineOn(final double[] xs, final double[] ys, final LineStyle style, final boolean onRight) {
        double[] dx = new double[xs.length];
        double[] dy = new double[xs.length];
        for (int i = 0; i < xs.length; i++) {
            boolean ok = Double.isFinite(xs[i]) && Double.isFinite(ys[i]) && (!x.isLog() || xs[i] > 0)
                    && (!(onRight ? right : y).isLog() || ys[i] > 0);
            dx[i] = ok ? px(xs[i]) : Double.NaN;
            dy[i] = ok ? (onRight ? pyRight(ys[i]) : py(ys[i])) : Double.NaN;
        }
        Path2D.Double path = Polylines.path(dx, dy);
        d.clip(area).stroke(path, style).endClip();
        return new double[][] {dx, dy};
    }

    /**
     * Markers spaced evenly along a drawn line (device coordinates from {@link #line}).
     *
     * @param device  device x and y of the line
     * @param marker  shape
     * @param colour  colour
     * @param spacing distance between markers along the line [pt]
     * @param phase   distance of the first marker from the start [pt]
     */
    public void markersAlong(final double[][] device, final Marker marker, final Color colour, final double spacing,
                             final double phase) {
        double[] dx = device[0];
        double[] dy = device[1];
        double next = phase;
        double run = 0;
        d.clip(area);
        for (int i = 1; i < dx.length; i++) {
            if (!(Double.isFinite(dx[i]) && Double.isFinite(dx[i - 1]))) {
                continue;
            }
            double seg = Math.hypot(dx[i] - dx[i - 1], dy[i] - dy[i - 1]);
            while (run + seg >= next) {
                double f = seg == 0 ? 0 : (next - run) / seg;
                markerAt(marker, dx[i - 1] + f * (dx[i] - dx[i - 1]), dy[i - 1] + f * (dy[i] - dy[i - 1]), colour,
                        ChartStyle.MARKER_PT);
                next += spacing;
            }
            run += seg;
        }
        d.endClip();
    }

    /**
     * @param marker shape
     * @param xd     device x [pt]
     * @param yd     device y [pt]
     * @param colour colour
     * @param size   size [pt]
     */
    public void markerAt(final Marker marker, final double xd, final double yd, final Color colour, final double size) {
        if (marker.filled()) {
            d.fill(marker.at(xd, yd, size), colour);
            d.stroke(marker.at(xd, yd, size), LineStyle.solid(Color.WHITE, 0.3));
        } else {
            d.fill(marker.at(xd, yd, size), Color.WHITE);
            d.stroke(marker.at(xd, yd, size), LineStyle.solid(colour, 0.7));
        }
    }

    /**
     * @param marker shape
     * @param xv     x value
     * @param yv     y value
     * @param colour colour
     */
    public void point(final Marker marker, final double xv, final double yv, final Color colour) {
        markerAt(marker, px(xv), py(yv), colour, ChartStyle.MARKER_PT);
    }

    /**
     * A horizontal error bar with end caps.
     *
     * @param low    left end
     * @param high   right end
     * @param yv     y value
     * @param colour colour
     */
    public void xErrorBar(final double low, final double high, final double yv, final Color colour) {
        if (!(Double.isFinite(low) && Double.isFinite(high))) {
            return;
        }
        LineStyle s = LineStyle.solid(colour, 0.7);
        double yy = py(yv);
        Path2D.Double p = new Path2D.Double();
        p.moveTo(px(low), yy);
        p.lineTo(px(high), yy);
        p.moveTo(px(low), yy - 1.8);
        p.lineTo(px(low), yy + 1.8);
        p.moveTo(px(high), yy - 1.8);
        p.lineTo(px(high), yy + 1.8);
        d.clip(area).stroke(p, s).endClip();
    }

    /**
     * A vertical error bar with end caps.
     *
     * @param xv     x value
     * @param low    lower end
     * @param high   upper end
     * @param colour colour
     */
    public void yErrorBar(final double xv, final double low, final double high, final Color colour) {
        if (!(Double.isFinite(low) && Double.isFinite(high))) {
            return;
        }
        double xx = px(xv);
        Path2D.Double p = new Path2D.Double();
        p.moveTo(xx, py(low));
        p.lineTo(xx, py(high));
        p.moveTo(xx - 1.8, py(low));
        p.lineTo(xx + 1.8, py(low));
        p.moveTo(xx - 1.8, py(high));
        p.lineTo(xx + 1.8, py(high));
        d.clip(area).stroke(p, LineStyle.solid(colour, 0.7)).endClip();
    }

    /**
     * A label in data coordinates.
     *
     * @param text  the text
     * @param xv    x value of the anchor
     * @param yv    y value of the baseline
     * @param dx    shift right [pt]
     * @param dy    shift down [pt]
     * @param align alignment
     */
    public void label(final String text, final double xv, final double yv, final double dx, final double dy,
                      final Drawing.Align align) {
        d.text(text, px(xv) + dx, py(yv) + dy, ChartStyle.NOTE_PT, align, Palette.AXIS);
    }

    /**
     * @param v     x value of a vertical reference line
     * @param style line style
     */
    public void vline(final double v, final LineStyle style) {
        d.clip(area).stroke(new Line2D.Double(px(v), area.getMinY(), px(v), area.getMaxY()), style).endClip();
    }

    /**
     * @param v     y value of a horizontal reference line
     * @param style line style
     */
    public void hline(final double v, final LineStyle style) {
        d.clip(area).stroke(new Line2D.Double(area.getMinX(), py(v), area.getMaxX(), py(v)), style).endClip();
    }

    /**
     * A filled polygon in data coordinates.
     *
     * @param xs     x values
     * @param ys     y values
     * @param colour fill colour
     */
    public void area(final double[] xs, final double[] ys, final Color colour) {
        Path2D.Double p = new Path2D.Double();
        for (int i = 0; i < xs.length; i++) {
            if (i == 0) {
                p.moveTo(px(xs[i]), py(ys[i]));
            } else {
                p.lineTo(px(xs[i]), py(ys[i]));
            }
        }
        p.closePath();
        d.clip(area).fill(p, colour).endClip();
    }

    /**
     * A note inside the box, in the corner where it covers the fewest drawn lines and labels.
     *
     * @param lines text lines
     * @param free  what is drawn so far
     */
    void cornerNote(final List<String> lines, final Placement free) {
        Rectangle2D best = null;
        int fewest = Integer.MAX_VALUE;
        for (Rectangle2D box : noteCandidates(lines)) {
            int hits = free.hits(box);
            if (hits < fewest) {
                fewest = hits;
                best = box;
            }
            if (hits == 0) {
                break;
            }
        }
        free.take(best);
        drawNote(lines, best);
    }

    /** Corners first, then positions down the left and right edges and along the top and bottom. */
    private List<Rectangle2D> noteCandidates(final List<String> lines) {
        List<Rectangle2D> out = new java.util.ArrayList<>();
        for (boolean top : new boolean[] {true, false}) {
            for (boolean left : new boolean[] {true, false}) {
                out.add(noteBox(lines, top, left));
            }
        }
        Rectangle2D tl = noteBox(lines, true, true);
        Rectangle2D tr = noteBox(lines, true, false);
        Rectangle2D bl = noteBox(lines, false, true);
        for (double dy = 4; tl.getMaxY() + dy < area.getMaxY(); dy += 4) {
            out.add(new Rectangle2D.Double(tl.getX(), tl.getY() + dy, tl.getWidth(), tl.getHeight()));
            out.add(new Rectangle2D.Double(tr.getX(), tr.getY() + dy, tr.getWidth(), tr.getHeight()));
        }
        for (double dx = 4; tl.getMaxX() + dx < area.getMaxX(); dx += 4) {
            out.add(new Rectangle2D.Double(tl.getX() + dx, tl.getY(), tl.getWidth(), tl.getHeight()));
            out.add(new Rectangle2D.Double(bl.getX() + dx, bl.getY(), bl.getWidth(), bl.getHeight()));
        }
        return out;
    }

    /**
     * A note inside the box at one of its corners.
     *
     * @param lines text lines
     * @param top   true for the top corners
     * @param left  true for the left corners
     */
    public void cornerNote(final List<String> lines, final boolean top, final boolean left) {
        drawNote(lines, noteBox(lines, top, left));
    }

    private Rectangle2D noteBox(final List<String> lines, final boolean top, final boolean left) {
        double pad = 2.5;
        double widest = 0;
        for (String l : lines) {
            widest = Math.max(widest, Fonts.width(l, ChartStyle.NOTE_PT));
        }
        double w = widest + 3;
        double h = lines.size() * ChartStyle.NOTE_PT * 1.25 + 2;
        double x0 = left ? area.getMinX() + pad : area.getMaxX() - pad - w;
        double y0 = top ? area.getMinY() + pad : area.getMaxY() - pad - h;
        return new Rectangle2D.Double(x0, y0, w, h);
    }

    private void drawNote(final List<String> lines, final Rectangle2D box) {
        double lineH = ChartStyle.NOTE_PT * 1.25;
        d.fill(box, new Color(255, 255, 255, 235));
        for (int i = 0; i < lines.size(); i++) {
            d.text(lines.get(i), box.getMinX() + 1.5, box.getMinY() + 1 + (i + 1) * lineH - 1.6, ChartStyle.NOTE_PT,
                    Drawing.Align.LEFT, Palette.NOTE);
        }
    }
}
