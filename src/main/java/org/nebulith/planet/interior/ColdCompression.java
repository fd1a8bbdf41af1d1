package org.nebulith.planet.interior;

/**
 * An isothermal compression law P(eta), eta = rho / rho0, with the density found from a pressure by
 * safeguarded Newton iteration (bisection where Newton would leave the bracket). Subclasses give
 * P(eta) and dP/deta; the inversion is the numerical part, kept here once.
 */
abstract class ColdCompression implements EquationOfState {
    private static final double ETA_MAX = 30.0;
    private static final int MAX_ITERATIONS = 200;

    private final String name;
    private final double rho0;

    /**
     * @param name eos name
     * @param rho0 zero-pressure density [kg/m3], &gt; 0
     */
    ColdCompression(final String name, final double rho0) {
        if (!(rho0 > 0) || !Double.isFinite(rho0)) {
            throw new IllegalArgumentException(name + ": zero-pressure density must be > 0, got " + rho0);
        }
        this.name = name;
        this.rho0 = rho0;
    }

    /** @param eta rho/rho0 @return pressure [Pa] */
    abstract double pressure(double eta);

    /** @param eta rho/rho0 @return dP/deta [Pa] */
    abstract double slope(double eta);

    @Override
    public final String name() {
        return name;
    }

    /** @return zero-pressure density [kg/m3] */
    public final double rho0() {
        return rho0;
    }

    @Override
    public final double density(final double pressurePa) {
        if (!(pressurePa >= 0) || !Double.isFinite(pressurePa)) {
            throw new IllegalArgumentException(name + ": pressure must be finite and >= 0, got " + pressurePa);
        }
        if (pressurePa == 0) {
            return rho0;
        }
        double lo = 1.0;
        double hi = 2.0;
        while (pressure(hi) < pressurePa) {
            lo = hi;
            hi *= 2;
            if (hi > ETA_MAX) {
                throw new IllegalArgumentException(name + ": pressure " + pressurePa / 1e9
                        + " GPa is beyond the compression this fit covers (rho/rho0 > " + ETA_MAX + ")");
            }
        }
        double eta = 0.5 * (lo + hi);
        for (int i = 0; i < MAX_ITERATIONS; i++) {
            double f = pressure(eta) - pressurePa;
            if (f > 0) {
                hi = eta;
            } else {
                lo = eta;
            }
            double next = eta - f / slope(eta);
            if (!(next > lo && next < hi)) {
                next = 0.5 * (lo + hi);
            }
            if (Math.abs(next - eta) <= 1e-14 * eta) {
                return rho0 * next;
            }
            eta = next;
        }
        return rho0 * eta;
    }
}
