package org.nebulith.report.chart;

/** Output formats of a chart. */
public enum ChartFormat {
    /** Raster, {@value ChartStyle#PNG_DPI} dpi, for screens and the HTML report. */
    PNG("png"),
    /** Vector with live text ({@code <text>} elements), written through VectorGraphics2D. */
    SVG("svg"),
    /** Vector (pdfbox-graphics2d) with the chart font embedded and text kept as text, for papers. */
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
