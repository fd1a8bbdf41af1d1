package org.nebulith.report.chart;

import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Objects;

/**
 * Radial map of a disk in three stacked panels sharing a logarithmic distance axis: midplane
 * temperature and pressure (top); molar Mg/Si and Fe/Si of the local solids with the host star's
 * ratios as dotted lines, and the condensed share of the heavy elements on the right axis (middle);
 * the weight of each feeding zone (bottom). Condensation fronts are vertical lines through all
 * panels, labelled above the top panel ("+" a phase appears, "\u2212" it disappears, going outwards),
 * the labels spread so that none overlaps. The distance range is the zones plus a margin.
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
    public Drawing chart(final double widthPt, final double heightPt) {
        Drawing d = new Drawing(widthPt, heightPt);
        double[] r = range();
        Axis x = Axis.log(r[0], r[1], "Distance from the star r [AU]");
        double[] tShown = shownOrAll(visible(temperatureK, r), temperatureK);
        double[] pShown = shownOrAll(visible(pressureBar, r), pressureBar);
        Axis t = Axis.linear(0, Math.max(100, Math.ceil(max(tShown) * 1.05 / 100) * 100), "T [K]").ticks(4);
        Axis p = Axis.log(decadeBelow(min(pShown)), decadeAbove(max(pShown)), "P [bar]");
        Axis ratio = Axis.linear(0, ratioTop(), "Molar ratio in solids").ticks(4);
        Axis cond = Axis.linear(0, 1, "Heavy elements condensed").ticks(4);
        Axis weight = Axis.linear(0, 1.5, "Zone weight").ticks(2).labels(v -> v == 0 ? "0" : v == 1 ? "1" : "");
        double left = ChartStyle.PAD + Math.max(Panel.yAxisWidth(ratio), Panel.yAxisWidth(t));
        double right = widthPt - ChartStyle.PAD - Math.max(Panel.yAxisWidth(cond), Panel.yAxisWidth(p)) - 2;
        double labelStrip = 3 * ChartStyle.NOTE_PT + 6;
        double top = ChartStyle.PAD + labelStrip;
        double avail = heightPt - top - Panel.xAxisHeight() - ChartStyle.PAD - 14;
        double h1 = avail * 0.27;
        double h3 = avail * 0.17;
        double h2 = avail - h1 - h3;
        double w = right - left;
        Panel tp = new Panel(d, new Rectangle2D.Double(left, top, w, h1), x, t).rightAxis(p);
        Panel rp = new Panel(d, new Rectangle2D.Double(left, top + h1 + 7, w, h2), x, ratio).rightAxis(cond);
        Panel zp = new Panel(d, new Rectangle2D.Double(left, top + h1 + h2 + 14, w, h3), x, weight);
        tp.frame(false, true);
        rp.frame(false, true);
        zp.frame(true, true);
        drawTop(tp);
        drawMiddle(rp);
        drawZones(zp);
        drawFronts(d, List.of(tp, rp, zp), top);
        return d;
    }

    private void drawTop(final Panel tp) {
        ChartStyle.Series ts = ChartStyle.series(1);
        ChartStyle.Series ps = ChartStyle.series(0);
        tp.line(radiusAU, temperatureK, LineStyle.solid(ts.colour(), Palette.LINE_WIDTH));
        tp.lineRight(radiusAU, pressureBar, new LineStyle(ps.colour(), Palette.LINE_WIDTH, new float[] {4f, 2f}));
        Legend l = new Legend().add(new Legend.Entry("T (left)", LineStyle.solid(ts.colour(), Palette.LINE_WIDTH), null,
                        ts.colour()))
                .add(new Legend.Entry("P (right)", new LineStyle(ps.colour(), Palette.LINE_WIDTH, new float[] {4f, 2f}),
                        null, ps.colour()));
        Rectangle2D a = tp.area();
        double lw = 2 * (l.columnWidth() + 6);
        tp.drawing().fill(new Rectangle2D.Double(a.getMaxX() - lw - 4, a.getMinY() + 2, lw + 2, Legend.rowHeight() + 1),
                new java.awt.Color(255, 255, 255, 235));
        l.draw(tp.drawing(), a.getMaxX() - lw - 2, a.getMinY() + 2, 2, 6);
    }

    private void drawMiddle(final Panel rp) {
        ChartStyle.Series mg = ChartStyle.series(0);
        ChartStyle.Series fe = ChartStyle.series(1);
        ChartStyle.Series cf = ChartStyle.series(2);
        LineStyle hostStyle = new LineStyle(Palette.REFERENCE, 0.7, new float[] {1f, 1.5f});
        Legend l = new Legend();
        double[][] mgDev = rp.line(radiusAU, mgSi, mg.line());
        rp.markersAlong(mgDev, mg.marker(), mg.colour(), 40, 8);
        double[][] feDev = rp.line(radiusAU, feSi, fe.line());
        rp.markersAlong(feDev, fe.marker(), fe.colour(), 40, 28);
        LineStyle cfLine = new LineStyle(cf.colour(), Palette.LINE_WIDTH, new float[] {1f, 1.5f});
        rp.lineRight(radiusAU, condensedFraction, cfLine);
        l.add(Legend.Entry.of("Mg/Si", mg)).add(Legend.Entry.of("Fe/Si", fe))
                .add(new Legend.Entry("heavy elements condensed (right)", cfLine, null, cf.colour()));
        if (Double.isFinite(hostMgSi)) {
            rp.hline(hostMgSi, hostStyle);
            rp.drawing().text("host Mg/Si", rp.area().getMinX() + 2, rp.py(hostMgSi) - 1.5, ChartStyle.NOTE_PT,
                    Drawing.Align.LEFT, Palette.REFERENCE);
        }
        if (Double.isFinite(hostFeSi)) {
            rp.hline(hostFeSi, hostStyle);
            rp.drawing().text("host Fe/Si", rp.area().getMinX() + 2, rp.py(hostFeSi) + ChartStyle.NOTE_PT,
                    ChartStyle.NOTE_PT, Drawing.Align.LEFT, Palette.REFERENCE);
        }
        Rectangle2D a = rp.area();
        double lw = l.columnWidth();
        double lh = l.height(1);
        rp.drawing().fill(new Rectangle2D.Double(a.getMaxX() - lw - 5, a.getMaxY() - lh - 4, lw + 3, lh + 2),
                new java.awt.Color(255, 255, 255, 235));
        l.draw(rp.drawing(), a.getMaxX() - lw - 3, a.getMaxY() - lh - 3, 1, 0);
    }

    private void drawZones(final Panel zp) {
        for (int i = 0; i < zones.size(); i++) {
            Zone z = zones.get(i);
            double[] wgt = z.weight();
            double peak = max(wgt);
            double[] norm = new double[wgt.length];
            for (int k = 0; k < wgt.length; k++) {
                norm[k] = peak > 0 ? wgt[k] / peak : 0;
                if (radiusAU[k] < z.innerAU() * 0.999 || radiusAU[k] > z.outerAU() * 1.001) {
                    norm[k] = Double.NaN;
                }
            }
            ChartStyle.Series s = ChartStyle.series(i + 3);
            zp.line(radiusAU, norm, s.line());
            double centre = Math.sqrt(z.innerAU() * z.outerAU());
            zp.drawing().text(z.label(), zp.px(centre), zp.py(1.0) - 2, ChartStyle.NOTE_PT, Drawing.Align.CENTRE,
                    s.colour().darker());
        }
    }

    private void drawFronts(final Drawing d, final List<Panel> panels, final double top) {
        List<Front> shown = new ArrayList<>();
        Axis x = panels.get(0).x();
        for (Front f : fronts) {
            if (x.contains(f.radiusAU())) {
                shown.add(f);
            }
        }
        shown.sort(Comparator.comparingDouble(Front::radiusAU));
        LineStyle line = new LineStyle(Palette.REFERENCE, 0.5, new float[] {3f, 2f});
        for (Front f : shown) {
            for (Panel p : panels) {
                p.vline(f.radiusAU(), line);
            }
        }
        // three label rows above the top panel; within a row labels are spread apart horizontally
        int rows = 3;
        Panel tp = panels.get(0);
        for (int row = 0; row < rows; row++) {
            List<Front> inRow = new ArrayList<>();
            for (int i = row; i < shown.size(); i += rows) {
                inRow.add(shown.get(i));
            }
            placeRow(d, tp, inRow, top - 2 - (rows - 1 - row) * (ChartStyle.NOTE_PT + 1.5), line);
        }
    }

    private static void placeRow(final Drawing d, final Panel tp, final List<Front> inRow, final double baseline,
                                 final LineStyle line) {
        int n = inRow.size();
        if (n == 0) {
            return;
        }
        double[] wanted = new double[n];
        double[] widths = new double[n];
        double[] gaps = new double[Math.max(0, n - 1)];
        for (int i = 0; i < n; i++) {
            widths[i] = Fonts.width(inRow.get(i).text(), ChartStyle.NOTE_PT);
            wanted[i] = tp.px(inRow.get(i).radiusAU());
            if (i > 0) {
                gaps[i - 1] = (widths[i - 1] + widths[i]) / 2 + 4;
            }
        }
        Rectangle2D a = tp.area();
        double[] at = Spread.apart(wanted, gaps, a.getMinX() + widths[0] / 2, a.getMaxX() - widths[n - 1] / 2);
        for (int i = 0; i < n; i++) {
            d.text(inRow.get(i).text(), at[i], baseline, ChartStyle.NOTE_PT, Drawing.Align.CENTRE, Palette.NOTE);
            d.stroke(new Line2D.Double(at[i], baseline + 1.2, wanted[i], a.getMinY()), line.withWidth(0.3));
        }
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
