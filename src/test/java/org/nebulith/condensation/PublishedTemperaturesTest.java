package org.nebulith.condensation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import org.nebulith.thermo.DataSet;
import org.nebulith.thermo.Element;

/**
 * 50% condensation temperatures at 1e-4 bar, default data set, all solutions, against Lodders (2003)
 * ApJ 591, 1220, Table 8. Na, Mg, Al, Si, P, S: Table 8 as transcribed beside Wood et al. (2019) on
 * the skyfallmeteorites.com page "Condensation Temperatures of the Elements"; Ti, Ca, Fe, Ni, Co, Cr, K,
 * Mn: Table 8 as transcribed in GitHub nhmc/Barak, barak/data/abundances/CondensationTemperatures.txt
 * (commit 43b70f5177937cbceaf084fb5b69757ac4ba6dbc; it also agrees with the skyfallmeteorites values).
 * The tolerances are 30 K (100 K for Na, whose host is an ideal feldspar, and P). Misses are not loosened:
 * each asserts its documented cause instead (contributors' guide, "Condensation temperatures").
 */
class PublishedTemperaturesTest {

    @ParameterizedTest(name = "{0}: Lodders 2003 {1} K ({3})")
    @CsvSource({
        "Ti, 1582, 30, Lodders 2003 Table 8 via nhmc/Barak",
        "Ca, 1517, 30, Lodders 2003 Table 8 via nhmc/Barak",
        "Mg, 1336, 30, Lodders 2003 Table 8 via skyfallmeteorites.com",
        "Si, 1310, 30, Lodders 2003 Table 8 via skyfallmeteorites.com",
        "Fe, 1334, 30, Lodders 2003 Table 8 via nhmc/Barak",
        "Ni, 1353, 30, Lodders 2003 Table 8 via nhmc/Barak",
        "Co, 1352, 30, Lodders 2003 Table 8 via nhmc/Barak",
        "Cr, 1296, 30, Lodders 2003 Table 8 via nhmc/Barak",
        "Na, 958, 100, Lodders 2003 Table 8 via skyfallmeteorites.com",
        "K, 1006, 30, Lodders 2003 Table 8 via nhmc/Barak",
        "Mn, 1158, 30, Lodders 2003 Table 8 via nhmc/Barak",
    })
    void withinTheIssueTolerance(String symbol, double published, double tolerance, String source) {
        assertEquals(published, SequenceRuns.t50K(SequenceRuns.base(), Element.fromSymbol(symbol)), tolerance, source);
    }

    @Test
    void aluminiumMissExplainedByGaseousAlOH() {
        // Lodders 2003 Table 8 via skyfallmeteorites.com: Al 1653 K; we get about 1615 K (miss by about 38 K)
        double ours = SequenceRuns.t50K(SequenceRuns.base(), Element.Al);
        assertTrue(Math.abs(ours - 1653) > 30, "Al now within 30 K: update the documentation " + ours);
        // thermo-sources README 9: NASA AlOH(g) ~13 kJ/mol more stable than JANAF (from memory), ~20 K on corundum
        double shift = SequenceProbe.firstAppearance(SequenceRuns.alohShifted(13000), "corundum")
                - SequenceProbe.firstAppearance(SequenceRuns.alohBase(), "corundum");
        assertEquals(20, shift, 10, "corundum appearance shift");
        double t50Shift = SequenceRuns.t50K(SequenceRuns.alohShifted(13000), Element.Al)
                - SequenceRuns.t50K(SequenceRuns.alohBase(), Element.Al);
        assertTrue(t50Shift > 10, "Al T50 moves towards the published value by " + t50Shift);
    }

    @Test
    void sulfurMissExplainedByTheFeSData() {
        // Lodders 2003 Table 8 via skyfallmeteorites.com: S 664 K; we get about 634 K with the NASA FeS entries
        double nasa = SequenceRuns.t50K(SequenceRuns.sulfide(1e-4, false), Element.S);
        double troilite = SequenceRuns.t50K(SequenceRuns.sulfide(1e-4, true), Element.S);
        assertTrue(Math.abs(nasa - 664) > 30, "S now within 30 K: update the documentation " + nasa);
        // thermo-sources README 9: ds62 troilite and NASA FeS appear about 25 K apart
        assertEquals(25, SequenceProbe.firstAppearance(SequenceRuns.sulfide(1e-4, true), "troilite")
                - SequenceProbe.sulfideAppearance(SequenceRuns.sulfide(1e-4, false)), 10);
        assertEquals(664, troilite, 30, "with ds62 troilite S is within the 30 K tolerance");
    }

    @Test
    void phosphorusMissExplainedByTheMissingPhosphide() {
        // Lodders 2003 Table 8 via skyfallmeteorites.com: P 1229 K, hosted by schreibersite (Fe3P) in metal
        ElementCondensation p = SequenceRuns.t50(SequenceRuns.base(), Element.P);
        assertTrue(Math.abs(p.t50K().orElseThrow() - 1229) > 100, "P now within 100 K " + p);
        assertEquals("whitlockite", p.hostPhase());
        // thermo-sources README 9: no schreibersite data, so no Fe-P condensate at all
        assertFalse(DataSet.named(DataSet.DEFAULT).condensed().stream().anyMatch(s -> s.formula().counts().size() == 2
                && s.formula().count(Element.P) > 0 && s.formula().count(Element.Fe) > 0), "a phosphide exists now");
    }

    @Test
    void manganeseAndPotassiumHaveSilicateHosts() {
        // Lodders 2003 Table 8 via nhmc/Barak: Mn hosted by forsterite + enstatite, K by feldspar
        ElementCondensation mn = SequenceRuns.t50(SequenceRuns.base(), Element.Mn);
        assertEquals("olivine", mn.hostPhase(), mn.toString());
        assertEquals("feldspar", SequenceRuns.t50(SequenceRuns.base(), Element.K).hostPhase());
    }

    @Test
    void chlorineMissExplainedByTheMissingSodalite() {
        // Lodders 2003 Table 8 via nhmc/Barak: Cl 948 K in sodalite Na4[Al3Si3O12]Cl; Wood et al. 2019 (via
        // skyfallmeteorites.com) give 472 K in Cl-apatite with a lower Cl abundance
        ElementCondensation cl = SequenceRuns.t50(SequenceRuns.base(), Element.Cl);
        assertTrue(Math.abs(cl.t50K().orElseThrow() - 948) > 100, "Cl now within 100 K " + cl);
        assertEquals("NaCL(cr)", cl.hostPhase());
        // no Cl-bearing silicate or phosphate in the data: Cl can only condense as a chloride
        assertFalse(DataSet.named(DataSet.DEFAULT).condensed().stream().anyMatch(s -> s.formula().count(Element.Cl) > 0
                && (s.formula().count(Element.Si) > 0 || s.formula().count(Element.P) > 0)), "a Cl silicate exists now");
    }
}
