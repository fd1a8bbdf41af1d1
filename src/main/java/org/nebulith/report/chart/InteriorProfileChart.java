package org.nebulith.report.chart;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;

/**
 * Interior structure of one planet: density (left axis) and pressure (right axis) against radius.
 *
 * @param radiusKm radii [km], increasing
 * @param densityKgM3 density [kg/m3]
 * @param pressureGpa pressure [GPa]
 */
public record InteriorProfileChart(double[] radiusKm, double[] densityKgM3, double[] pressureGpa) {

    public InteriorProfileChart {
        radiusKm = radiusKm.clone();
        Curve.checkGrid(radiusKm, "interior profile");
        new Curve("density", densityKgM3).check(radiusKm.length, "interior profile", false, 0, Double.MAX_VALUE);
        new Curve("pressure", pressureGpa).check(radiusKm.length, "interior profile", false, 0, Double.MAX_VALUE);
        densityKgM3 = densityKgM3.clone();
        pressureGpa = pressureGpa.clone();
    }

    /**
     * @param size figure size
     * @return the chart
     */
    public XYChart chart(final ChartSize size) {
        XYChart chart = ChartStyle.newXYChart(size, "Radius r [km]", "Density [kg/m3]");
        chart.getStyler().setYAxisGroupPosition(1, Styler.YAxisPosition.Right);
        chart.getStyler().setLegendPosition(Styler.LegendPosition.InsideNE);
        chart.getStyler().setXAxisMin(0.0).setXAxisMax(radiusKm[radiusKm.length - 1]);
        chart.getStyler().setYAxisMin(0, 0.0);
        chart.getStyler().setYAxisMin(1, 0.0);
        chart.setYAxisGroupTitle(0, "Density [kg/m3]");
        chart.setYAxisGroupTitle(1, "Pressure [GPa]");
        chart.getStyler().setXAxisDecimalPattern("0");
        XYSeries rho = chart.addSeries("density", radiusKm, densityKgM3);
        ChartStyle.line(rho, 0);
        rho.setYAxisGroup(0);
        XYSeries p = chart.addSeries("pressure", radiusKm, pressureGpa);
        ChartStyle.line(p, 1);
        p.setYAxisGroup(1);
        return chart;
    }
}
