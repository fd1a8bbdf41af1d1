package org.nebulith.thermo.mineral;

import java.util.List;

import org.nebulith.thermo.ThermoModel;

/**
 * Standard-state (1 bar) functions of a mineral from its tabulated enthalpy of formation and
 * third-law entropy at 298.15 K, a heat-capacity polynomial and the transition terms its source
 * requires: {@code H(T) = H_f,298 + int Cp dT + sum H_term}, {@code S(T) = S_298 + int Cp/T dT +
 * sum S_term}, {@code G = H - T S}. This is the NASA Glenn enthalpy convention, so the values can be
 * combined with NASA gases (see {@link ThermoModel}). Pressure effects on the solid are ignored.
 *
 * <p>Validity policy. The sources give the data from 298.15 K; most give no upper limit.
 * <ul>
 * <li>{@link #tMinK()} is the source's lower limit; the model may be used down to
 *     {@link #EXTRAPOLATION_MIN_K} (the floor of the NASA condensed data), flagged as extrapolated.</li>
 * <li>Where the source states an upper limit, it is both {@link #tMaxK()} and the hard limit.</li>
 * <li>Where it states none, {@link #tMaxK()} is {@link #NOMINAL_MAX_K} (above about 1800-2000 K the
 *     heat-capacity fits of these compilations are extrapolations and many phases melt) and the model
 *     may be used, flagged as extrapolated, up to {@link #UNSTATED_HARD_MAX_K}; it is refused above.</li>
 * </ul>
 */
public final class MineralModel implements ThermoModel {
    /** Lowest temperature at which a mineral row may be used (as extrapolation) [K]. */
    public static final double EXTRAPOLATION_MIN_K = 200.0;
    /** Upper limit of the trusted range where the source gives none [K]. */
    public static final double NOMINAL_MAX_K = 1800.0;
    /** Hard upper limit where the source gives none [K]. */
    public static final double UNSTATED_HARD_MAX_K = 2500.0;

    private final double hf298;
    private final double s298;
    private final HeatCapacity heatCapacity;
    private final List<TransitionTerm> terms;
    private final double tMin;
    private final double statedTMax;

    /**
     * @param hf298J     enthalpy of formation from the elements at 298.15 K [J/mol]
     * @param s298J      third-law entropy at 298.15 K [J/(mol K)]
     * @param heatCapacity the heat-capacity polynomial
     * @param terms      transition and order-disorder terms to add
     * @param tMinK      lowest temperature of the source data [K]
     * @param statedTMaxK upper limit stated by the source [K], or NaN if none
     */
    public MineralModel(double hf298J, double s298J, HeatCapacity heatCapacity, List<TransitionTerm> terms,
                        double tMinK, double statedTMaxK) {
        if (!Double.isFinite(hf298J) || !Double.isFinite(s298J) || !(s298J > 0)) {
            throw new IllegalArgumentException("mineral needs finite H_f_298 and S_298 > 0, got " + hf298J
                    + ", " + s298J);
        }
        if (!(tMinK > 0) || !(Double.isNaN(statedTMaxK) || statedTMaxK > tMinK)) {
            throw new IllegalArgumentException("mineral range needs 0 < T_min < T_max, got " + tMinK + ", "
                    + statedTMaxK);
        }
        this.hf298 = hf298J;
        this.s298 = s298J;
        this.heatCapacity = heatCapacity;
        this.terms = List.copyOf(terms);
        this.tMin = tMinK;
        this.statedTMax = statedTMaxK;
    }

    /** @return the transition and order-disorder terms */
    public List<TransitionTerm> terms() {
        return terms;
    }

    /** @return true if the source states an upper temperature limit */
    public boolean hasStatedTMax() {
        return !Double.isNaN(statedTMax);
    }

    @Override
    public double tMinK() {
        return tMin;
    }

    @Override
    public double tMaxK() {
        return hasStatedTMax() ? statedTMax : NOMINAL_MAX_K;
    }

    @Override
    public double usableMinK() {
        return Math.min(tMin, EXTRAPOLATION_MIN_K);
    }

    @Override
    public double usableMaxK() {
        return hasStatedTMax() ? statedTMax : UNSTATED_HARD_MAX_K;
    }

    @Override
    public double hJPerMol(double tK) {
        double h = hf298 + heatCapacity.enthalpyIncrement(tK);
        for (TransitionTerm t : terms) {
            h += t.h(tK);
        }
        return h;
    }

    @Override
    public double sJPerMolK(double tK) {
        double s = s298 + heatCapacity.entropyIncrement(tK);
        for (TransitionTerm t : terms) {
            s += t.s(tK);
        }
        return s;
    }

    @Override
    public double cpJPerMolK(double tK) {
        double cp = heatCapacity.cp(tK);
        for (TransitionTerm t : terms) {
            cp += t.cp(tK);
        }
        return cp;
    }

    @Override
    public double gJPerMol(double tK) {
        double g = hf298 + heatCapacity.enthalpyIncrement(tK) - tK * (s298 + heatCapacity.entropyIncrement(tK));
        for (TransitionTerm t : terms) {
            g += t.g(tK);
        }
        return g;
    }

    @Override
    public double cpOverR(double tK) {
        return cpJPerMolK(tK) / R;
    }

    @Override
    public double hOverRT(double tK) {
        return hJPerMol(tK) / (R * tK);
    }

    @Override
    public double sOverR(double tK) {
        return sJPerMolK(tK) / R;
    }

    @Override
    public double gOverRT(double tK) {
        return gJPerMol(tK) / (R * tK);
    }
}
