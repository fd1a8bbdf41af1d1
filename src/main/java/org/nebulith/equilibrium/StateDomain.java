package org.nebulith.equilibrium;

import java.util.Locale;

import org.nebulith.thermo.Species;

/**
 * The temperatures and pressures at which a {@link ChemicalSystem} may be solved: from the floor of
 * the condensed data ({@value Species#CONDENSED_FLOOR_K} K, where NASA condensed entries and the
 * mineral rows begin) or the lowest temperature of its gas data, whichever is higher, to the highest
 * temperature at which every gas species has data; and pressures from {@value #P_MIN_BAR} to
 * {@value #P_MAX_BAR} bar. The upper pressure limit is that of the model, not of the data: an ideal
 * gas and condensed phases without a volume term (their data are for 1 bar) are fair approximations
 * up to about 100 bar (common practice); the lower one is far below any disk of interest and
 * keeps the gas amounts within double precision.
 */
public final class StateDomain {
    /** Lowest accepted pressure [bar]. */
    public static final double P_MIN_BAR = 1e-12;
    /** Highest accepted pressure [bar]. */
    public static final double P_MAX_BAR = 100;

    private StateDomain() {
    }

    /**
     * @param species a species selection (its gases decide)
     * @return the lowest temperature at which a system of these species may be solved [K]
     */
    public static double minTemperatureK(java.util.List<Species> species) {
        double lo = Species.CONDENSED_FLOOR_K;
        for (Species s : species) {
            if (s.isGas()) {
                lo = Math.max(lo, s.thermo().tMinK() - Species.GAS_EXTRAPOLATION_BELOW_K);
            }
        }
        return lo;
    }

    /**
     * @param species a species selection (its gases decide)
     * @return the highest temperature at which every gas of the selection has data [K]
     */
    public static double maxTemperatureK(java.util.List<Species> species) {
        double hi = Double.POSITIVE_INFINITY;
        for (Species s : species) {
            if (s.isGas()) {
                hi = Math.min(hi, s.thermo().tMaxK());
            }
        }
        return hi;
    }

    /**
     * @param lo lowest temperature [K] @param hi highest [K]
     * @return the range for messages, "200 to 6000 K"
     */
    public static String temperatureRange(double lo, double hi) {
        return num(lo) + " to " + num(hi) + " K";
    }

    /** @param system a system @return the lowest temperature at which it may be solved [K] */
    public static double minTemperatureK(ChemicalSystem system) {
        return Math.max(Species.CONDENSED_FLOOR_K, system.gasTMinK());
    }

    /** @param system a system @return the highest temperature at which it may be solved [K] */
    public static double maxTemperatureK(ChemicalSystem system) {
        return system.gasTMaxK();
    }

    /**
     * @param system a system
     * @param tK     a temperature [K]
     * @return true if tK lies in the range of the system's data
     */
    public static boolean coversTemperature(ChemicalSystem system, double tK) {
        return tK >= minTemperatureK(system) && tK <= maxTemperatureK(system);
    }

    /** @param pBar a pressure [bar] @return true if it lies in the accepted range */
    public static boolean coversPressure(double pBar) {
        return pBar >= P_MIN_BAR && pBar <= P_MAX_BAR;
    }

    /** @param system a system @return the accepted temperature range for messages, "200 to 6000 K" */
    public static String temperatureRange(ChemicalSystem system) {
        return temperatureRange(minTemperatureK(system), maxTemperatureK(system));
    }

    /** @return the accepted pressure range for messages, "1e-12 to 100 bar" */
    public static String pressureRange() {
        return num(P_MIN_BAR) + " to " + num(P_MAX_BAR) + " bar";
    }

    private static String num(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e7) {
            return Long.toString((long) v);
        }
        String t = String.format(Locale.ROOT, "%.6g", v);
        return t.contains("e") ? t.replaceAll("\\.?0+e", "e").replace("e-0", "e-").replace("e+0", "e").replace("e+", "e") : t;
    }
}
