package org.nebulith.planet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;

import org.junit.jupiter.api.Test;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.thermo.Element;

/** Reference bodies against the derived rows of the project reference data (published-compositions.csv). */
class ReferenceComparisonTest {

    /** molar_ratio_bulkEarth_McDonough2003 (derived from McDonough 2003 bulk Earth wt%). */
    @Test
    void bulkEarthRatios() {
        Map<String, Double> r = MolarRatios.of(ReferenceBodies.get("bulk-earth").elements());
        assertEquals(1.105, r.get("Mg_Si_molar"), 0.002);
        assertEquals(0.997, r.get("Fe_Si_molar"), 0.002);
        assertEquals(0.103, r.get("Al_Si_molar"), 0.001);
        assertEquals(0.074, r.get("Ca_Si_molar"), 0.001);
        assertEquals(0.325, ReferenceBodies.get("bulk-earth").coreMassFraction().getAsDouble(), 0);
        assertTrue(ReferenceBodies.get("mars").fromMemory());
    }

    /** molar_ratio_CI_PalmeONeill2014 (derived from Palme & O'Neill 2014 CI wt%), the alternative CI. */
    @Test
    void ciRatios() {
        Map<String, Double> r = MolarRatios.of(ReferenceBodies.get("ci-chondrite-palme-oneill2014").elements());
        assertEquals(1.03, r.get("Mg_Si_molar"), 0.005);
        assertEquals(0.877, r.get("Fe_Si_molar"), 0.002);
        assertEquals(0.0817, r.get("Al_Si_molar"), 0.0005);
        Map<String, Double> p = MolarRatios.of(ReferenceBodies.ci(org.nebulith.composition.CiReference.PALME_ONEILL_2014)
                .elements());
        assertEquals(r.get("Mg_Si_molar"), p.get("Mg_Si_molar"), 1e-12, "preset and reference body are one table");
    }

    /**
     * molar_ratio_CI_LPG2009 (Lodders, Palme & Gail 2009 via Asplund et al. 2009 Table 1): Mg/Si 1.047,
     * Fe/Si 0.871. The default CI body is the composition the dust enrichment adds.
     */
    @Test
    void defaultCiIsTheDustComposition() {
        Map<String, Double> r = MolarRatios.of(ReferenceBodies.get(ReferenceBodies.CI).elements());
        assertEquals(1.047, r.get("Mg_Si_molar"), 0.002);
        assertEquals(0.871, r.get("Fe_Si_molar"), 0.002);
        assertEquals(MolarRatios.of(AbundancePresets.preset(AbundancePresets.CI_CHONDRITE).abundances()), r);
        assertEquals(org.nebulith.composition.CiReference.LODDERS_PALME_GAIL_2009,
                org.nebulith.composition.CiReference.DEFAULT);
    }

    /**
     * Bulk silicate Earth as oxides: wt_oxide_BSE_McDonoughSun1995_derived (SiO2 44.93, MgO 37.81,
     * FeO 8.05, CaO 3.54, Al2O3 4.44 wt%; McDonough & Sun 1995) and Mg# 89.3 (Mg_number_primitive_mantle).
     * The reference rows are normalised to the whole rock, ours to the oxide sum: tolerance 1 % relative.
     */
    @Test
    void bulkSilicateEarthOxides() {
        MantleOxides.Result o = MantleOxides.convert(ReferenceBodies.get("bulk-silicate-earth").elements());
        Map<String, Double> w = o.oxideWtPct();
        assertEquals(44.93, w.get("SiO2"), 0.45);
        assertEquals(37.81, w.get("MgO"), 0.38);
        assertEquals(8.05, w.get("FeO"), 0.08);
        assertEquals(3.54, w.get("CaO"), 0.04);
        assertEquals(4.44, w.get("Al2O3"), 0.05);
        assertEquals(89.3, o.mgNumber(), 0.1);
        // McDonough & Sun give O = 44.0 wt%: their O closes the oxides within a few percent
        assertTrue(Math.abs(o.oxygenExcess() / o.oxygenNeeded()) < 0.03, "" + o.oxygenExcess() / o.oxygenNeeded());
    }

    @Test
    void refractoryEnrichmentIsOneAgainstItself() {
        ElementAbundances ci = AbundancePresets.preset("ci-chondrite").abundances();
        Map<String, Double> e = RefractoryEnrichment.relativeTo(ci, ci, "CI");
        assertEquals(6, e.size());
        e.values().forEach(v -> assertEquals(1.0, v, 1e-14));
        ElementAbundances doubled = ci.with(Element.Al, 2 * ci.moles(Element.Al));
        assertEquals(2.0, RefractoryEnrichment.relativeTo(doubled, ci, "CI").get("Al_Si_vs_CI"), 1e-14);
        assertTrue(RefractoryEnrichment.relativeTo(ElementAbundances.parseInline("Al=1"), ci, "CI").isEmpty());
    }
}
