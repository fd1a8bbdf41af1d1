package org.nebulith.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * Reproduces the verification tables of the thermo-sources README (§5b: G(T) of ds62 and B88 rows minus
 * NASA Glenn; §5c: Gibbs energies of formation from the oxides at 1500 K). Source of the expected figures:
 * "thermo-sources README §5b/§5c, own scripts of the data compilers". They are printed to 0.01 kJ (§5b) and
 * 0.1 kJ (§5c), so the tolerances are 0.015 kJ and 0.06 kJ (rounding plus a margin).
 */
class CompilerChecksTest {
    private static final SpeciesDatabase DB = SpeciesDatabase.bundled();
    private static final double TOL_5B_KJ = 0.015;
    private static final double TOL_5C_KJ = 0.06;

    private static double gKj(String id, double t) {
        Species s = DB.get(id);
        if (!s.isValidAt(t)) {
            throw new IllegalStateException(id + " not valid at " + t);
        }
        return s.thermo().gJPerMol(t) / 1000;
    }

    /** {mineral id, per-formula-unit divisor, T, G_NASA, ds62-NASA, B88-NASA (NaN if n/a), NASA id, B88 id}. */
    private static final Object[][] TABLE_5B = {
        {"corundum", 1, 1000, -1778.00, 0.35, 0.24, "AL2O3(a)", "corundum/B88"},
        {"corundum", 1, 1600, -1905.57, 0.39, 0.27, "AL2O3(a)", "corundum/B88"},
        {"spinel", 1, 1000, -2460.96, 2.47, 2.82, "MgAL2O4(cr)", "spinel/B88"},
        {"spinel", 1, 1600, -2652.70, 2.93, 5.42, "MgAL2O4(cr)", "spinel/B88"},
        {"forsterite", 1, 1000, -2345.11, 4.77, 3.98, "Mg2SiO4(cr)", "forsterite/B88"},
        {"forsterite", 1, 1600, -2538.93, 4.98, 4.73, "Mg2SiO4(cr)", "forsterite/B88"},
        {"enstatite", 2, 1000, -1666.78, 4.10, 3.34, "MgSiO3(II)", "enstatite/B88"},
        {"enstatite", 2, 1600, -1801.95, 2.30, 0.91, "MgSiO3(III)", "enstatite/B88"},
        {"periclase", 1, 1000, -650.92, 0.67, 0.15, "MgO(cr)", "periclase/B88"},
        {"periclase", 1, 1600, -708.14, 1.13, 0.14, "MgO(cr)", "periclase/B88"},
        {"lime", 1, 1000, -697.24, 0.37, 0.16, "CaO(cr)", "lime/B88"},
        {"lime", 1, 1600, -763.28, -0.45, -0.37, "CaO(cr)", "lime/B88"},
        {"rutile", 1, 1000, -1026.79, 0.15, -1.53, "TiO2(cr)", "rutile/B88"},
        {"rutile", 1, 1600, -1116.46, 0.85, -2.75, "TiO2(cr)", "rutile/B88"},
        {"troilite", 1, 1000, -196.39, -2.07, Double.NaN, "FeS(c)", null},
        {"troilite", 1, 1400, -258.30, -1.75, Double.NaN, "FeS(c)", null},
        {"iron/ds62", 1, 1000, -42.34, 0.28, Double.NaN, "Fe(a)", null},
        {"iron/ds62", 1, 1600, -89.59, 1.15, Double.NaN, "Fe(c)", null},
        {"nickel/ds62", 1, 1000, -45.07, -0.04, Double.NaN, "Ni(cr)", null},
        {"nickel/ds62", 1, 1600, -90.31, -0.41, Double.NaN, "Ni(cr)", null},
        {"eskolaite", 1, 1000, -1280.95, 1.88, Double.NaN, "Cr2O3(I)", null},
        {"eskolaite", 1, 1600, -1435.84, 1.49, Double.NaN, "Cr2O3(I)", null},
        {"magnetite", 1, 1000, -1360.89, 3.25, 1.53, "Fe3O4(cr)", "magnetite/B88"},
        {"magnetite", 1, 1600, -1626.16, 3.01, 2.58, "Fe3O4(cr)", "magnetite/B88"},
        {"geikielite", 1, 1000, -1702.65, 4.14, Double.NaN, "MgTiO3(cr)", null},
        {"geikielite", 1, 1600, -1850.52, 4.75, Double.NaN, "MgTiO3(cr)", null},
        {"quartz", 1, 1000, -981.42, -0.06, 0.07, "SiO2(b-qz)", "quartz/B88"},
        {"cristobalite", 1, 1600, -1062.56, -0.39, -0.27, "SiO2(b-crt)", "cristobalite/B88"},
    };

