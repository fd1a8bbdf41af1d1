package org.nebulith.equilibrium;

import java.util.ArrayList;
import java.util.List;

/**
 * The globally convergent path of the solver: a log-barrier interior-point method on the dual of
 * the Gibbs minimisation, which carries every available phase at once and needs no phase
 * selection.
 *
 * <p>For an ideal gas, pure phases and ideal solutions, the minimum of G/RT subject to the element
 * balances A n = b equals the maximum of b.lambda over the element potentials lambda subject to one
 * convex constraint per phase (the dual of White, Johnson &amp; Dantzig 1958; Boyd &amp; Vandenberghe
 * 2004, sec. 5.2): g = a.lambda - G/RT &lt;= 0 for a pure phase, and g = ln sum_k exp((a_k.lambda -
 * c_k)/m_k) &lt;= 0 for the gas and each solution (its stability function). The amount of each
 * phase is the Lagrange multiplier of its constraint. The barrier problem
 * min -b.lambda - mu sum ln(-g) is smooth and strictly convex in the m element potentials, so
 * Newton's method with a backtracking line search converges from any strictly feasible start
 * (Nocedal &amp; Wright 2006, ch. 19; Boyd &amp; Vandenberghe 2004, ch. 11); every phase then holds
 * mu / (-g) > 0, the central path. mu is reduced in stages until present and absent phases are
 * told apart; the caller polishes the result with the active-set Newton method
 * ({@link PhaseSelection}), which gives the exact equilibrium.
 */
final class InteriorPoint {
    /** Barrier weight of the first stage, relative to the total amount of elements. */
    private static final double MU_START = 1.0;

    /**
     * Path-following settings.
     *
     * @param muEnd          barrier weight of the last stage
     * @param muFactor       reduction of the weight per stage (squared after a stage of at most two steps)
     * @param maxInner       Newton steps per stage
     * @param decrement      inner stopping test: squared Newton decrement per unit of weight
     * @param regularisation added to the unit diagonal of the scaled Hessian
     * @param maxStep        largest change of a potential per step [RT]
     * @param maxIterations  Newton steps over all stages before giving up
     */
    record Settings(double muEnd, double muFactor, int maxInner, double decrement, double regularisation, double maxStep,
                    int maxIterations) {
    }

    /** Few, long stages with loose centring: the first try. */
    static final Settings FAST = new Settings(1e-10, 0.02, 10, 1e-3, 1e-9, 50, 300);
    /**
     * Short stages centred tightly, to a smaller last weight: slower, but it follows the path where
     * the first try, on badly scaled low-temperature states, stalls.
     */
    static final Settings CAREFUL = new Settings(1e-12, 0.1, 60, 1e-8, 1e-13, 1e4, 2000);

    private final StateData st;
    private final ChemicalSystem sys;
    private final int m;
    /** element totals normalised to sum 1 */
    private final double[] bn;
    private final double total;
    /** phases carried (gas first), each available at the state */
    private final int[] phases;
    /**
     * barrier weight of each phase: its largest possible amount relative to the total, so that on
     * the central path every phase holds mu / (-g) of its largest amount, whatever the element
     */
    private final double[] weight;
    private final double[] g;
    private final double[][] grad;
    /** the non-zero entries of one constraint gradient (work array of {@link #evaluate}) */
    private final int[] nz;
    int iterations;
    /** why {@link #solve} returned null */
    String failure = "";

    private final Settings set;

    InteriorPoint(StateData st, double[] totals, Settings set) {
        this.set = set;
        this.st = st;
        this.sys = st.system;
        this.m = sys.elementCount();
        double s = 0;
        for (double v : totals) {
            s += v;
        }
        this.total = s;
        this.bn = new double[m];
        for (int j = 0; j < m; j++) {
            bn[j] = totals[j] / s;
        }
        List<Integer> ps = new ArrayList<>();
        for (int p = 0; p < sys.phaseCount(); p++) {
            if (p == 0 || st.available[p]) {
                ps.add(p);
            }
        }
        phases = ps.stream().mapToInt(Integer::intValue).toArray();
        weight = new double[phases.length];
        for (int i = 0; i < phases.length; i++) {
            weight[i] = i == 0 ? 1.0 : st.scale[phases[i]] / s;
        }
        g = new double[phases.length];
        grad = new double[phases.length][m];
        nz = new int[m];
        for (int i = 0; i < phases.length; i++) {
            PhaseDef ph = sys.phase(phases[i]);
            if (ph.kind == PhaseKind.PURE) {
                // a pure phase's constraint is linear: its gradient is its stoichiometry, set once
                Constituent c = ph.members[0];
                for (int k = 0; k < c.nzIndex.length; k++) {
                    grad[i][c.nzIndex[k]] = c.nzCount[k];
                }
            }
        }
    }

