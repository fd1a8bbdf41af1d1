package org.nebulith.thermo;

import java.util.Locale;

/**
 * The chemical elements Nebulith tracks, with their standard atomic weights.
 *
 * <p>Atomic weights [g/mol] are the IUPAC 2013 standard atomic weights (conventional values
 * where IUPAC gives an interval), Meija et al. (2016) Pure Appl. Chem. 88, 265.
 */
public enum Element {
    H(1.008), He(4.002602), C(12.011), N(14.007), O(15.999), F(18.998403163),
    Na(22.98976928), Mg(24.305), Al(26.9815385), Si(28.085), P(30.973761998),
    S(32.06), Cl(35.45), K(39.0983), Ca(40.078), Ti(47.867), Cr(51.9961),
    Mn(54.938044), Fe(55.845), Co(58.933194), Ni(58.6934);

    private final double atomicWeight;

    Element(double atomicWeight) {
        this.atomicWeight = atomicWeight;
    }

    /** @return the standard atomic weight [g/mol] */
    public double atomicWeight() {
        return atomicWeight;
    }

    /** @return the symbol as chemists write it ("Al", "Fe") */
    public String symbol() {
        return name();
    }

    /**
     * Parses a symbol in any letter case ("AL", "al", "Al").
     *
     * @param symbol an element symbol
     * @return the element, or {@code null} if Nebulith does not track it
     */
    public static Element fromSymbol(String symbol) {
        String s = symbol.trim();
        if (s.isEmpty()) {
            return null;
        }
        String norm = s.substring(0, 1).toUpperCase(Locale.ROOT) + s.substring(1).toLowerCase(Locale.ROOT);
        for (Element e : values()) {
            if (e.name().equals(norm)) {
                return e;
            }
        }
        return null;
    }
}
