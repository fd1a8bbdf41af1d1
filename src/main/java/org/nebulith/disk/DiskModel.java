package org.nebulith.disk;

/**
 * A protoplanetary disk: midplane temperature, pressure and gas surface density against
 * heliocentric distance r, valid for {@link #rMinAU()} &lt;= r &lt;= {@link #rMaxAU()}.
 * Implementations are immutable and thread-safe. Calls outside the range are refused.
 */
public interface DiskModel {

    /** @return inner edge of validity [AU] */
    double rMinAU();

    /** @return outer edge of validity [AU] */
    double rMaxAU();

    /** @return a one-line description with its source (or "invented" for demo disks) */
    String description();

    /**
     * @param rAU heliocentric distance [AU], inside the range
     * @return the midplane state (computed once; prefer this when several quantities are needed)
     */
    DiskState stateAt(double rAU);

    /** @return midplane temperature [K] */
    default double temperatureK(double rAU) {
        return stateAt(rAU).temperatureK();
    }

    /** @return midplane pressure [bar] */
    default double pressureBar(double rAU) {
        return stateAt(rAU).pressureBar();
    }

    /** @return gas surface density [g cm^-2] */
    default double sigmaGasGcm2(double rAU) {
        return stateAt(rAU).sigmaGasGcm2();
    }

    /** @return true if rAU lies within the range of validity */
    default boolean covers(double rAU) {
        return rAU >= rMinAU() && rAU <= rMaxAU();
    }

    /**
     * @param rAU a radius [AU]
     * @throws IllegalArgumentException if it lies outside the range of validity
     */
    default void checkRange(double rAU) {
        if (!covers(rAU)) {
            throw new IllegalArgumentException("r = " + rAU + " AU is outside the disk model's range ["
                    + rMinAU() + ", " + rMaxAU() + "] AU");
        }
    }
}
