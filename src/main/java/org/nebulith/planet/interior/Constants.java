package org.nebulith.planet.interior;

/** Physical constants of the interior model. */
public final class Constants {
    /** Gravitational constant [m3 kg-1 s-2] (CODATA 2018). */
    public static final double G = 6.67430e-11;
    /** Earth mass [kg] (IAU 2015 nominal GM_earth / G, common practice). */
    public static final double M_EARTH_KG = 5.9722e24;
    /** Earth mean radius [m] (common practice; PREM's radius is 6371 km). */
    public static final double R_EARTH_M = 6.371e6;

    private Constants() {
    }
}
