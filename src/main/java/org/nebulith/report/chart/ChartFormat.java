package org.nebulith.report.chart;

/** Output formats of a chart. */
public enum ChartFormat {
    /** Raster, {@value ChartStyle#PNG_DPI} dpi, for screens and the HTML report. */
    PNG("png"),
    /** Vector, text as outlines (VectorGraphics2D). */
    SVG("svg"),
    /** Vector (pdfbox-graphics2d), for papers. */
    PDF("pdf");

    private final String extension;

    ChartFormat(final String extension) {
        this.extension = extension;
    }

    /** @return the file-name extension without dot */
    public String extension() {
        return extension;
    }
}
