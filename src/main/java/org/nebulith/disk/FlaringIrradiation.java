package org.nebulith.disk;

/**
 * Midplane temperature of a passive flaring disk heated by its star, after Chiang &amp; Goldreich
 * 1997 (ApJ 490, 368): T_irr = T_ref (r/AU)^-3/7 at the reference star, scaled with stellar
 * luminosity L and mass M as T_irr ~ L^(2/7) M^(-1/7).
 *
 * <p>The scaling follows from their flaring geometry: the grazing angle is dominated by the
 * flaring term, alpha ~ H/r ~ (T r / M)^(1/2), and T^4 ~ alpha L / r^2 gives T ~ L^(2/7) M^(-1/7)
 * r^(-3/7). The default normalisation is their T ~ 150 K (r/AU)^-3/7 for their fiducial T Tauri
 * star (M = 0.5 M_sun, R = 2.5 R_sun, T_eff = 4000 K, so L = 1.44 L_sun; parameters from memory).
 * For the Sun this gives about 122 K at 1 AU. Caution: valid where the disk is optically thick to
 * stellar light and flared (roughly 0.1 to 100 AU); no shadowing or puffed inner rim.
 */
public final class FlaringIrradiation {
    /** Chiang &amp; Goldreich 1997 normalisation at 1 AU [K]. */
    public static final double CG97_T_REF_K = 150.0;
    /** Luminosity of their fiducial star [L_sun] = 2.5^2 (4000/5772)^4 (from memory). */
    public static final double CG97_L_REF_LSUN = 6.25 * Math.pow(4000.0 / 5772.0, 4);
    /** Mass of their fiducial star [M_sun] (from memory). */
    public static final double CG97_M_REF_MSUN = 0.5;

    private final double tRefK;
    private final double lRefLsun;
    private final double mRefMsun;

    /**
     * @param tRefK    T_irr at 1 AU for the reference star [K]
     * @param lRefLsun reference luminosity [L_sun]
     * @param mRefMsun reference mass [M_sun]
     */
    public FlaringIrradiation(double tRefK, double lRefLsun, double mRefMsun) {
        if (!(tRefK > 0 && lRefLsun > 0 && mRefMsun > 0) || Double.isInfinite(tRefK + lRefLsun + mRefMsun)) {
            throw new IllegalArgumentException("irradiation reference T, L and M must be finite and > 0");
        }
        this.tRefK = tRefK;
        this.lRefLsun = lRefLsun;
        this.mRefMsun = mRefMsun;
    }

    /** @return the Chiang &amp; Goldreich 1997 normalisation */
    public static FlaringIrradiation chiangGoldreich1997() {
        return new FlaringIrradiation(CG97_T_REF_K, CG97_L_REF_LSUN, CG97_M_REF_MSUN);
    }

    /**
     * @param rAU       radius [AU]
     * @param lStarLsun stellar luminosity [L_sun]
     * @param mStarMsun stellar mass [M_sun]
     * @return T_irr [K]
     */
    public double temperatureK(double rAU, double lStarLsun, double mStarMsun) {
        return tRefK * Math.pow(lStarLsun / lRefLsun, 2.0 / 7.0) * Math.pow(mStarMsun / mRefMsun, -1.0 / 7.0)
                * Math.pow(rAU, -3.0 / 7.0);
    }
}
