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
    private static final double NEGLIGIBLE = 1e-22;
    private final double[] gasJacobianFloor;
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
        PhaseDef gas = sys.phase(0);
        this.gasJacobianFloor = new double[gas.members.length];
        for (int k = 0; k < gasJacobianFloor.length; k++) {
            double bmin = Double.POSITIVE_INFINITY;
            for (int j : gas.members[k].nzIndex) {
                bmin = Math.min(bmin, totals[j]);
            }
            gasJacobianFloor[k] = NEGLIGIBLE * bmin;
        }
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
        for (int k = 0; k < ph.members.length; k++) {
            double xk = x(p, k, lambda);
            xs[k] = xk;
            if (xk == 0) {
                continue;
            }
            sum += xk;
            Constituent mem = ph.members[k];
            double nk = n * xk;
            int[] idx = mem.nzIndex;
            double[] cnt = mem.nzCount;
            double invM = 1.0 / mem.multiplicity;
            boolean negligible = p == 0 && nk < gasJacobianFloor[k];
            for (int a = 0; a < idx.length; a++) {
                int j = idx[a];
                r[j] += nk * cnt[a];
                if (jac != null && !negligible) {
                    double w = nk * cnt[a] * invM;
                    double[] rowj = jac[j];
                    for (int c = 0; c < idx.length; c++) {
                        rowj[idx[c]] += w * cnt[c];
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
        double f = evaluate(it, r, jac);
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
            Iterate trial = null;
            double fTrial = Double.POSITIVE_INFINITY;
            for (int ls = 0; ls < 40; ls++) {
                trial = step(it, d, alpha);
                fTrial = evaluate(trial, rTrial, jacTrial);
                if (fTrial <= (1 - 1e-4 * alpha) * f || fTrial < 1e-28) {
                    break;
                }
                alpha *= 0.5;
            }
            if (!(fTrial < f) && !(fTrial < 1e-28)) {
                evaluate(it, r, jac);
                return converged(r, n) || stalledAtRounding();
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

    private Iterate step(Iterate it, double[] d, double alpha) {
        Iterate t = it.copy();
        for (int j = 0; j < m; j++) {
            t.lambda[j] += alpha * d[j];
        }
        t.lnGas += alpha * d[m];
        for (int q = 0; q < t.u.length; q++) {
            t.u[q] += alpha * d[m + 1 + q];
        }
        return t;
    }

    private static void copyInto(Iterate from, Iterate to) {
        to.lambda = from.lambda;
        to.lnGas = from.lnGas;
        to.u = from.u;
    }
}
