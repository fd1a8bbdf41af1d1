package org.nebulith.equilibrium;

import java.util.Locale;

/**
 * A posteriori checks of an equilibrium, computed from the final amounts rather than from the
 * solver's internal residuals: element balance, the equilibrium condition mu_i = sum_j a_ij
 * lambda_j for every present member (with mu from the amounts: ln x for mixtures), and a
 * non-negative affinity for every absent condensed phase available at the temperature.
 */
public final class ResultChecks {
    /** Largest accepted relative element-balance error. */
    public static final double BALANCE_LIMIT = 1e-10;
    /** Largest accepted |mu - a.lambda| of a present member [RT]. */
    public static final double POTENTIAL_LIMIT = 1e-7;
    /** Most negative accepted affinity per atom of an absent phase [RT]. */
    public static final double AFFINITY_LIMIT = -1e-6;

    private static final double TINY_FRACTION = 1e-250;

    private ResultChecks() {
    }

    record Measures(double balance, double potential, String worstMember, double minAffinity, String minAffinityPhase) {
    }

    static Measures measure(EquilibriumProblem problem, StateData st, PhaseSelection selection, Iterate it,
                            double[] phaseMoles, double[][] memberMoles) {
        ChemicalSystem sys = st.system;
        int m = sys.elementCount();
        double[] sum = new double[m];
        double pot = 0;
        String worst = "";
        for (int p = 0; p < sys.phaseCount(); p++) {
            if (phaseMoles[p] <= 0 && p != 0) {
                continue;
            }
            PhaseDef ph = sys.phase(p);
            for (int k = 0; k < ph.members.length; k++) {
                double n = memberMoles[p][k];
                if (n <= 0) {
                    continue;
                }
                Constituent c = ph.members[k];
                for (int a = 0; a < c.nzIndex.length; a++) {
                    sum[c.nzIndex[a]] += n * c.nzCount[a];
                }
                double mu = st.c[p][k];
                if (ph.kind != PhaseKind.PURE && n < TINY_FRACTION * phaseMoles[p]) {
                    continue; // below the normal double range: ln x carries no precision there
                }
                if (ph.kind != PhaseKind.PURE) {
                    mu += c.multiplicity * Math.log(n / phaseMoles[p]);
                }
                double res = Math.abs(mu - c.dot(it.lambda));
                if (res > pot) {
                    pot = res;
                    worst = ph.name + ":" + c.name;
                }
            }
        }
        double bal = 0;
        for (int j = 0; j < m; j++) {
            bal = Math.max(bal, Math.abs(sum[j] - problem.total(j)) / problem.total(j));
        }
        double minA = selection.minAffinity;
        String minP = selection.minAffinityPhase;
        return new Measures(bal, pot, worst, minA == Double.POSITIVE_INFINITY ? 0 : minA, minP);
    }

    /**
     * @param r       a result
     * @param options the solver settings
     * @return null if r passes every check, else a description of the first failure
     */
    static String failure(EquilibriumResult r, SolverOptions options) {
        EquilibriumResult.Diagnostics d = r.diagnostics();
        if (!(d.maxBalanceError() <= BALANCE_LIMIT)) {
            return String.format(Locale.ROOT, "element balance error %.3g exceeds %.1g", d.maxBalanceError(), BALANCE_LIMIT);
        }
        if (!(d.maxPotentialResidual() <= POTENTIAL_LIMIT)) {
            return String.format(Locale.ROOT, "equilibrium residual %.3g RT of %s exceeds %.1g", d.maxPotentialResidual(),
                    d.worstMember(), POTENTIAL_LIMIT);
        }
        if (!(d.minAbsentAffinity() >= AFFINITY_LIMIT)) {
            return String.format(Locale.ROOT, "absent phase %s is supersaturated (affinity %.3g RT per atom)",
                    d.minAffinityPhase(), d.minAbsentAffinity());
        }
        return null;
    }

    /**
     * Checks a result and says what is wrong.
     *
     * @param r a result
     * @return null if it passes, else the failure
     */
    public static String check(EquilibriumResult r) {
        return failure(r, SolverOptions.defaults());
    }
}
