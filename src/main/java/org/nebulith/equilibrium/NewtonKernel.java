package org.nebulith.equilibrium;

/**
 * Newton iteration of the element-potential method for a fixed set of active phases
 * (Gordon &amp; McBride 1994, NASA RP-1311, ch. 2, in the dual form of White, Johnson &amp; Dantzig
 * 1958). Unknowns: element potentials lambda_j, ln N_gas and the amounts of the active condensed
 * phases. Every mixture member (gas species or solution end-member) has the mole fraction
 * x = exp((a.lambda - c)/m), so trace species are computed, never iterated, and cannot underflow
 * the balance. Equations, each scaled to be dimensionless:
 * <ul>
 * <li>element balance of element j divided by its total b_j;</li>
 * <li>for each mixture phase: ln(sum of its mole fractions) = 0;</li>
 * <li>for each pure phase: a.lambda - G/RT = 0.</li>
 * </ul>
 * Steps are limited in lambda and damped by a backtracking line search on the residual norm.
 * This is the numerical kernel of the solver, kept in one place on purpose.
 */
final class NewtonKernel {
    private static final double MAX_EXP = 690;
    /** ln of the scaled amount below which a solution counts as vanishing (1e-30 of its maximum). */
    static final double VANISH_LN = Math.log(1e-30);
    /** ln of the scaled amount given to a solution when it is brought in. */
    static final double START_LN = Math.log(1e-6);
    private final StateData st;
    private final ChemicalSystem sys;
    private final double[] b;
    private final int m;
    private final SolverOptions opt;
    int iterations;
    /**
     * A gas species whose moles are below this fraction of the smallest total among its elements
     * adds nothing measurable to the Jacobian (its entries would be 1e-22 of the diagonal), so only
     * its residual contribution is kept: this skips most of the hundreds of trace gases per step.
     */
    static final double NEGLIGIBLE = 1e-22;
    private final double[] gasJacobianFloor;
    /**
     * A gas species whose moles are below this fraction of the smallest total among its elements
     * changes no sum of the Newton system by a representable amount (a relative 1e-30, where the
     * balances converge to 1e-12 and a double resolves 1e-16): its exponential is not even taken
     * during the iteration. The result computes every species' amount in full
     * ({@link ResultBuilder}), so the reported trace gases are unaffected.
     */
    static final double UNSEEN = 1e-30;
    /** Marks a member of {@link #lastX} left out of the latest sums (its mole fraction not computed). */
    static final double NOT_COMPUTED = -1;
    private final double[] gasLnSumFloor;
    /** mole fractions (not normalised) of the mixture members from the latest evaluation */
    final double[][] lastX;
    double lastBalance;
    double lastPotential;

    NewtonKernel(StateData st, double[] totals, SolverOptions opt) {
        this.st = st;
        this.sys = st.system;
        this.b = totals;
        this.m = sys.elementCount();
        this.opt = opt;
        this.lastX = new double[sys.phaseCount()][];
        this.gasJacobianFloor = st.gasJacobianFloor;
        this.gasLnSumFloor = st.gasLnSumFloor;
    }

    /** Mole fraction of member k of phase p (not normalised). */
    double x(int p, int k, double[] lambda) {
        double c = st.c[p][k];
        if (c == Double.POSITIVE_INFINITY) {
            return 0;
        }
        Constituent mem = sys.phase(p).members[k];
        double e = (mem.dot(lambda) - c) / mem.multiplicity;
        return Math.exp(Math.min(e, MAX_EXP));
    }

    /** ln of the sum of mole fractions of a mixture phase (its stability function). */
    double stability(int p, double[] lambda) {
        PhaseDef ph = sys.phase(p);
        if (ph.kind == PhaseKind.PURE) {
            return ph.members[0].dot(lambda) - st.c[p][0];
        }
        double max = Double.NEGATIVE_INFINITY;
        double[] e = new double[ph.members.length];
        for (int k = 0; k < e.length; k++) {
            double c = st.c[p][k];
            e[k] = c == Double.POSITIVE_INFINITY ? Double.NEGATIVE_INFINITY
                    : (ph.members[k].dot(lambda) - c) / ph.members[k].multiplicity;
            max = Math.max(max, e[k]);
        }
        if (max == Double.NEGATIVE_INFINITY) {
            return Double.NEGATIVE_INFINITY;
        }
        double s = 0;
        for (double v : e) {
            s += Math.exp(v - max);
        }
        return max + Math.log(s);
    }

