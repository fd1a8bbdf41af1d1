package org.nebulith.thermo.mineral;

/**
 * A heat-capacity polynomial that is a sum of powers of T, {@code Cp = sum_i c_i T^p_i}
 * [J/(mol K)], with its exact integrals from the reference temperature 298.15 K.
 * The subclasses fix the exponents of one published form.
 */
public abstract class HeatCapacity {
    /** Reference temperature of the tabulated H and S [K]. */
    public static final double T_REF_K = 298.15;

    private final double[] exponents;
    private final double[] coefficients;

    /**
     * @param exponents    the powers of T
     * @param coefficients the coefficients, in the same order
     */
    protected HeatCapacity(double[] exponents, double[] coefficients) {
        if (exponents.length != coefficients.length) {
            throw new IllegalArgumentException("heat capacity needs one coefficient per power of T");
        }
        for (double c : coefficients) {
            if (!Double.isFinite(c)) {
                throw new IllegalArgumentException("heat-capacity coefficient " + c + " is not finite");
            }
        }
        this.exponents = exponents.clone();
        this.coefficients = coefficients.clone();
    }

    /** @param tK temperature [K] @return Cp [J/(mol K)] */
    public double cp(double tK) {
        double sum = 0;
        for (int i = 0; i < exponents.length; i++) {
            sum += coefficients[i] * pow(tK, exponents[i]);
        }
        return sum;
    }

    /** @param tK temperature [K] @return the integral of Cp dT from 298.15 K to tK [J/mol] */
    public double enthalpyIncrement(double tK) {
        double sum = 0;
        for (int i = 0; i < exponents.length; i++) {
            double p = exponents[i] + 1;
            sum += coefficients[i] * (p == 0 ? Math.log(tK / T_REF_K) : (pow(tK, p) - pow(T_REF_K, p)) / p);
        }
        return sum;
    }

    /** @param tK temperature [K] @return the integral of Cp/T dT from 298.15 K to tK [J/(mol K)] */
    public double entropyIncrement(double tK) {
        double sum = 0;
        for (int i = 0; i < exponents.length; i++) {
            double p = exponents[i];
            sum += coefficients[i] * (p == 0 ? Math.log(tK / T_REF_K) : (pow(tK, p) - pow(T_REF_K, p)) / p);
        }
        return sum;
    }

    private static double pow(double t, double p) {
        if (p == 1) {
            return t;
        } else if (p == 2) {
            return t * t;
        } else if (p == -2) {
            return 1 / (t * t);
        } else if (p == -0.5) {
            return 1 / Math.sqrt(t);
        } else if (p == 0.5) {
            return Math.sqrt(t);
        }
        return Math.pow(t, p);
    }
}
