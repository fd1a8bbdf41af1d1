package org.nebulith.thermo.mineral;

/**
 * A first-order transition at Tt with enthalpy dH and entropy dS = dH/Tt, added above Tt as in
 * Berman (1988, J. Petrol. 29, 445) for the enthalpy at the lambda temperature and in the MELTS
 * solid table (Ghiorso &amp; Sack 1995) for perovskite and whitlockite. G stays continuous at Tt.
 */
public final class FirstOrderTransition implements TransitionTerm {
    private final double tt;
    private final double dh;

    /** @param ttK transition temperature [K] @param dhJ enthalpy of transition [J/mol] */
    public FirstOrderTransition(double ttK, double dhJ) {
        if (!(ttK > 0) || !Double.isFinite(dhJ)) {
            throw new IllegalArgumentException("first-order transition needs Tt > 0 K and finite dH, got Tt="
                    + ttK + ", dH=" + dhJ);
        }
        this.tt = ttK;
        this.dh = dhJ;
    }

    @Override
    public double h(double tK) {
        return tK > tt ? dh : 0.0;
    }

    @Override
    public double s(double tK) {
        return tK > tt ? dh / tt : 0.0;
    }

    @Override
    public double cp(double tK) {
        return 0.0;
    }

    @Override
    public double[] singularTemperaturesK() {
        return new double[] {tt};
    }
}
