package org.nebulith.condensation;

import java.util.List;
import java.util.Optional;

import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumProblem;
import org.nebulith.equilibrium.EquilibriumResult;
import org.nebulith.equilibrium.EquilibriumSolver;

/**
 * Where a condensation sequence must start so that it begins with gas only: strong dust enrichment
 * (or high pressure) makes refractory phases stable above the usual start of 2000 K, and a sequence
 * started there would report phases as present from the start instead of their appearance.
 */
public final class AllGasStart {
    /** Step by which the start is raised [K]. */
    public static final double STEP_K = 50;

    /**
     * What was found.
     *
     * @param startK       the first temperature tried at or above the requested start that is all
     *                     gas [K], if any below the limit
     * @param stableAtStart data ids of the condensed phases stable at the requested start
     *                     (empty if it was all gas)
     * @param limitK       the highest temperature tried: the upper limit of the gas data [K]
     * @param startState   the all-gas equilibrium at {@code startK} (a cold solve, the same a sequence
     *                     started there would solve first), if any
     */
    public record Result(Optional<Double> startK, List<String> stableAtStart, double limitK,
                         Optional<EquilibriumResult> startState) {
        /** @return whether the requested start was all gas already */
        public boolean allGasAtStart() {
            return stableAtStart.isEmpty();
        }
    }

    private AllGasStart() {
    }

    /**
     * @param solver  the solver
     * @param system  the chemical system
     * @param totals  element totals [mol]
     * @param path    the pressure path (pressure at each trial temperature)
     * @param startK  the requested start [K]
     * @return the requested start if it is all gas, else the lowest start in steps of {@link #STEP_K}
     *         that is, up to the gas data's upper limit
     */
    public static Result find(EquilibriumSolver solver, ChemicalSystem system, double[] totals, PressurePath path,
                              double startK) {
        EquilibriumResult first = solveAt(solver, system, totals, path, startK);
        List<String> stable = first.presentPhaseNames();
        if (stable.isEmpty()) {
            return new Result(Optional.of(startK), List.of(), system.gasTMaxK(), Optional.of(first));
        }
        double limit = system.gasTMaxK();
        for (double t = startK + STEP_K; t <= limit; t += STEP_K) {
            EquilibriumResult r = solveAt(solver, system, totals, path, t);
            if (r.presentPhaseNames().isEmpty()) {
                return new Result(Optional.of(t), stable, limit, Optional.of(r));
            }
        }
        return new Result(Optional.empty(), stable, limit, Optional.empty());
    }

    private static EquilibriumResult solveAt(EquilibriumSolver solver, ChemicalSystem system, double[] totals,
                                             PressurePath path, double tK) {
        return solver.solve(new EquilibriumProblem(system, tK, path.pressureBar(tK), totals));
    }
}
