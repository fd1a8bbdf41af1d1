package org.nebulith.composition;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumSet;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.nebulith.thermo.Element;

class CompositionOperationsTest {
    private final ElementAbundances sun = AbundancePresets.preset("protosolar-lodders2003").abundances();
    private final ElementAbundances ci = AbundancePresets.preset("ci-chondrite").abundances();

    @Test
    void dustEnrichmentAddsCiDustPerSi() {
        assertSame(sun, DustEnrichment.enrich(sun, ci, 1.0));
        ElementAbundances e = DustEnrichment.enrich(sun, ci, 10.0);
        double si = sun.moles(Element.Si);
        assertEquals(10 * si, e.moles(Element.Si), 1e-9 * si);
        assertEquals(sun.moles(Element.H), e.moles(Element.H), 0);
        assertEquals(sun.moles(Element.He), e.moles(Element.He), 0);
        for (Element el : EnumSet.of(Element.Mg, Element.Fe, Element.O, Element.C, Element.S)) {
            double expected = sun.moles(el) + 9 * si * ci.ratio(el, Element.Si);
            assertEquals(expected, e.moles(el), 1e-12 * expected, el.name());
        }
        // the enrichment is in the dust: Fe/H rises roughly ten-fold, H/He is untouched
        assertTrue(e.ratio(Element.Fe, Element.H) / sun.ratio(Element.Fe, Element.H) > 9.5);
        assertThrows(IllegalArgumentException.class, () -> DustEnrichment.enrich(sun, ci, 0.5));
        assertThrows(IllegalArgumentException.class, () -> DustEnrichment.enrich(sun, ci, Double.NaN));
    }

    @Test
    void carbonToOxygenOverrideChangesOnlyCarbon() {
        ElementAbundances c = CarbonToOxygen.withCarbonToOxygen(sun, 0.9);
        assertEquals(0.9, CarbonToOxygen.of(c), 1e-15);
        for (Element el : sun.elements()) {
            if (el != Element.C) {
                assertEquals(sun.moles(el), c.moles(el), 0, el.name());
            }
        }
        assertThrows(IllegalArgumentException.class, () -> CarbonToOxygen.withCarbonToOxygen(sun, -1));
    }

    @Test
    void stellarAbundancesFollowFeHWhereMissing() {
        ElementAbundances ref = SolarReference.ASPLUND2009.abundances();
        StellarAbundances.Result r = StellarAbundances.apply(ref, Map.of(Element.Fe, 0.2, Element.Mg, 0.1));
        ElementAbundances s = r.abundances();
        assertEquals(ref.logEps(Element.Fe) + 0.2, s.logEps(Element.Fe), 1e-12);
        assertEquals(ref.logEps(Element.Mg) + 0.1, s.logEps(Element.Mg), 1e-12);
        assertEquals(ref.logEps(Element.Si) + 0.2, s.logEps(Element.Si), 1e-12);
        assertEquals(ref.moles(Element.He), s.moles(Element.He), 0);
        assertTrue(r.followedFeH().contains(Element.Si));
        assertTrue(!r.followedFeH().contains(Element.Mg) && !r.followedFeH().contains(Element.He));
        // a star with [X/H] = 0 everywhere is the reference itself
        assertEquals(ref, StellarAbundances.apply(ref, Map.of(Element.Fe, 0.0)).abundances());
        assertThrows(IllegalArgumentException.class, () -> StellarAbundances.apply(ref, Map.of(Element.Mg, 0.1)));
        assertThrows(IllegalArgumentException.class,
                () -> StellarAbundances.apply(ref, Map.of(Element.Fe, 0.0, Element.He, 0.1)));
        assertEquals(AbundancePresets.PROTOSOLAR_LODDERS2003, SolarReference.LODDERS2003.presetName());
    }
}
