package org.nebulith.composition;

import org.nebulith.thermo.Element;

/**
 * Overrides the C/O ratio of a composition.
 *
 * <p>Choice (documented): only carbon changes, C = target x O; oxygen and every other element are
 * kept. This is the usual way to explore carbon-rich gas, since stellar C is the less certain of
 * the two and O also sets the silicate budget. The molar C/O of the result equals the target exactly.
 */
public final class CarbonToOxygen {
    private CarbonToOxygen() {
    }

    /**
     * @param comp   the composition (must contain O)
     * @param target the molar C/O wanted, finite and &gt;= 0
     * @return the composition with C replaced
     */
    public static ElementAbundances withCarbonToOxygen(ElementAbundances comp, double target) {
        if (!(target >= 0) || Double.isInfinite(target)) {
            throw new IllegalArgumentException("C/O must be a finite number >= 0, got " + target);
        }
        double o = comp.moles(Element.O);
        if (o <= 0) {
            throw new IllegalArgumentException("a C/O override needs O in the composition");
        }
        return comp.with(Element.C, target * o);
    }

    /** @return the molar C/O of comp @throws IllegalArgumentException without O */
    public static double of(ElementAbundances comp) {
        return comp.ratio(Element.C, Element.O);
    }
}
