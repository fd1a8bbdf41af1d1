package org.nebulith.report.chart;

import java.util.List;
import java.util.Objects;

import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;

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
    public XYChart chart(final ChartSize size) {
        XYChart chart = ChartStyle.newXYChart(size, "Mass [M_earth]", "Radius [R_earth]");
        chart.getStyler().setXAxisLogarithmic(true);
        chart.getStyler().setLegendPosition(Styler.LegendPosition.InsideNW);
        chart.getStyler().setXAxisMin(massMearth[0]).setXAxisMax(massMearth[massMearth.length - 1]);
        chart.getStyler().setYAxisDecimalPattern("0.0#");
        for (int i = 0; i < curves.size(); i++) {
            XYSeries s = chart.addSeries(curves.get(i).label(), massMearth, curves.get(i).values());
            ChartStyle.line(s, i);
        }
        if (!planets.isEmpty()) {
            int n = planets.size();
            double[] x = new double[n];
            double[] y = new double[n];
            double[] xl = new double[n];
            double[] xh = new double[n];
            double[] yl = new double[n];
            double[] yh = new double[n];
            for (int i = 0; i < n; i++) {
                Planet p = planets.get(i);
                x[i] = p.mass();
                y[i] = p.radius();
                xl[i] = Math.max(massMearth[0], p.mass() - p.massErr());
                xh[i] = Math.min(massMearth[massMearth.length - 1], p.mass() + p.massErr());
                yl[i] = p.radius() - p.radiusErr();
                yh[i] = p.radius() + p.radiusErr();
            }
            ErrorBars.horizontal(chart, "mass errors", x, xl, xh, y, Palette.REFERENCE);
            ErrorBars.vertical(chart, "radius errors", x, y, yl, yh, Palette.REFERENCE);
            XYSeries s = chart.addSeries("measured planets", x, y);
            ChartStyle.points(s, 6);
            for (Planet p : planets) {
                chart.addAnnotation(new AnnotationText(p.label(), p.mass(), p.radius() + p.radiusErr() + 0.04, false));
            }
        }
        return chart;
    }
}
