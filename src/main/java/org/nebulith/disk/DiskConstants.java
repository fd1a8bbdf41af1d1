package org.nebulith.disk;

/** Physical constants in cgs units, with their sources. */
public final class DiskConstants {
    /** Boltzmann constant [erg K^-1], CODATA 2018 (exact). */
    public static final double K_B = 1.380649e-16;
    /** Mass of the hydrogen atom [g]: 1.00782503 u x 1.66053907e-24 g (CODATA 2018). */
    public static final double M_H = 1.6735575e-24;
    /** Newtonian constant of gravitation [cm^3 g^-1 s^-2], CODATA 2018. */
    public static final double G = 6.67430e-8;
    /** Stefan-Boltzmann constant [erg cm^-2 s^-1 K^-4], CODATA 2018. */
    public static final double SIGMA_SB = 5.670374419e-5;
    /** Astronomical unit [cm], IAU 2012 resolution B2. */
    public static final double AU_CM = 1.495978707e13;
    /** Nominal solar mass parameter GM_sun [cm^3 s^-2], IAU 2015 resolution B3. */
    public static final double GM_SUN = 1.3271244e26;
    /** Solar mass [g] = GM_sun / G. */
    public static final double M_SUN_G = GM_SUN / G;
    /** Nominal solar luminosity [erg s^-1], IAU 2015 resolution B3. */
    public static final double L_SUN = 3.828e33;
    /** Julian year [s]. */
    public static final double YEAR_S = 3.15576e7;
    /** 1 bar in dyn cm^-2. */
    public static final double BAR_DYN_CM2 = 1e6;
    /** Mean molecular weight of proto-solar H2 + He gas, 2.34 (Hayashi 1981; common practice). */
    public static final double MU_DEFAULT = 2.34;

    private DiskConstants() {
    }
}
