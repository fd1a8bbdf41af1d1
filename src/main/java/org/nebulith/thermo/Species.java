package org.nebulith.thermo;

import java.util.Objects;

/**
 * One species of the database: a gas or one condensed polymorph, with its provenance.
 *
 * <p>Validity policy: a condensed species exists only inside its data range,
 * {@code tMin < T <= tMax} (as NASA CEA treats polymorph entries), and is simply absent outside.
 * A gas species may be evaluated down to {@link #GAS_EXTRAPOLATION_BELOW_K} below its lowest
 * data temperature (its polynomials are smooth there and trace gases at such temperatures carry
 * no mass); further out it is refused.
 *
 * @param id         unique id: the NASA name for NASA entries, the mineral name for mineral rows
 * @param state      gas, solid or liquid
 * @param formula    element composition per formula unit
 * @param source     key of the publication (see the database header)
 * @param sourceRow  the source's own identifier for the row
 * @param role       {@code primary}, {@code alternative} or {@code extra} (NASA rows are primary)
 * @param thermo     the standard-state functions
 */
public record Species(String id, State state, Formula formula, String source, String sourceRow,
                      String role, ThermoModel thermo) {

    /** How far below its data a gas may be evaluated [K]. */
    public static final double GAS_EXTRAPOLATION_BELOW_K = 150.0;

    /** Aggregate state. */
    public enum State { GAS, SOLID, LIQUID }

    public Species {
        Objects.requireNonNull(id);
        Objects.requireNonNull(state);
        Objects.requireNonNull(formula);
        Objects.requireNonNull(thermo);
    }

    /** @return true for gas species */
    public boolean isGas() {
        return state == State.GAS;
    }

    /** @return molar mass [g/mol] */
    public double molarMass() {
        return formula.molarMass();
    }

    /**
     * @param tK temperature [K]
     * @return whether this species may take part in an equilibrium at tK (see class policy)
     */
    public boolean isValidAt(double tK) {
        if (isGas()) {
            return tK >= thermo.tMinK() - GAS_EXTRAPOLATION_BELOW_K && tK <= thermo.tMaxK();
        }
        return tK > thermo.tMinK() && tK <= thermo.tMaxK();
    }
}
