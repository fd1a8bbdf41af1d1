package org.nebulith.equilibrium;

/**
 * A warm start from another composition carried to the target's element totals along the straight
 * path b(t) = b0 + t (b1 - b0), one phase change at a time (a parametric active set). At each
 * converged point the tangent of the solution follows from the converged Newton matrix,
 * J dx/dt = (b1 - b0) / b(t) in the balance rows; its linear prediction gives the first value of t
 * where a present phase runs out or an absent one becomes saturated. The path steps just past that
 * point, makes the change, and converges there with the phase selection (a few Newton steps from the
 * prediction), then goes on from the new assemblage. From the point after the last change the
 * prediction at b1 is returned for the caller's own solve and checks.
 *
 * <p>It exists for the survey's draws whose assemblage changes at their first radius (orthopyroxene
 * and rutile giving way to nepheline and titanite): there Newton from the star's nominal state, with
 * the nominal assemblage at the draw's totals, has no solution to converge to and creeps.
 */
final class CompositionPath {
    /**
     * Newton iterations the path's intermediate points may spend together before it gives way to
     * the interior-point path (which takes about 50 from the start of a draw). Measured on 20
     * invented stars x 100 draws: with 40, 90 % of the draws' first radii end by the path; 30 saves
     * nothing (the draws it loses then pay both).
     */
    static final int BUDGET = 40;
    /** Steps the path may take (each a phase change or an approach to one). */
    static final int MAX_STEPS = 12;
    /** Newton iterations of the phase selection at one intermediate point. */
    static final int POINT_BUDGET = 15;
    /** The step goes this factor past a predicted change, plus {@link #MIN_STEP}. */
    private static final double OVERSHOOT = 1.05;
    private static final double MIN_STEP = 1e-3;
    /**
     * A change predicted farther than this in t is approached first (to {@link #NEAR} of its
     * distance) and predicted again from there: the linear prediction of a far change is off by
     * enough to make the wrong change.
     */
    private static final double APPROACH = 0.1;
    private static final double NEAR = 0.85;
    /**
     * Largest predicted change of an element potential, ln N_gas or a solution's ln amount in one
     * step [RT or ln units]: 1 or 0.5 sent a third more draws to the interior-point path, no limit
     * a quarter more.
     */
    private static final double MAX_CHANGE = 2;
    /**
     * Tolerances of the intermediate points (balance; ten times this for the phase conditions and
     * affinities): only the end needs the solver's own; from 1e-12 to this, 30 % fewer Newton
     * iterations on the path.
     */
    private static final double LOOSE = 1e-4;

    private final SolverOptions opt;
    private final SolverOptions loose;
    private final EquilibriumProblem target;
    private final double[] b0;
    private final double[] b1;
    /** Newton iterations of the intermediate points */
    int iterations;
    /** why the path failed, or null */
    String failure;

    /**
     * @param target the state to reach
     * @param b0     the totals at which the start was converged [mol]
     * @param opt    solver settings
     */
    CompositionPath(EquilibriumProblem target, double[] b0, SolverOptions opt) {
        this.target = target;
        this.b0 = b0;
        this.b1 = target.totals();
        this.opt = opt;
        this.loose = new SolverOptions(Math.max(LOOSE, opt.balanceTolerance()),
                Math.max(10 * LOOSE, opt.potentialTolerance()), Math.max(10 * LOOSE, opt.affinityTolerance()),
                opt.maxNewtonIterations(), opt.maxPhaseChanges(), opt.maxPotentialStep(), opt.coldStartTK());
    }

    /** A predicted start at the target's totals, with its state data. */
    record Prediction(Iterate iterate, StateData state) {
    }

    /**
     * @param start converged at {@link #b0} and at the target's T and P (copied, not modified)
     * @return the prediction at b1 after the last change, or null if the path failed ({@link #failure})
     */
    Prediction follow(Iterate start) {
        double t = 0;
        EquilibriumProblem pr = at(0);
        StateData st = new StateData(pr);
        StateData first = st;
        Iterate it = start.copy();
        for (int step = 0; step < MAX_STEPS; step++) {
            NewtonKernel kernel = new NewtonKernel(st, pr.totals(), opt);
            double[] dx = tangent(kernel, it, pr.totals());
            if (dx == null) {
                failure = "singular Newton matrix at t = " + t;
                return null;
            }
            double room = 1 - t;
            double reach = Math.min(room, MAX_CHANGE / largestChange(st, it, dx));
            Event e = firstEvent(st, kernel, it, dx, room);
            double s = reach;
            if (e != null && e.s > APPROACH) {
                s = Math.min(reach, NEAR * e.s);
                e = null;
            } else if (e != null && OVERSHOOT * e.s + MIN_STEP <= reach) {
                s = OVERSHOOT * e.s + MIN_STEP;
            } else {
                e = null;
            }
            double tNext = s >= room ? 1 : t + s;
            EquilibriumProblem next = tNext == 1 ? target : at(tNext);
            StateData stNext = tNext == 1 ? new StateData(next) : new StateData(next, first);
            Iterate pred = predict(it, dx, s, st, stNext);
            if (e != null) {
                e.apply(pred, st.system);
            }
            if (tNext == 1) {
                return new Prediction(pred, stNext);
            }
            NewtonKernel k = new NewtonKernel(stNext, next.totals(), loose);
            String f = new PhaseSelection(stNext, k, loose).withBudget(POINT_BUDGET).run(pred);
            iterations += k.iterations;
            if (f != null || iterations > BUDGET) {
                failure = f != null ? "at t = " + tNext + ": " + f : "more than " + BUDGET + " Newton iterations";
                return null;
            }
            it = pred;
            st = stNext;
            pr = next;
            t = tNext;
        }
        failure = "more than " + MAX_STEPS + " steps";
        return null;
    }