    /**
     * Follows the central path from a feasible point below {@code start}'s potentials down to a
     * small barrier weight.
     *
     * @param startLambda element potentials to start near (shifted down until strictly feasible)
     * @return the iterate at the end of the path (active phases: those that hold a significant
     *         amount), or null if the iteration failed
     */
    Iterate solve(double[] startLambda) {
        double[] lambda = feasibleStart(startLambda);
        double[] bound = feasibleStart(boundStart());
        if (lambda == null || (bound != null && value(bound, MU_START) < value(lambda, MU_START))) {
            lambda = bound;
        }
        if (lambda == null) {
            failure = "no strictly feasible start";
            return null;
        }
        double[][] h = new double[m][m];
        double[] gr = new double[m];
        double[] d = new double[m];
        double mu = MU_START;
        while (true) {
            int inner = 0;
            while (true) {
                if (++iterations > set.maxIterations()) {
                    failure = "more than " + set.maxIterations() + " interior-point iterations (barrier weight " + mu + ")";
                    return null;
                }
                double f = evaluate(lambda, mu, gr, h);
                if (!Double.isFinite(f) || !newtonStep(h, gr, d)) {
                    failure = "singular barrier Hessian at barrier weight " + mu;
                    return null;
                }
                double dec = 0;
                for (int j = 0; j < m; j++) {
                    dec -= gr[j] * d[j];
                }
                if (dec <= set.decrement() * mu || dec <= 1e-13 * (1 + Math.abs(f)) || ++inner > set.maxInner()) {
                    break;
                }
                double[] next = lineSearch(lambda, d, f, dec, mu);
                if (next == null) {
                    break;
                }
                lambda = next;
            }
            if (mu <= set.muEnd()) {
                break;
            }
            // a stage that needed at most two steps was close to the path: take a longer step along it
            mu = Math.max(set.muEnd(), mu * (inner <= 2 ? set.muFactor() * set.muFactor() : set.muFactor()));
        }
        evaluate(lambda, mu, null, null);
        return toIterate(lambda, mu);
    }

    private double[] feasibleStart(double[] start) {
        double[] lambda = start.clone();
        for (int attempt = 0; attempt < 60; attempt++) {
            constraints(lambda);
            double shift = 0;
            for (int i = 0; i < phases.length; i++) {
                if (!(g[i] < -1)) {
                    double rate = shiftRate(phases[i]);
                    shift = Math.max(shift, Double.isFinite(g[i]) ? (g[i] + 2) / rate : 50 / rate);
                }
            }
            if (shift == 0) {
                return lambda;
            }
            for (int j = 0; j < m; j++) {
                lambda[j] -= shift;
            }
        }
        return null;
    }

    /**
     * A start below every constraint: lambda_j = min over the members k that contain element j of
     * c_k / atoms_k, so that a_k.lambda &lt;= c_k for every member (each feasible on its own).
     */
    private double[] boundStart() {
        double[] lambda = new double[m];
        java.util.Arrays.fill(lambda, Double.POSITIVE_INFINITY);
        for (int p : phases) {
            PhaseDef ph = sys.phase(p);
            for (int k = 0; k < ph.members.length; k++) {
                double c = st.c[p][k];
                if (c == Double.POSITIVE_INFINITY) {
                    continue;
                }
                Constituent mem = ph.members[k];
                for (int j : mem.nzIndex) {
                    lambda[j] = Math.min(lambda[j], c / mem.atoms);
                }
            }
        }
        return lambda;
    }

    /** How fast the constraint of phase p falls when every potential falls by 1 (at least). */
    private double shiftRate(int p) {
        double r = Double.POSITIVE_INFINITY;
        for (Constituent c : sys.phase(p).members) {
            r = Math.min(r, c.atoms / c.multiplicity);
        }
        return r;
    }

    /** Fills g and grad (the constraints and their gradients). */
    private void constraints(double[] lambda) {
        for (int i = 0; i < phases.length; i++) {
            g[i] = constraint(i, lambda, null, 0, true);
        }
    }

