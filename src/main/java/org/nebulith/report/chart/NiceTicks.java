package org.nebulith.report.chart;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Makes XChart choose round tick values on an x axis with a custom label formatter. With such a
 * formatter, XChart 4.0.3 places the ticks on the data's own x values whenever all x values
 * are equally spaced (as a temperature grid is), which gives ticks like 2000, 1820, 1640. One
 * invisible, legend-less series with an off-grid x value (and NaN y values, which draw nothing
 * and do not affect the y range) breaks the equal spacing, so the ordinary round-number ticks
 * are used.
 */
final class NiceTicks {

    private NiceTicks() {
    }

    /**
     * @param chart the chart
     * @param xMin  the smallest plotted x value
     * @param xMax  the largest plotted x value
     */
    static void force(final XYChart chart, final double xMin, final double xMax) {
        double offGrid = xMin + (xMax - xMin) * 0.0123456789;
        XYSeries s = chart.addSeries("\u2063ticks", new double[] {xMin, offGrid}, new double[] {Double.NaN, Double.NaN});
        s.setShowInLegend(false);
        s.setMarker(SeriesMarkers.NONE);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
    }
}
