package org.nebulith.thermo;

import java.util.Objects;

/**
 * One species of the database: a gas or one condensed polymorph, with its provenance.
 *
 * <p>Validity policy ({@link #isValidAt(double)}):
 * <ul>
 * <li>A NASA condensed entry exists only inside its data range, {@code tMin < T <= tMax} (as NASA
 *     CEA treats polymorph entries), and is simply absent outside; at the floor of the data,
 *     {@link #CONDENSED_FLOOR_K}, an entry beginning there is included.</li>
 * <li>A gas may be evaluated down to {@link #GAS_EXTRAPOLATION_BELOW_K} below its lowest data
 *     temperature (its polynomials are smooth there and trace gases at such temperatures carry
 *     no mass) and up to its highest data temperature.</li>
 * <li>A mineral row may be used between {@link ThermoModel#usableMinK()} and
 *     {@link ThermoModel#usableMaxK()}, which may extend beyond the source data range by a documented
 *     margin (see {@code org.nebulith.thermo.mineral.MineralModel}); {@link #isExtrapolatedAt(double)}
 *     flags such temperatures so that reports can show the caution.</li>
 * </ul>
 *
 * @param id         unique id: the NASA name for NASA entries, the mineral name for mineral rows
 *                   ({@code name/VARIANT} for alternative rows of a mineral)
 * @param state      gas, solid or liquid
 * @param formula    element composition per formula unit
 * @param source     key of the publication (see the database header)
 * @param sourceRow  the source's own identifier for the row (file and line)
 * @param role       {@code primary}, {@code alternative} or {@code extra} (NASA rows are primary)
 * @param thermo     the standard-state functions
 * @param variant    the variant tag of an alternative row ({@code B88}, {@code ds62}, ...), empty for
 *                   primary rows
 */
public record Species(String id, State state, Formula formula, String source, String sourceRow,
                      String role, ThermoModel thermo, String variant) {

    /** How far below its data a gas may be evaluated [K]. */
    public static final double GAS_EXTRAPOLATION_BELOW_K = 150.0;

    /**
     * The floor of the condensed data [K]: NASA condensed entries and mineral rows begin here at the
     * lowest. An entry whose usable range begins at this floor is included at the floor itself (no
     * polymorph lies below it to take over), so that the documented lower limit of the tool is a
     * valid state.
     */
    public static final double CONDENSED_FLOOR_K = 200.0;

    /** Aggregate state. */
    public enum State { GAS, SOLID, LIQUID }

    public Species {
        Objects.requireNonNull(id);
        Objects.requireNonNull(state);
        Objects.requireNonNull(formula);
        Objects.requireNonNull(thermo);
        variant = variant == null ? "" : variant;
    }

    /** A species without variant tag (primary row). */
    public Species(String id, State state, Formula formula, String source, String sourceRow,
                   String role, ThermoModel thermo) {
        this(id, state, formula, source, sourceRow, role, thermo, "");
    }

    /** @return true for gas species */
    public boolean isGas() {
        return state == State.GAS;
    }

    /** @return true for solids and liquids */
    public boolean isCondensed() {
        return state != State.GAS;
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
        double lo = thermo.usableMinK();
        return (tK > lo || (tK == lo && lo == CONDENSED_FLOOR_K)) && tK <= thermo.usableMaxK();
    }

    /**
     * @param tK temperature [K]
     * @return true if tK is usable ({@link #isValidAt}) but outside the source's own data range,
     *         so that values there are an extrapolation
     */
    public boolean isExtrapolatedAt(double tK) {
        return isValidAt(tK) && (tK < thermo.tMinK() || tK > thermo.tMaxK());
    }
}
