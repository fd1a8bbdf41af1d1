package org.nebulith.thermo.mineral;

/**
 * Landau tricritical transition term of Holland &amp; Powell (2011, J. Metamorphic Geol. 29, 333,
 * eqs. 9-11, at 1 bar so that the critical temperature is Tc0). With
 * {@code Q0 = ((Tc0 - 298.15)/Tc0)^(1/4)} and {@code Q = ((Tc0 - T)/Tc0)^(1/4)} below Tc0 (else 0):
 * <pre>
 * G_L = Smax [Tc0 (Q0^2 - Q0^6/3) - Tc0 Q^2 + Tc0 Q^6/3 - T (Q0^2 - Q^2)]
 * S_L = Smax (Q0^2 - Q^2),   H_L = Smax Tc0 (Q0^2 - Q0^6/3 - Q^2 + Q^6/3),
 * Cp_L = Smax T / (2 Tc0 Q^2)  (T &lt; Tc0, 0 above)
 * </pre>
 * It is zero at 298.15 K, where the tabulated H and S already describe the ordered state.
 */
public final class LandauTerm implements TransitionTerm {
    private final double tc0;
    private final double sMax;
    private final double q0Sq;

    /** @param tc0K critical temperature at 1 bar [K] @param sMaxJPerK maximum entropy of disorder [J/(mol K)] */
    public LandauTerm(double tc0K, double sMaxJPerK) {
        if (!(tc0K > HeatCapacity.T_REF_K) || !Double.isFinite(sMaxJPerK)) {
            throw new IllegalArgumentException("Landau term needs Tc0 > 298.15 K and a finite Smax, got Tc0="
                    + tc0K + ", Smax=" + sMaxJPerK);
        }
        this.tc0 = tc0K;
        this.sMax = sMaxJPerK;
        this.q0Sq = Math.sqrt((tc0K - HeatCapacity.T_REF_K) / tc0K);
    }

    /** @param tK temperature [K] @return Q^2 (0 at and above Tc0) */
    public double orderParameterSquared(double tK) {
        return tK < tc0 ? Math.sqrt((tc0 - tK) / tc0) : 0.0;
    }

    @Override
    public double h(double tK) {
        double q2 = orderParameterSquared(tK);
        return sMax * tc0 * (q0Sq - q0Sq * q0Sq * q0Sq / 3 - q2 + q2 * q2 * q2 / 3);
    }

    @Override
    public double s(double tK) {
        return sMax * (q0Sq - orderParameterSquared(tK));
    }

    @Override
    public double cp(double tK) {
        double q2 = orderParameterSquared(tK);
        return q2 > 0 ? sMax * tK / (2 * tc0 * q2) : 0.0;
    }

    @Override
    public double[] singularTemperaturesK() {
        return new double[] {tc0};
    }
}
