package org.nebulith.equilibrium;

import org.nebulith.thermo.Species;

/**
 * The temperature- and pressure-dependent data of a system at one state: the standard chemical
 * potential c = G/RT (+ ln P/1 bar for gases) of every phase member, which candidate species
 * supplies it, and the amount scale of each phase. The part that depends on T and P only
 * ({@link Thermal}) is shared by every state of the system at the same T and P
 * ({@link ChemicalSystem#thermal}): the draws of a survey meet the same radial nodes again and again.
 */
final class StateData {
    final ChemicalSystem system;
    final double tK;
    final double lnP;
    /** c[p][k]; +infinity where member k of phase p has no valid species at tK (shared: never modified) */
    final double[][] c;
    final Species[][] chosen;
    final boolean[] available;
    /** largest amount of phase p that the element totals allow [mol] (scale of its amount variable; 1 for the gas) */
    final double[] scale;
    /** moles of each gas species below which it is left out of the Jacobian ({@link NewtonKernel}) */
    final double[] gasJacobianFloor;
    /** ln of the moles below which a gas species is left out of the Newton sums ({@link NewtonKernel#UNSEEN}) */
    final double[] gasLnSumFloor;
    final int excludedGas;
    /** the data that depend on T and P only (shared) */
    final Thermal thermal;

    StateData(EquilibriumProblem problem) {
        this.system = problem.system();
        this.tK = problem.temperatureK();
        this.lnP = Math.log(problem.pressureBar());
        Thermal th = system.thermal(tK, problem.pressureBar());
        thermal = th;
        c = th.c;
        chosen = th.chosen;
        available = th.available;
        excludedGas = th.excludedGas;
        Amounts am = Amounts.of(problem);
        gasJacobianFloor = am.gasJacobianFloor;
        gasLnSumFloor = am.gasLnSumFloor;
        int np = system.phaseCount();
        scale = new double[np];
        scale[0] = 1.0; // the gas amount is ln N_gas, never scaled
        for (int p = 1; p < np; p++) {
            double sc = 0;
            double[] most = am.memberMost[p];
            for (int k = 0; k < most.length; k++) {
                if (chosen[p][k] != null) {
                    sc = Math.max(sc, most[k]);
                }
            }
            scale[p] = sc > 0 ? sc : 1.0;
        }
    }

    /**
     * The data of {@code problem} with the totals-only data (amount scales, gas floors) of
     * {@code like}, a state of the same system at the same T and P: for the intermediate points of a
     * path in composition ({@link CompositionPath}), which any nearby scale serves.
     */
    StateData(EquilibriumProblem problem, StateData like) {
        if (problem.system() != like.system || problem.temperatureK() != like.tK
                || Math.log(problem.pressureBar()) != like.lnP) {
            throw new IllegalArgumentException("another system or state");
        }
        system = like.system;
        tK = like.tK;
        lnP = like.lnP;
        thermal = like.thermal;
        c = like.c;
        chosen = like.chosen;
        available = like.available;
        excludedGas = like.excludedGas;
        gasJacobianFloor = like.gasJacobianFloor;
        gasLnSumFloor = like.gasLnSumFloor;
        scale = like.scale;
    }

    /**
     * The data of a system that depend on the element totals only (the largest amount of every
     * member and the gas floors of {@link NewtonKernel}); the latest two are kept per thread, since a
     * sequence or a survey draw solves state after state with the same totals, and a draw starts
     * from its star's nominal totals. Immutable.
     */
    private static final class Amounts {
        /** the latest two of this thread (a survey draw's first radius starts from its star's nominal totals) */
        private static final ThreadLocal<Amounts[]> LATEST = new ThreadLocal<>();
        final ChemicalSystem system;
        final double[] totals;
        /** largest amount of member k of phase p that the totals allow [mol] */
        final double[][] memberMost;
        final double[] gasJacobianFloor;
        final double[] gasLnSumFloor;

        private Amounts(EquilibriumProblem problem) {
            system = problem.system();
            totals = problem.totals();
            int np = system.phaseCount();
            memberMost = new double[np][];
            for (int p = 0; p < np; p++) {
                Constituent[] members = system.phase(p).members;
                memberMost[p] = new double[members.length];
                for (int k = 0; k < members.length; k++) {
                    memberMost[p][k] = maxAmount(members[k], problem);
                }
            }
            Constituent[] gas = system.phase(0).members;
            gasJacobianFloor = new double[gas.length];
            gasLnSumFloor = new double[gas.length];
            for (int k = 0; k < gas.length; k++) {
                double bmin = Double.POSITIVE_INFINITY;
                for (int j : gas[k].nzIndex) {
                    bmin = Math.min(bmin, problem.total(j));
                }
                gasJacobianFloor[k] = NewtonKernel.NEGLIGIBLE * bmin;
                gasLnSumFloor[k] = Math.log(NewtonKernel.UNSEEN * bmin);
            }
        }

        static Amounts of(EquilibriumProblem problem) {
            Amounts[] kept = LATEST.get();
            if (kept == null) {
                kept = new Amounts[2];
                LATEST.set(kept);
            }
            for (Amounts a : kept) {
                if (a != null && a.system == problem.system() && problem.hasTotals(a.totals)) {
                    return a;
                }
            }
            Amounts a = new Amounts(problem);
            kept[1] = kept[0];
            kept[0] = a;
            return a;
        }
    }

    /** The data of a system that depend on T and P only; immutable once built. */
    static final class Thermal {
        final double[][] c;
        final Species[][] chosen;
        final boolean[] available;
        int excludedGas;
        /** id of the species chosen for each member, null where none is valid (shared by results) */
        final String[][] memberSpecies;
        /** a zero amount for every member of each phase (shared by results for absent phases) */
        final double[][] zeroMoles;

        /**
         * @param system the system
         * @param tK     temperature [K]
         * @param pBar   pressure [bar]
         */
        Thermal(ChemicalSystem system, double tK, double pBar) {
            int np = system.phaseCount();
            double lnP = Math.log(pBar);
            c = new double[np][];
            chosen = new Species[np][];
            available = new boolean[np];
            memberSpecies = new String[np][];
            zeroMoles = new double[np][];
            for (int p = 0; p < np; p++) {
                evaluatePhase(system.phase(p), p, tK, lnP);
                memberSpecies[p] = new String[chosen[p].length];
                for (int k = 0; k < chosen[p].length; k++) {
                    memberSpecies[p][k] = chosen[p][k] == null ? null : chosen[p][k].id();
                }
                zeroMoles[p] = new double[chosen[p].length];
            }
        }

        private void evaluatePhase(PhaseDef ph, int p, double tK, double lnP) {
            int n = ph.members.length;
            c[p] = new double[n];
            chosen[p] = new Species[n];
            int valid = 0;
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
            }
            available[p] = valid > 0;
        }
    }

    private static double maxAmount(Constituent m, EquilibriumProblem problem) {
        double lim = Double.POSITIVE_INFINITY;
        for (int k = 0; k < m.nzIndex.length; k++) {
            lim = Math.min(lim, problem.total(m.nzIndex[k]) / m.nzCount[k]);
        }
        return lim;
    }
}
