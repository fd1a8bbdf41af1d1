package org.nebulith.report.chart;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.XYStyler;


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
    public Figure chart(final ChartSize size) {
        Figure f = new Figure(size.widthPt(), size.heightPt());
        XYChart c = ChartStyle.chart(f, size.widthPt(), size.heightPt(), "Radius r [km]", "Density [kg/m3]");
        XYStyler s = c.getStyler();
        s.setXAxisMin(0.0);
        s.setXAxisMax(radiusKm[radiusKm.length - 1]);
        s.setYAxisMin(0.0);
        s.setYAxisMax(top(densityKgM3));
        s.setLegendPosition(Styler.LegendPosition.InsideNE);
        ChartStyle.line(c, "density (left)", radiusKm, densityKgM3, ChartStyle.series(0).line(), true);
        XYSeries p = ChartStyle.line(c, "pressure (right)", radiusKm, pressureGpa, ChartStyle.series(1).line(), true);
        if (p != null) {
            p.setYAxisGroup(1);
        }
        c.setYAxisGroupTitle(1, "Pressure [GPa]");
        s.setYAxisGroupPosition(1, Styler.YAxisPosition.Right);
        s.setYAxisMin(1, 0.0);
        s.setYAxisMax(1, top(pressureGpa));
        f.fill(c);
        return f;
    }

    private static double top(final double[] v) {
        double m = 0;
        for (double x : v) {
            m = Math.max(m, x);
        }
        return m > 0 ? m * 1.08 : 1;
    }
}
