package org.nebulith.planet.interior;

/**
 * A cold (reference-temperature) equation of state: density as a function of pressure.
 * Implementations are immutable and thread-safe.
 */
public interface EquationOfState {

    /**
     * @param pressurePa pressure [Pa], &gt;= 0
     * @return density [kg/m3]
     */
    double density(double pressurePa);

    /** @return a short name for profiles and messages, e.g. {@code epsilon-Fe} */
    String name();
}
