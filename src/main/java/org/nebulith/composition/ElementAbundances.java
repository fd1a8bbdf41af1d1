package org.nebulith.composition;

import java.util.Collections;
import java.util.EnumMap;
import java.util.Map;
import java.util.Set;
import java.util.StringJoiner;

import org.nebulith.thermo.Element;

/**
 * An immutable set of element amounts [mol, or any consistent relative unit], never negative,
 * never NaN. Elements with zero amount are dropped.
 *
 * <p>Normalisations: {@link #perH()} (H = 1), {@link #per1e6Si()} (Si = 1e6) and
 * {@link #logEps(Element)} = log10(N/N_H) + 12 (the astronomers' scale, common practice).
 */
public final class ElementAbundances {
    private final EnumMap<Element, Double> moles;

    private ElementAbundances(EnumMap<Element, Double> moles) {
        this.moles = moles;
    }

    /**
     * @param amounts element amounts; zero entries are dropped
     * @return the abundances
     * @throws IllegalArgumentException if an amount is negative, NaN or infinite
     */
    public static ElementAbundances of(Map<Element, Double> amounts) {
        EnumMap<Element, Double> copy = new EnumMap<>(Element.class);
        for (Map.Entry<Element, Double> e : amounts.entrySet()) {
            double v = e.getValue();
            if (!(v >= 0) || Double.isInfinite(v)) {
                throw new IllegalArgumentException("amount of " + e.getKey() + " must be finite and >= 0, got " + v);
            }
            if (v > 0) {
                copy.put(e.getKey(), v);
            }
        }
        return new ElementAbundances(copy);
    }

    /** @return an empty composition */
    public static ElementAbundances empty() {
        return new ElementAbundances(new EnumMap<>(Element.class));
    }

    /**
     * @param logEps log eps values (log10(N/N_H) + 12) per element
     * @return amounts relative to H = 1 (10^(logEps - 12))
     */
    public static ElementAbundances fromLogEps(Map<Element, Double> logEps) {
        EnumMap<Element, Double> m = new EnumMap<>(Element.class);
        logEps.forEach((el, v) -> m.put(el, Math.pow(10.0, v - 12.0)));
        return of(m);
    }

    /**
     * Parses the inline notation {@code H=1,He=0.085,O=4.9e-4} (relative moles; element symbols in
     * any letter case; an element given twice is an error).
     *
     * @param text the notation
     * @return the abundances
     * @throws IllegalArgumentException naming the faulty item
     */
    public static ElementAbundances parseInline(String text) {
        EnumMap<Element, Double> m = new EnumMap<>(Element.class);
        for (String item : text.split(",")) {
            String t = item.trim();
            int eq = t.indexOf('=');
            if (eq <= 0) {
                throw new IllegalArgumentException("inline composition item '" + t + "' is not Element=amount"
                        + " (example: H=1,He=0.085,O=4.9e-4)");
            }
            Element el = Element.fromSymbol(t.substring(0, eq));
            if (el == null) {
                throw new IllegalArgumentException("inline composition: unknown element '" + t.substring(0, eq).trim()
                        + "'; accepted: " + java.util.Arrays.toString(Element.values()));
            }
            double v = parseAmount(t.substring(eq + 1).trim(), t);
            if (m.put(el, v) != null) {
                throw new IllegalArgumentException("inline composition: element " + el + " given twice");
            }
        }
        return of(m);
    }

    private static double parseAmount(String s, String item) {
        try {
            double v = Double.parseDouble(s);
            if (v >= 0 && !Double.isInfinite(v)) {
                return v;
            }
        } catch (NumberFormatException ignored) {
            // reported below
        }
        throw new IllegalArgumentException("inline composition item '" + item + "': amount must be a finite number >= 0");
    }

    /** @param e an element @return its amount (0 if absent) */
    public double moles(Element e) {
        Double v = moles.get(e);
        return v == null ? 0.0 : v;
    }

    /** @return true if e has a non-zero amount */
    public boolean contains(Element e) {
        return moles.containsKey(e);
    }

