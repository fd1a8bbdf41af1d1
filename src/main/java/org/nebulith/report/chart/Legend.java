package org.nebulith.report.chart;

import java.awt.Color;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

/** A legend: one row per entry (line sample and/or marker, then the label), in one or more columns. */
public final class Legend {

    private static final double SAMPLE = 16;
    private static final double GAP = 3;

    /**
     * @param label  text
     * @param line   line sample, or null
     * @param marker marker, or null
     * @param colour marker colour
     */
    public record Entry(String label, LineStyle line, Marker marker, Color colour) {
        public Entry {
            Objects.requireNonNull(label);
        }

        /** @param label text @param s series style @return an entry with line and marker */
        public static Entry of(final String label, final ChartStyle.Series s) {
            return new Entry(label, s.line(), s.marker(), s.colour());
        }
    }

    private final List<Entry> entries = new ArrayList<>();

    /** @param e an entry @return this */
    public Legend add(final Entry e) {
        entries.add(e);
        return this;
    }

    /** @return whether there is nothing to show */
    public boolean isEmpty() {
        return entries.isEmpty();
    }

    /** @return height of one row [pt] */
    public static double rowHeight() {
        return ChartStyle.LEGEND_PT * 1.35;
    }

    /** @return width of one column [pt] */
    public double columnWidth() {
        double w = 0;
        for (Entry e : entries) {
            w = Math.max(w, Fonts.width(e.label(), ChartStyle.LEGEND_PT));
        }
        return SAMPLE + GAP + w;
    }

    /**
     * @param columns number of columns
     * @return the height [pt]
     */
    public double height(final int columns) {
        return Math.ceil(entries.size() / (double) columns) * rowHeight();
    }

    /**
     * @param d       drawing
     * @param x       left edge [pt]
     * @param y       top edge [pt]
     * @param columns number of columns (filled row by row)
     * @param columnGap space between columns [pt]
     */
    public void draw(final Drawing d, final double x, final double y, final int columns, final double columnGap) {
        double cw = columnWidth() + columnGap;
        Panel helper = new Panel(d, new Rectangle2D.Double(0, 0, d.widthPt(), d.heightPt()),
                Axis.linear(0, 1, ""), Axis.linear(0, 1, ""));
        for (int i = 0; i < entries.size(); i++) {
            Entry e = entries.get(i);
            double x0 = x + (i % columns) * cw;
            double mid = y + (i / columns) * rowHeight() + rowHeight() / 2;
            if (e.line() != null) {
                d.stroke(new Line2D.Double(x0, mid, x0 + SAMPLE, mid), e.line());
            }
            if (e.marker() != null) {
                helper.markerAt(e.marker(), x0 + SAMPLE / 2, mid, e.colour(), ChartStyle.MARKER_PT);
            }
            d.text(e.label(), x0 + SAMPLE + GAP, mid + Fonts.capHeight(ChartStyle.LEGEND_PT) / 2,
                    ChartStyle.LEGEND_PT, Drawing.Align.LEFT, Palette.AXIS);
        }
    }
}
