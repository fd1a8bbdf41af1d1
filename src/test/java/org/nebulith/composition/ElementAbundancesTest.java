package org.nebulith.composition;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.junit.jupiter.api.Test;
import org.nebulith.thermo.Element;

class ElementAbundancesTest {

    @Test
    void inlineNotationParsesAndRoundTrips() {
        ElementAbundances a = ElementAbundances.parseInline("H=1, he=0.085,O=4.9e-4");
        assertEquals(1.0, a.moles(Element.H));
        assertEquals(0.085, a.moles(Element.He));
        assertEquals(4.9e-4, a.moles(Element.O));
        assertEquals(0.0, a.moles(Element.Fe));
        assertEquals(a, ElementAbundances.parseInline(a.toInline()));
    }

    @Test
    void inlineErrorsNameTheItem() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ElementAbundances.parseInline("H=1,Xx=2"));
        assertTrue(e.getMessage().contains("Xx"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> ElementAbundances.parseInline("H=1,O=-3"));
        assertThrows(IllegalArgumentException.class, () -> ElementAbundances.parseInline("H=1,O=NaN"));
        assertThrows(IllegalArgumentException.class, () -> ElementAbundances.parseInline("H=1,H=2"));
        assertThrows(IllegalArgumentException.class, () -> ElementAbundances.parseInline("H 1"));
    }

    @Test
    void normalisationsAreExact() {
        ElementAbundances a = ElementAbundances.of(Map.of(Element.H, 2.0, Element.Si, 4e-5, Element.Fe, 3e-5));
        assertEquals(1.0, a.perH().moles(Element.H), 0);
        assertEquals(1.5e-5, a.perH().moles(Element.Fe), 1e-20);
        assertEquals(1e6, a.per1e6Si().moles(Element.Si), 1e-9);
        assertEquals(750000.0, a.per1e6Si().moles(Element.Fe), 1e-6);
        assertEquals(Math.log10(1.5e-5) + 12, a.logEps(Element.Fe), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> a.logEps(Element.Mg));
        assertThrows(IllegalArgumentException.class,
                () -> ElementAbundances.of(Map.of(Element.Fe, 1.0)).perH());
    }

    @Test
    void weightPercentSumsToHundredAndEmptyStaysEmpty() {
        ElementAbundances a = ElementAbundances.parseInline("Mg=2,Si=1,O=4");
        double sum = a.weightPercent().values().stream().mapToDouble(Double::doubleValue).sum();
        assertEquals(100.0, sum, 1e-12);
        // forsterite Mg2SiO4: Mg 34.55 wt% (IUPAC atomic weights; common practice)
        assertEquals(100 * 2 * 24.305 / (2 * 24.305 + 28.085 + 4 * 15.999), a.weightPercent().get(Element.Mg), 1e-12);
        assertTrue(ElementAbundances.empty().weightPercent().isEmpty());
        assertFalse(a.isEmpty());
    }

    @Test
    void negativeOrNanAmountsAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> ElementAbundances.of(Map.of(Element.H, -1.0)));
        assertThrows(IllegalArgumentException.class, () -> ElementAbundances.of(Map.of(Element.H, Double.NaN)));
    }
}
