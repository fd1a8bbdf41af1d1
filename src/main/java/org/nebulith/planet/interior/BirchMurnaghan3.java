package org.nebulith.planet.interior;

/**
 * The third-order Birch-Murnaghan equation of state (Birch 1947, Phys. Rev. 71, 809):
 * P = 1.5 K0 (eta^(7/3) - eta^(5/3)) [1 + 0.75 (K0' - 4)(eta^(2/3) - 1)], eta = rho / rho0.
 */
public final class BirchMurnaghan3 extends ColdCompression {
    private final double k0;
    private final double k0Prime;

    /**
     * @param name    eos name
     * @param rho0    zero-pressure density [kg/m3]
     * @param k0Pa    isothermal bulk modulus [Pa]
     * @param k0Prime its pressure derivative
     */
    public BirchMurnaghan3(final String name, final double rho0, final double k0Pa, final double k0Prime) {
        super(name, rho0);
        this.k0 = k0Pa;
        this.k0Prime = k0Prime;
    }

    /**
     * @param name        eos name
     * @param molarMassKg molar mass [kg/mol]
     * @param v0M3        zero-pressure molar volume [m3/mol]
     * @param k0Pa        bulk modulus [Pa]
     * @param k0Prime     its pressure derivative
     * @return the equation of state with rho0 = M / V0
     */
    public static BirchMurnaghan3 ofMolarVolume(final String name, final double molarMassKg, final double v0M3,
                                                final double k0Pa, final double k0Prime) {
        return new BirchMurnaghan3(name, molarMassKg / v0M3, k0Pa, k0Prime);
    }

    /** @return the same compression law with rho0 scaled by a factor (same molar volume, heavier cations) */
    BirchMurnaghan3 scaled(final String newName, final double factor) {
        return new BirchMurnaghan3(newName, rho0() * factor, k0, k0Prime);
    }

    @Override
    double pressure(final double eta) {
        double e23 = Math.pow(eta, 2.0 / 3.0);
        double e53 = e23 * eta;
        double e73 = e53 * e23;
        return 1.5 * k0 * (e73 - e53) * (1 + 0.75 * (k0Prime - 4) * (e23 - 1));
    }

    @Override
    double slope(final double eta) {
        double e23 = Math.pow(eta, 2.0 / 3.0);
        double e13 = Math.cbrt(eta);
        double e53 = e23 * eta;
        double e73 = e53 * e23;
        double c = 0.75 * (k0Prime - 4);
        double a = e73 - e53;
        double da = (7.0 / 3.0) * e23 * e23 - (5.0 / 3.0) * e23;
        double b = 1 + c * (e23 - 1);
        double db = c * (2.0 / 3.0) / e13;
        return 1.5 * k0 * (da * b + a * db);
    }
}