    /**
     * Constraint i at lambda, its gradient into grad[i] (skipped, for a solution or the gas, when
     * neither {@code gradient} nor h is asked for); with h non-null and the constraint
     * strictly satisfied, adds nu = mu / (-g) times the first part of its Hessian,
     * sum_k z_k w_k w_k^T with w_k = a_k / m_k and z_k the normalised member weights (the rank-one
     * part -grad grad^T is added by the caller).
     */
    private double constraint(int i, double[] lambda, double[][] h, double mu, boolean gradient) {
        int p = phases[i];
        PhaseDef ph = sys.phase(p);
        if (ph.kind == PhaseKind.PURE) {
            return ph.members[0].dot(lambda) - st.c[p][0];
        }
        double[] gi = grad[i];
        java.util.Arrays.fill(gi, 0);
        Constituent[] mem = ph.members;
        double[] cs = st.c[p];
        double[] e = work(mem.length);
        double max = Double.NEGATIVE_INFINITY;
        for (int k = 0; k < mem.length; k++) {
            e[k] = cs[k] == Double.POSITIVE_INFINITY ? Double.NEGATIVE_INFINITY
                    : (mem[k].dot(lambda) - cs[k]) / mem[k].multiplicity;
            max = Math.max(max, e[k]);
        }
        if (max == Double.NEGATIVE_INFINITY) {
            return Double.NEGATIVE_INFINITY;
        }
        double sum = 0;
        for (int k = 0; k < mem.length; k++) {
            double y = e[k] - max < -690 ? 0 : Math.exp(e[k] - max);
            e[k] = y;
            sum += y;
        }
        double gv = max + Math.log(sum);
        if (!gradient && h == null) {
            return gv;
        }
        double nu = h != null && gv < 0 ? mu * weight[i] / -gv : 0;
        for (int k = 0; k < mem.length; k++) {
            double z = e[k] / sum;
            if (z == 0) {
                continue;
            }
            Constituent c = mem[k];
            double inv = 1.0 / c.multiplicity;
            for (int a = 0; a < c.nzIndex.length; a++) {
                gi[c.nzIndex[a]] += z * c.nzCount[a] * inv;
            }
            if (nu > 0) {
                double wz = nu * z * inv * inv;
                for (int a = 0; a < c.nzIndex.length; a++) {
                    double[] row = h[c.nzIndex[a]];
                    double va = wz * c.nzCount[a];
                    for (int q = 0; q < c.nzIndex.length; q++) {
                        row[c.nzIndex[q]] += va * c.nzCount[q];
                    }
                }
            }
        }
        return gv;
    }

    private double[] work = new double[0];

    private double[] work(int n) {
        if (work.length < n) {
            work = new double[n];
        }
        return work;
    }

    /** whether {@link #evaluate} fills the constraint gradients (not needed for the objective alone) */
    private boolean gradients = true;

    /**
     * The barrier objective alone at lambda (line search, choice of the start): the same value as
     * {@link #evaluate}, without the constraint gradients.
     */
    private double value(double[] lambda, double mu) {
        gradients = false;
        try {
            return evaluate(lambda, mu, null, null);
        } finally {
            gradients = true;
        }
    }

    /**
     * Barrier objective at lambda; with gr and h non-null, fills its gradient and Hessian.
     *
     * @return f, or +infinity if lambda is not strictly feasible
     */
    private double evaluate(double[] lambda, double mu, double[] gr, double[][] h) {
        double f = 0;
        for (int j = 0; j < m; j++) {
            f -= bn[j] * lambda[j];
        }
        if (gr != null) {
            for (int j = 0; j < m; j++) {
                gr[j] = -bn[j];
                java.util.Arrays.fill(h[j], 0);
            }
        }
        for (int i = 0; i < phases.length; i++) {
            boolean mixture = sys.phase(phases[i]).kind != PhaseKind.PURE;
            double gi = constraint(i, lambda, h, mu, gradients);
            g[i] = gi;
            if (!(gi < 0)) {
                return Double.POSITIVE_INFINITY;
            }
            f -= mu * weight[i] * Math.log(-gi);
            if (gr != null) {
                double nu = mu * weight[i] / -gi;
                double[] gv = grad[i];
                double rank = nu / -gi - (mixture ? nu : 0);
                int count = 0;
                for (int j = 0; j < m; j++) {
                    if (gv[j] != 0) {
                        nz[count++] = j;
                    }
                }
                for (int a = 0; a < count; a++) {
                    int j = nz[a];
                    gr[j] += nu * gv[j];
                    double[] row = h[j];
                    double v = rank * gv[j];
                    for (int b = 0; b < count; b++) {
                        int l = nz[b];
                        row[l] += v * gv[l];
                    }
                }
            }
        }
        return f;
    }

    private boolean newtonStep(double[][] h, double[] gr, double[] d) {
        double[][] a = new double[m][m];
        double[] scale = new double[m];
        for (int j = 0; j < m; j++) {
            scale[j] = h[j][j] > 0 ? 1.0 / Math.sqrt(h[j][j]) : 1.0;
        }
        for (int j = 0; j < m; j++) {
            for (int l = 0; l < m; l++) {
                a[j][l] = h[j][l] * scale[j] * scale[l];
            }
            a[j][j] += set.regularisation();
            d[j] = -gr[j] * scale[j];
        }
        if (!LinearSystem.solve(a, d, m)) {
            return false;
        }
        for (int j = 0; j < m; j++) {
            d[j] *= scale[j];
        }
        return true;
    }

