package org.nebulith.report;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;

import org.nebulith.format.Decimal;
import org.nebulith.thermo.Element;
import org.nebulith.thermo.Formula;

/**
 * Chemical formulas as mineralogists write them (common practice): carbon and hydrogen first, then
 * the cations from the large alkalis to Al, then Si and P, then the anions (N, S, O, F, Cl), counts
 * as subscripts in plain digits and 1 omitted: {@code CaMgSi2O6}, {@code Mg2SiO4}, {@code FeS},
 * {@code H2O}, {@code CaAl12O19}.
 */
public final class FormulaText {

    private static final List<Element> ORDER = List.of(Element.C, Element.H, Element.K, Element.Na, Element.Ca,
            Element.Mg, Element.Fe, Element.Mn, Element.Ni, Element.Co, Element.Cr, Element.Ti, Element.Al,
            Element.Si, Element.P, Element.N, Element.S, Element.O, Element.F, Element.Cl);

    private FormulaText() {
    }

    /**
     * @param formula a formula
     * @return its conventional text
     */
    public static String conventional(final Formula formula) {
        List<Map.Entry<Element, Double>> parts = new ArrayList<>(formula.counts().entrySet());
        parts.sort(Comparator.comparingInt((Map.Entry<Element, Double> e) -> rank(e.getKey()))
                .thenComparing(e -> e.getKey().symbol()));
        StringBuilder b = new StringBuilder();
        for (Map.Entry<Element, Double> e : parts) {
            double n = e.getValue();
            b.append(e.getKey().symbol());
            if (n != 1) {
                b.append(Decimal.format(n));
            }
        }
        return b.toString();
    }

    private static int rank(final Element e) {
        int i = ORDER.indexOf(e);
        // unlisted elements go just before P (after Si), alphabetically among themselves
        return i >= 0 ? (i >= ORDER.indexOf(Element.P) ? i + 1 : i) : ORDER.indexOf(Element.P);
    }
}
