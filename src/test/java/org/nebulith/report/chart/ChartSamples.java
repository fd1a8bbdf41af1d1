package org.nebulith.report.chart;

import java.util.ArrayList;
import java.util.List;

import org.knowm.xchart.XYChart;

/**
 * Invented demo data for chart tests (shapes only, not results: smooth logistic curves and an
 * invented star "Keroa" and planet "Keroa b").
 */
final class ChartSamples {

    private ChartSamples() {
    }

    static double[] temperatures() {
        double[] t = new double[171];
        for (int i = 0; i < t.length; i++) {
            t[i] = 2000 - 10 * i;
        }
        return t;
    }

    private static double logistic(final double t, final double t50, final double width) {
        return 1 / (1 + Math.exp((t - t50) / width));
    }

    static CondensationCurves condensation() {
        double[] t = temperatures();
        String[] elements = {"Al", "Ti", "Ca", "Mg", "Si", "Fe", "Ni", "Co", "Cr", "Na", "K", "P", "Mn", "S"};
        double[] t50 = {1650, 1580, 1520, 1340, 1310, 1335, 1350, 1345, 1295, 960, 1000, 1230, 1150, 660};
        List<Curve> curves = new ArrayList<>();
        for (int e = 0; e < elements.length; e++) {
            double[] f = new double[t.length];
            for (int i = 0; i < t.length; i++) {
                f[i] = logistic(t[i], t50[e], 15);
            }
            curves.add(new Curve(elements[e], f));
        }
        return new CondensationCurves(t, curves, "P = 1e-4 bar (invented)");
    }

    static PhaseAssemblage phases() {
        double[] t = temperatures();
        String[] phases = {"corundum", "perovskite", "melilite", "metal", "forsterite", "enstatite", "troilite"};
        double[] onset = {1700, 1600, 1550, 1360, 1350, 1300, 700};
        double[] amount = {2e4, 1.5e3, 4e4, 8e5, 5e5, 7e5, 2e5};
        List<Curve> curves = new ArrayList<>();
        for (int p = 0; p < phases.length; p++) {
            double[] a = new double[t.length];
            for (int i = 0; i < t.length; i++) {
                a[i] = t[i] > onset[p] ? 0.0 : amount[p] * (1 - Math.exp(-(onset[p] - t[i]) / 40));
            }
            curves.add(new Curve(phases[p], a));
        }
        return new PhaseAssemblage(t, curves, "mol per 1e6 Si");
    }

    static RadialProfile radial() {
        int n = 120;
        double[] r = new double[n];
        double[] fraction = new double[n];
        double[] mg = new double[n];
        double[] fe = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = 0.1 + i * 0.025;
            fraction[i] = logistic(-r[i], -0.35, 0.03);
            mg[i] = r[i] < 0.3 ? Double.NaN : 1.05 - 0.3 * Math.exp(-(r[i] - 0.3) / 0.1);
            fe[i] = r[i] < 0.3 ? Double.NaN : 0.85 + 0.1 * Math.exp(-(r[i] - 0.3) / 0.2);
        }
        return new RadialProfile(r, fraction, mg, fe,
                List.of(new RadialProfile.Zone("Keroa b", 0.8, 1.4)),
                List.of(new RadialProfile.Front("metal", 0.32), new RadialProfile.Front("FeS", 2.2)));
    }

    static BodyComparison comparison() {
        List<String> q = List.of("Mg/Si", "Fe/Si", "Ca/Si", "Al/Si", "core mass fraction");
        return new BodyComparison(q, List.of(
                new BodyComparison.Body("Keroa b (invented)", new double[] {1.02, 0.88, 0.061, 0.085, 0.31},
                        new double[] {0.95, 0.8, 0.055, 0.077, 0.28}, new double[] {1.1, 0.95, 0.067, 0.093, 0.34}),
                BodyComparison.Body.of("Keroa (invented)", 1.0, 0.9, 0.06, 0.084, Double.NaN),
                BodyComparison.Body.of("bulk Earth (demo)", 1.1, 0.95, 0.07, 0.09, 0.32),
                BodyComparison.Body.of("CI (demo)", 1.05, 0.87, 0.057, 0.085, Double.NaN)));
    }

    static SurveyScatter survey() {
        java.util.SplittableRandom random = new java.util.SplittableRandom(11);
        List<SurveyScatter.Point> stars = new ArrayList<>();
        List<SurveyScatter.Point> planets = new ArrayList<>();
        for (int i = 0; i < 40; i++) {
            double fe = 0.6 + 0.6 * random.nextDouble();
            double mg = 0.8 + 0.6 * random.nextDouble();
            stars.add(new SurveyScatter.Point("star " + i, fe, fe - 0.05, fe + 0.06, mg, mg - 0.07, mg + 0.05));
            planets.add(new SurveyScatter.Point("planet " + i, fe * 0.98, fe * 0.9, fe * 1.05, mg * 1.01,
                    mg * 0.93, mg * 1.08));
        }
        return new SurveyScatter(stars, planets, List.of(SurveyScatter.Point.of("Sun (demo)", 0.85, 1.05),
                SurveyScatter.Point.of("Earth (demo)", 0.9, 1.1)));
    }

    /** @return every chart kind, by base file name */
    static java.util.Map<String, XYChart> all() {
        java.util.Map<String, XYChart> charts = new java.util.LinkedHashMap<>();
        charts.put("condensation-curves", condensation().chart(ChartSize.COLUMN));
        charts.put("phase-assemblage", phases().chart(ChartSize.COLUMN, false));
        charts.put("phase-assemblage-log", phases().chart(ChartSize.COLUMN, true));
        charts.put("radial-profile", radial().chart(ChartSize.COLUMN_TALL));
        charts.put("planet-comparison", comparison().chart(ChartSize.COLUMN_TALL));
        charts.put("survey", survey().chart(ChartSize.COLUMN));
        return charts;
    }
}
