package org.nebulith.report.chart;

import java.util.List;
import java.util.Objects;


/**
 * Mass-radius diagram: curves of constant composition (core mass fraction, water) and measured
 * planets with their 1-sigma error bars, log mass axis.
 *
 * @param massMearth the masses of the curves [M_earth], increasing
 * @param curves     radius curves [R_earth] on that grid
 * @param planets    the planets
 */
public record MassRadiusChart(double[] massMearth, List<Curve> curves, List<Planet> planets) {

    /**
     * @param label     name
     * @param mass      mass [M_earth]
     * @param massErr   its error
     * @param radius    radius [R_earth]
     * @param radiusErr its error
     */
    public record Planet(String label, double mass, double massErr, double radius, double radiusErr) {
        public Planet {
            Objects.requireNonNull(label);
            if (!(mass > 0 && radius > 0 && massErr >= 0 && radiusErr >= 0)) {
                throw new IllegalArgumentException(label + ": mass and radius must be > 0 with errors >= 0");
            }
        }
    }

    public MassRadiusChart {
        massMearth = massMearth.clone();
        Curve.checkGrid(massMearth, "mass-radius chart");
        for (Curve c : curves) {
            c.check(massMearth.length, "mass-radius chart", false, 0, Double.MAX_VALUE);
        }
        curves = List.copyOf(curves);
        planets = List.copyOf(planets);
    }

    /**
     * @param size figure size
     * @return the chart
     */
    public Drawing chart(final ChartSize size) {
        Drawing d = Drawing.of(size);
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        for (Curve c : curves) {
            for (double v : c.values()) {
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            }
        }
        for (Planet pl : planets) {
            lo = Math.min(lo, pl.radius() - pl.radiusErr());
            hi = Math.max(hi, pl.radius() + pl.radiusErr());
        }
        if (!(hi > lo)) {
            lo = 0;
            hi = 2;
        }
        double span = hi - lo;
        Axis x = Axis.log(massMearth[0], massMearth[massMearth.length - 1], "Mass [M_earth]");
        Axis y = Axis.linear(Math.max(0, lo - 0.08 * span), hi + 0.12 * span, "Radius [R_earth]").ticks(5);
        Legend legend = new Legend();
        for (int i = 0; i < curves.size(); i++) {
            legend.add(new Legend.Entry(curves.get(i).label(), ChartStyle.series(i).line(), null,
                    ChartStyle.series(i).colour()));
        }
        if (!planets.isEmpty()) {
            legend.add(new Legend.Entry("measured planets", null, Marker.DIAMOND, Palette.AXIS));
        }
        double left = ChartStyle.PAD + Panel.yAxisWidth(y);
        double right = size.widthPt() - ChartStyle.PAD - legend.columnWidth() - 6;
        java.awt.geom.Rectangle2D box = new java.awt.geom.Rectangle2D.Double(left, ChartStyle.PAD + 2, right - left,
                size.heightPt() - 2 * ChartStyle.PAD - 2 - Panel.xAxisHeight());
        Panel p = new Panel(d, box, x, y).frame(true, true);
        for (int i = 0; i < curves.size(); i++) {
            p.line(massMearth, curves.get(i).values(), ChartStyle.series(i).line());
        }
        for (Planet pl : planets) {
            p.xErrorBar(Math.max(massMearth[0], pl.mass() - pl.massErr()),
                    Math.min(massMearth[massMearth.length - 1], pl.mass() + pl.massErr()), pl.radius(), Palette.REFERENCE);
            p.yErrorBar(pl.mass(), pl.radius() - pl.radiusErr(), pl.radius() + pl.radiusErr(), Palette.REFERENCE);
            p.point(Marker.DIAMOND, pl.mass(), pl.radius(), Palette.AXIS);
            p.label(pl.label(), pl.mass(), pl.radius() + pl.radiusErr(), 0, -2, Drawing.Align.CENTRE);
        }
        legend.draw(d, right + 6, box.getMinY() + 2, 1, 0);
        return d;
    }
}
