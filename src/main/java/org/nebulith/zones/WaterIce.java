package org.nebulith.zones;

import org.nebulith.thermo.Formula;

/**
 * Water ice in equilibrium with the gas below the floor temperature of the condensation
 * calculation: vapour in excess of the saturation pressure of hexagonal ice condenses.
 *
 * <p>Saturation pressure: Murphy &amp; Koop (2005), Q. J. R. Meteorol. Soc. 131, 1539, eq. 7,
 * valid for T &gt; 110 K: ln(p/Pa) = 9.550426 - 5723.265/T + 3.53068 ln T - 0.00728332 T.
 * Caution: only water ice is modelled; CO, CO2, CH4 and NH3 ices and clathrates are not.
 */
public final class WaterIce {
    /** The formula of water, H2O (parsed once, shared by every user). */
    public static final Formula FORMULA = Formula.parse("H:2 O:1");

    /** Lowest temperature of the saturation formula [K]. */
    public static final double T_MIN_K = 110.0;

    private WaterIce() {
    }

    /** @param tK temperature [K], &gt; 110 @return saturation vapour pressure over ice [bar] */
    public static double saturationPressureBar(double tK) {
        if (!(tK > T_MIN_K)) {
            throw new IllegalArgumentException("the ice vapour-pressure formula is valid above " + T_MIN_K
                    + " K, got " + tK + " K");
        }
        double lnPa = 9.550426 - 5723.265 / tK + 3.53068 * Math.log(tK) - 0.00728332 * tK;
        return Math.exp(lnPa) * 1e-5;
    }

    /**
     * @param waterMoles moles of H2O vapour available
     * @param gasMoles   total moles of gas
     * @param tK         temperature [K]
     * @param pBar       total pressure [bar]
     * @return moles of ice that condense (0 when the vapour is undersaturated)
     */
    public static double condensedMoles(double waterMoles, double gasMoles, double tK, double pBar) {
        double tEval = Math.max(tK, T_MIN_K + 1e-9);
        double saturated = saturationPressureBar(tEval) / pBar * gasMoles;
        return Math.max(0.0, waterMoles - saturated);
    }
}