    /** @return elements with non-zero amounts, in {@link Element} order */
    public Set<Element> elements() {
        return Collections.unmodifiableSet(moles.keySet());
    }

    /** @return unmodifiable view of the amounts, in {@link Element} order */
    public Map<Element, Double> asMap() {
        return Collections.unmodifiableMap(moles);
    }

    /** @return true if no element is present */
    public boolean isEmpty() {
        return moles.isEmpty();
    }

    /** @return total amount of atoms */
    public double totalMoles() {
        double s = 0;
        for (double v : moles.values()) {
            s += v;
        }
        return s;
    }

    /** @return mass [g] if the amounts are in mol (IUPAC atomic weights) */
    public double massGrams() {
        double s = 0;
        for (Map.Entry<Element, Double> e : moles.entrySet()) {
            s += e.getValue() * e.getKey().atomicWeight();
        }
        return s;
    }

    /** @return mass fractions in wt% (sum 100); empty for an empty composition */
    public Map<Element, Double> weightPercent() {
        EnumMap<Element, Double> w = new EnumMap<>(Element.class);
        double total = massGrams();
        if (total > 0) {
            moles.forEach((el, n) -> w.put(el, 100.0 * n * el.atomicWeight() / total));
        }
        return Collections.unmodifiableMap(w);
    }

    /**
     * @param factor a finite factor >= 0
     * @return every amount multiplied by factor
     */
    public ElementAbundances scaled(double factor) {
        EnumMap<Element, Double> m = new EnumMap<>(Element.class);
        moles.forEach((el, v) -> m.put(el, v * factor));
        return of(m);
    }

    /** @return the element-wise sum */
    public ElementAbundances plus(ElementAbundances other) {
        EnumMap<Element, Double> m = new EnumMap<>(moles);
        other.moles.forEach((el, v) -> m.merge(el, v, Double::sum));
        return of(m);
    }

    /** @return a copy with the amount of e replaced (0 removes it) */
    public ElementAbundances with(Element e, double amount) {
        EnumMap<Element, Double> m = new EnumMap<>(moles);
        m.put(e, amount);
        return of(m);
    }

    /** @return a copy keeping only the elements in keep */
    public ElementAbundances restrictedTo(Set<Element> keep) {
        EnumMap<Element, Double> m = new EnumMap<>(Element.class);
        moles.forEach((el, v) -> {
            if (keep.contains(el)) {
                m.put(el, v);
            }
        });
        return of(m);
    }

    /**
     * @return the molar ratio a/b
     * @throws IllegalArgumentException if b is absent (the ratio would not be finite)
     */
    public double ratio(Element a, Element b) {
        return moles(a) / require(b);
    }

    /** @return amounts normalised to H = 1 @throws IllegalArgumentException without H */
    public ElementAbundances perH() {
        return scaled(1.0 / require(Element.H));
    }

    /** @return amounts normalised to Si = 1e6 atoms @throws IllegalArgumentException without Si */
    public ElementAbundances per1e6Si() {
        return scaled(1e6 / require(Element.Si));
    }

    /**
     * @return log10(N_e/N_H) + 12 [dex]
     * @throws IllegalArgumentException if H or e is absent (the value would be infinite)
     */
    public double logEps(Element e) {
        return Math.log10(require(e) / require(Element.H)) + 12.0;
    }

    private double require(Element e) {
        double v = moles(e);
        if (v <= 0) {
            throw new IllegalArgumentException("composition has no " + e + "; cannot normalise to it");
        }
        return v;
    }

    /** @return the inline notation, e.g. {@code H=1,He=0.085} (round-trips through parseInline) */
    public String toInline() {
        StringJoiner j = new StringJoiner(",");
        moles.forEach((el, v) -> j.add(el.symbol() + "=" + v));
        return j.toString();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ElementAbundances && ((ElementAbundances) o).moles.equals(moles);
    }

    @Override
    public int hashCode() {
        return moles.hashCode();
    }

    @Override
    public String toString() {
        return toInline();
    }
}
