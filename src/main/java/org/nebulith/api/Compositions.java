package org.nebulith.api;

import java.io.IOException;
import java.io.UncheckedIOException;

import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.thermo.Element;

/** Resolves the composition arguments of the builders. */
final class Compositions {
    private Compositions() {
    }

    /**
     * @param arg a preset name, an abundance file or inline {@code H=1,O=4.9e-4}
     * @return the composition [mol]
     */
    static ElementAbundances resolve(String arg) {
        try {
            return AbundancePresets.resolve(arg).abundances();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * @param symbol an element symbol, e.g. {@code Mg}
     * @return the element
     * @throws IllegalArgumentException for a symbol Nebulith does not track
     */
    static Element element(String symbol) {
        Element e = Element.fromSymbol(symbol);
        if (e == null) {
            throw new IllegalArgumentException("unknown element '" + symbol + "'; known: "
                    + java.util.Arrays.toString(Element.values()));
        }
        return e;
    }
}
