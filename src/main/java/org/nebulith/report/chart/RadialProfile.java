package org.nebulith.report.chart;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;

import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.XYStyler;

/**
 * Radial map of a disk in stacked panels sharing a logarithmic distance axis: midplane temperature,
 * midplane pressure (log), molar Mg/Si and Fe/Si of the local solids with the host star's ratios as
 * dotted lines, the condensed share of the mass of the elements heavier than He, and the weight of
 * each feeding zone (bottom). Condensation fronts are vertical lines through all panels, named in a
 * strip above the top panel ("+" a phase appears, "\u2212" it disappears, going outwards), the names
 * spread so that none overlaps. The distance range is the zones plus a margin.
 *
 * @param radiusAU          radial grid [AU], increasing
 * @param temperatureK      midplane temperature [K]
 * @param pressureBar       midplane pressure [bar]
 * @param condensedFraction condensed share of the mass of the elements heavier than He, in [0, 1]
 * @param mgSi              molar Mg/Si of the local solids (NaN where there are none)
 * @param feSi              molar Fe/Si of the local solids (NaN where there are none)
 * @param hostMgSi          the host star's molar Mg/Si (NaN = not drawn)
 * @param hostFeSi          the host star's molar Fe/Si (NaN = not drawn)
 * @param zones             feeding zones, with their weights
 * @param fronts            condensation fronts
 */
