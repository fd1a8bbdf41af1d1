package org.nebulith.equilibrium;

/** The kinds of phase the solver handles. */
public enum PhaseKind {
    /** the ideal-gas mixture (standard state 1 bar) */
    GAS,
    /** a pure condensed species (activity 1) */
    PURE,
    /** an ideal solution of condensed end-members */
    SOLUTION
}
