package org.nebulith.planet;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.nebulith.composition.ElementAbundances;
import org.nebulith.thermo.Element;

/** The molar ratios reported for planets and stars. A ratio with a zero denominator is omitted. */
public final class MolarRatios {
    /** Numerator and denominator of each reported ratio, in report order. */
    public static final List<Element[]> PAIRS = List.of(
            new Element[] {Element.Mg, Element.Si}, new Element[] {Element.Fe, Element.Si},
            new Element[] {Element.Ca, Element.Si}, new Element[] {Element.Al, Element.Si},
            new Element[] {Element.Ti, Element.Si}, new Element[] {Element.Ni, Element.Fe},
            new Element[] {Element.S, Element.Si}, new Element[] {Element.C, Element.Si},
            new Element[] {Element.O, Element.Si});

    private MolarRatios() {
    }

    /** @return the quantity name of a/b, e.g. {@code Mg_Si_molar} */
    public static String key(Element a, Element b) {
        return a.symbol() + "_" + b.symbol() + "_molar";
    }

    /**
     * @param c a composition
     * @return ratio name to value [mol/mol], in {@link #PAIRS} order, omitting zero denominators
     */
    public static Map<String, Double> of(ElementAbundances c) {
        Map<String, Double> m = new LinkedHashMap<>();
        for (Element[] p : PAIRS) {
            if (c.moles(p[1]) > 0) {
                m.put(key(p[0], p[1]), c.moles(p[0]) / c.moles(p[1]));
            }
        }
        return Collections.unmodifiableMap(m);
    }
}
