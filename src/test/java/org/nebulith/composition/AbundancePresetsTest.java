package org.nebulith.composition;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.nebulith.thermo.Element;

/**
 * The presets against the published tables they copy. Reference values are the rows of the
 * project reference data (published-compositions.csv), quoted with their quantity names.
 */
class AbundancePresetsTest {

    private static ElementAbundances get(String name) {
        return AbundancePresets.preset(name).abundances();
    }

    /** Lodders 2003 Table 2 gives N per 1e6 Si and log eps; the two columns must agree. */
    @Test
    void lodders2003NumberAndLogColumnsAgree() {
        ElementAbundances l = get("protosolar-lodders2003");
        assertEquals(1e6, l.per1e6Si().moles(Element.Si), 1e-6);
        // logeps_protosolar_Lodders2003 (Lodders 2003 Table 2), given to 0.01 dex
        assertEquals(7.54, l.logEps(Element.Fe), 0.006);
        assertEquals(7.62, l.logEps(Element.Mg), 0.006);
        assertEquals(7.61, l.logEps(Element.Si), 0.006);
        assertEquals(8.76, l.logEps(Element.O), 0.006);
        assertEquals(6.41, l.logEps(Element.Ca), 0.006);
        assertEquals(10.984, l.logEps(Element.He), 0.002);
    }

    /** Ratios against the molar_ratio_* rows of the reference data (derived from the tables). */
    @Test
    void molarRatiosMatchTheReferenceData() {
        ElementAbundances a = get("photosphere-asplund2009");
        ElementAbundances l = get("protosolar-lodders2003");
        ElementAbundances ci = get("ci-chondrite");
        // molar_ratio_solar_photosphere_Asplund2009 (Asplund et al. 2009 Table 1)
        assertEquals(1.23, a.ratio(Element.Mg, Element.Si), 0.005);
        assertEquals(0.977, a.ratio(Element.Fe, Element.Si), 0.001);
        assertEquals(0.55, a.ratio(Element.C, Element.O), 0.005);
        // molar_ratio_protosolar_Lodders2003 (Lodders 2003 Table 2)
        assertEquals(1.02, l.ratio(Element.Mg, Element.Si), 0.0005);
        assertEquals(0.838, l.ratio(Element.Fe, Element.Si), 0.0005);
        assertEquals(0.501, l.ratio(Element.C, Element.O), 0.0005);
        // molar_ratio_CI_LPG2009 (Lodders, Palme & Gail 2009 in Asplund et al. 2009 Table 1)
        assertEquals(1.047, ci.ratio(Element.Mg, Element.Si), 0.001);
        assertEquals(0.871, ci.ratio(Element.Fe, Element.Si), 0.001);
        assertEquals(0.0832, ci.ratio(Element.Al, Element.Si), 0.0002);
    }

    @Test
    void presetsCiteTheirTables() {
        assertTrue(String.join(" ", AbundancePresets.preset("protosolar-lodders2003").provenance()).contains("Table 2"));
        assertTrue(String.join(" ", AbundancePresets.preset("photosphere-asplund2009").provenance()).contains("Table 1"));
        assertTrue(String.join(" ", AbundancePresets.preset("ci-chondrite").provenance()).contains("Lodders, Palme & Gail 2009"));
        assertFalse(get("ci-chondrite").contains(Element.H));
    }

    @Test
    void resolveAcceptsInlineAndRefusesUnknownNames() throws Exception {
        assertEquals(2.0, AbundancePresets.resolve("H=1,O=2").abundances().moles(Element.O));
        assertEquals(get("ci-chondrite"), AbundancePresets.resolve("ci-chondrite").abundances());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> AbundancePresets.resolve("no-such-preset"));
        assertTrue(e.getMessage().contains("protosolar-lodders2003"), e.getMessage());
    }
}
