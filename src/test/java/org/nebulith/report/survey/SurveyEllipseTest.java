package org.nebulith.report.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.EnumMap;
import java.util.Map;
import java.util.SplittableRandom;

import org.junit.jupiter.api.Test;
import org.nebulith.report.chart.SurveyScatter;
import org.nebulith.survey.Measurement;
import org.nebulith.survey.StarRow;
import org.nebulith.thermo.Element;

/**
 * The survey chart's star ellipses against a direct Monte Carlo of the same error model (the
 * survey's: [X/H] = value + error (sqrt(rho) z0 + sqrt(1 - rho) z_X), elements a star lacks follow
 * [Fe/H]); the ratios are 10^([X/H] - [Si/H]) times their nominal values (exact identity), so the
 * first-order covariance must match the sampled one for small errors.
 */
class SurveyEllipseTest {

    @Test
    void covarianceMatchesAMonteCarloOfTheDraws() {
        Map<Element, Measurement> m = new EnumMap<>(Element.class);
        m.put(Element.Fe, new Measurement(0.1, 0.03));
        m.put(Element.Mg, new Measurement(0.05, 0.02));
        m.put(Element.Si, new Measurement(0.0, 0.025));
        check(new StarRow("invented", 2, m, null, null, 0.4), false);
    }

    @Test
    void aMissingElementFollowsIron() {
        Map<Element, Measurement> m = new EnumMap<>(Element.class);
        m.put(Element.Fe, new Measurement(0.1, 0.03));
        m.put(Element.Si, new Measurement(0.0, 0.025));
        check(new StarRow("invented", 2, m, null, null, 0.2), true);
    }

    private static void check(final StarRow row, final boolean mgFollowsFe) {
        double feSi = 0.9;
        double mgSi = 1.1;
        SurveyScatter.Ellipse e = SurveyChart.ellipse(row, SurveyScatter.Point.of("invented", feSi, mgSi));
        SplittableRandom random = new SplittableRandom(5);
        int n = 400_000;
        double rho = row.errorCorrelation();
        double sx = 0;
        double sy = 0;
        double sxx = 0;
        double syy = 0;
        double sxy = 0;
        for (int i = 0; i < n; i++) {
            double z0 = gauss(random);
            double fe = row.abundances().get(Element.Fe).error() * (Math.sqrt(rho) * z0 + Math.sqrt(1 - rho) * gauss(random));
            double mgDraw = mgFollowsFe ? Double.NaN : row.abundances().get(Element.Mg).error()
                    * (Math.sqrt(rho) * z0 + Math.sqrt(1 - rho) * gauss(random));
            double si = row.abundances().get(Element.Si).error() * (Math.sqrt(rho) * z0 + Math.sqrt(1 - rho) * gauss(random));
            double mg = mgFollowsFe ? fe : mgDraw;
            double x = feSi * Math.pow(10, fe - si);
            double y = mgSi * Math.pow(10, mg - si);
            sx += x;
            sy += y;
            sxx += x * x;
            syy += y * y;
            sxy += x * y;
        }
        double vx = sxx / n - (sx / n) * (sx / n);
        double vy = syy / n - (sy / n) * (sy / n);
        double cxy = sxy / n - (sx / n) * (sy / n);
        // first order in errors of a few 0.01 dex: agreement to a few per cent
        assertEquals(vx, e.varFeSi(), 0.04 * vx, "var Fe/Si");
        assertEquals(vy, e.varMgSi(), 0.04 * vy, "var Mg/Si");
        assertEquals(cxy, e.covariance(), 0.05 * Math.abs(cxy), "cov");
    }

    private static double gauss(final SplittableRandom r) {
        double u = r.nextDouble();
        double v = r.nextDouble();
        return Math.sqrt(-2 * Math.log(1 - u)) * Math.cos(2 * Math.PI * v);
    }
}
