package org.nebulith.thermo.mineral;

/**
 * Berman order-disorder heat capacity
 * {@code Cp_dis = d0 + d1 T^-1/2 + d2 T^-2 + d3 T + d4 T^2} between Tmin and Tmax, with H and S
 * integrated from Tmin and frozen above Tmax (Berman 1988, J. Petrol. 29, 445, eqs. 6-8; the
 * coefficient order is the one of the mineral table, see its README section 3). The volume part
 * of Berman's term is irrelevant at 1 bar and left out.
 */
public final class BermanDisorderTerm implements TransitionTerm {
    private final double[] d;
    private final double tMin;
    private final double tMax;

    /**
     * @param d    the five coefficients d0..d4
     * @param tMinK start of disordering [K]
     * @param tMaxK end of disordering [K]
     */
    public BermanDisorderTerm(double[] d, double tMinK, double tMaxK) {
        if (d.length != 5 || !(tMaxK > tMinK) || !(tMinK > 0)) {
            throw new IllegalArgumentException("disorder term needs d0..d4 and 0 < Tmin < Tmax, got Tmin="
                    + tMinK + ", Tmax=" + tMaxK);
        }
        this.d = d.clone();
        this.tMin = tMinK;
        this.tMax = tMaxK;
    }

    private double clamp(double tK) {
        return Math.min(Math.max(tK, tMin), tMax);
    }

    private double hAntiderivative(double t) {
        return d[0] * t + 2 * d[1] * Math.sqrt(t) - d[2] / t + d[3] * t * t / 2 + d[4] * t * t * t / 3;
    }

    private double sAntiderivative(double t) {
        return d[0] * Math.log(t) - 2 * d[1] / Math.sqrt(t) - d[2] / (2 * t * t) + d[3] * t + d[4] * t * t / 2;
    }

    @Override
    public double h(double tK) {
        return hAntiderivative(clamp(tK)) - hAntiderivative(tMin);
    }

    @Override
    public double s(double tK) {
        return sAntiderivative(clamp(tK)) - sAntiderivative(tMin);
    }

    @Override
    public double cp(double tK) {
        if (tK <= tMin || tK > tMax) {
            return 0.0;
        }
        return d[0] + d[1] / Math.sqrt(tK) + d[2] / (tK * tK) + d[3] * tK + d[4] * tK * tK;
    }

    @Override
    public double[] singularTemperaturesK() {
        return new double[] {tMin, tMax};
    }
}
