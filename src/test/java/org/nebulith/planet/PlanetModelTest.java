package org.nebulith.planet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.thermo.Element;
import org.nebulith.thermo.Formula;

class PlanetModelTest {

    private static CondensedPhase ph(String name, String formula, double moles, PhaseKind kind) {
        return new CondensedPhase(name, Formula.parse(formula), moles, kind);
    }

    /**
     * A hand-built proto-solar inventory (Lodders 2003, ApJ 591, 1220, Table 2, atoms per 1e6 Si):
     * all Fe, Ni and Co as metal, S left in the gas, Mg and Si as forsterite + enstatite, Al, Ca, Ti,
     * Cr, Mn, Na, K as refractory oxides.
     */
    static List<CondensedPhase> protosolarInventory() {
        ElementAbundances s = AbundancePresets.preset("protosolar-lodders2003").abundances().per1e6Si();
        double mg = s.moles(Element.Mg);
        double si = s.moles(Element.Si);
        double fo = mg - si; // Mg2SiO4 + MgSiO3 with 2 fo + en = Mg, fo + en = Si
        List<CondensedPhase> p = new ArrayList<>();
        p.add(ph("Fe-Ni metal (Fe)", "Fe:1", s.moles(Element.Fe), PhaseKind.METAL));
        p.add(ph("Fe-Ni metal (Ni)", "Ni:1", s.moles(Element.Ni), PhaseKind.METAL));
        p.add(ph("Fe-Ni metal (Co)", "Co:1", s.moles(Element.Co), PhaseKind.METAL));
        p.add(ph("forsterite", "Mg:2 Si:1 O:4", fo, PhaseKind.SILICATE_OXIDE));
        p.add(ph("enstatite", "Mg:1 Si:1 O:3", si - fo, PhaseKind.SILICATE_OXIDE));
        p.add(ph("corundum", "Al:2 O:3", s.moles(Element.Al) / 2, PhaseKind.SILICATE_OXIDE));
        p.add(ph("perovskite", "Ca:1 Ti:1 O:3", s.moles(Element.Ti), PhaseKind.SILICATE_OXIDE));
        p.add(ph("lime", "Ca:1 O:1", s.moles(Element.Ca) - s.moles(Element.Ti), PhaseKind.SILICATE_OXIDE));
        p.add(ph("eskolaite", "Cr:2 O:3", s.moles(Element.Cr) / 2, PhaseKind.SILICATE_OXIDE));
        p.add(ph("manganosite", "Mn:1 O:1", s.moles(Element.Mn), PhaseKind.SILICATE_OXIDE));
        p.add(ph("Na2O", "Na:2 O:1", s.moles(Element.Na) / 2, PhaseKind.SILICATE_OXIDE));
        p.add(ph("K2O", "K:2 O:1", s.moles(Element.K) / 2, PhaseKind.SILICATE_OXIDE));
        return p;
    }

    /**
     * Core mass fraction of proto-solar rock with all Fe, Ni as metal and S in the gas: between
     * 0.30 and 0.36 (bulk Earth 0.325, McDonough 2003, Treatise on Geochemistry vol. 2; composition
     * Lodders 2003 Table 2).
     */
    @Test
    void protosolarRockHasAnEarthLikeCoreMassFraction() {
        PlanetComposition c = PlanetModel.build(protosolarInventory(), CoreOptions.defaults()).require();
        double cmf = c.coreMassFraction();
        assertTrue(cmf > 0.30 && cmf < 0.36, "CMF = " + cmf);
        assertEquals(100.0, c.oxides().mgNumber(), 1e-12); // no FeO: all iron is metal
        assertEquals(0.0, c.oxides().oxygenExcess(), 1e-9 * c.oxides().oxygenNeeded());
        ElementAbundances s = AbundancePresets.preset("protosolar-lodders2003").abundances();
        assertEquals(s.ratio(Element.Mg, Element.Si), c.molarRatios().get("Mg_Si_molar"), 1e-12);
        assertEquals(s.ratio(Element.Fe, Element.Si), c.molarRatios().get("Fe_Si_molar"), 1e-12);
        assertFalse(c.molarRatios().containsKey("S_Si_molar") && c.molarRatios().get("S_Si_molar") > 0);
    }

