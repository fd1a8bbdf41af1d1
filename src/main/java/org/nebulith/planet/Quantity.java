package org.nebulith.planet;

/**
 * One reported number of a planet, as it goes into {@code bulk-composition.csv}, or the mark that it
 * does not apply to this planet (a core mass fraction without rock, a mantle Mg# without Mg and Fe
 * in the mantle): such a quantity has no value and is written as an empty cell, never as 0 or NaN.
 *
 * @param name    quantity name, e.g. {@code Mg_Si_molar}
 * @param value   finite value when it applies; NaN otherwise (check {@link #applies()} before use)
 * @param unit    unit, e.g. {@code mol/mol}, {@code wt_pct}, {@code mass fraction}
 * @param applies whether the quantity applies
 */
public record Quantity(String name, double value, String unit, boolean applies) {
    public Quantity {
        if (applies && !Double.isFinite(value)) {
            throw new IllegalArgumentException("quantity " + name + " is not finite: " + value);
        }
        if (!applies) {
            value = Double.NaN;
        }
    }

    /**
     * @param name  quantity name
     * @param value finite value
     * @param unit  unit
     */
    public Quantity(String name, double value, String unit) {
        this(name, value, unit, true);
    }

    /**
     * @param name quantity name
     * @param unit unit
     * @return the quantity marked as not applicable
     */
    public static Quantity notApplicable(String name, String unit) {
        return new Quantity(name, Double.NaN, unit, false);
    }

    /** @return the value, or null when it does not apply (an empty cell in tables) */
    public Double valueOrNull() {
        return applies ? value : null;
    }
}
