package org.nebulith.equilibrium;

import java.util.Arrays;
import java.util.Map;
import java.util.StringJoiner;

import org.nebulith.thermo.Element;

/**
 * An immutable equilibrium problem: a chemical system at temperature T and pressure P with fixed
 * element totals. Amounts are in moles on any common basis (the solver is scale-invariant).
 */
public final class EquilibriumProblem {
    private final ChemicalSystem system;
    private final double tK;
    private final double pBar;
    private final double[] totals;

    /**
     * @param system  the chemical system
     * @param tK      temperature [K], > 0
     * @param pBar    total pressure [bar], > 0
     * @param totals  element totals [mol] in the order of {@link ChemicalSystem#elements()}, each > 0
     */
    public EquilibriumProblem(ChemicalSystem system, double tK, double pBar, double[] totals) {
        if (!(tK > 0) || Double.isInfinite(tK)) {
            throw new IllegalArgumentException("temperature must be a positive number of kelvin, got " + tK);
        }
        if (!(pBar > 0) || Double.isInfinite(pBar)) {
            throw new IllegalArgumentException("pressure must be a positive number of bar, got " + pBar);
        }
        if (totals.length != system.elementCount()) {
            throw new IllegalArgumentException("expected " + system.elementCount() + " element totals, got " + totals.length);
        }
        for (int j = 0; j < totals.length; j++) {
            if (!(totals[j] > 0) || Double.isInfinite(totals[j])) {
                throw new IllegalArgumentException("total of " + system.elements().get(j)
                        + " must be a positive number of moles, got " + totals[j]);
            }
        }
        this.system = system;
        this.tK = tK;
        this.pBar = pBar;
        this.totals = totals.clone();
    }

    /**
     * @param system   the system
     * @param tK       temperature [K]
     * @param pBar     pressure [bar]
     * @param amounts  moles per element; every element of the system must be present
     * @return the problem
     */
    public static EquilibriumProblem of(ChemicalSystem system, double tK, double pBar, Map<Element, Double> amounts) {
        double[] b = new double[system.elementCount()];
        for (int j = 0; j < b.length; j++) {
            Double v = amounts.get(system.elements().get(j));
            b[j] = v == null ? 0 : v;
        }
        return new EquilibriumProblem(system, tK, pBar, b);
    }

    /** @return the system */
    public ChemicalSystem system() {
        return system;
    }

    /** @return temperature [K] */
    public double temperatureK() {
        return tK;
    }

    /** @return pressure [bar] */
    public double pressureBar() {
        return pBar;
    }

    /** @param b element totals [mol] @return whether they are this problem's, value for value */
    boolean hasTotals(double[] b) {
        return Arrays.equals(totals, b);
    }

    /** @return element totals [mol], a copy */
    public double[] totals() {
        return totals.clone();
    }

    double total(int j) {
        return totals[j];
    }

    /** @param newT temperature [K] @param newP pressure [bar] @return the same composition at (T, P) */
    public EquilibriumProblem at(double newT, double newP) {
        return new EquilibriumProblem(system, newT, newP, totals);
    }

    /** @param newTotals element totals [mol] @return the same state with other totals */
    public EquilibriumProblem withTotals(double[] newTotals) {
        return new EquilibriumProblem(system, tK, pBar, newTotals);
    }

    /** @return "T = ... K, P = ... bar, composition H=..., ..." for error messages */
    public String describe() {
        StringJoiner j = new StringJoiner(",");
        for (int i = 0; i < totals.length; i++) {
            j.add(system.elements().get(i).symbol() + "=" + String.format(java.util.Locale.ROOT, "%.6g", totals[i]));
        }
        return String.format(java.util.Locale.ROOT, "T = %.6g K, P = %.6g bar, composition (mol) %s", tK, pBar, j);
    }

    @Override
    public String toString() {
        return describe() + " " + Arrays.toString(totals);
    }
}
