package org.nebulith.report.chart;

/**
 * Figure sizes for journals, in points (1/72 in): the chart is laid out at this size, vector
 * files keep it, and PNG files are rendered at {@link ChartStyle#PNG_DPI}.
 */
public enum ChartSize {
    /** One journal column: 3.5 in x 2.6 in (1050 x 780 px at 300 dpi). */
    COLUMN(252, 187),
    /** One column, taller, for charts with a long legend: 3.5 in x 3.2 in. */
    COLUMN_TALL(252, 230),
    /** Full page width: 7.1 in x 3.6 in. */
    PAGE(511, 259);

    private final int widthPt;
    private final int heightPt;

    ChartSize(final int widthPt, final int heightPt) {
        this.widthPt = widthPt;
        this.heightPt = heightPt;
    }

    /** @return width [pt] */
    public int widthPt() {
        return widthPt;
    }

    /** @return height [pt] */
    public int heightPt() {
        return heightPt;
    }
}
