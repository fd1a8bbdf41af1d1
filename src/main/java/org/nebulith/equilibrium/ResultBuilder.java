package org.nebulith.equilibrium;

/** Turns a converged {@link Iterate} into an {@link EquilibriumResult} with checked diagnostics. */
final class ResultBuilder {
    private ResultBuilder() {
    }

    static EquilibriumResult build(EquilibriumProblem problem, StateData st, NewtonKernel kernel,
                                   PhaseSelection selection, Iterate it, boolean cold) {
        int changes = selection.changes;
        ChemicalSystem sys = st.system;
        int np = sys.phaseCount();
        double[] phaseMoles = new double[np];
        // absent phases share the state's read-only zero arrays; present ones get their own
        double[][] memberMoles = st.thermal.zeroMoles.clone();
        memberMoles[0] = new double[memberMoles[0].length];
        for (int p : it.active) {
            memberMoles[p] = new double[memberMoles[p].length];
        }
        fillMixture(0, Math.exp(it.lnGas), kernel, it, phaseMoles, memberMoles);
        for (int q = 0; q < it.active.length; q++) {
            int p = it.active[q];
            if (sys.phaseKind(p) == PhaseKind.PURE) {
                double n = it.u[q] * st.scale[p];
                phaseMoles[p] = n;
                memberMoles[p][0] = n;
            } else {
                fillMixture(p, Math.exp(it.u[q]) * st.scale[p], kernel, it, phaseMoles, memberMoles);
            }
        }
        ResultChecks.Measures ms = ResultChecks.measure(problem, st, selection, it, phaseMoles, memberMoles);
        EquilibriumResult.Diagnostics d = new EquilibriumResult.Diagnostics(kernel.iterations, changes,
                ms.balance(), ms.potential(), ms.worstMember(), ms.minAffinity(), ms.minAffinityPhase(), st.excludedGas, cold);
        return new EquilibriumResult(problem, it.lambda.clone(), phaseMoles, memberMoles, st.thermal.memberSpecies, d, it.copy());
    }

    private static void fillMixture(int p, double n, NewtonKernel kernel, Iterate it, double[] phaseMoles,
                                    double[][] memberMoles) {
        double sum = 0;
        double[] x = memberMoles[p];
        double[] known = kernel.lastX[p];
        for (int k = 0; k < x.length; k++) {
            x[k] = known != null && known[k] != NewtonKernel.NOT_COMPUTED ? known[k] : kernel.x(p, k, it.lambda);
            sum += x[k];
        }
        for (int k = 0; k < x.length; k++) {
            x[k] = n * x[k] / sum;
        }
        phaseMoles[p] = n;
    }

    static EquilibriumResult withIterations(EquilibriumResult r, int totalIterations) {
        EquilibriumResult.Diagnostics d = r.diagnostics();
        return r.withDiagnostics(new EquilibriumResult.Diagnostics(totalIterations, d.phaseChanges(),
                d.maxBalanceError(), d.maxPotentialResidual(), d.worstMember(), d.minAbsentAffinity(),
                d.minAffinityPhase(), d.excludedGasSpecies(), d.coldStart()));
    }

    static EquilibriumResult markCold(EquilibriumResult r, int totalIterations) {
        EquilibriumResult.Diagnostics d = r.diagnostics();
        EquilibriumResult.Diagnostics nd = new EquilibriumResult.Diagnostics(totalIterations, d.phaseChanges(),
                d.maxBalanceError(), d.maxPotentialResidual(), d.worstMember(), d.minAbsentAffinity(), d.minAffinityPhase(),
                d.excludedGasSpecies(), true);
        return r.withDiagnostics(nd);
    }
}
