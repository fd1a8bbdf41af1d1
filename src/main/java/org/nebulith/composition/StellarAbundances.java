package org.nebulith.composition;

import java.util.Collections;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.Map;
import java.util.Set;

import org.nebulith.thermo.Element;

/**
 * Builds a star's composition from its [X/H] values and a solar reference:
 * N_X = N_X,sun x 10^[X/H] with N_H fixed.
 *
 * <p>Elements the star lacks follow its [Fe/H] (common practice), and the result lists them.
 * H is the reference and He is kept at the solar He/H (helium is not measured in the photospheres
 * of solar-type stars; common practice).
 */
public final class StellarAbundances {

    /**
     * @param abundances   the star's composition (solar scale, H as in the reference)
     * @param measured     elements with a catalogue [X/H]
     * @param followedFeH  elements that took [Fe/H] because the star lacks them
     */
    public record Result(ElementAbundances abundances, Set<Element> measured, Set<Element> followedFeH) {
        public Result {
            measured = Collections.unmodifiableSet(EnumSet.copyOf(withDummy(measured)));
            followedFeH = Collections.unmodifiableSet(EnumSet.copyOf(withDummy(followedFeH)));
        }

        private static Set<Element> withDummy(Set<Element> s) {
            return s.isEmpty() ? EnumSet.noneOf(Element.class) : s;
        }
    }

    private StellarAbundances() {
    }

    /**
     * @param solar the solar reference composition (must contain H)
     * @param xH    [X/H] in dex per element; must include Fe; H and He are not accepted
     * @return the star's composition and which elements followed [Fe/H]
     * @throws IllegalArgumentException if Fe is missing, H or He is given, a value is not finite,
     *                                  or the reference lacks an element given
     */
    public static Result apply(ElementAbundances solar, Map<Element, Double> xH) {
        Double feH = xH.get(Element.Fe);
        if (feH == null) {
            throw new IllegalArgumentException("stellar abundances need [Fe/H] (elements the star lacks follow it)");
        }
        EnumMap<Element, Double> out = new EnumMap<>(Element.class);
        EnumSet<Element> followed = EnumSet.noneOf(Element.class);
        for (Map.Entry<Element, Double> e : xH.entrySet()) {
            checkGiven(e.getKey(), e.getValue(), solar);
        }
        for (Element el : solar.elements()) {
            double dex;
            if (el == Element.H || el == Element.He) {
                dex = 0.0;
            } else if (xH.containsKey(el)) {
                dex = xH.get(el);
            } else {
                dex = feH;
                followed.add(el);
            }
            out.put(el, solar.moles(el) * Math.pow(10.0, dex));
        }
        return new Result(ElementAbundances.of(out), EnumSet.copyOf(xH.keySet()), followed);
    }

    private static void checkGiven(Element el, double dex, ElementAbundances solar) {
        if (el == Element.H || el == Element.He) {
            throw new IllegalArgumentException("[" + el + "/H] is not accepted: H is the reference and He stays solar");
        }
        if (!Double.isFinite(dex)) {
            throw new IllegalArgumentException("[" + el + "/H] must be finite, got " + dex);
        }
        if (!solar.contains(el)) {
            throw new IllegalArgumentException("the solar reference has no " + el + "; [" + el + "/H] cannot be applied");
        }
    }
}
