package org.nebulith.planet;

/**
 * One reported number of a planet, as it goes into {@code bulk-composition.csv}.
 *
 * @param name  quantity name, e.g. {@code Mg_Si_molar}
 * @param value finite value
 * @param unit  unit, e.g. {@code mol/mol}, {@code wt_pct}, {@code mass fraction}
 */
public record Quantity(String name, double value, String unit) {
    public Quantity {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException("quantity " + name + " is not finite: " + value);
        }
    }
}
