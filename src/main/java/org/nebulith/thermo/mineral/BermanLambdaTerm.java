package org.nebulith.thermo.mineral;

/**
 * Berman lambda-transition heat capacity {@code Cp_lambda = T (l1 + l2 T)^2} between Tref and
 * Tlambda (Berman &amp; Brown 1985, Contrib. Mineral. Petrol. 89, 168; Berman 1988, J. Petrol. 29,
 * 445, eq. 5). Its H and S integrals run from Tref and are frozen above Tlambda. A first-order
 * enthalpy at Tlambda is a separate {@link FirstOrderTransition}.
 */
public final class BermanLambdaTerm implements TransitionTerm {
    private final double l1;
    private final double l2;
    private final double tRef;
    private final double tLambda;

    /**
     * @param l1 [(J/mol)^1/2 / K] @param l2 [(J/mol)^1/2 / K^2]
     * @param tRefK start of the lambda heat capacity [K] @param tLambdaK end [K]
     */
    public BermanLambdaTerm(double l1, double l2, double tRefK, double tLambdaK) {
        if (!(tLambdaK > tRefK) || !(tRefK > 0) || !Double.isFinite(l1) || !Double.isFinite(l2)) {
            throw new IllegalArgumentException("lambda term needs 0 < Tref < Tlambda and finite l1, l2, got Tref="
                    + tRefK + ", Tlambda=" + tLambdaK);
        }
        this.l1 = l1;
        this.l2 = l2;
        this.tRef = tRefK;
        this.tLambda = tLambdaK;
    }

    private double clamp(double tK) {
        return Math.min(Math.max(tK, tRef), tLambda);
    }

    private double hAntiderivative(double t) {
        return l1 * l1 * t * t / 2 + 2 * l1 * l2 * t * t * t / 3 + l2 * l2 * t * t * t * t / 4;
    }

    private double sAntiderivative(double t) {
        return l1 * l1 * t + l1 * l2 * t * t + l2 * l2 * t * t * t / 3;
    }

    @Override
    public double h(double tK) {
        return hAntiderivative(clamp(tK)) - hAntiderivative(tRef);
    }

    @Override
    public double s(double tK) {
        return sAntiderivative(clamp(tK)) - sAntiderivative(tRef);
    }

    @Override
    public double cp(double tK) {
        if (tK <= tRef || tK > tLambda) {
            return 0.0;
        }
        double f = l1 + l2 * tK;
        return tK * f * f;
    }

    @Override
    public double[] singularTemperaturesK() {
        return new double[] {tRef, tLambda};
    }
}
