package org.nebulith.thermo;

/**
 * Standard-state (1 bar) thermodynamic functions of one species, in dimensionless form.
 *
 * <p>Enthalpy follows the NASA Glenn convention (McBride, Zehe &amp; Gordon 2002): the assigned
 * enthalpy is the enthalpy of formation from the reference elements at 298.15 K plus
 * H(T) - H(298.15 K); entropy is absolute (third law). Both the NASA gases and the mineral rows
 * share this convention, so their Gibbs energies can be compared directly.
 *
 * <p>Every model has a validity range [{@link #tMinK()}, {@link #tMaxK()}]. Evaluation outside it
 * is the caller's decision: {@link Species#isValidAt(double)} states the policy.
 */
public interface ThermoModel {
    /** Gas constant used with the NASA Glenn data [J/(mol K)], McBride et al. 2002. */
    double R = 8.314510;

    /** @return lowest temperature of the data [K] */
    double tMinK();

    /** @return highest temperature of the data [K] */
    double tMaxK();

    /**
     * @return lowest temperature at which the model may be used [K]; equal to {@link #tMinK()}
     *         unless the model documents an extrapolation margin
     */
    default double usableMinK() {
        return tMinK();
    }

    /**
     * @return highest temperature at which the model may be used [K]; equal to {@link #tMaxK()}
     *         unless the model documents an extrapolation margin
     */
    default double usableMaxK() {
        return tMaxK();
    }

    /** @param tK temperature [K] @return Cp/R [-] */
    double cpOverR(double tK);

    /** @param tK temperature [K] @return H/(RT) [-] (assigned enthalpy) */
    double hOverRT(double tK);

    /** @param tK temperature [K] @return S/R [-] (absolute entropy at 1 bar) */
    double sOverR(double tK);

    /** @param tK temperature [K] @return G/(RT) = H/(RT) - S/R [-] at 1 bar */
    default double gOverRT(double tK) {
        return hOverRT(tK) - sOverR(tK);
    }

    /** @param tK temperature [K] @return Cp [J/(mol K)] */
    default double cpJPerMolK(double tK) {
        return cpOverR(tK) * R;
    }

    /** @param tK temperature [K] @return H [J/mol] */
    default double hJPerMol(double tK) {
        return hOverRT(tK) * R * tK;
    }

    /** @param tK temperature [K] @return S [J/(mol K)] */
    default double sJPerMolK(double tK) {
        return sOverR(tK) * R;
    }

    /** @param tK temperature [K] @return G = H - TS [J/mol] */
    default double gJPerMol(double tK) {
        return gOverRT(tK) * R * tK;
    }
}
