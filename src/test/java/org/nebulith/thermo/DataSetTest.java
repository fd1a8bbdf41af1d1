package org.nebulith.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Collectors;

import org.junit.jupiter.api.Test;

class DataSetTest {
    private static Set<String> ids(DataSet d) {
        return d.species().stream().map(Species::id).collect(Collectors.toSet());
    }

    @Test
    void nasaSetHoldsEveryNasaEntryAndNoMineralRow() {
        DataSet nasa = DataSet.named(DataSet.NASA);
        // 520 neutral gases made of the 21 tracked elements: count of the NASA file entries (own scan of the
        // file with a separate script while writing this test)
        assertEquals(520, nasa.gases().size());
        assertTrue(ids(nasa).containsAll(List.of("AL2O3(a)", "Mg2SiO4(cr)", "SiO", "Fe(a)", "Fe(L)", "MgSiO3(III)")));
        assertFalse(ids(nasa).contains("forsterite"));
        assertTrue(nasa.species().stream().noneMatch(s -> s.formula().counts().isEmpty()));
    }

    @Test
    void referencePureHasThe47CondensedAnd299GasesOfItsElements() {
        DataSet ref = DataSet.named(DataSet.REFERENCE_PURE);
        assertEquals(47, ref.condensed().size());
        // reference-sequence README: "all 299 neutral gases of the NASA file made only of these elements"
        Set<Element> els = EnumSet.of(Element.H, Element.He, Element.C, Element.N, Element.O, Element.Na, Element.Mg,
                Element.Al, Element.Si, Element.P, Element.S, Element.K, Element.Ca, Element.Ti, Element.Cr, Element.Fe,
                Element.Ni);
        assertEquals(299, ref.gases().stream().filter(s -> s.formula().madeOnlyOf(els)).count());
    }

    @Test
    void defaultReplacesNasaOxidesByMineralsAndKeepsMetalsAndFeS() {
        Set<String> d = ids(DataSet.named(DataSet.DEFAULT));
        assertTrue(d.containsAll(List.of("corundum", "forsterite", "enstatite", "protoenstatite", "clinoenstatite",
                "pseudowollastonite", "quartz", "tridymite", "cristobalite", "hibonite", "perovskite", "whitlockite",
                "Fe(a)", "Fe(c)", "Fe(d)", "Fe(L)", "Ni(cr)", "Ni(L)", "Co(a)", "Co(b)", "Co(L)",
                "FeS(a)", "FeS(b)", "FeS(c)", "FeS(L)", "C(gr)", "CaS(cr)", "TiN(cr)", "SiC(b)")));
        for (String gone : List.of("AL2O3(a)", "Mg2SiO4(cr)", "MgSiO3(I)", "MgSiO3(II)", "MgSiO3(III)", "SiO2(a-qz)",
                "SiO2(b-crt)", "MgAL2O4(cr)", "TiO2(cr)", "CaO(cr)", "MgO(cr)", "Fe3O4(cr)", "MgTiO3(cr)",
                "troilite", "high albite", "iron", "iron/ds62", "nickel/ds62", "forsterite/B88", "AL2O3(L)", "SiO2(L)")) {
            assertFalse(d.contains(gone), gone);
        }
        assertTrue(DataSet.named(DataSet.DEFAULT).condensed().stream()
                .noneMatch(s -> s.state() == Species.State.LIQUID && s.formula().count(Element.O) > 0));
    }

    @Test
    void variantSwapsRowsOfOneFamily() {
        DataSet b88 = DataSet.named(DataSet.DEFAULT).withVariant("B88");
        Set<String> d = ids(b88);
        assertTrue(d.containsAll(List.of("forsterite/B88", "quartz/B88", "cristobalite/B88", "enstatite/B88",
                "protoenstatite/B88", "sanidine/B88", "nepheline")));
        assertFalse(d.contains("forsterite"));
        assertFalse(d.contains("tridymite"), "ds62 SiO2 polymorph without B88 row must go");
        assertFalse(d.contains("clinoenstatite"));
        DataSet ds62 = DataSet.named(DataSet.DEFAULT).withVariant("ds62");
        assertTrue(ids(ds62).containsAll(List.of("iron/ds62", "nickel/ds62", "Fe(L)")));
        assertFalse(ids(ds62).contains("Fe(a)"));
        Set<String> rh = ids(DataSet.named(DataSet.DEFAULT).withVariant("RH95"));
        assertTrue(rh.contains("cobalt/RH95") && rh.contains("Co(b)") && !rh.contains("Co(a)"));
        assertThrows(IllegalArgumentException.class, () -> DataSet.named(DataSet.DEFAULT).withVariant("nonsense"));
    }
}
