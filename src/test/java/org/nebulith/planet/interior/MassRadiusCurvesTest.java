package org.nebulith.planet.interior;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.nebulith.planet.MassRadius;

/** Mass-radius curves of the structure model against published ones over 1-8 Earth masses. */
@Tag("slow")
class MassRadiusCurvesTest {
    private final StructureSolver solver = new StructureSolver();

    @Test
    void matchesZeng2016WithinItsAccuracyPlusTheColdModel() {
        // Zeng, Sasselov & Jacobsen 2016 (ApJ 819, 127): R = (1.07 - 0.21 CMF) M^(1/3.7), valid for 1-8 M_earth,
        // CMF 0-0.4, a fit to their PREM-scaled models good to about 2 % (from memory). Our cold model is allowed
        // 3 %: its cold iron core is slightly denser than their PREM-based one.
        for (double m : new double[] {1, 2, 4, 8}) {
            for (double cmf : new double[] {0, 0.2, 0.325, 0.4}) {
                double r = solver.solve(InteriorModel.ironAndMgSilicate(m, cmf)).radiusRearth();
                double zeng = MassRadius.radiusRearth(m, cmf);
                assertEquals(zeng, r, 0.03 * zeng, "M = " + m + ", CMF = " + cmf);
            }
        }
    }

    @Test
    void matchesSeager2007IronAndIceCurves() {
        // Seager et al. 2007 (ApJ 669, 1279), eq. 23 with Table 4 (coefficients from memory):
        // log10 Rs = k1 + log10(Ms)/3 - k2 Ms^k3, M = m1 Ms, R = r1 Rs. Their models add a Thomas-Fermi-Dirac
        // high-pressure part our Vinet / BM3 fits lack; we allow 7 %.
        double[][] fits = {{-0.209594, 0.0799, 0.413, 5.80, 2.52}, {-0.209396, 0.0807, 0.375, 5.52, 4.43}};
        for (double m : new double[] {1, 2, 4, 8}) {
            double iron = solver.solve(InteriorModel.ironAndMgSilicate(m, 1)).radiusRearth();
            double ice = solver.solve(new InteriorModel(m, 0, 0.9999, MantleComposition.magnesiumSilicate(),
                    CoreComposition.pureIron())).radiusRearth();
            assertEquals(seager(m, fits[0]), iron, 0.07 * iron, "iron at " + m);
            assertEquals(seager(m, fits[1]), ice, 0.07 * ice, "ice at " + m);
        }
    }

    private static double seager(final double m, final double[] f) {
        double ms = m / f[3];
        return f[4] * Math.pow(10, f[0] + Math.log10(ms) / 3 - f[1] * Math.pow(ms, f[2]));
    }

    @Test
    void radiusGrowsWithMassAndFallsWithCoreFraction() {
        double last = 0;
        for (double m : new double[] {0.01, 0.1, 0.5, 1, 3, 10, 30}) {
            double r = solver.solve(InteriorModel.ironAndMgSilicate(m, 0.3)).radiusRearth();
            assertEquals(true, r > last, "mass " + m);
            last = r;
        }
        double a = solver.solve(InteriorModel.ironAndMgSilicate(1, 0.1)).radiusRearth();
        double b = solver.solve(InteriorModel.ironAndMgSilicate(1, 0.6)).radiusRearth();
        assertEquals(true, a > b);
    }
}
