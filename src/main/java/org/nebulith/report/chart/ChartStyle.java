package org.nebulith.report.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.util.Locale;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.XYStyler;
import org.knowm.xchart.style.markers.Marker;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Nebulith's own chart look: white background, thin dark axes box, light dotted grid, sans-serif
 * type sized for a journal column (7 pt ticks, 8 pt axis titles), the {@link Palette} colours, no
 * chart title (captions belong to the paper or report), {@link Locale#ROOT} numbers without
 * grouping.
 */
public final class ChartStyle {

    /** Resolution of PNG output [dots per inch]. */
    public static final int PNG_DPI = 300;

    /** Tick-label font. */
    static final Font TICK_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 7);
    /** Axis-title font. */
    static final Font TITLE_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 8);
    /** Legend font. */
    static final Font LEGEND_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 7);
    /** Annotation font. */
    static final Font NOTE_FONT = new Font(Font.SANS_SERIF, Font.PLAIN, 6);

    private static final Color AXIS = new Color(0x33, 0x33, 0x33);
    private static final Color GRID = new Color(0xDD, 0xDD, 0xDD);

    private static final Marker[] MARKERS = {
        SeriesMarkers.CIRCLE, SeriesMarkers.SQUARE, SeriesMarkers.DIAMOND, SeriesMarkers.TRIANGLE_UP,
        SeriesMarkers.TRIANGLE_DOWN, SeriesMarkers.CROSS, SeriesMarkers.PLUS, SeriesMarkers.OVAL,
    };

    private ChartStyle() {
    }

    /**
     * @param size   figure size
     * @param xTitle x-axis title with unit
     * @param yTitle y-axis title with unit
     * @return an empty XY chart in Nebulith style
     */
    public static XYChart newXYChart(final ChartSize size, final String xTitle, final String yTitle) {
        XYChart chart = new XYChart(size.widthPt(), size.heightPt());
        chart.setXAxisTitle(xTitle);
        chart.setYAxisTitle(yTitle);
        apply(chart.getStyler());
        return chart;
    }

    /** @param styler the styler to set up */
    static void apply(final XYStyler styler) {
        styler.setLocale(Locale.ROOT);
        styler.setChartBackgroundColor(Color.WHITE);
        styler.setPlotBackgroundColor(Color.WHITE);
        styler.setPlotBorderColor(AXIS);
        styler.setPlotBorderVisible(true);
        styler.setChartTitleVisible(false);
        styler.setChartPadding(4);
        styler.setPlotMargin(0);
        styler.setPlotGridLinesColor(GRID);
        styler.setPlotGridLinesStroke(new BasicStroke(0.4f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                new float[] {1f, 1f}, 0f));
        styler.setAxisTickLabelsFont(TICK_FONT);
        styler.setAxisTitleFont(TITLE_FONT);
        styler.setAxisTickLabelsColor(AXIS);
        styler.setAxisTickMarksColor(AXIS);
        styler.setAxisTickMarkLength(3);
        styler.setAxisTickPadding(2);
        styler.setAxisTitlePadding(3);
        styler.setLegendFont(LEGEND_FONT);
        styler.setLegendBorderColor(Color.WHITE);
        styler.setLegendBackgroundColor(Color.WHITE);
        styler.setLegendPadding(3);
        styler.setLegendSeriesLineLength(14);
        styler.setLegendPosition(Styler.LegendPosition.OutsideE);
        styler.setAnnotationTextFont(NOTE_FONT);
        styler.setAnnotationTextFontColor(Palette.REFERENCE);
        styler.setAnnotationLineColor(Palette.REFERENCE);
        styler.setAnnotationLineStroke(new BasicStroke(0.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                new float[] {3f, 2f}, 0f));
        styler.setMarkerSize(4);
        styler.setXAxisTickMarkSpacingHint(36);
        styler.setYAxisTickMarkSpacingHint(24);
        styler.setXAxisLogarithmicDecadeOnly(true);
        styler.setYAxisLogarithmicDecadeOnly(true);
        styler.setDefaultSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        styler.setAntiAlias(true);
        styler.setTextAntiAlias(true);
        styler.setDecimalPattern("0.###");
    }

    /**
     * Colours a line series by its index.
     *
     * @param series the series
     * @param index  its index among the chart's data series
     */
    static void line(final XYSeries series, final int index) {
        series.setLineColor(Palette.colour(index));
        series.setLineStyle(Palette.stroke(index));
        series.setMarker(SeriesMarkers.NONE);
    }

    /**
     * Marks a point series by its index (colour and marker shape both vary).
     *
     * @param series the series
     * @param index  its index
     */
    static void points(final XYSeries series, final int index) {
        series.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        series.setMarker(MARKERS[Math.floorMod(index, MARKERS.length)]);
        series.setMarkerColor(Palette.colour(index));
    }
}
