package org.nebulith.equilibrium;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Gibbs free-energy minimiser for an ideal gas, pure condensed phases and ideal solutions at fixed
 * T and P: the element-potential Newton method (Gordon &amp; McBride 1994, NASA RP-1311) with
 * phase selection. After each converged Newton solve, a phase whose amount went negative is
 * dropped; otherwise the absent phase with the largest driving force per atom is brought in (or
 * exchanged for a present pure phase when its stoichiometry depends on theirs); this repeats until
 * no absent phase is supersaturated. A cold start continues from an all-gas state at high
 * temperature down to the target. Every result is checked a posteriori ({@link ResultChecks}); a
 * state that fails is an error naming T, P and the composition.
 *
 * <p>Instances are immutable and thread-safe.
 */
public final class EquilibriumSolver {
    private final SolverOptions options;
    /**
     * Largest continuation step of a cold start in 1/T [1/K] (about 100 K at 1400 K, 15 K at
     * 550 K, 5 K at 300 K): larger steps change many phases at once, and phase selection then
     * often cycles.
     */
    private static final double MAX_COLD_STEP = 5e-5;

    /** @param options solver settings */
    public EquilibriumSolver(SolverOptions options) {
        this.options = options;
    }

    /** A solver with {@link SolverOptions#defaults()}. */
    public EquilibriumSolver() {
        this(SolverOptions.defaults());
    }

    /** @return the settings */
    public SolverOptions options() {
        return options;
    }

    /**
     * Solves from a cold start.
     *
     * @param problem the state
     * @return the checked equilibrium
     * @throws ConvergenceException naming the state if no checked equilibrium was found
     */
    public EquilibriumResult solve(EquilibriumProblem problem) {
        if (problem.temperatureK() >= SHORT_CONTINUATION_K) {
            try {
                return coldSolve(problem);
            } catch (ConvergenceException e) {
                return globalCold(problem, e.getMessage());
            }
        }
        return globalCold(problem, null);
    }

    /**
     * Above this temperature [K] a cold start tries the continuation from the all-gas state first:
     * its path from {@link SolverOptions#coldStartTK()} is a few steps long there and costs less than
     * the interior-point path (measured with {@code nebulith bench}).
     */
    static final double SHORT_CONTINUATION_K = 1500;

    private EquilibriumResult globalCold(EquilibriumProblem problem, String continuationFailure) {
        StateData st = new StateData(problem);
        Attempt g = globalSolve(problem, st, GasGuess.initial(st, problem.totals()).lambda);
        if (g.result != null) {
            return ResultBuilder.markCold(g.result, g.result.diagnostics().newtonIterations());
        }
        String failure = continuationFailure;
        if (failure == null) {
            try {
                return coldSolve(problem);
            } catch (ConvergenceException e) {
                failure = e.getMessage();
            }
        }
        EquilibriumResult anchored = fromWarmerAnchor(problem);
        if (anchored != null) {
            return anchored;
        }
        throw new ConvergenceException(failure + "; interior-point path: " + g.failure
                + "; no warmer anchor led down to the state");
    }

    /**
     * Temperatures of the last-resort anchors, as multiples of the target's (each below
     * {@link #SHORT_CONTINUATION_K}).
     */
    private static final double[] ANCHOR_FACTORS = {1.05, 1.15, 1.4, 2.0};

    /**
     * The last resort of a cold start: the globally convergent path at a warmer temperature, where
     * the barrier problem is better conditioned (below about 250 K nearly every element is condensed
     * and the dual is nearly degenerate), then the warm start from there down to the target, as a
     * condensation sequence does it.
     *
     * @return the checked equilibrium, or null if no anchor led down to the state
     */
    private EquilibriumResult fromWarmerAnchor(EquilibriumProblem problem) {
        for (double factor : ANCHOR_FACTORS) {
            double tK = problem.temperatureK() * factor;
            if (tK >= SHORT_CONTINUATION_K) {
                break;
            }
            EquilibriumProblem anchor = problem.at(tK, problem.pressureBar());
            StateData st = new StateData(anchor);
            Attempt g = globalSolve(anchor, st, GasGuess.initial(st, anchor.totals()).lambda);
            if (g.result == null) {
                continue;
            }
            EquilibriumResult down = warmOnly(problem, WarmStart.of(g.result));
            if (down != null) {
                return ResultBuilder.markCold(down, down.diagnostics().newtonIterations()
                        + g.result.diagnostics().newtonIterations());
            }
        }
        return null;
    }

