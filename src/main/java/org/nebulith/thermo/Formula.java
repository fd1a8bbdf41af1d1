package org.nebulith.thermo;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;
import java.util.StringJoiner;

/**
 * An immutable element composition: the number of atoms of each element in one formula unit.
 * Counts may be fractional (NASA entries allow it) but never negative.
 */
public final class Formula {
    private final EnumMap<Element, Double> counts;

    private Formula(EnumMap<Element, Double> counts) {
        this.counts = counts;
    }

    /**
     * @param counts atoms per formula unit; zero entries are dropped
     * @return the formula
     * @throws IllegalArgumentException if a count is negative or not finite
     */
    public static Formula of(Map<Element, Double> counts) {
        EnumMap<Element, Double> copy = new EnumMap<>(Element.class);
        for (Map.Entry<Element, Double> e : counts.entrySet()) {
            double v = e.getValue();
            if (!(v >= 0) || Double.isInfinite(v)) {
                throw new IllegalArgumentException("atom count of " + e.getKey() + " must be >= 0, got " + v);
            }
            if (v > 0) {
                copy.put(e.getKey(), v);
            }
        }
        if (copy.isEmpty()) {
            throw new IllegalArgumentException("a formula needs at least one element");
        }
        return new Formula(copy);
    }

    /**
     * Parses the project's formula notation, element:count pairs separated by spaces
     * ({@code "Mg:2 Si:1 O:4"}).
     *
     * @param text the notation
     * @return the formula
     * @throws IllegalArgumentException naming the faulty token
     */
    public static Formula parse(String text) {
        EnumMap<Element, Double> m = new EnumMap<>(Element.class);
        for (String tok : text.trim().split("\\s+")) {
            int colon = tok.indexOf(':');
            if (colon <= 0) {
                throw new IllegalArgumentException("formula token '" + tok + "' is not Element:count");
            }
            Element el = Element.fromSymbol(tok.substring(0, colon));
            if (el == null) {
                throw new IllegalArgumentException("unknown element '" + tok.substring(0, colon) + "' in formula");
            }
            double n;
            try {
                n = Double.parseDouble(tok.substring(colon + 1));
            } catch (NumberFormatException ex) {
                throw new IllegalArgumentException("atom count '" + tok.substring(colon + 1) + "' is not a number");
            }
            m.merge(el, n, Double::sum);
        }
        return of(m);
    }

    /** @param e an element @return atoms of e per formula unit (0 if absent) */
    public double count(Element e) {
        Double v = counts.get(e);
        return v == null ? 0.0 : v;
    }

    /** @return the elements with non-zero counts, in {@link Element} order, unmodifiable */
    public Map<Element, Double> counts() {
        return Collections.unmodifiableMap(counts);
    }

    /** @return the molar mass [g/mol] from IUPAC atomic weights */
    public double molarMass() {
        double m = 0;
        for (Map.Entry<Element, Double> e : counts.entrySet()) {
            m += e.getKey().atomicWeight() * e.getValue();
        }
        return m;
    }

    /** @return the total number of atoms per formula unit */
    public double atoms() {
        double n = 0;
        for (double v : counts.values()) {
            n += v;
        }
        return n;
    }

    /** @return true if every element of this formula is in {@code allowed} */
    public boolean madeOnlyOf(java.util.Set<Element> allowed) {
        return allowed.containsAll(counts.keySet());
    }

    /** @return the project notation, e.g. {@code "Mg:2 Si:1 O:4"} */
    public String notation() {
        StringJoiner j = new StringJoiner(" ");
        for (Map.Entry<Element, Double> e : counts.entrySet()) {
            double v = e.getValue();
            String n = v == Math.rint(v) ? Long.toString((long) v) : Double.toString(v);
            j.add(e.getKey().symbol() + ":" + n);
        }
        return j.toString();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Formula && ((Formula) o).counts.equals(counts);
    }

    @Override
    public int hashCode() {
        return counts.hashCode();
    }

    @Override
    public String toString() {
        return notation();
    }
}
