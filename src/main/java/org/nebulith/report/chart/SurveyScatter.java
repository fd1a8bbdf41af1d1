package org.nebulith.report.chart;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;

import org.knowm.xchart.XYChart;

/**
 * Survey: molar Mg/Si against Fe/Si for host stars and their predicted planets, with their ranges
 * (16th to 84th percentile) as thin crosses; host stars as open rings and planets as smaller dots
 * drawn over them, so that a planet at its star's position shows as a dot inside a ring; labelled
 * reference bodies (the Sun, bulk Earth) as large distinct markers; the legend outside the plot.
 * The errors of Mg/Si and Fe/Si are correlated (both divide by Si): a star whose covariance is
 * known is drawn with its 68 % ellipse instead of a cross.
 *
 * @param stars      the host stars
 * @param planets    the predicted planets
 * @param references reference bodies drawn as single markers (no ranges)
 */
public record SurveyScatter(List<Point> stars, List<Point> planets, List<Point> references, List<Ellipse> ellipses) {

    /**
     * The covariance of a star's molar Fe/Si and Mg/Si, drawn as its 68 % region (the ellipse of
     * Delta chi^2 = 2.30 for two parameters, common practice) in place of its range cross.
     *
     * @param label      the star (as its {@link Point})
     * @param varFeSi    variance of Fe/Si
     * @param varMgSi    variance of Mg/Si
     * @param covariance their covariance
     */
    public record Ellipse(String label, double varFeSi, double varMgSi, double covariance) {
        public Ellipse {
            Objects.requireNonNull(label);
            if (!(varFeSi >= 0 && varMgSi >= 0 && covariance * covariance <= varFeSi * varMgSi * (1 + 1e-9))) {
                throw new IllegalArgumentException(label + ": not a covariance matrix: " + varFeSi + ", " + varMgSi
                        + ", " + covariance);
            }
        }
    }

    /** Chi-square of two degrees of freedom enclosing 68.27 % (common practice). */
    private static final double CHI2_68 = 2.30;

    /**
     * @param stars      the host stars
     * @param planets    the predicted planets
     * @param references reference bodies drawn as single markers
     */
    public SurveyScatter(final List<Point> stars, final List<Point> planets, final List<Point> references) {
        this(stars, planets, references, List.of());
    }

    /**
     * One body with its ratios and their ranges.
     *
     * @param label    name (a star, a planet, a reference body)
     * @param feSi     molar Fe/Si (x)
     * @param feSiLow  lower end of the Fe/Si range (NaN = none)
     * @param feSiHigh upper end
     * @param mgSi     molar Mg/Si (y)
     * @param mgSiLow  lower end of the Mg/Si range (NaN = none)
     * @param mgSiHigh upper end
     */
    public record Point(String label, double feSi, double feSiLow, double feSiHigh, double mgSi, double mgSiLow,
                        double mgSiHigh) {
        public Point {
            Objects.requireNonNull(label);
            if (!(feSi > 0 && mgSi > 0 && Double.isFinite(feSi) && Double.isFinite(mgSi))) {
                throw new IllegalArgumentException(label + ": Fe/Si and Mg/Si must be finite and > 0, got "
                        + feSi + ", " + mgSi);
            }
        }

        /** @param label name @param feSi molar Fe/Si @param mgSi molar Mg/Si @return a point without ranges */
        public static Point of(final String label, final double feSi, final double mgSi) {
            return new Point(label, feSi, Double.NaN, Double.NaN, mgSi, Double.NaN, Double.NaN);
        }
    }

    private static final Marker[] REFERENCE_MARKERS = {Marker.STAR, Marker.DIAMOND, Marker.TRIANGLE_UP, Marker.SQUARE};

    public SurveyScatter {
        stars = List.copyOf(stars);
        planets = List.copyOf(planets);
        references = List.copyOf(references);
        ellipses = List.copyOf(ellipses);
        if (stars.isEmpty() && planets.isEmpty()) {
            throw new IllegalArgumentException("survey chart: no stars and no planets");
        }
    }

    /**
     * @param size figure size
     * @return the chart
     */
    public Figure chart(final ChartSize size) {
        Figure f = new Figure(size.widthPt(), size.heightPt());
        XYChart c = ChartStyle.chart(f, size.widthPt(), size.heightPt(), "Fe/Si [mol/mol]", "Mg/Si [mol/mol]");
        double[] xr = range(true);
        double[] yr = range(false);
        c.getStyler().setXAxisMin(xr[0]);
        c.getStyler().setXAxisMax(xr[1]);
        c.getStyler().setYAxisMin(yr[0]);
        c.getStyler().setYAxisMax(yr[1]);
        Color starColour = Palette.seriesColour(1);
        Color planetColour = Palette.seriesColour(0);
        java.util.Set<String> withEllipse = new java.util.HashSet<>();
        ellipses.forEach(e -> withEllipse.add(e.label()));
        ranges(c, "star ranges", stars.stream().filter(p -> !withEllipse.contains(p.label())).toList(),
                translucent(starColour, 110));
        ellipses(c, translucent(starColour, 140));
        ranges(c, "planet ranges", planets, translucent(planetColour, 80));
        if (!stars.isEmpty()) {
            ChartStyle.points(c, "stars", fe(stars), mg(stars), Marker.OPEN_CIRCLE, starColour, 1.4, true);
        }
        // planets over the star rings and smaller: a planet that sits on its star shows as a dot in a ring
        if (!planets.isEmpty()) {
            ChartStyle.points(c, "planets", fe(planets), mg(planets), Marker.CIRCLE,
                    translucent(planetColour, 150), 0.65, true);
        }
        for (int i = 0; i < references.size(); i++) {
            Point r = references.get(i);
            ChartStyle.points(c, r.label(), new double[] {r.feSi()}, new double[] {r.mgSi()},
                    REFERENCE_MARKERS[i % REFERENCE_MARKERS.length], Palette.AXIS, 1.6, true);
        }
        f.fill(c);
        DirectLabels labels = new DirectLabels(f, c);
        for (Point r : references) {
            labels.beside(r.label(), labels.x(r.feSi()), labels.y(r.mgSi()));
        }
        return f;
    }