    /**
     * The globally convergent path: the interior-point method at the state itself, then the
     * active-set Newton polish from its end point; null if either fails.
     */
    private Attempt globalSolve(EquilibriumProblem problem, StateData st, double[] startLambda) {
        Attempt fast = globalSolve(problem, st, startLambda, InteriorPoint.FAST);
        if (fast.result != null) {
            return fast;
        }
        Attempt careful = globalSolve(problem, st, startLambda, InteriorPoint.CAREFUL);
        if (careful.result == null) {
            careful.failure = "first try: " + fast.failure + "; careful try: " + careful.failure;
        }
        return careful;
    }

    private Attempt globalSolve(EquilibriumProblem problem, StateData st, double[] startLambda,
                                InteriorPoint.Settings settings) {
        InteriorPoint ip = new InteriorPoint(st, problem.totals(), settings);
        Iterate it = ip.solve(startLambda);
        if (it == null) {
            Attempt a = new Attempt();
            a.failure = ip.failure;
            return a;
        }
        Attempt a = attempt(problem, st, it);
        if (a.result == null) {
            a.failure = "polish after " + ip.iterations + " interior-point iterations: " + a.failure;
        } else {
            a.result = ResultBuilder.withIterations(a.result, a.iterations + ip.iterations);
        }
        return a;
    }

    /**
     * Solves from a warm start; falls back to a cold start if the warm start fails or its result
     * fails the checks (a warm start can land in a wrong assemblage near a phase boundary). A start
     * of the same composition (a sequence, the next radius) tries the active-set method; a start from
     * another composition at the same T and P (a survey draw from its star's nominal state) follows
     * the composition path ({@link CompositionPath}), one from another composition and state (a
     * fractional sequence) a short active-set search ({@link PhaseSelection#forOtherComposition});
     * then each tries the interior-point path, then the continuation from the start's state (in T,
     * P and composition).
     *
     * @param problem the state
     * @param start   a start from earlier results of the same system (may be null)
     * @return the checked equilibrium
     */
    public EquilibriumResult solve(EquilibriumProblem problem, WarmStart start) {
        if (start == null) {
            return coldSolve(problem);
        }
        EquilibriumResult warm = warmOnly(problem, start);
        return warm != null ? warm : solve(problem);
    }

    /**
     * The warm start's paths (fast attempt, globally convergent path, continuation); null if all fail.
     * A start from another composition at the same T and P (a survey draw from its star's nominal
     * state) is carried along the composition path first ({@link CompositionPath}): measured on 20
     * invented stars x 100 draws, the first radius then takes 35,300 Newton iterations against 50,100
     * for the short search from the nominal state followed by the interior-point path where that
     * failed (a third of the draws), and 90 % of the draws end by the path.
     */
    private EquilibriumResult warmOnly(EquilibriumProblem problem, WarmStart start) {
        StateData st = new StateData(problem);
        Iterate it = adapt(start.iterate.copy(), st);
        boolean sameTotals = java.util.Arrays.equals(start.fromTotals, problem.totals());
        if (!sameTotals && start.fromTK == problem.temperatureK() && start.fromPBar == problem.pressureBar()) {
            EquilibriumResult path = alongComposition(problem, start);
            if (path != null) {
                return path;
            }
        } else {
            Attempt a = attempt(problem, st, it, !sameTotals);
            if (a.result != null) {
                return a.result;
            }
        }
        // the globally convergent path before the continuation, measured: from another composition
        // (a survey draw from its star's nominal state) a mean of 5 ms against 25 ms for the
        // continuation in composition; from the same composition (the next radius or temperature)
        // where the search failed, 6 % less CPU per survey draw and a third off its 99th percentile,
        // and between two Ca-Al fronts 2e-4 AU apart in the demo disk, where the search must leave
        // hibonite out, about 45 Newton steps (5-8 ms) against 200-300 (50-80 ms) for a continuation
        // that meets the same failed addition at each of its steps
        Attempt global = globalSolve(problem, st, start.iterate.lambda);
        if (global.result != null) {
            return global.result;
        }
        return continueFrom(problem, start);
    }

