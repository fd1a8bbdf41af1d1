package org.nebulith.planet;

import java.util.Objects;

import org.nebulith.thermo.Formula;

/**
 * One condensed phase of a zone's integrated inventory.
 *
 * @param name    phase name (e.g. "forsterite", "Fe-metal")
 * @param formula element composition per formula unit
 * @param moles   amount of formula units [mol], finite and &gt;= 0
 * @param kind    what it contributes to the planet
 */
public record CondensedPhase(String name, Formula formula, double moles, PhaseKind kind) {
    public CondensedPhase {
        Objects.requireNonNull(name);
        Objects.requireNonNull(formula);
        Objects.requireNonNull(kind);
        if (!(moles >= 0) || Double.isInfinite(moles)) {
            throw new IllegalArgumentException("phase " + name + ": moles must be finite and >= 0, got " + moles);
        }
    }

    /** @return mass [g] */
    public double massGrams() {
        return moles * formula.molarMass();
    }
}
