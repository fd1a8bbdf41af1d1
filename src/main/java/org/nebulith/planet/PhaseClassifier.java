package org.nebulith.planet;

import java.util.EnumSet;
import java.util.Map;
import java.util.Set;

import org.nebulith.thermo.Element;
import org.nebulith.thermo.Formula;
import org.nebulith.zones.WaterIce;

/**
 * Assigns a condensed phase to a planetary reservoir from its composition (common practice for
 * condensation-based planet compositions): members of the metal solution and pure Fe, Ni, Co, Cr
 * or Mn metal are {@link PhaseKind#METAL}; sulfides of Fe, Ni, Co without oxygen are
 * {@link PhaseKind#SULFIDE}; water is {@link PhaseKind#ICE}; anything with oxygen is
 * {@link PhaseKind#SILICATE_OXIDE}; carbon-bearing phases without oxygen are
 * {@link PhaseKind#CARBON}; the rest (CaS, nitrides, halides...) is {@link PhaseKind#OTHER}.
 */
public final class PhaseClassifier {
    private static final Set<Element> METALS = EnumSet.of(Element.Fe, Element.Ni, Element.Co, Element.Cr, Element.Mn);
    private static final Set<Element> SULFIDE_METALS = EnumSet.of(Element.Fe, Element.Ni, Element.Co, Element.S);

    private PhaseClassifier() {
    }

    /**
     * @param phaseName   the phase ("metal" for the metal solution)
     * @param formula     the member's formula
     * @return its reservoir
     */
    public static PhaseKind classify(String phaseName, Formula formula) {
        Map<Element, Double> c = formula.counts();
        if ("metal".equals(phaseName) || (c.size() == 1 && METALS.containsAll(c.keySet()))) {
            return PhaseKind.METAL;
        }
        if (formula.equals(WaterIce.FORMULA)) {
            return PhaseKind.ICE;
        }
        if (c.containsKey(Element.S) && !c.containsKey(Element.O) && SULFIDE_METALS.containsAll(c.keySet())) {
            return PhaseKind.SULFIDE;
        }
        if (c.containsKey(Element.O)) {
            return PhaseKind.SILICATE_OXIDE;
        }
        if (c.containsKey(Element.C)) {
            return PhaseKind.CARBON;
        }
        return PhaseKind.OTHER;
    }
}