    /**
     * The parametric path in the element totals from the start's composition ({@link CompositionPath});
     * null if it fails or its end fails the checks.
     */
    EquilibriumResult alongComposition(EquilibriumProblem problem, WarmStart start) {
        CompositionPath path = new CompositionPath(problem, start.fromTotals, options);
        CompositionPath.Prediction end = path.follow(start.iterate);
        if (end == null) {
            return null;
        }
        Attempt a = attempt(problem, end.state(), end.iterate(), true);
        return a.result == null ? null : ResultBuilder.withIterations(a.result, a.iterations + path.iterations);
    }

    /**
     * Continuation from the warm start's state to the target along a straight path in (1/T, ln P,
     * ln b), with adaptive steps; null if it stalls.
     */
    private EquilibriumResult continueFrom(EquilibriumProblem problem, WarmStart start) {
        double inv0 = 1.0 / start.fromTK;
        double inv1 = 1.0 / problem.temperatureK();
        double lp0 = Math.log(start.fromPBar);
        double lp1 = Math.log(problem.pressureBar());
        Iterate good = start.iterate.copy();
        double s = 0;
        double ds = 0.25;
        int iterations = 0;
        while (s < 1) {
            double next = Math.min(1.0, s + ds);
            EquilibriumProblem pr = next == 1.0 ? problem : new EquilibriumProblem(problem.system(),
                    1.0 / (inv0 + next * (inv1 - inv0)), Math.exp(lp0 + next * (lp1 - lp0)),
                    between(start.fromTotals, problem, next));
            StateData st = new StateData(pr);
            Attempt a = attempt(pr, st, adapt(good.copy(), st));
            iterations += a.iterations;
            if (a.result == null) {
                ds *= 0.5;
                if (ds < 1e-4) {
                    return null;
                }
                continue;
            }
            s = next;
            good = a.iterate;
            if (s == 1.0) {
                return ResultBuilder.withIterations(a.result, iterations);
            }
            ds = Math.min(0.5, ds * 1.5);
        }
        return null;
    }

    private static final class Attempt {
        EquilibriumResult result;
        Iterate iterate;
        String failure;
        EquilibriumResult rejected;
        int iterations;
    }

    private Attempt attempt(EquilibriumProblem problem, StateData st, Iterate it) {
        return attempt(problem, st, it, false);
    }

    /** @param otherComposition the start comes from another composition ({@link PhaseSelection#forOtherComposition}) */
    private Attempt attempt(EquilibriumProblem problem, StateData st, Iterate it, boolean otherComposition) {
        Attempt a = new Attempt();
        NewtonKernel kernel = new NewtonKernel(st, problem.totals(), options);
        PhaseSelection sel = new PhaseSelection(st, kernel, options);
        if (otherComposition) {
            sel.forOtherComposition();
        }
        String failure = sel.run(it);
        a.iterations = kernel.iterations;
        a.iterate = it;
        if (failure != null) {
            a.failure = failure;
            return a;
        }
        EquilibriumResult r = ResultBuilder.build(problem, st, kernel, sel, it, false);
        String bad = ResultChecks.failure(r, options);
        if (bad != null) {
            a.failure = bad;
            a.rejected = r;
            return a;
        }
        a.result = r;
        return a;
    }

    /** Removes phases unavailable at the new state, replacing polymorphs by a valid twin. */
    private static Iterate adapt(Iterate it, StateData st) {
        ChemicalSystem sys = st.system;
        Set<Integer> seen = new HashSet<>();
        List<Integer> act = new ArrayList<>();
        List<Double> amt = new ArrayList<>();
        for (int q = 0; q < it.active.length; q++) {
            int p = it.active[q];
            int use = st.available[p] ? p : twin(sys, st, p);
            if (use >= 0 && seen.add(use)) {
                act.add(use);
                amt.add(use == p ? it.u[q] : it.u[q] * st.scale[p] / st.scale[use]);
            }
        }
        it.active = act.stream().mapToInt(Integer::intValue).toArray();
        it.u = amt.stream().mapToDouble(Double::doubleValue).toArray();
        return it;
    }

