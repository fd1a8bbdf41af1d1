package org.nebulith.thermo.mineral;

/**
 * A transition or order-disorder contribution that is added to the heat-capacity integral of a
 * mineral. All values are at 1 bar, in J/mol and J/(mol K); {@code g = h - T s} holds for every term.
 */
public interface TransitionTerm {
    /** @param tK temperature [K] @return enthalpy contribution [J/mol] */
    double h(double tK);

    /** @param tK temperature [K] @return entropy contribution [J/(mol K)] */
    double s(double tK);

    /** @param tK temperature [K] @return heat-capacity contribution [J/(mol K)] */
    double cp(double tK);

    /** @param tK temperature [K] @return Gibbs energy contribution [J/mol] */
    default double g(double tK) {
        return h(tK) - tK * s(tK);
    }

    /** @return temperatures [K] at which this term has a kink or a step (for numerical checks) */
    double[] singularTemperaturesK();
}
