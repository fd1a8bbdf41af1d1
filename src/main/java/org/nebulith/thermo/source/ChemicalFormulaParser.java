package org.nebulith.thermo.source;

import java.util.EnumMap;
import java.util.Map;

import org.nebulith.thermo.Element;
import org.nebulith.thermo.Formula;

/**
 * Parses a conventional chemical formula with optional parentheses and integer or decimal counts
 * ({@code Mg2SiO4}, {@code Ca3(PO4)2}, {@code Ca5(PO4)3F}) into a {@link Formula}.
 */
final class ChemicalFormulaParser {
    private final String text;
    private int pos;

    private ChemicalFormulaParser(String text) {
        this.text = text;
    }

    /**
     * @param text the formula
     * @return the element counts
     * @throws IllegalArgumentException naming the position of a fault
     */
    static Formula parse(String text) {
        ChemicalFormulaParser p = new ChemicalFormulaParser(text.trim());
        Map<Element, Double> m = p.group();
        if (p.pos != p.text.length()) {
            throw new IllegalArgumentException("unexpected '" + p.text.charAt(p.pos) + "' at position " + p.pos
                    + " of formula '" + text + "'");
        }
        return Formula.of(m);
    }

    private Map<Element, Double> group() {
        Map<Element, Double> m = new EnumMap<>(Element.class);
        while (pos < text.length() && text.charAt(pos) != ')') {
            Map<Element, Double> part;
            if (text.charAt(pos) == '(') {
                pos++;
                part = group();
                if (pos >= text.length() || text.charAt(pos) != ')') {
                    throw new IllegalArgumentException("unclosed '(' in formula '" + text + "'");
                }
                pos++;
            } else {
                part = new EnumMap<>(Element.class);
                part.put(element(), 1.0);
            }
            double n = count();
            part.forEach((e, c) -> m.merge(e, c * n, Double::sum));
        }
        return m;
    }

    private Element element() {
        int start = pos;
        if (pos >= text.length() || !Character.isUpperCase(text.charAt(pos))) {
            throw new IllegalArgumentException("expected an element symbol at position " + pos + " of formula '"
                    + text + "'");
        }
        pos++;
        while (pos < text.length() && Character.isLowerCase(text.charAt(pos))) {
            pos++;
        }
        String sym = text.substring(start, pos);
        Element e = Element.fromSymbol(sym);
        if (e == null || !e.symbol().equals(sym)) {
            throw new IllegalArgumentException("unknown element '" + sym + "' in formula '" + text + "'");
        }
        return e;
    }

    private double count() {
        int start = pos;
        while (pos < text.length() && (Character.isDigit(text.charAt(pos)) || text.charAt(pos) == '.')) {
            pos++;
        }
        return start == pos ? 1.0 : Double.parseDouble(text.substring(start, pos));
    }
}