    private static int twin(ChemicalSystem sys, StateData st, int p) {
        if (sys.phaseKind(p) != PhaseKind.PURE) {
            return -1;
        }
        double[] a = sys.phase(p).members[0].a;
        for (int q = 1; q < sys.phaseCount(); q++) {
            if (q != p && st.available[q] && sys.phaseKind(q) == PhaseKind.PURE
                    && java.util.Arrays.equals(a, sys.phase(q).members[0].a)) {
                return q;
            }
        }
        return -1;
    }

    /**
     * Cold start: an all-gas guess at a high temperature, then continuation in 1/T down to the
     * target with adaptive steps (at most {@link #MAX_COLD_STEP}), each started by extrapolating
     * the chemical potentials and amounts of the two previous points linearly in T
     * ({@link WarmStart#extrapolate}).
     */
    private EquilibriumResult coldSolve(EquilibriumProblem problem) {
        double target = problem.temperatureK();
        double t0 = Math.max(options.coldStartTK(), target);
        EquilibriumProblem first = problem.at(t0, problem.pressureBar());
        StateData st0 = new StateData(first);
        Iterate it = GasGuess.initial(st0, first.totals());
        Attempt a = attempt(first, st0, it);
        if (a.result == null) {
            throw failure(problem, "cold start at " + t0 + " K: " + a.failure, a);
        }
        int totalIterations = a.iterations;
        double invT = 1.0 / t0;
        double invTarget = 1.0 / target;
        double h = 2.0e-5;
        EquilibriumResult last = a.result;
        EquilibriumResult previous = null;
        while (invT < invTarget) {
            double next = Math.min(invTarget, invT + h);
            if (invTarget - next < 0.2 * h) {
                next = invTarget;
            }
            EquilibriumProblem pr = problem.at(1.0 / next, problem.pressureBar());
            if (next == invTarget) {
                pr = problem;
            }
            StateData st = new StateData(pr);
            Iterate start = WarmStart.extrapolate(last, previous, pr.temperatureK()).iterate;
            Attempt s = attempt(pr, st, adapt(start, st));
            totalIterations += s.iterations;
            if (s.result == null) {
                h *= 0.5;
                if (h < 1e-9) {
                    throw failure(problem, "continuation stalled at T = " + (1.0 / invT) + " K: " + s.failure, s);
                }
                continue;
            }
            invT = next;
            previous = last;
            last = s.result;
            h = Math.min(h * 1.5, MAX_COLD_STEP);
        }
        return ResultBuilder.markCold(last, totalIterations);
    }

    private static double[] between(double[] from, EquilibriumProblem to, double s) {
        double[] b = new double[from.length];
        for (int j = 0; j < b.length; j++) {
            b[j] = Math.exp((1 - s) * Math.log(from[j]) + s * Math.log(to.total(j)));
        }
        return b;
    }

    static ConvergenceException failure(EquilibriumProblem problem, String what) {
        return ConvergenceException.at(problem, what, List.of(), java.util.Map.of());
    }

    /** The failure with the phases of the attempt's last iterate and the residuals of its rejected result. */
    private static ConvergenceException failure(EquilibriumProblem problem, String what, Attempt a) {
        List<String> phases = new ArrayList<>();
        if (a.iterate != null) {
            for (int p : a.iterate.active) {
                phases.add(problem.system().phaseName(p));
            }
        }
        java.util.Map<String, Double> residuals = new java.util.LinkedHashMap<>();
        if (a.rejected != null) {
            EquilibriumResult.Diagnostics d = a.rejected.diagnostics();
            residuals.put("balance", d.maxBalanceError());
            residuals.put("potential_RT", d.maxPotentialResidual());
            residuals.put("affinity_RT", d.minAbsentAffinity());
        }
        return ConvergenceException.at(problem, what, phases, residuals);
    }
}
