package org.nebulith.stress;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.ConvergenceException;
import org.nebulith.equilibrium.EquilibriumProblem;
import org.nebulith.equilibrium.EquilibriumResult;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.equilibrium.SystemSpec;
import org.nebulith.equilibrium.WarmStart;
import org.nebulith.thermo.Element;

/**
 * Solves stress states with the default data set, either with all solutions or in pure-phase mode:
 * a state from a cold start, and its neighbour from a warm start at the state's result. Keeps one
 * chemical system per element set; not thread-safe (use one instance per thread).
 */
public final class StressSolve {
    private final boolean pureOnly;
    private final EquilibriumSolver solver = new EquilibriumSolver();
    private final Map<Set<Element>, ChemicalSystem> systems = new HashMap<>();
    private EquilibriumResult lastCold;

    /** @param pureOnly true for the pure-phase mode (no solutions) */
    public StressSolve(boolean pureOnly) {
        this.pureOnly = pureOnly;
    }

    /** @return true in pure-phase mode */
    public boolean pureOnly() {
        return pureOnly;
    }

    /**
     * @param s a state
     * @return its problem in this mode's system
     */
    public EquilibriumProblem problem(StressState s) {
        Set<Element> els = s.composition().elements();
        ChemicalSystem sys = systems.computeIfAbsent(els, e -> (pureOnly
                ? SystemSpec.defaults().withSolutions(List.of()) : SystemSpec.defaults()).build(e));
        return EquilibriumProblem.of(sys, s.tK(), s.pBar(), s.composition().asMap());
    }

    /**
     * Solves s from a cold start and keeps its result for {@link #warm}.
     *
     * @param s the state
     * @return the outcome
     */
    public StressOutcome cold(StressState s) {
        lastCold = null;
        EquilibriumProblem pr = problem(s);
        long t0 = System.nanoTime();
        try {
            EquilibriumResult r = solver.solve(pr);
            long dt = System.nanoTime() - t0;
            lastCold = r;
            return new StressOutcome(true, dt, r.diagnostics().newtonIterations(), "");
        } catch (ConvergenceException e) {
            return new StressOutcome(false, System.nanoTime() - t0, 0, e.getMessage());
        }
    }

    /** @return the result of the latest successful {@link #cold} solve, or null */
    public EquilibriumResult lastCold() {
        return lastCold;
    }

    /**
     * Solves target from a warm start at an earlier result of the same mode.
     *
     * @param target the state to solve
     * @param from   the earlier result (its system must be this mode's system for target's elements)
     * @return the outcome
     */
    public StressOutcome warm(StressState target, EquilibriumResult from) {
        EquilibriumProblem pr = problem(target);
        long t0 = System.nanoTime();
        try {
            EquilibriumResult r = solver.solve(pr, WarmStart.of(from));
            return new StressOutcome(true, System.nanoTime() - t0, r.diagnostics().newtonIterations(), "");
        } catch (ConvergenceException e) {
            return new StressOutcome(false, System.nanoTime() - t0, 0, e.getMessage());
        }
    }

    /**
     * Solves target warm and returns its result (for checks); throws on failure.
     *
     * @param target the state
     * @param from   the start
     * @return the result
     */
    public EquilibriumResult warmResult(StressState target, EquilibriumResult from) {
        return solver.solve(problem(target), WarmStart.of(from));
    }
}
