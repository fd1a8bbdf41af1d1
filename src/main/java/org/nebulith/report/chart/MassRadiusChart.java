package org.nebulith.report.chart;

import java.util.List;
import java.util.Objects;

import org.knowm.xchart.XYChart;


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
    public Figure chart(final ChartSize size) {
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
        Figure f = new Figure(size.widthPt(), size.heightPt());
        XYChart c = ChartStyle.chart(f, size.widthPt(), size.heightPt(), "Mass [M_earth]", "Radius [R_earth]");
        double mMin = massMearth[0];
        double mMax = massMearth[massMearth.length - 1];
        ChartStyle.logAxis(f, c, true, mMin, mMax);
        c.getStyler().setYAxisMin(Math.max(0, lo - 0.08 * span));
        c.getStyler().setYAxisMax(hi + 0.12 * span);
        for (int i = 0; i < curves.size(); i++) {
            ChartStyle.line(c, curves.get(i).label(), massMearth, curves.get(i).values(), ChartStyle.series(i).line(),
                    true);
        }
        if (!planets.isEmpty()) {
            double[] x = new double[6 * planets.size()];
            double[] y = new double[6 * planets.size()];
            for (int k = 0; k < planets.size(); k++) {
                Planet pl = planets.get(k);
                double[] xs = {Math.max(mMin, pl.mass() - pl.massErr()), Math.min(mMax, pl.mass() + pl.massErr()),
                    Double.NaN, pl.mass(), pl.mass(), Double.NaN};
                double[] ys = {pl.radius(), pl.radius(), Double.NaN, pl.radius() - pl.radiusErr(),
                    pl.radius() + pl.radiusErr(), Double.NaN};
                System.arraycopy(xs, 0, x, 6 * k, 6);
                System.arraycopy(ys, 0, y, 6 * k, 6);
                x[6 * k + 2] = pl.mass();
                x[6 * k + 5] = pl.mass();
            }
            ChartStyle.line(c, "1-sigma", x, y, LineStyle.solid(Palette.REFERENCE, 0.6), false);
            ChartStyle.points(c, "measured planets", planets.stream().mapToDouble(Planet::mass).toArray(),
                    planets.stream().mapToDouble(Planet::radius).toArray(), Marker.DIAMOND, Palette.AXIS, 1.2, true);
        }
        f.fill(c);
        DirectLabels labels = new DirectLabels(f, c);
        for (Planet pl : planets) {
            double x = labels.x(pl.mass());
            double y = labels.y(pl.radius() + pl.radiusErr()) - 5;
            labels.putFirstFree(pl.label(), -1, x, y, x, labels.y(pl.radius() - pl.radiusErr()) + 5);
        }
        return f;
    }

}