    /** Exact identities: every element's bulk total equals the sum over phases and over reservoirs. */
    @Test
    void massBalanceHoldsToRoundOff() {
        List<CondensedPhase> inv = new ArrayList<>(protosolarInventory());
        inv.add(ph("troilite", "Fe:1 S:1", 1e5, PhaseKind.SULFIDE));
        inv.add(ph("water ice", "H:2 O:1", 3e6, PhaseKind.ICE));
        inv.add(ph("graphite", "C:1", 2e4, PhaseKind.CARBON));
        for (CoreOptions o : List.of(CoreOptions.defaults(), new CoreOptions(false, 5, 2))) {
            PlanetComposition c = PlanetModel.build(inv, o).require();
            for (Element el : Element.values()) {
                double phases = 0;
                for (CondensedPhase p : inv) {
                    phases += p.moles() * p.formula().count(el);
                }
                double reservoirs = c.core().moles(el) + c.mantle().moles(el) + c.mantleSulfide().moles(el)
                        + c.ice().moles(el);
                double scale = Math.max(1.0, phases);
                assertEquals(phases, c.bulk().moles(el), 1e-12 * scale, el.name());
                assertEquals(phases, reservoirs, 1e-12 * scale, el.name());
            }
            for (Quantity q : c.quantities()) {
                assertTrue(Double.isFinite(q.value()), q.name());
            }
        }
    }

    @Test
    void lightElementsAndSulfideOptions() {
        List<CondensedPhase> inv = new ArrayList<>(protosolarInventory());
        inv.add(ph("troilite", "Fe:1 S:1", 1e5, PhaseKind.SULFIDE));
        PlanetComposition withFeS = PlanetModel.build(inv, CoreOptions.defaults()).require();
        PlanetComposition feSMantle = PlanetModel.build(inv, new CoreOptions(false, 0, 0)).require();
        assertTrue(withFeS.coreMassFraction() > feSMantle.coreMassFraction());
        assertEquals(1e5, feSMantle.mantleSulfide().moles(Element.S), 1e-9);
        PlanetComposition si = PlanetModel.build(inv, new CoreOptions(true, 6, 0)).require();
        double siWt = si.core().weightPercent().get(Element.Si);
        assertEquals(6.0, siWt, 1e-10);
        assertTrue(si.oxides().oxygenExcess() > 0, "Si taken as metal leaves its oxygen behind");
        List<CondensedPhase> noSilicate = List.of(ph("metal", "Fe:1", 10, PhaseKind.METAL),
                ph("quartz", "Si:1 O:2", 0.01, PhaseKind.SILICATE_OXIDE));
        assertThrows(IllegalArgumentException.class, () -> PlanetModel.build(noSilicate, new CoreOptions(true, 10, 0)));
    }

    @Test
    void mgNumberLimits() {
        PlanetComposition fo = PlanetModel.build(List.of(ph("fo", "Mg:2 Si:1 O:4", 1, PhaseKind.SILICATE_OXIDE)),
                CoreOptions.defaults()).require();
        assertEquals(100.0, fo.oxides().mgNumber(), 0);
        PlanetComposition fa = PlanetModel.build(List.of(ph("fa", "Fe:2 Si:1 O:4", 1, PhaseKind.SILICATE_OXIDE)),
                CoreOptions.defaults()).require();
        assertEquals(0.0, fa.oxides().mgNumber(), 0);
        PlanetComposition mix = PlanetModel.build(List.of(ph("fo", "Mg:2 Si:1 O:4", 0.9, PhaseKind.SILICATE_OXIDE),
                ph("fa", "Fe:2 Si:1 O:4", 0.1, PhaseKind.SILICATE_OXIDE)), CoreOptions.defaults()).require();
        assertEquals(90.0, mix.oxides().mgNumber(), 1e-12);
        // forsterite is 42.7 wt% SiO2 and 57.3 wt% MgO (stoichiometry, IUPAC weights: common practice)
        assertEquals(100 * 60.083 / 140.693, fo.oxides().oxideWtPct().get("SiO2"), 1e-3);
        assertEquals(0.0, fo.coreMassFraction(), 0);
    }

    @Test
    void noSolidsGivesANoticeNotNaN() {
        for (List<CondensedPhase> inv : List.of(List.<CondensedPhase>of(),
                List.of(ph("fo", "Mg:2 Si:1 O:4", 0.0, PhaseKind.SILICATE_OXIDE)))) {
            PlanetResult r = PlanetModel.build(inv, CoreOptions.defaults());
            assertFalse(r.hasSolids());
            assertTrue(r.notice().startsWith("no solids"), r.notice());
            assertThrows(IllegalStateException.class, r::require);
        }
        PlanetComposition iceOnly = PlanetModel.build(List.of(ph("ice", "H:2 O:1", 1, PhaseKind.ICE)),
                CoreOptions.defaults()).require();
        assertFalse(iceOnly.hasRock());
        assertEquals(1.0, iceOnly.waterMassFraction(), 1e-15);
        assertTrue(iceOnly.quantities().stream().noneMatch(q -> q.name().equals("core_mass_fraction")));
    }
}
