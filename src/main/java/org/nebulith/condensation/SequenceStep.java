package org.nebulith.condensation;

import org.nebulith.equilibrium.EquilibriumResult;
import org.nebulith.thermo.Element;

/**
 * One temperature of a condensation sequence: the equilibrium of the still-reacting system and
 * the solids withdrawn so far (all zero in equilibrium mode).
 */
public final class SequenceStep {
    private final EquilibriumResult result;
    private final double[][] withdrawn;
    private final double[] inputTotals;
    private final double[] withdrawnElements;

    /**
     * @param withdrawn    moles withdrawn per phase and member (null in equilibrium mode); kept, not copied
     * @param inputTotals element totals of the input (shared, not modified)
     * @param stoich      the system's stoichiometry, to sum the withdrawn element moles once
     */
    SequenceStep(EquilibriumResult result, double[][] withdrawn, double[] inputTotals, Stoichiometry stoich) {
        this.result = result;
        this.withdrawn = withdrawn;
        this.inputTotals = inputTotals;
        this.withdrawnElements = withdrawn == null ? null : stoich.condensedElements(withdrawn);
    }

    /** @return temperature [K] */
    public double temperatureK() {
        return result.problem().temperatureK();
    }

    /** @return pressure [bar] */
    public double pressureBar() {
        return result.problem().pressureBar();
    }

    /** @return the equilibrium of the reacting system at this step */
    public EquilibriumResult result() {
        return result;
    }

    /**
     * @param p phase @param k member
     * @return moles of member k of phase p withdrawn at or before this step [mol, input basis]
     */
    public double withdrawnMoles(int p, int k) {
        return withdrawn == null ? 0 : withdrawn[p][k];
    }

    /** @param p phase @param k member @return reacting plus withdrawn moles of the member */
    public double totalMoles(int p, int k) {
        return result.memberMoles(p, k) + withdrawnMoles(p, k);
    }

    /** @param e an element @return moles of e in the solids withdrawn before this step */
    public double withdrawnElementMoles(Element e) {
        int j = result.system().elementIndex(e);
        return j < 0 || withdrawnElements == null ? 0 : withdrawnElements[j];
    }

    /** @param e an element @return input amount of e [mol] (0 if not in the system) */
    public double inputTotal(Element e) {
        int j = result.system().elementIndex(e);
        return j < 0 ? 0 : inputTotals[j];
    }

    /** @param e an element @return fraction of the input amount of e that is condensed (reacting or withdrawn) */
    public double condensedFraction(Element e) {
        int j = result.system().elementIndex(e);
        if (j < 0) {
            return 0;
        }
        double f = (result.condensedMoles(e) + withdrawnElementMoles(e)) / inputTotals[j];
        return Math.min(1, Math.max(0, f));
    }
}
