package org.nebulith.equilibrium;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import org.nebulith.thermo.Element;

/**
 * An immutable equilibrium state: amounts of every phase and member, element potentials and the
 * solver's diagnostics. Amounts are moles on the basis of the problem's element totals.
 */
public final class EquilibriumResult {
    private final EquilibriumProblem problem;
    private final double[] lambda;
    private final double[] phaseMoles;
    private final double[][] memberMoles;
    private final String[][] memberSpecies;
    private final int[] present;
    private final Diagnostics diagnostics;
    final Iterate iterate;

    /**
     * Solver diagnostics.
     *
     * @param newtonIterations Newton steps taken for this state
     * @param phaseChanges     phase additions, removals and exchanges
     * @param maxBalanceError  largest relative element-balance error of the final amounts
     * @param maxPotentialResidual largest |mu - sum a lambda| of a present member [RT]
     * @param worstMember      the member with that residual (phase:member)
     * @param minAbsentAffinity smallest affinity per atom of an absent, available condensed phase [RT]
     * @param minAffinityPhase the phase with that affinity ("" if none)
     * @param excludedGasSpecies gas species left out because T is outside their data
     * @param coldStart        whether the state was reached by a cold start
     */
    public record Diagnostics(int newtonIterations, int phaseChanges, double maxBalanceError,
                              double maxPotentialResidual, String worstMember, double minAbsentAffinity, String minAffinityPhase,
                              int excludedGasSpecies, boolean coldStart) {
    }

    EquilibriumResult(EquilibriumProblem problem, double[] lambda, double[] phaseMoles, double[][] memberMoles,
                      String[][] memberSpecies, Diagnostics diagnostics, Iterate iterate) {
        this.problem = problem;
        this.lambda = lambda;
        this.phaseMoles = phaseMoles;
        this.memberMoles = memberMoles;
        this.memberSpecies = memberSpecies;
        this.diagnostics = diagnostics;
        this.iterate = iterate;
        List<Integer> pr = new ArrayList<>();
        for (int p = 1; p < phaseMoles.length; p++) {
            if (phaseMoles[p] > 0) {
                pr.add(p);
            }
        }
        present = pr.stream().mapToInt(Integer::intValue).toArray();
    }

    /** @return the problem solved */
    public EquilibriumProblem problem() {
        return problem;
    }

    /** @return the system */
    public ChemicalSystem system() {
        return problem.system();
    }

    /** @return element potentials lambda_j = mu_j/RT in the order of the system's elements */
    public double[] elementPotentials() {
        return lambda.clone();
    }

    /** @param p phase index @return moles of phase p (sum over members; 0 if absent) */
    public double phaseMoles(int p) {
        return phaseMoles[p];
    }

    /** @param p phase index @param k member @return moles of member k of phase p */
    public double memberMoles(int p, int k) {
        return memberMoles[p][k];
    }

    /** @param p phase @param k member @return the species id supplying the member ("" if none) */
    public String memberSpecies(int p, int k) {
        String s = memberSpecies[p][k];
        return s == null ? "" : s;
    }

    /** @return total moles of gas */
    public double gasMoles() {
        return phaseMoles[0];
    }

    /** @param i gas species index @return its mole fraction in the gas */
    public double gasMoleFraction(int i) {
        return memberMoles[0][i] / phaseMoles[0];
    }

    /** @return indices of the condensed phases present, in system order */
    public int[] presentCondensedPhases() {
        return present.clone();
    }

    /** @return names of the condensed phases present */
    public List<String> presentPhaseNames() {
        List<String> n = new ArrayList<>();
        for (int p : present) {
            n.add(system().phaseName(p));
        }
        return Collections.unmodifiableList(n);
    }

    /**
     * @param e an element
     * @return moles of e in condensed phases
     */
    public double condensedMoles(Element e) {
        int j = system().elementIndex(e);
        if (j < 0) {
            return 0;
        }
        double s = 0;
        for (int p : present) {
            for (int k = 0; k < memberMoles[p].length; k++) {
                s += memberMoles[p][k] * system().phase(p).members[k].a[j];
            }
        }
        return s;
    }

    /** @param e element @return fraction of e condensed, in [0, 1] (0 for elements not in the system) */
    public double condensedFraction(Element e) {
        int j = system().elementIndex(e);
        if (j < 0) {
            return 0;
        }
        return Math.min(1.0, Math.max(0.0, condensedMoles(e) / problem.total(j)));
    }

    EquilibriumResult withDiagnostics(Diagnostics d) {
        return new EquilibriumResult(problem, lambda, phaseMoles, memberMoles, memberSpecies, d, iterate);
    }

    /** @return the diagnostics */
    public Diagnostics diagnostics() {
        return diagnostics;
    }
}