public record RadialProfile(double[] radiusAU, double[] temperatureK, double[] pressureBar,
                            double[] condensedFraction, double[] mgSi, double[] feSi, double hostMgSi,
                            double hostFeSi, List<Zone> zones, List<Front> fronts) {

    /**
     * A feeding zone.
     *
     * @param label   name
     * @param innerAU inner edge of its support [AU]
     * @param outerAU outer edge [AU]
     * @param weight  its weight on the radial grid (any scale, drawn normalised to its peak)
     */
    public record Zone(String label, double innerAU, double outerAU, double[] weight) {
        public Zone {
            Objects.requireNonNull(label);
            weight = weight.clone();
            if (!(innerAU >= 0 && outerAU > innerAU && Double.isFinite(outerAU))) {
                throw new IllegalArgumentException("zone " + label + ": need 0 <= inner < outer, got " + innerAU
                        + ", " + outerAU);
            }
        }
    }

    /**
     * A condensation front.
     *
     * @param label    phase name
     * @param radiusAU where it lies [AU]
     * @param appears  true if the phase appears going outwards, false if it disappears
     */
    public record Front(String label, double radiusAU, boolean appears) {
        public Front {
            Objects.requireNonNull(label);
            if (!(radiusAU > 0 && Double.isFinite(radiusAU))) {
                throw new IllegalArgumentException("front " + label + ": radius " + radiusAU + " must be > 0");
            }
        }

        /** @return the label with its direction sign */
        public String text() {
            return (appears ? "+" : "\u2212") + label;
        }
    }

    public RadialProfile {
        radiusAU = radiusAU.clone();
        Curve.checkGrid(radiusAU, "radial profile");
        int n = radiusAU.length;
        new Curve("T", temperatureK).check(n, "radial profile", false, 0, Double.MAX_VALUE);
        new Curve("P", pressureBar).check(n, "radial profile", false, Double.MIN_VALUE, Double.MAX_VALUE);
        new Curve("condensed fraction", condensedFraction).check(n, "radial profile", false, 0, 1 + 1e-9);
        new Curve("Mg/Si", mgSi).check(n, "radial profile", true, 0, Double.MAX_VALUE);
        new Curve("Fe/Si", feSi).check(n, "radial profile", true, 0, Double.MAX_VALUE);
        temperatureK = temperatureK.clone();
        pressureBar = pressureBar.clone();
        condensedFraction = condensedFraction.clone();
        mgSi = mgSi.clone();
        feSi = feSi.clone();
        zones = List.copyOf(zones);
        fronts = List.copyOf(fronts);
        for (Zone z : zones) {
            new Curve(z.label(), z.weight()).check(n, "radial profile", false, 0, Double.MAX_VALUE);
        }
    }

    /**
     * @param widthPt  figure width [pt]
     * @param heightPt figure height [pt]
     * @return the chart
     */
    public Figure chart(final double widthPt, final double heightPt) {
        Figure f = new Figure(widthPt, heightPt);
        double[] r = range();
        List<Front> shown = shownFronts(r);
        double strip = shown.isEmpty() ? 0 : LABEL_ROWS * (ChartStyle.NOTE_PT + 2) + 6;
        double avail = heightPt - strip;
        double[] heights = {avail * 0.2, avail * 0.19, avail * 0.25, avail * 0.14, avail * 0.22};
        XYChart t = panel(f, widthPt, heights[0], r, "T [K]");
        double[] tShown = shownOrAll(visible(temperatureK, r), temperatureK);
        double tLow = Math.floor(min(tShown) * 0.95 / 100) * 100;
        double tHigh = Math.max(tLow + 100, Math.ceil(max(tShown) * 1.05 / 100) * 100);
        // ends a little beyond round values, so that the round values are labelled
        t.getStyler().setYAxisMin(tLow - 0.03 * (tHigh - tLow));
        t.getStyler().setYAxisMax(tHigh + 0.03 * (tHigh - tLow));
        ChartStyle.line(t, "T", radiusAU, temperatureK, LineStyle.solid(Palette.seriesColour(1), Palette.LINE_WIDTH),
                false);
        XYChart p = panel(f, widthPt, heights[1], r, "P [bar]");
        double[] pShown = shownOrAll(visible(pressureBar, r), pressureBar);
        ChartStyle.logAxis(f, p, false, decadeBelow(min(pShown)), decadeAbove(max(pShown)));
        ChartStyle.line(p, "P", radiusAU, pressureBar, new LineStyle(Palette.seriesColour(0), Palette.LINE_WIDTH,
                new float[] {4f, 2f}), false);
        XYChart m = panel(f, widthPt, heights[2], r, "Ratio [mol/mol]");
        middle(m);
        XYChart cf = panel(f, widthPt, heights[3], r, "Condensed");
        cf.getStyler().setYAxisMin(-0.03);
        cf.getStyler().setYAxisMax(1.03);
        ChartStyle.line(cf, CONDENSED, radiusAU, condensedFraction,
                new LineStyle(Palette.seriesColour(2), Palette.LINE_WIDTH, new float[] {1f, 1.5f}), false);
        XYChart z = panel(f, widthPt, heights[4], r, "Weight");
        z.getStyler().setXAxisTicksVisible(true);
        z.getStyler().setXAxisTitleVisible(true);
        zones(z);
        List<XYChart> panels = new ArrayList<>(List.of(t, p, m, cf, z));
        for (XYChart c : panels) {
            frontLines(c, shown);
        }
        f.stack(panels, heights, strip);
        for (XYChart c : panels) {
            f.layOut(c);
        }
        if (!shown.isEmpty()) {
            // the strip's plot area spans the panels' plot width above the top panel
            java.awt.geom.Rectangle2D cell = f.cell(t);
            java.awt.geom.Rectangle2D top = DirectLabels.plotBox(t);
            XYChart labelStrip = strip(f, widthPt, strip, r);
            double area = cell.getMinY() + top.getMinY() - 1;
            // reaching down over the top panel (transparent): XChart maps no y into a plot under about 50 pt
            f.overlay(labelStrip, new java.awt.geom.Rectangle2D.Double(cell.getMinX() + top.getMinX(), 1,
                    top.getWidth(), area + 60));
            f.layOut(labelStrip);
            frontLabels(f, labelStrip, shown, area);
        }
        labelMiddle(f, m);
        DirectLabels cfLabels = new DirectLabels(f, cf);
        double[][] cfDev = cfLabels.device(radiusAU, condensedFraction);
        cfLabels.free().line(cfDev);
        labelEnd(cfLabels, CONDENSED, cfDev, 0);
        labelZones(f, z);
        return f;
    }

    /** Rows of front labels above the top panel. */
    private static final int LABEL_ROWS = 3;

    private static XYChart panel(final Figure f, final double width, final double height, final double[] r,
                                 final String yTitle) {
        XYChart c = ChartStyle.chart(f, width, height, "Distance from the star r [AU]", yTitle);
        ChartStyle.logAxis(f, c, true, r[0], r[1]);
        c.getStyler().setXAxisTicksVisible(false);
        c.getStyler().setXAxisTitleVisible(false);
        c.getStyler().setChartPadding(2);
        c.getStyler().setYAxisTickMarkSpacingHint(12);
        c.getStyler().setLegendVisible(false);
        return c;
    }

    private void middle(final XYChart m) {
        m.getStyler().setYAxisMin(0.0);
        m.getStyler().setYAxisMax(ratioTop());
        ChartStyle.line(m, "Mg/Si", radiusAU, mgSi, ChartStyle.series(0).line(), false);
        ChartStyle.line(m, "Fe/Si", radiusAU, feSi, ChartStyle.series(1).line(), false);
        LineStyle host = new LineStyle(Palette.REFERENCE, 0.7, new float[] {1f, 1.5f});
        double[] ends = {radiusAU[0], radiusAU[radiusAU.length - 1]};
        if (Double.isFinite(hostMgSi)) {
            ChartStyle.line(m, "host Mg/Si", ends, new double[] {hostMgSi, hostMgSi}, host, false);
        }
        if (Double.isFinite(hostFeSi)) {
            ChartStyle.line(m, "host Fe/Si", ends, new double[] {hostFeSi, hostFeSi}, host, false);
        }
    }

    private static final String CONDENSED = "heavy elements condensed";

    private void zones(final XYChart z) {
        z.getStyler().setYAxisMin(0.0);
        z.getStyler().setYAxisMax(1.45);
        for (int i = 0; i < zones.size(); i++) {
            ChartStyle.line(z, "zone " + zones.get(i).label(), radiusAU, normalised(zones.get(i)),
                    ChartStyle.series(i + 3).line(), false);
        }
    }

    private double[] normalised(final Zone zone) {
        double[] wgt = zone.weight();
        double peak = max(wgt);
        double[] norm = new double[wgt.length];
        for (int k = 0; k < wgt.length; k++) {
            boolean inside = radiusAU[k] >= zone.innerAU() * 0.999 && radiusAU[k] <= zone.outerAU() * 1.001;
            norm[k] = inside ? (peak > 0 ? wgt[k] / peak : 0) : Double.NaN;
        }
        return norm;
    }

    private void labelMiddle(final Figure f, final XYChart m) {
        DirectLabels labels = new DirectLabels(f, m);
        double[][] mg = labels.device(radiusAU, mgSi);
        double[][] fe = labels.device(radiusAU, feSi);
        labels.free().line(mg);
        labels.free().line(fe);
        java.awt.geom.Rectangle2D box = labels.box();
        if (Double.isFinite(hostMgSi)) {
            labelHost(labels, "host Mg/Si", labels.y(hostMgSi), box);
        }
        if (Double.isFinite(hostFeSi)) {
            labelHost(labels, "host Fe/Si", labels.y(hostFeSi), box);
        }
        labelEnd(labels, "Mg/Si", mg, 0);
        labelEnd(labels, "Fe/Si", fe, 1);
    }

    private static void labelHost(final DirectLabels labels, final String text, final double y,
                                  final java.awt.geom.Rectangle2D box) {
        double w = Fonts.width(text, ChartStyle.NOTE_PT);
        double h = Fonts.capHeight(ChartStyle.NOTE_PT);
        double x = box.getMinX() + 3 + w / 2;
        labels.putFirstFree(text, -1, x, y - h / 2 - 2, x, y + h / 2 + 2, box.getMaxX() - 3 - w / 2, y - h / 2 - 2);
    }

    /** Writes a curve's name near its outer end, above or below it, where there is room. */
    private static void labelEnd(final DirectLabels labels, final String text, final double[][] dev,
                                 final int line) {
        double w = Fonts.width(text, ChartStyle.NOTE_PT);
        double h = Fonts.capHeight(ChartStyle.NOTE_PT);
        java.awt.geom.Rectangle2D box = labels.box();
        for (int k = dev[0].length - 1; k >= 0; k--) {
            double x = dev[0][k];
            double y = dev[1][k];
            if (!Double.isFinite(x) || x > box.getMaxX() - w / 2 - 2 || y < box.getMinY() || y > box.getMaxY()) {
                continue;
            }
            if (labels.putFirstFree(text, line, x - w / 2, y - h / 2 - 2.5, x - w / 2, y + h / 2 + 2.5)) {
                return;
            }
            if (x < box.getMinX() + box.getWidth() * 0.4) {
                return;
            }
        }
    }

    private void labelZones(final Figure f, final XYChart z) {
        DirectLabels labels = new DirectLabels(f, z);
        for (int i = 0; i < zones.size(); i++) {
            Zone zone = zones.get(i);
            double[] norm = normalised(zone);
            int peak = 0;
            for (int k = 0; k < norm.length; k++) {
                if (Double.isFinite(norm[k]) && (!Double.isFinite(norm[peak]) || norm[k] > norm[peak])) {
                    peak = k;
                }
            }
            double x = labels.x(radiusAU[peak]);
            double h = Fonts.capHeight(ChartStyle.NOTE_PT);
            double y = labels.y(1.0) - h / 2 - 2;
            double w = Fonts.width(zone.label(), ChartStyle.NOTE_PT);
            labels.putFirstFree(zone.label(), -1, x, y, x - w / 2 - 3, y - h - 2, x + w / 2 + 3, y - h - 2, x, y - h - 2);
        }
    }

    private List<Front> shownFronts(final double[] r) {
        List<Front> shown = new ArrayList<>();
        for (Front fr : fronts) {
            if (fr.radiusAU() >= r[0] && fr.radiusAU() <= r[1]) {
                shown.add(fr);
            }
        }
        shown.sort(Comparator.comparingDouble(Front::radiusAU));
        return shown;
    }

    private static void frontLines(final XYChart c, final List<Front> shown) {
        if (shown.isEmpty()) {
            return;
        }
        double lo = c.getStyler().getYAxisMin();
        double hi = c.getStyler().getYAxisMax();
        double[] x = new double[3 * shown.size()];
        double[] y = new double[3 * shown.size()];
        for (int i = 0; i < shown.size(); i++) {
            x[3 * i] = shown.get(i).radiusAU();
            x[3 * i + 1] = shown.get(i).radiusAU();
            x[3 * i + 2] = shown.get(i).radiusAU();
            y[3 * i] = lo;
            y[3 * i + 1] = hi;
            y[3 * i + 2] = Double.NaN;
        }
        XYSeries s = c.addSeries("fronts", x, y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setLineColor(Palette.REFERENCE);
        s.setLineStyle(new LineStyle(Palette.REFERENCE, 0.5, new float[] {3f, 2f}).stroke());
        s.setMarker(org.knowm.xchart.style.markers.SeriesMarkers.NONE);
        s.setShowInLegend(false);
    }

    /** The strip above the panels where the fronts are named, its x axis the panels' (not drawn). */
    private static XYChart strip(final Figure f, final double width, final double height, final double[] r) {
        XYChart c = ChartStyle.chart(f, width, height, "", "");
        ChartStyle.logAxis(f, c, true, r[0], r[1]);
        XYStyler s = c.getStyler();
        s.setYAxisMin(0.0);
        s.setYAxisMax(1.0);
        // the y axis is kept (blank): without it XChart gives the plot no height to map y into
        s.setXAxisTicksVisible(false);
        s.setYAxisTickLabelsFormattingFunction(v -> "");
        s.setAxisTickMarkLength(0);
        s.setAxisTitlesVisible(false);
        s.setPlotBorderVisible(false);
        s.setPlotGridLinesVisible(false);
        s.setLegendVisible(false);
        s.setChartPadding(0);
        java.awt.Color none = new java.awt.Color(255, 255, 255, 0);
        s.setChartBackgroundColor(none);
        s.setPlotBackgroundColor(none);
        return c;
    }

    /** Names the fronts in rows above the top panel, spread so that none overlaps, with a leader to each. */
    private static void frontLabels(final Figure f, final XYChart stripChart, final List<Front> shown,
                                    final double area) {
        DirectLabels labels = new DirectLabels(f, stripChart);
        java.awt.geom.Rectangle2D a = labels.box();
        double rowH = ChartStyle.NOTE_PT + 2;
        List<double[]> leaders = new ArrayList<>();
        for (int row = 0; row < LABEL_ROWS; row++) {
            List<Front> inRow = new ArrayList<>();
            for (int i = row; i < shown.size(); i += LABEL_ROWS) {
                inRow.add(shown.get(i));
            }
            int n = inRow.size();
            if (n == 0) {
                continue;
            }
            double[] wanted = new double[n];
            double[] widths = new double[n];
            double[] gaps = new double[Math.max(0, n - 1)];
            for (int i = 0; i < n; i++) {
                widths[i] = Fonts.width(inRow.get(i).text(), ChartStyle.NOTE_PT);
                wanted[i] = labels.x(inRow.get(i).radiusAU());
                if (i > 0) {
                    gaps[i - 1] = (widths[i - 1] + widths[i]) / 2 + 4;
                }
            }
            double[] at = Spread.apart(wanted, gaps, a.getMinX() + widths[0] / 2, a.getMaxX() - widths[n - 1] / 2);
            double cy = a.getMinY() + 1 + (row + 0.5) * rowH;
            for (int i = 0; i < n; i++) {
                labels.put(inRow.get(i).text(), at[i], cy);
                leaders.add(new double[] {labels.dataX(at[i]), labels.dataY(cy + rowH / 2 - 0.5),
                    inRow.get(i).radiusAU()});
            }
        }
        double[] x = new double[3 * leaders.size()];
        double[] y = new double[3 * leaders.size()];
        for (int i = 0; i < leaders.size(); i++) {
            x[3 * i] = leaders.get(i)[0];
            y[3 * i] = leaders.get(i)[1];
            x[3 * i + 1] = leaders.get(i)[2];
            y[3 * i + 1] = labels.dataY(a.getMinY() + area);
            x[3 * i + 2] = leaders.get(i)[2];
            y[3 * i + 2] = Double.NaN;
        }
        XYSeries s = stripChart.addSeries("leaders", x, y);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Line);
        s.setLineStyle(LineStyle.solid(Palette.REFERENCE, 0.3).stroke());
        s.setLineColor(Palette.REFERENCE);
        s.setMarker(org.knowm.xchart.style.markers.SeriesMarkers.NONE);
        s.setShowInLegend(false);
    }

    private double[] range() {
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        for (Zone z : zones) {
            lo = Math.min(lo, z.innerAU());
            hi = Math.max(hi, z.outerAU());
        }
        double first = radiusAU[0];
        double last = radiusAU[radiusAU.length - 1];
        if (!(hi > 0) || !(lo > 0)) {
            return new double[] {first, last};
        }
        return new double[] {Math.max(first, lo / 1.3), Math.min(last, hi * 1.3)};
    }

    /** @return the visible values if any is positive, else all values (a range without grid points) */
    private static double[] shownOrAll(final double[] shown, final double[] all) {
        return max(shown) > 0 ? shown : all;
    }

    /** @return the values at radii within [r0, r1], NaN elsewhere */
    private double[] visible(final double[] values, final double[] r) {
        double[] out = values.clone();
        for (int i = 0; i < out.length; i++) {
            if (radiusAU[i] < r[0] || radiusAU[i] > r[1]) {
                out[i] = Double.NaN;
            }
        }
        return out;
    }

    private double ratioTop() {
        double[] r = range();
        double top = Math.max(Math.max(max(visible(mgSi, r)), max(visible(feSi, r))),
                Math.max(finite(hostMgSi), finite(hostFeSi)));
        top = top <= 0 ? 1.0 : top * 1.15;
        return Math.ceil(top * 4) / 4;
    }

    private static double finite(final double v) {
        return Double.isFinite(v) ? v : 0;
    }

    private static double max(final double[] v) {
        double m = 0;
        for (double x : v) {
            if (x > m) {
                m = x;
            }
        }
        return m;
    }

    private static double min(final double[] v) {
        double m = Double.POSITIVE_INFINITY;
        for (double x : v) {
            if (x > 0 && x < m) {
                m = x;
            }
        }
        return m;
    }

    private static double decadeBelow(final double v) {
        return Math.pow(10, Math.floor(Math.log10(v)));
    }

    private static double decadeAbove(final double v) {
        double up = Math.pow(10, Math.ceil(Math.log10(v)));
        return up > v ? up : up * 10;
    }
}
