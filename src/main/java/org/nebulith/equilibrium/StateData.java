package org.nebulith.equilibrium;

import org.nebulith.thermo.Species;

/**
 * The temperature- and pressure-dependent data of a system at one state: the standard chemical
 * potential c = G/RT (+ ln P/1 bar for gases) of every phase member, which candidate species
 * supplies it, and the amount scale of each phase.
 */
final class StateData {
    final ChemicalSystem system;
    final double tK;
    final double lnP;
    /** c[p][k]; +infinity where member k of phase p has no valid species at tK */
    final double[][] c;
    final Species[][] chosen;
    final boolean[] available;
    /** largest amount of phase p that the element totals allow [mol] (scale of its amount variable) */
    final double[] scale;
    int excludedGas;

    StateData(EquilibriumProblem problem) {
        this.system = problem.system();
        this.tK = problem.temperatureK();
        this.lnP = Math.log(problem.pressureBar());
        int np = system.phaseCount();
        c = new double[np][];
        chosen = new Species[np][];
        available = new boolean[np];
        scale = new double[np];
        for (int p = 0; p < np; p++) {
            evaluatePhase(p, problem);
        }
    }

    private void evaluatePhase(int p, EquilibriumProblem problem) {
        PhaseDef ph = system.phase(p);
        int n = ph.members.length;
        c[p] = new double[n];
        chosen[p] = new Species[n];
        int valid = 0;
        double sc = 0;
        for (int k = 0; k < n; k++) {
            Constituent m = ph.members[k];
            Species s = m.candidates.length == 1 ? (m.candidates[0].isValidAt(tK) ? m.candidates[0] : null)
                    : m.stableCandidate(tK);
            if (s == null) {
                c[p][k] = Double.POSITIVE_INFINITY;
                if (ph.kind == PhaseKind.GAS) {
                    excludedGas++;
                }
                continue;
            }
            chosen[p][k] = s;
            double g = s.thermo().gOverRT(tK);
            c[p][k] = ph.kind == PhaseKind.GAS ? g + lnP : g;
            valid++;
            sc = Math.max(sc, maxAmount(m, problem));
        }
        available[p] = ph.kind == PhaseKind.SOLUTION ? valid >= 1 : valid > 0;
        scale[p] = sc > 0 ? sc : 1.0;
    }

    private static double maxAmount(Constituent m, EquilibriumProblem problem) {
        double lim = Double.POSITIVE_INFINITY;
        for (int k = 0; k < m.nzIndex.length; k++) {
            lim = Math.min(lim, problem.total(m.nzIndex[k]) / m.nzCount[k]);
        }
        return lim;
    }
}