    /**
     * Residuals into r (length m + 1 + active); returns 0.5 |r|^2, and fills jac if non-null.
     */
    double evaluate(Iterate it, double[] r, double[][] jac) {
        int n = m + 1 + it.active.length;
        if (jac != null) {
            for (int i = 0; i < n; i++) {
                java.util.Arrays.fill(jac[i], 0, n, 0.0);
            }
        }
        for (int j = 0; j < m; j++) {
            r[j] = -b[j];
        }
        double gasN = Math.exp(it.lnGas);
        r[m] = mixture(0, gasN, it.lambda, r, jac, m, m);
        for (int q = 0; q < it.active.length; q++) {
            int p = it.active[q];
            int row = m + 1 + q;
            if (sys.phase(p).kind == PhaseKind.PURE) {
                r[row] = pure(p, it.u[q] * st.scale[p], it.lambda, r, jac, row, q);
            } else {
                double amount = Math.exp(Math.min(it.u[q], MAX_EXP)) * st.scale[p];
                r[row] = mixture(p, amount, it.lambda, r, jac, row, row);
            }
        }
        double f = 0;
        for (int j = 0; j < m; j++) {
            r[j] /= b[j];
            if (jac != null) {
                for (int k = 0; k < n; k++) {
                    jac[j][k] /= b[j];
                }
            }
        }
        for (int i = 0; i < n; i++) {
            f += r[i] * r[i];
        }
        return 0.5 * f;
    }

    /** Adds a pure phase to the balances; returns its phase residual. */
    private double pure(int p, double amount, double[] lambda, double[] r, double[][] jac, int row, int q) {
        Constituent mem = sys.phase(p).members[0];
        for (int k = 0; k < mem.nzIndex.length; k++) {
            int j = mem.nzIndex[k];
            r[j] += amount * mem.nzCount[k];
            if (jac != null) {
                jac[j][m + 1 + q] += st.scale[p] * mem.nzCount[k];
                jac[row][j] = mem.nzCount[k];
            }
        }
        return mem.dot(lambda) - st.c[p][0];
    }

    /**
     * Adds a mixture phase (gas or solution) of total amount n to the balances and the Jacobian;
     * its amount variable is logarithmic, so column amountCol holds d/d(ln n). Returns ln(sum x).
     */
    private double mixture(int p, double n, double[] lambda, double[] r, double[][] jac, int row, int amountCol) {
        PhaseDef ph = sys.phase(p);
        double sum = 0;
        double colScale = n;
        double[] grad = jac == null ? null : jac[row];
        double[] xs = lastX[p];
        if (xs == null) {
            xs = new double[ph.members.length];
            lastX[p] = xs;
        }
        double[] cs = st.c[p];
        int[] start = ph.start;
        int[] idx = ph.index;
        double[] cnt = ph.count;
        double[] mult = ph.multiplicity;
        // in the gas, ln x below a species' limit means moles below its floor (UNSEEN)
        boolean gas = p == 0;
        double lnN = gas ? Math.log(n) : 0;
        for (int k = 0; k < xs.length; k++) {
            double c = cs[k];
            if (c == Double.POSITIVE_INFINITY) {
                xs[k] = 0;
                continue;
            }
            int from = start[k];
            int to = start[k + 1];
            double dot = 0;
            for (int a = from; a < to; a++) {
                dot += cnt[a] * lambda[idx[a]];
            }
            double lnX = (dot - c) / mult[k];
            if (gas && lnX + lnN < gasLnSumFloor[k]) {
                xs[k] = NOT_COMPUTED;
                continue;
            }
            double xk = Math.exp(Math.min(lnX, MAX_EXP));
            xs[k] = xk;
            if (xk == 0) {
                continue;
            }
            sum += xk;
            double nk = n * xk;
            double invM = 1.0 / mult[k];
            boolean negligible = p == 0 && nk < gasJacobianFloor[k];
            for (int a = from; a < to; a++) {
                int j = idx[a];
                r[j] += nk * cnt[a];
                if (jac != null && !negligible) {
                    double w = nk * cnt[a] * invM;
                    double[] rowj = jac[j];
                    for (int b = from; b < to; b++) {
                        rowj[idx[b]] += w * cnt[b];
                    }
                    rowj[amountCol] += colScale * xk * cnt[a];
                    grad[j] += xk * cnt[a] * invM;
                }
            }
        }
        if (sum == 0) {
            return -MAX_EXP;
        }
        if (jac != null) {
            for (int j = 0; j < m; j++) {
                grad[j] /= sum;
            }
        }
        return Math.log(sum);
    }

