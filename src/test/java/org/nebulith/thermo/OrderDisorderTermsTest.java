package org.nebulith.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.nebulith.thermo.mineral.BraggWilliamsTerm;
import org.nebulith.thermo.mineral.LandauTerm;
import org.nebulith.thermo.mineral.MineralModel;
import org.nebulith.thermo.mineral.TransitionTerm;

/**
 * The Landau term of quartz and the Bragg-Williams term of spinel against separate, deliberately naive
 * evaluations of the formulas in thermo-sources README §3 (Holland &amp; Powell 2011 Landau; Holland &amp;
 * Powell 1996 Bragg-Williams, with Q found here by brute-force minimisation of G over a fine grid), plus
 * their limits. Parameters from the ds62 rows of the mineral table: quartz Tc0 = 847 K, Smax = 4.95 J/K;
 * spinel dH = 8000 J, W = 1200 J, n = 2, f = 0.5.
 */
class OrderDisorderTermsTest {
    private static final double R = 8.314510;

    private static double landauReadme(double t, double tc0, double smax) {
        double q0 = Math.pow((tc0 - 298.15) / tc0, 0.25);
        double q = t < tc0 ? Math.pow((tc0 - t) / tc0, 0.25) : 0;
        return smax * (tc0 * (q0 * q0 - Math.pow(q0, 6) / 3) - tc0 * q * q + tc0 * Math.pow(q, 6) / 3 - t * (q0 * q0 - q * q));
    }

    private static double bwG(double q, double t, double dh, double w, double n, double f) {
        double sum = (1 + n * q) * Math.log((1 + n * q) / (n + 1)) + n * (n + q) * Math.log((n + q) / (n + 1));
        if (q < 1) {
            sum += n * (1 - q) * Math.log(n * (1 - q) / (n + 1)) + n * (1 - q) * Math.log((1 - q) / (n + 1));
        }
        double sConf = -R * f / (n + 1) * sum;
        return (1 - q) * dh + (1 - q) * q * w - t * sConf;
    }

    /** Brute force: G on 200001 points of Q in [0, 1], then golden-section refinement around the best. */
    private static double[] bwReadme(double t, double dh, double w, double n, double f) {
        int best = 0;
        double gBest = Double.POSITIVE_INFINITY;
        for (int i = 0; i <= 200000; i++) {
            double g = bwG(i / 200000.0, t, dh, w, n, f);
            if (g < gBest) {
                gBest = g;
                best = i;
            }
        }
        double a = Math.max(0, (best - 1) / 200000.0);
        double b = Math.min(1, (best + 1) / 200000.0);
        for (int k = 0; k < 200; k++) {
            double m1 = a + (b - a) * 0.381966;
            double m2 = a + (b - a) * 0.618034;
            if (bwG(m1, t, dh, w, n, f) < bwG(m2, t, dh, w, n, f)) {
                b = m2;
            } else {
                a = m1;
            }
        }
        double q = 0.5 * (a + b);
        return new double[] {q, bwG(q, t, dh, w, n, f)};
    }

    private static TransitionTerm onlyTerm(String id) {
        MineralModel m = (MineralModel) SpeciesDatabase.bundled().get(id).thermo();
        assertEquals(1, m.terms().size(), id + " terms");
        return m.terms().get(0);
    }

    @Test
    void quartzLandauTermMatchesReadmeFormulaAndLimits() {
        TransitionTerm l = onlyTerm("quartz");
        assertTrue(l instanceof LandauTerm);
        assertEquals(0.0, l.g(298.15), 1e-9, "zero at 298.15 K (README §3)");
        for (double t : new double[] {400, 600, 800, 840, 846, 900, 1200, 1800}) {
            assertEquals(landauReadme(t, 847, 4.95), l.g(t), 1e-9, "G_Landau at " + t);
            assertEquals(l.h(t) - t * l.s(t), l.g(t), 1e-9);
        }
        // above Tc0 only the constant part remains: S constant, H constant, G linear in T
        assertEquals(l.s(900), l.s(1500), 1e-12);
        assertEquals(l.h(900), l.h(1500), 1e-9);
        double q0sq = Math.sqrt((847 - 298.15) / 847);
        assertEquals(4.95 * q0sq, l.s(1000), 1e-12, "S above Tc0 = Smax Q0^2");
        assertEquals(0.0, l.cp(1000), 0.0);
    }

    @Test
    void spinelBraggWilliamsTermMatchesBruteForceMinimum() {
        TransitionTerm t = onlyTerm("spinel");
        assertTrue(t instanceof BraggWilliamsTerm);
        BraggWilliamsTerm bw = (BraggWilliamsTerm) t;
        for (double temp : new double[] {298.15, 500, 800, 1000, 1300, 1600, 2000}) {
            double[] ref = bwReadme(temp, 8000, 1200, 2, 0.5);
            assertEquals(ref[0], bw.orderParameter(temp), 1e-5, "Q at " + temp);
            assertEquals(ref[1], bw.g(temp), 1e-3, "G_BW at " + temp);
            assertEquals(bw.h(temp) - temp * bw.s(temp), bw.g(temp), 1e-8);
        }
        assertTrue(bw.orderParameter(298.15) > 0.98, "nearly ordered at 298 K");
        assertTrue(Math.abs(bw.g(298.15)) < 20, "README §3: G_BW(298 K) <= 0.02 kJ");
        assertTrue(bw.orderParameter(200) > bw.orderParameter(1000) && bw.orderParameter(1000) > bw.orderParameter(2000));
    }

    @Test
    void braggWilliamsPicksTheLowerOfTwoMinima() {
        // anorthite (dH = 42010 J, W = 42000 J, n = 1, f = 2): W close to dH, G(Q) can have two minima
        BraggWilliamsTerm an = (BraggWilliamsTerm) onlyTerm("anorthite");
        for (double temp : new double[] {800, 1500, 2200, 2500}) {
            double[] ref = bwReadme(temp, 42010, 42000, 1, 2);
            assertEquals(ref[1], an.g(temp), 1e-3, "anorthite G_BW at " + temp);
        }
    }
}
