package org.nebulith.condensation;

import org.nebulith.equilibrium.EquilibriumResult;
import org.nebulith.thermo.Element;

/**
 * One temperature of a condensation sequence: the equilibrium of the still-reacting system and
 * the solids isolated so far (all zero in equilibrium mode).
 */
public final class SequenceStep {
    private final EquilibriumResult result;
    private final double[][] isolated;
    private final double[] inputTotals;
    private final double[] isolatedElements;

    /**
     * @param isolated    moles isolated per phase and member (null in equilibrium mode); kept, not copied
     * @param inputTotals element totals of the input (shared, not modified)
     * @param stoich      the system's stoichiometry, to sum the isolated element moles once
     */
    SequenceStep(EquilibriumResult result, double[][] isolated, double[] inputTotals, Stoichiometry stoich) {
        this.result = result;
        this.isolated = isolated;
        this.inputTotals = inputTotals;
        this.isolatedElements = isolated == null ? null : stoich.condensedElements(isolated);
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
     * @return moles of member k of phase p isolated at or before this step [mol, input basis]
     */
    public double isolatedMoles(int p, int k) {
        return isolated == null ? 0 : isolated[p][k];
    }

    /** @param p phase @param k member @return reacting plus isolated moles of the member */
    public double totalMoles(int p, int k) {
        return result.memberMoles(p, k) + isolatedMoles(p, k);
    }

    /** @param e an element @return moles of e in the solids isolated before this step */
    public double isolatedElementMoles(Element e) {
        int j = result.system().elementIndex(e);
        return j < 0 || isolatedElements == null ? 0 : isolatedElements[j];
    }

    /** @param e an element @return input amount of e [mol] (0 if not in the system) */
    public double inputTotal(Element e) {
        int j = result.system().elementIndex(e);
        return j < 0 ? 0 : inputTotals[j];
    }

    /** @param e an element @return fraction of the input amount of e that is condensed (reacting or isolated) */
    public double condensedFraction(Element e) {
        int j = result.system().elementIndex(e);
        if (j < 0) {
            return 0;
        }
        double f = (result.condensedMoles(e) + isolatedElementMoles(e)) / inputTotals[j];
        return Math.min(1, Math.max(0, f));
    }
}