    /** The stars' 68 % regions as closed curves, one series (one path). */
    private void ellipses(final XYChart c, final Color colour) {
        java.util.Map<String, Point> byLabel = new java.util.HashMap<>();
        stars.forEach(p -> byLabel.putIfAbsent(p.label(), p));
        int steps = 40;
        double[] x = new double[ellipses.size() * (steps + 2)];
        double[] y = new double[x.length];
        int k = 0;
        for (Ellipse e : ellipses) {
            Point p = byLabel.get(e.label());
            if (p == null) {
                continue;
            }
            // Cholesky factor of the covariance: (a 0; b d)
            double a = Math.sqrt(e.varFeSi());
            double b = a > 0 ? e.covariance() / a : 0;
            double d = Math.sqrt(Math.max(0, e.varMgSi() - b * b));
            double r = Math.sqrt(CHI2_68);
            for (int i = 0; i <= steps; i++) {
                double t = 2 * Math.PI * i / steps;
                x[k] = p.feSi() + r * a * Math.cos(t);
                y[k++] = p.mgSi() + r * (b * Math.cos(t) + d * Math.sin(t));
            }
            x[k] = p.feSi();
            y[k++] = Double.NaN;
        }
        if (k > 0) {
            ChartStyle.line(c, "star ellipses", java.util.Arrays.copyOf(x, k), java.util.Arrays.copyOf(y, k),
                    LineStyle.solid(colour, 0.5), false);
        }
    }

    private static Color translucent(final Color c, final int alpha) {
        return new Color(c.getRed(), c.getGreen(), c.getBlue(), alpha);
    }

    private static double[] fe(final List<Point> points) {
        return points.stream().mapToDouble(Point::feSi).toArray();
    }

    private static double[] mg(final List<Point> points) {
        return points.stream().mapToDouble(Point::mgSi).toArray();
    }

    /** The 16th-84th percentile ranges of a group as thin crosses, one series (one path). */
    private static void ranges(final XYChart c, final String name, final List<Point> points, final Color colour) {
        List<double[]> segments = new ArrayList<>();
        for (Point pt : points) {
            if (Double.isFinite(pt.feSiLow()) && Double.isFinite(pt.feSiHigh())) {
                segments.add(new double[] {pt.feSiLow(), pt.mgSi(), pt.feSiHigh(), pt.mgSi()});
            }
            if (Double.isFinite(pt.mgSiLow()) && Double.isFinite(pt.mgSiHigh())) {
                segments.add(new double[] {pt.feSi(), pt.mgSiLow(), pt.feSi(), pt.mgSiHigh()});
            }
        }
        if (segments.isEmpty()) {
            return;
        }
        double[] x = new double[3 * segments.size()];
        double[] y = new double[3 * segments.size()];
        for (int k = 0; k < segments.size(); k++) {
            double[] sg = segments.get(k);
            x[3 * k] = sg[0];
            y[3 * k] = sg[1];
            x[3 * k + 1] = sg[2];
            y[3 * k + 1] = sg[3];
            x[3 * k + 2] = sg[2];
            y[3 * k + 2] = Double.NaN;
        }
        ChartStyle.line(c, name, x, y, LineStyle.solid(colour, 0.5), false);
    }

    private double[] range(final boolean fe) {
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (List<Point> group : List.of(stars, planets, references)) {
            for (Point pt : group) {
                for (double v : fe ? new double[] {pt.feSi(), pt.feSiLow(), pt.feSiHigh()}
                        : new double[] {pt.mgSi(), pt.mgSiLow(), pt.mgSiHigh()}) {
                    if (Double.isFinite(v)) {
                        lo = Math.min(lo, v);
                        hi = Math.max(hi, v);
                    }
                }
            }
        }
        for (Ellipse e : ellipses) {
            for (Point pt : stars) {
                if (pt.label().equals(e.label())) {
                    double centre = fe ? pt.feSi() : pt.mgSi();
                    double half = Math.sqrt(CHI2_68 * (fe ? e.varFeSi() : e.varMgSi()));
                    lo = Math.min(lo, centre - half);
                    hi = Math.max(hi, centre + half);
                    break;
                }
            }
        }
        double span = Math.max(hi - lo, 0.05);
        return new double[] {Math.max(0, lo - 0.08 * span), hi + 0.08 * span};
    }
}