    @Test
    void section5bDifferencesToNasa() {
        List<String> bad = new ArrayList<>();
        double maxDev = 0;
        for (Object[] r : TABLE_5B) {
            double t = ((Integer) r[2]).doubleValue();
            double gNasa = gKj((String) r[6], t);
            maxDev = Math.max(maxDev, expect(bad, r[6] + " G at " + t, (Double) r[3], gNasa, TOL_5B_KJ));
            double ds62 = gKj((String) r[0], t) / (Integer) r[1];
            maxDev = Math.max(maxDev, expect(bad, r[0] + " - " + r[6] + " at " + t, (Double) r[4], ds62 - gNasa, TOL_5B_KJ));
            if (r[7] != null) {
                double b88 = gKj((String) r[7], t);
                maxDev = Math.max(maxDev, expect(bad, r[7] + " - " + r[6] + " at " + t, (Double) r[5], b88 - gNasa,
                        TOL_5B_KJ));
            }
        }
        assertEquals(List.of(), bad, "max deviation " + maxDev + " kJ");
    }

    /** Lowest G at T among the listed polymorphs [kJ/mol]: the stable SiO2 of one data family. */
    private static double stable(double t, String... ids) {
        double g = Double.POSITIVE_INFINITY;
        for (String id : ids) {
            if (DB.get(id).isValidAt(t)) {
                g = Math.min(g, gKj(id, t));
            }
        }
        return g;
    }

    @Test
    void section5cGibbsEnergiesOfFormationFromOxidesAt1500K() {
        double t = 1500;
        double q62 = stable(t, "quartz", "tridymite", "cristobalite");
        double qB88 = stable(t, "quartz/B88", "cristobalite/B88");
        double qNasa = stable(t, "SiO2(a-qz)", "SiO2(b-qz)", "SiO2(b-crt)");
        double lime = gKj("lime", t);
        double cor = gKj("corundum", t);
        double per = gKj("periclase", t);
        double limeB = gKj("lime/B88", t);
        double corB = gKj("corundum/B88", t);
        double perB = gKj("periclase/B88", t);
        double limeN = gKj("CaO(cr)", t);
        double corN = gKj("AL2O3(a)", t);
        double perN = gKj("MgO(cr)", t);
        List<String> bad = new ArrayList<>();
        double an = gKj("anorthite", t);
        expect(bad, "anorthite ds62", -138.0, an - lime - cor - 2 * q62, TOL_5C_KJ);
        expect(bad, "anorthite B88", -133.4, gKj("anorthite/B88", t) - limeB - corB - 2 * qB88, TOL_5C_KJ);
        expect(bad, "anorthite on NASA oxides", -138.6, an - limeN - corN - 2 * qNasa, TOL_5C_KJ);
        double geh = gKj("gehlenite", t);
        expect(bad, "gehlenite ds62", -178.3, geh - 2 * lime - cor - q62, TOL_5C_KJ);
        expect(bad, "gehlenite B88", -172.5, gKj("gehlenite/B88", t) - 2 * limeB - corB - qB88, TOL_5C_KJ);
        expect(bad, "gehlenite on NASA oxides", -178.8, geh - 2 * limeN - corN - qNasa, TOL_5C_KJ);
        double di = gKj("diopside", t);
        expect(bad, "diopside ds62", -133.6, di - lime - per - 2 * q62, TOL_5C_KJ);
        expect(bad, "diopside B88", -130.5, gKj("diopside/B88", t) - limeB - perB - 2 * qB88, TOL_5C_KJ);
        expect(bad, "diopside on NASA oxides", -133.5, di - limeN - perN - 2 * qNasa, TOL_5C_KJ);
        expect(bad, "hibonite Hallstedt", -75.8, gKj("hibonite", t) - lime - 6 * cor, TOL_5C_KJ);
        expect(bad, "grossite Hallstedt", -64.2, gKj("grossite", t) - lime - 2 * cor, TOL_5C_KJ);
        expect(bad, "krotite Hallstedt", -49.8, gKj("krotite", t) - lime - cor, TOL_5C_KJ);
        expect(bad, "grossite Cemdata18 on NASA oxides", -70.0, gKj("grossite/Cemdata18", t) - limeN - 2 * corN, TOL_5C_KJ);
        expect(bad, "krotite Cemdata18 on NASA oxides", -61.4, gKj("krotite/Cemdata18", t) - limeN - corN, TOL_5C_KJ);
        double pv = gKj("perovskite", t);
        expect(bad, "perovskite on B88 oxides", -91.9, pv - limeB - gKj("rutile/B88", t), TOL_5C_KJ);
        expect(bad, "perovskite on ds62 oxides", -95.1, pv - lime - gKj("rutile", t), TOL_5C_KJ);
        assertEquals(List.of(), bad);
    }

    private static double expect(List<String> bad, String what, double expected, double actual, double tol) {
        double dev = Math.abs(actual - expected);
        if (!(dev <= tol)) {
            bad.add(String.format("%s: expected %.2f kJ, got %.3f kJ", what, expected, actual));
        }
        return dev;
    }
}