    /**
     * Consecutive steps cut below {@link #STALL_STEP} by the line search, each reducing 0.5 |r|^2 by
     * less than a factor {@link #STALL_DECREASE}, after which the iteration is abandoned as stalled:
     * the Newton system of an assemblage without a solution (a pure phase beside a solution whose
     * end-members combine to its formula, or an element left without a carrier) creeps with steps
     * of 1e-5 and would spend the whole iteration limit, with a dozen line-search trials each, before
     * the phase selection could swap or drop a phase. A stall whose residuals are at the rounding
     * level ({@link #stalledAtRounding}) counts as converged, as when the line search fails there.
     */
    static final int STALL_ITERATIONS = 4;
    /**
     * Largest residuals (balance, phase conditions) from which the next full Newton step is expected
     * to land within the tolerances, so that its trial is evaluated without the Jacobian (measured on
     * survey draws: 17 % fewer Jacobian evaluations for 20 % more residual-only ones, the same path).
     */
    static final double LIKELY_LAST_BALANCE = 1e-5;
    /** See {@link #LIKELY_LAST_BALANCE}. */
    static final double LIKELY_LAST_POTENTIAL = 1e-4;
    /** Step fraction below which a Newton step counts towards a stall. */
    static final double STALL_STEP = 1e-2;
    /** Reduction of 0.5 |r|^2 per step above which a step counts towards a stall. */
    static final double STALL_DECREASE = 0.9;

    /**
     * Iterates to convergence from it (modified in place).
     *
     * @return true when converged within the options' tolerances
     */
    boolean converge(Iterate it) {
        int n = m + 1 + it.active.length;
        double[] r = new double[n];
        double[] rTrial = new double[n];
        double[][] jac = new double[n][n];
        double[][] jacTrial = new double[n][n];
        double[] d = new double[n];
        // the trial point reuses two buffers, swapped with the iterate's arrays when it is accepted
        Iterate trial = new Iterate(new double[m], 0, it.active, new double[it.u.length]);
        double f = evaluate(it, r, jac);
        int stalled = 0;
        for (int iter = 0; iter < opt.maxNewtonIterations(); iter++) {
            if (converged(r, n)) {
                return true;
            }
            for (int i = 0; i < n; i++) {
                d[i] = -r[i];
            }
            if (!LinearSystem.solve(jac, d, n)) {
                return false;
            }
            iterations++;
            double alpha = stepLimit(d, it);
            double fTrial = Double.POSITIVE_INFINITY;
            // near the solution the full step usually lands within the tolerances, where its Jacobian
            // would never be used: that trial gets its residual only (the Jacobian follows if needed)
            boolean likelyLast = lastBalance <= LIKELY_LAST_BALANCE && lastPotential <= LIKELY_LAST_POTENTIAL;
            boolean withJacobian = false;
            int ls = 0;
            for (; ls < 40; ls++) {
                step(it, d, alpha, trial);
                // the first trial usually passes and gets its Jacobian with the residual; shorter
                // trials get the residual only, and the accepted one its Jacobian afterwards
                withJacobian = ls == 0 && !likelyLast;
                fTrial = evaluate(trial, rTrial, withJacobian ? jacTrial : null);
                if (fTrial <= (1 - 1e-4 * alpha) * f || fTrial < 1e-28) {
                    break;
                }
                alpha *= 0.5;
            }
            if (!(fTrial < f) && !(fTrial < 1e-28)) {
                evaluate(it, r, jac);
                return converged(r, n) || stalledAtRounding();
            }
            if (!withJacobian) {
                if (ls == 0 && converged(rTrial, n)) {
                    copyInto(trial, it);
                    return vanishing(it) < 0;
                }
                fTrial = evaluate(trial, rTrial, jacTrial);
            }
            stalled = alpha < STALL_STEP && fTrial > STALL_DECREASE * f ? stalled + 1 : 0;
            if (stalled >= STALL_ITERATIONS) {
                copyInto(trial, it);
                // a creep at the rounding level within the conservation limit is convergence
                return converged(rTrial, n) || stalledAtRounding();
            }
            copyInto(trial, it);
            if (vanishing(it) >= 0) {
                return false;
            }
            double[] tr = r;
            r = rTrial;
            rTrial = tr;
            double[][] tj = jac;
            jac = jacTrial;
            jacTrial = tj;
            f = fTrial;
        }
        return converged(r, n);
    }

