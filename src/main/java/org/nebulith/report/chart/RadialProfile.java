package org.nebulith.report.chart;

import java.util.List;
import java.util.Objects;

import org.knowm.xchart.AnnotationLine;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;

/**
 * Radial map of a disk: molar Mg/Si and Fe/Si of the local solids (left axis) and the local
 * condensed fraction (right axis) against heliocentric distance, feeding zones shaded,
 * condensation fronts as dashed vertical lines.
 *
 * @param radiusAU          radial grid [AU], increasing
 * @param condensedFraction local condensed fraction of the condensable mass, in [0, 1]
 * @param mgSi              molar Mg/Si of the local solids (NaN where there are none)
 * @param feSi              molar Fe/Si of the local solids (NaN where there are none)
 * @param zones             feeding zones to shade
 * @param fronts            condensation fronts to mark
 */
public record RadialProfile(double[] radiusAU, double[] condensedFraction, double[] mgSi, double[] feSi,
                            List<Zone> zones, List<Front> fronts) {

    /**
     * A shaded radial band.
     *
     * @param label   name shown at the top of the band
     * @param innerAU inner edge [AU]
     * @param outerAU outer edge [AU]
     */
    public record Zone(String label, double innerAU, double outerAU) {
        public Zone {
            Objects.requireNonNull(label);
            if (!(innerAU >= 0 && outerAU > innerAU && Double.isFinite(outerAU))) {
                throw new IllegalArgumentException("zone " + label + ": need 0 <= inner < outer, got " + innerAU
                        + ", " + outerAU);
            }
        }
    }

    /**
     * A condensation front.
     *
     * @param label    e.g. {@code forsterite} or {@code FeS}
     * @param radiusAU where it lies [AU]
     */
    public record Front(String label, double radiusAU) {
        public Front {
            Objects.requireNonNull(label);
            if (!(radiusAU > 0 && Double.isFinite(radiusAU))) {
                throw new IllegalArgumentException("front " + label + ": radius " + radiusAU + " must be > 0");
            }
        }
    }

    public RadialProfile {
        radiusAU = radiusAU.clone();
        Curve.checkGrid(radiusAU, "radial profile");
        new Curve("condensed fraction", condensedFraction).check(radiusAU.length, "radial profile", false, 0, 1);
        new Curve("Mg/Si", mgSi).check(radiusAU.length, "radial profile", true, 0, Double.MAX_VALUE);
        new Curve("Fe/Si", feSi).check(radiusAU.length, "radial profile", true, 0, Double.MAX_VALUE);
        condensedFraction = condensedFraction.clone();
        mgSi = mgSi.clone();
        feSi = feSi.clone();
        zones = List.copyOf(zones);
        fronts = List.copyOf(fronts);
    }

    /**
     * @param size figure size
     * @return the chart
     */
    public XYChart chart(final ChartSize size) {
        XYChart chart = ChartStyle.newXYChart(size, "Distance from the star r [AU]", "Molar ratio in solids");
        double top = ratioAxisTop();
        chart.getStyler().setYAxisMin(0, 0.0).setYAxisMax(0, top);
        chart.getStyler().setYAxisMin(1, 0.0).setYAxisMax(1, 1.0);
        chart.getStyler().setXAxisMin(radiusAU[0]).setXAxisMax(radiusAU[radiusAU.length - 1]);
        chart.getStyler().setYAxisGroupPosition(1, Styler.YAxisPosition.Right);
        chart.getStyler().setLegendPosition(Styler.LegendPosition.InsideSE);
        chart.setYAxisGroupTitle(0, "Molar ratio in solids");
        chart.setYAxisGroupTitle(1, "Condensed fraction");
        shadeZones(chart, top);
        addLine(chart, "Mg/Si", mgSi, 0, 0);
        addLine(chart, "Fe/Si", feSi, 1, 0);
        addLine(chart, "condensed fraction", condensedFraction, 2, 1);
        for (Front front : fronts) {
            chart.addAnnotation(new AnnotationLine(front.radiusAU(), true, false));
            chart.addAnnotation(new AnnotationText(front.label(), front.radiusAU(), top * 0.97, false));
        }
        chart.getStyler().setXAxisDecimalPattern("0.##");
        chart.getStyler().setYAxisGroupPosition(0, Styler.YAxisPosition.Left);
        return chart;
    }

    private void addLine(final XYChart chart, final String name, final double[] y, final int colour,
                         final int group) {
        XYSeries s = chart.addSeries(name, radiusAU, y);
        ChartStyle.line(s, colour);
        s.setYAxisGroup(group);
    }

    private void shadeZones(final XYChart chart, final double top) {
        for (int i = 0; i < zones.size(); i++) {
            Zone zone = zones.get(i);
            XYSeries band = chart.addSeries("zone " + zone.label(), new double[] {zone.innerAU(), zone.outerAU()},
                    new double[] {top, top});
            band.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Area);
            band.setFillColor(Palette.BAND);
            band.setLineColor(Palette.BAND);
            band.setMarker(org.knowm.xchart.style.markers.SeriesMarkers.NONE);
            band.setShowInLegend(false);
            band.setYAxisGroup(0);
            chart.addAnnotation(new AnnotationText(zone.label(), (zone.innerAU() + zone.outerAU()) / 2, top * 0.90,
                    false));
        }
    }

    private double ratioAxisTop() {
        double max = 0;
        for (double[] series : new double[][] {mgSi, feSi}) {
            for (double v : series) {
                if (v > max) {
                    max = v;
                }
            }
        }
        double top = max <= 0 ? 1.0 : max * 1.25;
        return Math.ceil(top * 4) / 4; // a quarter-unit step keeps the axis readable
    }
}
