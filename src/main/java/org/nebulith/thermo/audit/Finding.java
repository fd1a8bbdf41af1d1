package org.nebulith.thermo.audit;

/**
 * One finding of the data audit.
 *
 * @param check     the check ({@link DataAudit} constants: vapour-pressure, gas-formation-enthalpy,
 *                  piece-jump, family-difference, oxide-formation)
 * @param subject   what was checked (species id, or ids joined by {@code |}), with the quantity
 * @param value     the measured size (in {@code unit}; absolute values for jumps and differences)
 * @param threshold the size above which a value is a finding
 * @param unit      unit of value and threshold
 * @param detail    what was found, for people
 */
public record Finding(String check, String subject, double value, double threshold, String unit, String detail) {
}