    /**
     * @return the active index of a solution whose amount fell below {@link #VANISH_LN} of its
     *         scale (it is driven towards zero: unstable), or -1
     */
    int vanishing(Iterate it) {
        for (int q = 0; q < it.active.length; q++) {
            if (sys.phase(it.active[q]).kind == PhaseKind.SOLUTION && it.u[q] < VANISH_LN) {
                return q;
            }
        }
        return -1;
    }

    /**
     * After {@link #converged} found the residuals above the tolerances: true if the line search can
     * no longer reduce them only because they are at the rounding level of an ill-conditioned
     * system (the balances within the conservation limit {@link ResultChecks#BALANCE_LIMIT}, the
     * phase conditions within their tolerance), which is accepted as converged.
     */
    private boolean stalledAtRounding() {
        return lastBalance <= ResultChecks.BALANCE_LIMIT && lastPotential <= opt.potentialTolerance();
    }

    private boolean converged(double[] r, int n) {
        double bal = 0;
        for (int j = 0; j < m; j++) {
            bal = Math.max(bal, Math.abs(r[j]));
        }
        double pot = 0;
        for (int i = m; i < n; i++) {
            pot = Math.max(pot, Math.abs(r[i]));
        }
        lastBalance = bal;
        lastPotential = pot;
        return bal <= opt.balanceTolerance() && pot <= opt.potentialTolerance();
    }

    private double stepLimit(double[] d, Iterate it) {
        double big = 0;
        for (int j = 0; j <= m; j++) {
            big = Math.max(big, Math.abs(d[j]));
        }
        for (int q = 0; q < it.active.length; q++) {
            if (sys.phase(it.active[q]).kind == PhaseKind.SOLUTION) {
                big = Math.max(big, Math.abs(d[m + 1 + q]));
            }
        }
        return big > opt.maxPotentialStep() ? opt.maxPotentialStep() / big : 1.0;
    }

    /** Writes it + alpha d into t (same active phases). */
    private void step(Iterate it, double[] d, double alpha, Iterate t) {
        for (int j = 0; j < m; j++) {
            t.lambda[j] = it.lambda[j] + alpha * d[j];
        }
        t.lnGas = it.lnGas + alpha * d[m];
        for (int q = 0; q < t.u.length; q++) {
            t.u[q] = it.u[q] + alpha * d[m + 1 + q];
        }
    }

    /** Makes the accepted trial the iterate; the iterate's former arrays become the trial's buffers. */
    private static void copyInto(Iterate from, Iterate to) {
        double[] l = to.lambda;
        to.lambda = from.lambda;
        from.lambda = l;
        double[] u = to.u;
        to.u = from.u;
        from.u = u;
        to.lnGas = from.lnGas;
    }
}
