package org.nebulith.composition;

import java.util.EnumSet;
import java.util.Set;

import org.nebulith.thermo.Element;

/**
 * Adds dust of CI-chondrite composition to a gas of solar type.
 *
 * <p>What "dust" contains (common practice): every element of the CI table except H, He and the
 * noble gases; C, N and O are included in their CI proportions (CI carbon, nitrogen and oxygen
 * are part of the rock: organics, carbonates, silicates, oxides and hydrated minerals; the CI water
 * is not added separately because the CI table has no H). The dust is scaled per Si: a factor f
 * adds (f - 1) x Si_gas x (X/Si)_CI moles of each dust element X, so f = 1 means no added dust,
 * f = 10 raises Si, Mg, Fe... ten-fold while H and He stay put. Because the solar gas already holds
 * roughly CI proportions of the rock-forming elements, f multiplies them by about f.
 */
public final class DustEnrichment {
    /** Elements that dust never carries here (H, He; noble gases are not tracked at all). */
    public static final Set<Element> NOT_IN_DUST = EnumSet.of(Element.H, Element.He);

    private DustEnrichment() {
    }

    /**
     * @param ci a CI-chondrite composition (any scale)
     * @return its dust part (CI without H and He)
     */
    public static ElementAbundances dustOf(ElementAbundances ci) {
        Set<Element> keep = EnumSet.complementOf(EnumSet.copyOf(NOT_IN_DUST));
        return ci.restrictedTo(keep);
    }

    /**
     * @param gas    the gas (must contain Si)
     * @param ci     the CI-chondrite composition (must contain Si)
     * @param factor the dust enrichment factor f &gt;= 1 (1 = none)
     * @return gas + (f - 1) x dust, with the dust scaled to the gas's Si
     * @throws IllegalArgumentException if f &lt; 1 or not finite, or Si is missing
     */
    public static ElementAbundances enrich(ElementAbundances gas, ElementAbundances ci, double factor) {
        if (!(factor >= 1.0) || Double.isInfinite(factor)) {
            throw new IllegalArgumentException("dust enrichment factor must be a finite number >= 1 (1 = no added dust), got "
                    + factor);
        }
        if (factor == 1.0) {
            return gas;
        }
        ElementAbundances dust = dustOf(ci);
        double scale = (factor - 1.0) * gas.moles(Element.Si) / requireSi(dust, "CI composition");
        requireSi(gas, "gas");
        return gas.plus(dust.scaled(scale));
    }

    private static double requireSi(ElementAbundances a, String what) {
        double si = a.moles(Element.Si);
        if (si <= 0) {
            throw new IllegalArgumentException("dust enrichment needs Si in the " + what + " (dust is scaled per Si)");
        }
        return si;
    }
}
