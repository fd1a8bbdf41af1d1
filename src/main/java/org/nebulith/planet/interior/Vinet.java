package org.nebulith.planet.interior;

/**
 * The Vinet (universal) equation of state (Vinet et al. 1987, J. Geophys. Res. 92, 9319):
 * P = 3 K0 (1 - x) / x^2 exp(1.5 (K0' - 1)(1 - x)), x = (rho0 / rho)^(1/3).
 */
public final class Vinet extends ColdCompression {
    private final double k0;
    private final double k0Prime;

    /**
     * @param name    eos name
     * @param rho0    zero-pressure density [kg/m3]
     * @param k0Pa    isothermal bulk modulus [Pa]
     * @param k0Prime its pressure derivative
     */
    public Vinet(final String name, final double rho0, final double k0Pa, final double k0Prime) {
        super(name, rho0);
        this.k0 = k0Pa;
        this.k0Prime = k0Prime;
    }

    @Override
    double pressure(final double eta) {
        double x = Math.cbrt(1 / eta);
        return 3 * k0 * (1 - x) / (x * x) * Math.exp(1.5 * (k0Prime - 1) * (1 - x));
    }

    @Override
    double slope(final double eta) {
        double x = Math.cbrt(1 / eta);
        double a = 1.5 * (k0Prime - 1);
        double e = Math.exp(a * (1 - x));
        // dP/dx, then dx/deta = -x / (3 eta)
        double dPdx = 3 * k0 * e * ((-1.0 / (x * x)) - 2 * (1 - x) / (x * x * x) - a * (1 - x) / (x * x));
        return dPdx * (-x / (3 * eta));
    }
}
