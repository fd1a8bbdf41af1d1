package org.nebulith.report.chart;


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
    public Drawing chart(final ChartSize size) {
        Drawing d = Drawing.of(size);
        double rMax = radiusKm[radiusKm.length - 1];
        Axis x = Axis.linear(0, rMax, "Radius r [km]");
        Axis rho = Axis.linear(0, top(densityKgM3), "Density [kg/m3]").ticks(5);
        Axis p = Axis.linear(0, top(pressureGpa), "Pressure [GPa]").ticks(5);
        double left = ChartStyle.PAD + Panel.yAxisWidth(rho);
        double right = size.widthPt() - ChartStyle.PAD - Panel.yAxisWidth(p) - 2;
        java.awt.geom.Rectangle2D box = new java.awt.geom.Rectangle2D.Double(left, ChartStyle.PAD + 2, right - left,
                size.heightPt() - 2 * ChartStyle.PAD - 2 - Panel.xAxisHeight());
        Panel panel = new Panel(d, box, x, rho).rightAxis(p).frame(true, true);
        ChartStyle.Series rs = ChartStyle.series(0);
        ChartStyle.Series ps = ChartStyle.series(1);
        panel.line(radiusKm, densityKgM3, rs.line());
        panel.lineRight(radiusKm, pressureGpa, ps.line());
        Legend l = new Legend().add(new Legend.Entry("density (left)", rs.line(), null, rs.colour()))
                .add(new Legend.Entry("pressure (right)", ps.line(), null, ps.colour()));
        l.draw(d, box.getMaxX() - l.columnWidth() - 4, box.getMinY() + 3, 1, 0);
        return d;
    }

    private static double top(final double[] v) {
        double m = 0;
        for (double x : v) {
            m = Math.max(m, x);
        }
        return m > 0 ? m * 1.08 : 1;
    }
}
