package org.nebulith.disk;

/**
 * kappa = kappa0 (T / 1 K)^b [cm^2 g^-1]. With kappa0 = 0.1 and b = 1/2 this is the "metal grains"
 * regime of Bell &amp; Lin 1994 (ApJ 427, 987; from memory), the default; b = 0 gives a constant
 * opacity. The exponent must be below 4 so that the midplane temperature equation has one root.
 */
public final class PowerLawOpacity implements OpacityLaw {
    /** Default kappa0 [cm^2 g^-1] (Bell &amp; Lin 1994 metal-grain regime; from memory). */
    public static final double BELL_LIN_METAL_KAPPA0 = 0.1;
    /** Default exponent (Bell &amp; Lin 1994 metal-grain regime; from memory). */
    public static final double BELL_LIN_METAL_EXPONENT = 0.5;

    private final double kappa0;
    private final double exponent;

    /**
     * @param kappa0   opacity at 1 K [cm^2 g^-1], &gt; 0
     * @param exponent b, with -10 &lt;= b &lt; 4
     */
    public PowerLawOpacity(double kappa0, double exponent) {
        if (!(kappa0 > 0) || Double.isInfinite(kappa0)) {
            throw new IllegalArgumentException("kappa0_cm2_g must be finite and > 0, got " + kappa0);
        }
        if (!(exponent >= -10 && exponent < 4)) {
            throw new IllegalArgumentException("kappa_T_exponent must lie in [-10, 4), got " + exponent);
        }
        this.kappa0 = kappa0;
        this.exponent = exponent;
    }

    /** @return the default law (Bell &amp; Lin 1994 metal grains, from memory) */
    public static PowerLawOpacity bellLinMetalGrains() {
        return new PowerLawOpacity(BELL_LIN_METAL_KAPPA0, BELL_LIN_METAL_EXPONENT);
    }

    @Override
    public double kappaCm2PerG(double tK) {
        return kappa0 * Math.pow(tK, exponent);
    }

    @Override
    public double temperatureExponent() {
        return exponent;
    }

    @Override
    public String description() {
        return "kappa = " + kappa0 + " (T/K)^" + exponent + " cm^2/g";
    }
}
