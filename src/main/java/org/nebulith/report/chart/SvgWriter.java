package org.nebulith.report.chart;

import java.awt.Color;
import java.awt.Shape;
import java.awt.geom.PathIterator;
import java.awt.geom.Rectangle2D;
import java.util.Locale;

/**
 * Writes a {@link Drawing} as SVG 1.1 with live text: every text run is a {@code <text>} element
 * (editable in a drawing program, searchable), every shape one {@code <path>}; coordinates in points
 * to 0.01 pt. The output depends only on the drawing (no dates, no ids from hash codes).
 */
public final class SvgWriter {

    private SvgWriter() {
    }

    /**
     * @param drawing the drawing
     * @return the SVG document
     */
    public static String write(final Drawing drawing) {
        StringBuilder s = new StringBuilder(1 << 15);
        String w = num(drawing.widthPt());
        String h = num(drawing.heightPt());
        s.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n")
                .append("<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"").append(w)
                .append("pt\" height=\"").append(h).append("pt\" viewBox=\"0 0 ").append(w).append(' ').append(h)
                .append("\">\n<rect width=\"").append(w).append("\" height=\"").append(h)
                .append("\" fill=\"#ffffff\"/>\n<g font-family=\"").append(escape(Fonts.SVG_FAMILY)).append("\">\n");
        int clipId = 0;
        for (Drawing.Op op : drawing.ops()) {
            if (op instanceof Drawing.Stroke st) {
                stroke(s, st);
            } else if (op instanceof Drawing.Fill f) {
                s.append("<path d=\"").append(path(f.shape())).append("\" fill=\"").append(hex(f.colour()))
                        .append('"').append(opacity("fill-opacity", f.colour())).append("/>\n");
            } else if (op instanceof Drawing.Text t) {
                text(s, t);
            } else if (op instanceof Drawing.Clip c) {
                clipId++;
                Rectangle2D r = c.area();
                s.append("<clipPath id=\"clip").append(clipId).append("\"><rect x=\"").append(num(r.getX()))
                        .append("\" y=\"").append(num(r.getY())).append("\" width=\"").append(num(r.getWidth()))
                        .append("\" height=\"").append(num(r.getHeight())).append("\"/></clipPath>\n<g clip-path=\"url(#clip")
                        .append(clipId).append(")\">\n");
            } else {
                s.append("</g>\n");
            }
        }
        return s.append("</g>\n</svg>\n").toString();
    }

    private static void stroke(final StringBuilder s, final Drawing.Stroke st) {
        LineStyle l = st.style();
        s.append("<path d=\"").append(path(st.shape())).append("\" fill=\"none\" stroke=\"").append(hex(l.colour()))
                .append('"').append(opacity("stroke-opacity", l.colour())).append(" stroke-width=\"")
                .append(num(l.width())).append("\" stroke-linejoin=\"round\"");
        float[] dash = l.dash();
        if (dash.length > 0) {
            s.append(" stroke-dasharray=\"");
            for (int i = 0; i < dash.length; i++) {
                s.append(i == 0 ? "" : " ").append(num(dash[i]));
            }
            s.append('"');
        }
        s.append("/>\n");
    }

    private static void text(final StringBuilder s, final Drawing.Text t) {
        String anchor = t.align() == Drawing.Align.LEFT ? "start" : t.align() == Drawing.Align.CENTRE ? "middle" : "end";
        s.append("<text x=\"").append(num(t.x())).append("\" y=\"").append(num(t.y())).append("\" font-size=\"")
                .append(num(t.sizePt())).append("\" text-anchor=\"").append(anchor).append("\" fill=\"")
                .append(hex(t.colour())).append('"');
        if (t.upright()) {
            s.append(" transform=\"rotate(-90 ").append(num(t.x())).append(' ').append(num(t.y())).append(")\"");
        }
        s.append('>').append(escape(t.text())).append("</text>\n");
    }

    /** @param shape a shape @return its SVG path data, coordinates to 0.01 pt */
    static String path(final Shape shape) {
        StringBuilder d = new StringBuilder(64);
        double[] c = new double[6];
        for (PathIterator it = shape.getPathIterator(null); !it.isDone(); it.next()) {
            int type = it.currentSegment(c);
            switch (type) {
                case PathIterator.SEG_MOVETO -> d.append('M').append(num(c[0])).append(' ').append(num(c[1]));
                case PathIterator.SEG_LINETO -> d.append('L').append(num(c[0])).append(' ').append(num(c[1]));
                case PathIterator.SEG_QUADTO -> d.append('Q').append(num(c[0])).append(' ').append(num(c[1]))
                        .append(' ').append(num(c[2])).append(' ').append(num(c[3]));
                case PathIterator.SEG_CUBICTO -> d.append('C').append(num(c[0])).append(' ').append(num(c[1]))
                        .append(' ').append(num(c[2])).append(' ').append(num(c[3])).append(' ').append(num(c[4]))
                        .append(' ').append(num(c[5]));
                default -> d.append('Z');
            }
        }
        return d.toString();
    }

    private static String opacity(final String attribute, final Color c) {
        return c.getAlpha() == 255 ? ""
                : " " + attribute + "=\"" + String.format(Locale.ROOT, "%.3f", c.getAlpha() / 255.0) + "\"";
    }

    private static String hex(final Color c) {
        return String.format(Locale.ROOT, "#%02x%02x%02x", c.getRed(), c.getGreen(), c.getBlue());
    }

    /** @param v a coordinate @return it to 0.01, without trailing zeros */
    static String num(final double v) {
        long hundredths = Math.round(v * 100);
        if (hundredths % 100 == 0) {
            return Long.toString(hundredths / 100);
        }
        String sign = hundredths < 0 ? "-" : "";
        long a = Math.abs(hundredths);
        String frac = String.format(Locale.ROOT, "%02d", a % 100);
        if (frac.endsWith("0")) {
            frac = frac.substring(0, 1);
        }
        return sign + (a / 100) + "." + frac;
    }

    static String escape(final String text) {
        StringBuilder out = new StringBuilder(text.length() + 8);
        for (int i = 0; i < text.length(); i++) {
            char ch = text.charAt(i);
            switch (ch) {
                case '&' -> out.append("&amp;");
                case '<' -> out.append("&lt;");
                case '>' -> out.append("&gt;");
                case '"' -> out.append("&quot;");
                default -> out.append(ch);
            }
        }
        return out.toString();
    }
}
