package org.nebulith.report.chart;

import java.util.ArrayList;
import java.util.List;


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
        return new CondensationCurves(t, curves, t50, List.of("P = 1e-4 bar (invented)"));
    }

    static PhaseAssemblage phases() {
        double[] t = temperatures();
        String[] phases = {"corundum", "perovskite", "melilite", "metal", "forsterite", "enstatite", "troilite"};
        double[] onset = {1700, 1600, 1550, 1360, 1350, 1300, 700};
        double[] amount = {2, 0.15, 4, 30, 25, 28, 10};
        List<Curve> curves = new ArrayList<>();
        for (int p = 0; p < phases.length; p++) {
            double[] a = new double[t.length];
            for (int i = 0; i < t.length; i++) {
                a[i] = t[i] > onset[p] ? 0.0 : amount[p] * (1 - Math.exp(-(onset[p] - t[i]) / 40));
            }
            curves.add(new Curve(phases[p], a));
        }
        return new PhaseAssemblage(t, curves, "Share of the condensate [wt%]", List.of("invented"));
    }

    static RadialProfile radial() {
        int n = 120;
        double[] r = new double[n];
        double[] temp = new double[n];
        double[] pres = new double[n];
        double[] fraction = new double[n];
        double[] mg = new double[n];
        double[] fe = new double[n];
        double[] w = new double[n];
        for (int i = 0; i < n; i++) {
            r[i] = 0.1 * Math.pow(1.03, i);
            temp[i] = 280 * Math.pow(r[i], -0.5) * 2.2;
            pres[i] = 1e-4 * Math.pow(r[i], -2.75);
            fraction[i] = logistic(-r[i], -0.35, 0.03);
            mg[i] = r[i] < 0.3 ? Double.NaN : 1.05 - 0.3 * Math.exp(-(r[i] - 0.3) / 0.1);
            fe[i] = r[i] < 0.3 ? Double.NaN : 0.85 + 0.1 * Math.exp(-(r[i] - 0.3) / 0.2);
            w[i] = Math.exp(-0.5 * Math.pow((r[i] - 1.1) / 0.15, 2));
        }
        return new RadialProfile(r, temp, pres, fraction, mg, fe, 1.0, 0.9,
                List.of(new RadialProfile.Zone("Keroa b", 0.65, 1.55, w)),
                List.of(new RadialProfile.Front("metal", 0.32, true), new RadialProfile.Front("troilite", 1.2, true),
                        new RadialProfile.Front("melilite", 0.33, false)));
    }

    static BodyComparison comparison() {
        List<String> q = List.of("Mg/Si [mol/mol]", "Fe/Si [mol/mol]", "Ca/Si [mol/mol]", "Al/Si [mol/mol]",
                "Core mass fraction");
        return new BodyComparison(q, List.of(
                new BodyComparison.Body("Keroa b (invented)", BodyComparison.Kind.PLANET,
                        new double[] {1.02, 0.88, 0.061, 0.085, 0.31}, new double[] {0.95, 0.8, 0.055, 0.077, 0.28},
                        new double[] {1.1, 0.95, 0.067, 0.093, 0.34}),
                BodyComparison.Body.of("Keroa (invented)", BodyComparison.Kind.HOST, 1.0, 0.9, 0.06, 0.084, Double.NaN),
                BodyComparison.Body.of("bulk Earth (demo)", BodyComparison.Kind.REFERENCE, 1.1, 0.95, 0.07, 0.09, 0.32),
                BodyComparison.Body.of("CI (demo)", BodyComparison.Kind.REFERENCE, 1.05, 0.87, 0.057, 0.085,
                        Double.NaN)));
    }

    static DevolatilisationPattern devolatilisation() {
        List<String> el = List.of("Ti", "Ca", "Mg", "Si", "Fe", "Na", "K", "S");
        double[] t50 = {1580, 1510, 1340, 1320, 1335, 990, 950, 630};
        double[] keroa = {1.0, 1.0, 0.95, 0.9, 0.92, 0.3, 0.25, 0.02};
        return new DevolatilisationPattern(el, t50, List.of(new DevolatilisationPattern.Body("Keroa b (invented)", keroa)),
                "(X/Al) body / (X/Al) star", List.of("invented"));
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
        List<SurveyScatter.Ellipse> ellipses = new ArrayList<>();
        for (int i = 0; i < 10; i++) {
            ellipses.add(new SurveyScatter.Ellipse("star " + i, 0.003, 0.004, 0.002));
        }
        return new SurveyScatter(stars, planets, List.of(SurveyScatter.Point.of("Sun (demo)", 0.85, 1.05),
                SurveyScatter.Point.of("Earth (demo)", 0.9, 1.1)), ellipses);
    }

    /** @return every chart kind, by base file name */
    static java.util.Map<String, Figure> all() {
        java.util.Map<String, Figure> charts = new java.util.LinkedHashMap<>();
        charts.put("condensation-curves", condensation().chart(ChartSize.COLUMN_TALL));
        charts.put("phase-assemblage", phases().chart(ChartSize.PAGE));
        charts.put("radial-profile", radial().chart(ChartSize.PAGE.widthPt(), 330));
        charts.put("planet-comparison", comparison().chart(ChartSize.PAGE.widthPt()));
        charts.put("survey", survey().chart(ChartSize.COLUMN_TALL));
        charts.put("devolatilisation", devolatilisation().chart(ChartSize.PAGE));
        return charts;
    }
}