    private EquilibriumProblem at(double t) {
        double[] b = new double[b0.length];
        for (int j = 0; j < b.length; j++) {
            b[j] = b0[j] + t * (b1[j] - b0[j]);
        }
        return new EquilibriumProblem(target.system(), target.temperatureK(), target.pressureBar(), b);
    }

    /** dx/dt at a converged point, in the Newton unknowns (lambda, ln N_gas, u); null if singular. */
    private double[] tangent(NewtonKernel kernel, Iterate it, double[] b) {
        int m = b.length;
        int n = m + 1 + it.active.length;
        double[][] jac = new double[n][n];
        kernel.evaluate(it, new double[n], jac);
        double[] d = new double[n];
        for (int j = 0; j < m; j++) {
            d[j] = (b1[j] - b0[j]) / b[j];
        }
        return LinearSystem.solve(jac, d, n) ? d : null;
    }

    /** A predicted phase change at step s of t. */
    private record Event(int phase, boolean removes, double s) {
        /**
         * Removes the phase, or brings in a pure one at zero amount; a solution is left to the phase
         * selection, which may swap it for a nearly dependent pure phase (spinel beside picrochromite).
         */
        void apply(Iterate it, ChemicalSystem sys) {
            if (removes) {
                it.remove(it.indexOf(phase));
            } else if (sys.phaseKind(phase) == PhaseKind.PURE) {
                it.add(phase, 0.0);
            }
        }
    }

    /** The first change the linear prediction meets within {@code room}, or null. */
    private static Event firstEvent(StateData st, NewtonKernel kernel, Iterate it, double[] dx, double room) {
        ChemicalSystem sys = st.system;
        int m = sys.elementCount();
        Event first = null;
        for (int q = 0; q < it.active.length; q++) {
            double du = dx[m + 1 + q];
            double s = sys.phaseKind(it.active[q]) == PhaseKind.PURE
                    ? (du < 0 ? -it.u[q] / du : Double.POSITIVE_INFINITY)
                    : (du < 0 ? -1 / du : Double.POSITIVE_INFINITY);
            if (s < room && (first == null || s < first.s)) {
                first = new Event(it.active[q], true, Math.max(0, s));
            }
        }
        double[] end = new double[m];
        for (int j = 0; j < m; j++) {
            end[j] = it.lambda[j] + room * dx[j];
        }
        for (int p = 1; p < sys.phaseCount(); p++) {
            if (!st.available[p] || it.indexOf(p) >= 0) {
                continue;
            }
            double s1 = kernel.stability(p, end);
            if (!(s1 > 0)) {
                continue;
            }
            double s0 = Math.min(0, kernel.stability(p, it.lambda));
            double s = room * -s0 / (s1 - s0);
            if (first == null || s < first.s) {
                first = new Event(p, false, s);
            }
        }
        return first;
    }

    /** The largest |d/dt| of an element potential, ln N_gas or a solution's ln amount. */
    private static double largestChange(StateData st, Iterate it, double[] dx) {
        int m = st.system.elementCount();
        double big = 1e-300;
        for (int j = 0; j <= m; j++) {
            big = Math.max(big, Math.abs(dx[j]));
        }
        for (int q = 0; q < it.active.length; q++) {
            if (st.system.phaseKind(it.active[q]) == PhaseKind.SOLUTION) {
                big = Math.max(big, Math.abs(dx[m + 1 + q]));
            }
        }
        return big;
    }

    /** it + s dx, with the amounts carried from st's scales to next's. */
    private static Iterate predict(Iterate it, double[] dx, double s, StateData st, StateData next) {
        ChemicalSystem sys = st.system;
        int m = sys.elementCount();
        Iterate p = it.copy();
        for (int j = 0; j < m; j++) {
            p.lambda[j] += s * dx[j];
        }
        p.lnGas += s * dx[m];
        for (int q = 0; q < p.active.length; q++) {
            int ph = p.active[q];
            double u = it.u[q] + s * dx[m + 1 + q];
            p.u[q] = sys.phaseKind(ph) == PhaseKind.PURE
                    ? Math.max(0, u) * st.scale[ph] / next.scale[ph]
                    : u + Math.log(st.scale[ph] / next.scale[ph]);
        }
        return p;
    }
}
