package org.nebulith.report.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.util.Locale;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.XYStyler;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Nebulith's chart look on XChart: white background, thin dark axes box, thin light grid, the
 * bundled DejaVu Sans sized for a journal column (7 pt ticks, 8 pt axis titles, 6.5 pt notes), no
 * chart title (captions belong to the paper or report), the legend outside the plot, and the
 * {@link Palette} colours, line patterns and markers. Data series are added through
 * {@link #line} and {@link #points}, which reduce lines to what the figure shows ({@link Polylines}).
 */
public final class ChartStyle {

    /** Resolution of PNG output [dots per inch]. */
    public static final int PNG_DPI = 300;
    /** Tick-label size [pt]. */
    public static final double TICK_PT = 7;
    /** Axis-title size [pt]. */
    public static final double TITLE_PT = 8;
    /** Legend size [pt]. */
    public static final double LEGEND_PT = 7;
    /** Note and direct-label size [pt]. */
    public static final double NOTE_PT = 6.5;
    /** Space between a note and the edge of its panel [pt]. */
    static final int NOTE_PADDING = 2;
    /** Marker size [pt]. */
    public static final int MARKER_PT = 4;
    /** Title of a temperature axis. */
    static final String TEMPERATURE_TITLE = "Temperature T [K]";
    /** Margin around a chart [pt]. */
    public static final int PAD = 4;

    private ChartStyle() {
    }

    /**
     * @param figure the figure the chart belongs to (its tick labels are recorded there)
     * @param width  width [pt]
     * @param height height [pt]
     * @param xTitle x-axis title with unit
     * @param yTitle y-axis title with unit
     * @return an empty XY chart in Nebulith style, linear tick labels for people
     */
    static XYChart chart(final Figure figure, final double width, final double height, final String xTitle,
                         final String yTitle) {
        XYChart chart = new XYChart((int) Math.round(width), (int) Math.round(height));
        chart.setXAxisTitle(xTitle);
        chart.setYAxisTitle(yTitle);
        apply(chart.getStyler());
        chart.getStyler().setXAxisTickLabelsFormattingFunction(figure.recording(TickLabels::linear));
        chart.getStyler().setYAxisTickLabelsFormattingFunction(figure.recording(TickLabels::linear));
        return chart;
    }

    /**
     * A temperature axis decreasing to the right, as condensation diagrams are read (a gas cools
     * from left to right): the chart plots -T and labels it T; its ends rounded out to 100 K.
     *
     * @param figure       the figure
     * @param chart        the chart
     * @param temperatureK the temperatures shown [K]
     */
    static void temperatureAxis(final Figure figure, final XYChart chart, final double[] temperatureK) {
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double t : temperatureK) {
            min = Math.min(min, t);
            max = Math.max(max, t);
        }
        double lo = Math.floor(min / 100) * 100;
        double hi = Math.max(Math.ceil(max / 100) * 100, lo + 100);
        chart.getStyler().setXAxisMin(-hi);
        chart.getStyler().setXAxisMax(-lo);
        chart.getStyler().setXAxisTickLabelsFormattingFunction(figure.recording(v -> TickLabels.linear(-v)));
    }

    /**
     * @param figure the figure
     * @param chart  the chart
     * @param x      true for the x axis, false for y
     * @param min    low end, &gt; 0
     * @param max    high end
     */
    static void logAxis(final Figure figure, final XYChart chart, final boolean x, final double min,
                        final double max) {
        XYStyler s = chart.getStyler();
        double decades = Math.log10(max / min);
        if (x) {
            s.setXAxisLogarithmic(true);
            s.setXAxisLogarithmicDecadeOnly(decades > 3);
            s.setXAxisMin(min);
            s.setXAxisMax(max);
            s.setXAxisTickLabelsFormattingFunction(figure.recording(v -> TickLabels.log(v, decades)));
        } else {
            s.setYAxisLogarithmic(true);
            s.setYAxisLogarithmicDecadeOnly(decades > 3);
            s.setYAxisMin(min);
            s.setYAxisMax(max);
            s.setYAxisTickLabelsFormattingFunction(figure.recording(v -> TickLabels.log(v, decades)));
        }
    }

    /** @param styler the styler to set up */
    static void apply(final XYStyler styler) {
        styler.setLocale(Locale.ROOT);
        styler.setChartBackgroundColor(Color.WHITE);
        styler.setPlotBackgroundColor(Color.WHITE);
        styler.setPlotBorderColor(Palette.AXIS);
        styler.setPlotBorderVisible(true);
        styler.setAxisTicksLineVisible(false);
        styler.setYAxisLabelAlignment(org.knowm.xchart.style.AxesChartStyler.TextAlignment.Right);
        styler.setChartTitleVisible(false);
        styler.setChartTitleFont(Fonts.at(TITLE_PT));
        styler.setChartPadding(PAD);
        styler.setPlotMargin(0);
        styler.setPlotContentSize(1.0);
        styler.setPlotGridLinesColor(Palette.GRID);
        // solid: XChart fills the outline of each grid line, which for a dashed line is one box per dash
        styler.setPlotGridLinesStroke(new BasicStroke(0.3f));
        styler.setAxisTickLabelsFont(Fonts.at(TICK_PT));
        styler.setAxisTitleFont(Fonts.at(TITLE_PT));
        styler.setChartFontColor(Palette.AXIS);
        styler.setAxisTickLabelsColor(Palette.AXIS);
        styler.setAxisTickMarksColor(Palette.AXIS);
        styler.setAxisTickMarksStroke(new BasicStroke(0.6f));
        styler.setAxisTickMarkLength(3);
        styler.setAxisTickPadding(2);
        styler.setAxisTitlePadding(3);
        styler.setLegendFont(Fonts.at(LEGEND_PT));
        styler.setLegendBorderColor(Color.WHITE);
        styler.setLegendBackgroundColor(Color.WHITE);
        styler.setLegendPadding(3);
        styler.setLegendSeriesLineLength(14);
        styler.setLegendPosition(Styler.LegendPosition.OutsideE);
        styler.setAnnotationTextFont(Fonts.at(NOTE_PT));
        styler.setAnnotationTextFontColor(Palette.NOTE);
        styler.setAnnotationTextPanelFont(Fonts.at(NOTE_PT));
        styler.setAnnotationTextPanelFontColor(Palette.NOTE);
        styler.setAnnotationTextPanelBackgroundColor(new Color(255, 255, 255, 225));
        styler.setAnnotationTextPanelBorderColor(new Color(255, 255, 255, 0));
        styler.setAnnotationTextPanelPadding(NOTE_PADDING);
        styler.setAnnotationLineColor(Palette.REFERENCE);
        styler.setAnnotationLineStroke(new BasicStroke(0.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f,
                new float[] {3f, 2f}, 0f));
        styler.setMarkerSize(MARKER_PT);
        styler.setXAxisTickMarkSpacingHint(40);
        styler.setYAxisTickMarkSpacingHint(26);
        styler.setDefaultSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        styler.setAntiAlias(true);
        styler.setTextAntiAlias(true);
    }

    /**
     * Adds a line series, reduced to the vertices the figure can show.
     *
     * @param chart  the chart
     * @param name   series name (unique in the chart; shown in the legend when {@code legend})
     * @param x      x values (NaN breaks the line)
     * @param y      y values (NaN breaks the line)
     * @param style  colour, width and dash pattern
     * @param legend whether the legend lists it
     * @return the series, or null when no point has both values (nothing is drawn)
     */
    static XYSeries line(final XYChart chart, final String name, final double[] x, final double[] y,
                         final LineStyle style, final boolean legend) {
        double[][] kept = Polylines.reduce(chart, x, y);
        if (kept[0].length == 0) {
            return null;
        }
        XYSeries s = chart.addSeries(name, kept[0], kept[1]);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setLineColor(style.colour());
        s.setLineStyle(style.stroke());
        s.setMarker(SeriesMarkers.NONE);
        s.setMarkerColor(style.colour());
        s.setShowInLegend(legend);
        return s;
    }

    /**
     * Adds a legend entry showing a series' line and marker together (its one point lies outside
     * the axes, so the plot shows nothing of it): for lines whose markers are a series of their own.
     *
     * @param chart the chart, its x range set
     * @param name  the entry
     * @param style the line
     * @param marker the marker
     */
    static void legendEntry(final XYChart chart, final String name, final LineStyle style, final Marker marker) {
        double outside = chart.getStyler().getXAxisMax() + 1e6 * (1 + Math.abs(chart.getStyler().getXAxisMax()));
        double y = chart.getStyler().getYAxisMin() != null ? chart.getStyler().getYAxisMin() : 0;
        XYSeries s = chart.addSeries(name, new double[] {outside}, new double[] {y});
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setLineColor(style.colour());
        s.setLineStyle(style.stroke());
        s.setMarker(marker.sized(0.9));
        s.setMarkerColor(style.colour());
        s.setShowInLegend(true);
    }

    /**
     * Adds a series of markers only.
     *
     * @param chart  the chart
     * @param name   series name
     * @param x      x values
     * @param y      y values
     * @param marker the marker
     * @param colour its colour
     * @param scale  its size relative to {@link #MARKER_PT}
     * @param legend whether the legend lists it
     * @return the series, or null for no points
     */
    static XYSeries points(final XYChart chart, final String name, final double[] x, final double[] y,
                           final Marker marker, final Color colour, final double scale, final boolean legend) {
        if (x.length == 0) {
            return null;
        }
        XYSeries s = chart.addSeries(name, x, y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        s.setMarker(marker.sized(scale));
        s.setMarkerColor(colour);
        s.setLineColor(colour);
        s.setShowInLegend(legend);
        return s;
    }

    /**
     * Gives a chart without data series an invisible one (XChart paints no chart without series).
     *
     * @param chart the chart
     */
    static void neverEmpty(final XYChart chart) {
        if (!chart.getSeriesCollection().isEmpty()) {
            return;
        }
        XYStyler s = chart.getStyler();
        double x = s.getXAxisMin() != null ? s.getXAxisMin() : 0;
        double y = s.getYAxisMin() != null ? s.getYAxisMin() : 0;
        XYSeries none = chart.addSeries("(no data)", new double[] {x}, new double[] {y});
        none.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
        none.setMarker(SeriesMarkers.NONE);
        none.setShowInLegend(false);
    }

    /**
     * The style of data series i: colour, line pattern and marker together, so that any two of the
     * first 28 series differ in pattern or marker even in greyscale.
     *
     * @param index series index
     * @return its style
     */
    public static Series series(final int index) {
        return new Series(Palette.seriesColour(index), Palette.dash(index), Palette.marker(index));
    }

    /**
     * @param colour colour
     * @param dash   dash pattern [pt] (empty for solid)
     * @param marker marker shape
     */
    public record Series(Color colour, float[] dash, Marker marker) {
        /** @return the line style */
        public LineStyle line() {
            return new LineStyle(colour, Palette.LINE_WIDTH, dash);
        }
    }
}
