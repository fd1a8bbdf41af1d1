package org.nebulith.planet;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

import org.nebulith.composition.ElementAbundances;
import org.nebulith.thermo.Element;

/**
 * Refractory enrichment: the planet's molar Al, Ca and Ti relative to Mg and to Si, divided by the
 * same ratio in a reference (CI chondrite, the host star). 1 means no fractionation; &gt; 1 means
 * the planet collected refractory-rich (hot-zone) condensates. Undefined ratios are omitted.
 */
public final class RefractoryEnrichment {
    private static final Element[] REFRACTORY = {Element.Al, Element.Ca, Element.Ti};
    private static final Element[] NORMALISERS = {Element.Mg, Element.Si};

    private RefractoryEnrichment() {
    }

    /**
     * @param planet   the planet's bulk
     * @param ref      the reference composition
     * @param refLabel label used in the names, e.g. {@code CI} or {@code host}
     * @return e.g. {@code Al_Mg_vs_CI} to (Al/Mg)_planet / (Al/Mg)_CI
     */
    public static Map<String, Double> relativeTo(ElementAbundances planet, ElementAbundances ref, String refLabel) {
        Map<String, Double> m = new LinkedHashMap<>();
        for (Element x : REFRACTORY) {
            for (Element y : NORMALISERS) {
                double p = planet.moles(y) > 0 ? planet.moles(x) / planet.moles(y) : -1;
                double r = ref.moles(y) > 0 ? ref.moles(x) / ref.moles(y) : 0;
                if (p >= 0 && r > 0) {
                    m.put(x.symbol() + "_" + y.symbol() + "_vs_" + refLabel, p / r);
                }
            }
        }
        return Collections.unmodifiableMap(m);
    }
}