    /**
     * A step length beyond which the step d from the current point certainly leaves the feasible
     * set: every constraint is convex, so g(lambda + alpha d) &gt;= g + alpha grad.d, which is
     * &gt;= 0 from alpha = -g / grad.d on (exact for pure phases). Uses g and grad of the latest
     * evaluation with gradients (at the current point), with a margin for rounding.
     */
    private double boundaryReach(double[] d) {
        double reach = Double.POSITIVE_INFINITY;
        for (int i = 0; i < phases.length; i++) {
            double slope = 0;
            double[] gv = grad[i];
            for (int j = 0; j < m; j++) {
                slope += gv[j] * d[j];
            }
            if (slope > 0) {
                reach = Math.min(reach, -g[i] / slope);
            }
        }
        return reach * (1 + 1e-6) + 1e-300;
    }

    private double[] lineSearch(double[] lambda, double[] d, double f, double dec, double mu) {
        double alpha = 1;
        double big = 0;
        for (double v : d) {
            big = Math.max(big, Math.abs(v));
        }
        if (big > set.maxStep()) {
            alpha = set.maxStep() / big;
        }
        double[] t = new double[m];
        double reach = boundaryReach(d);
        for (int ls = 0; ls < 60; ls++) {
            if (alpha > reach) {
                alpha *= 0.5; // certainly infeasible: the trial would return +infinity
                continue;
            }
            for (int j = 0; j < m; j++) {
                t[j] = lambda[j] + alpha * d[j];
            }
            double ft = value(t, mu);
            if (ft <= f - 1e-4 * alpha * dec) {
                return t;
            }
            alpha *= 0.5;
        }
        return null;
    }

    /**
     * The end of the path as a start of the active-set method. A phase counts as present when its
     * slack is small or it holds a significant share of its largest amount; the present phases are
     * then taken in order of decreasing share, keeping only those whose constraint gradient (for a
     * pure phase its stoichiometry, for the gas or a solution the composition at the current
     * potentials) is linearly independent of the gradients already kept. This is the phase rule
     * with solutions included: a dependent phase would make the Newton system of the polish
     * singular, and its amount is taken up by the phases it depends on.
     */
    private Iterate toIterate(double[] lambda, double mu) {
        double lnGas = Math.log(mu * weight[0] / -g[0] * total);
        List<Integer> cand = new ArrayList<>();
        double[] share = new double[phases.length];
        for (int i = 1; i < phases.length; i++) {
            share[i] = mu / -g[i];
            if (-g[i] < 1e-4 || share[i] > 1e-6) {
                cand.add(i);
            }
        }
        cand.sort((x, y) -> Double.compare(share[y], share[x]));
        List<double[]> basis = new ArrayList<>();
        independent(grad[0], basis);
        List<Integer> act = new ArrayList<>();
        List<Double> amt = new ArrayList<>();
        for (int i : cand) {
            if (!independent(grad[i], basis)) {
                continue;
            }
            int p = phases[i];
            double moles = mu * weight[i] / -g[i] * total;
            PhaseDef ph = sys.phase(p);
            boolean solution = ph.kind == PhaseKind.SOLUTION;
            if (solution) {
                moles /= ph.members[0].multiplicity;
            }
            act.add(p);
            amt.add(solution ? Math.log(moles / st.scale[p]) : moles / st.scale[p]);
        }
        return new Iterate(lambda.clone(), lnGas, act.stream().mapToInt(Integer::intValue).toArray(),
                amt.stream().mapToDouble(Double::doubleValue).toArray());
    }

    /**
     * Gram-Schmidt step: true (and v's orthonormal remainder added to the basis) if v is not a
     * combination of the basis to 1e-7 of its norm.
     */
    private static boolean independent(double[] v, List<double[]> basis) {
        double[] r = v.clone();
        double norm = 0;
        for (double x : r) {
            norm += x * x;
        }
        norm = Math.sqrt(norm);
        for (int pass = 0; pass < 2; pass++) {
            for (double[] q : basis) {
                double d = 0;
                for (int j = 0; j < r.length; j++) {
                    d += r[j] * q[j];
                }
                for (int j = 0; j < r.length; j++) {
                    r[j] -= d * q[j];
                }
            }
        }
        double rest = 0;
        for (double x : r) {
            rest += x * x;
        }
        rest = Math.sqrt(rest);
        if (!(rest > 1e-7 * norm)) {
            return false;
        }
        for (int j = 0; j < r.length; j++) {
            r[j] /= rest;
        }
        basis.add(r);
        return true;
    }
}
