package org.nebulith.equilibrium;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;

/**
 * The phase-selection loop around {@link NewtonKernel}: drop the phase with the most negative
 * amount; otherwise bring in the absent phase with the largest driving force per atom, exchanging
 * it for a present pure phase when its stoichiometry is a combination of theirs (the phase rule);
 * undo an addition whose Newton solve fails and try the next candidate.
 */
final class PhaseSelection {
    private final StateData st;
    private final NewtonKernel kernel;
    private final SolverOptions opt;
    private final ChemicalSystem sys;
    int changes;
    /**
     * Newton iterations one attempt may spend; beyond it the solver switches to a continuation in
     * small steps, which costs less than a long search from a distant start.
     */
    static final int ITERATION_BUDGET = 300;
    /**
     * Budget of a warm start from another composition: a search longer than this is a sign that the
     * assemblage changes a lot (in the survey's draws: orthopyroxene and rutile giving way to
     * nepheline and titanite), which the interior-point path settles in fewer steps than the search
     * or a continuation in composition would. Of the warm starts of survey draws that succeed,
     * nearly all take fewer than 15 Newton steps.
     */
    static final int OTHER_COMPOSITION_BUDGET = 20;
    /** smallest affinity per atom of an absent available phase at the end of the last scan [RT] */
    double minAffinity;
    String minAffinityPhase = "";

    private int budget = ITERATION_BUDGET;
    private boolean dropAfterFailure = true;

    /**
     * The short attempt of a warm start from another composition: at most
     * {@link #OTHER_COMPOSITION_BUDGET} Newton iterations, and a Newton failure that no addition
     * explains ends it (no small solution is dropped to go on). Such a failure means that the
     * assemblage changes (an element is left without a carrier once a solution has vanished); the
     * search from there crawled with line-search steps of a few hundredths and mostly ran out of
     * budget anyway, after which the interior-point path settles the state (measured on survey
     * draws: a tenth fewer Newton evaluations per draw).
     *
     * @return this
     */
    PhaseSelection forOtherComposition() {
        this.budget = OTHER_COMPOSITION_BUDGET;
        this.dropAfterFailure = false;
        return this;
    }

    /**
     * @param newtonIterations Newton iterations this search may spend
     * @return this
     */
    PhaseSelection withBudget(int newtonIterations) {
        this.budget = newtonIterations;
        return this;
    }

    PhaseSelection(StateData st, NewtonKernel kernel, SolverOptions opt) {
        this.st = st;
        this.kernel = kernel;
        this.opt = opt;
        this.sys = st.system;
    }

    /** @return null on success, else what failed */
    String run(Iterate it) {
        Set<Integer> blocked = new HashSet<>();
        Set<List<Integer>> settled = new HashSet<>();
        Set<String> visited = new HashSet<>();
        Iterate backup = null;
        int lastAdded = -1;
        while (changes <= opt.maxPhaseChanges()) {
            if (kernel.iterations > budget) {
                return "phase selection used more than " + budget + " Newton iterations (phases "
                        + names(it) + ")";
            }
            if (!visited.add(key(it)) && lastAdded >= 0 && backup != null) {
                // this addition leads back to an assemblage already tried: a cycle between nearly
                // degenerate phases; keep the earlier assemblage and stop offering this phase
                restore(backup, it);
                blocked.add(lastAdded);
                lastAdded = -1;
                changes++;
                continue;
            }
            boolean ok = kernel.converge(it);
            int vanished = kernel.vanishing(it);
            if (vanished >= 0) {
                it.remove(vanished);
                changes++;
                lastAdded = -1;
                blocked.clear();
                continue;
            }
            if (!ok) {
                if (lastAdded >= 0 && backup != null) {
                    changes++;
                    if (!swapIn(lastAdded, backup, it)) {
                        restore(backup, it);
                        blocked.add(lastAdded);
                    }
                    lastAdded = -1;
                    continue;
                }
                int weakest = dropAfterFailure ? smallestSolution(it) : -1;
                if (weakest >= 0) {
                    it.remove(weakest);
                    changes++;
                    continue;
                }
                return String.format(java.util.Locale.ROOT,
                        "Newton iteration did not converge with phases %s (balance residual %.3g, potential residual %.3g)",
                        names(it), kernel.lastBalance, kernel.lastPotential);
            }
            int worst = mostNegative(it);
            if (worst >= 0) {
                it.remove(worst);
                changes++;
                lastAdded = -1;
                blocked.clear();
                continue;
            }
            int cand = mostSupersaturated(it, blocked);
            if (cand < 0) {
                return null;
            }
            if (!settled.add(situation(it, blocked))) {
                // the Newton solution of an assemblage is unique: meeting it again with the same
                // blocked candidates means the same choices and the same cycle would follow, so
                // give up now rather than after maxPhaseChanges (the caller then takes a smaller
                // continuation step, or starts cold)
                return "phase selection cycles: the assemblage " + names(it) + " recurred with "
                        + sys.phaseName(cand) + " supersaturated";
            }
            backup = it.copy();
            if (sys.phaseKind(cand) == PhaseKind.SOLUTION) {
                if (!replaceDependent(it, cand)) {
                    it.add(cand, NewtonKernel.START_LN);
                }
            } else if (!exchange(it, cand)) {
                it.add(cand, 0.0);
            }
            lastAdded = cand;
            changes++;
        }
        return "phase selection did not settle after " + opt.maxPhaseChanges() + " changes (phases " + names(it) + ")";
    }

    private static String key(Iterate it) {
        int[] a = it.active.clone();
        Arrays.sort(a);
        return Arrays.toString(a);
    }

    private static void restore(Iterate from, Iterate to) {
        to.lambda = from.lambda.clone();
        to.lnGas = from.lnGas;
        to.active = from.active.clone();
        to.u = from.u.clone();
    }

    private int mostNegative(Iterate it) {
        int worst = -1;
        double wv = 0;
        for (int q = 0; q < it.u.length; q++) {
            if (sys.phaseKind(it.active[q]) == PhaseKind.PURE && it.u[q] < wv) {
                wv = it.u[q];
                worst = q;
            }
        }
        return worst;
    }

    /**
     * A phase whose addition made the Newton system fail is often nearly dependent on a present
     * phase (a solution taking over from its pure end-member at a polymorph change): tries to
     * replace each of the most similar present phases by it. The swap that the reaction really makes
     * removes the phase it exhausts, so the first swap that converges with every pure amount
     * non-negative is kept; failing that, the first that converges (the next steps then drop the
     * negative phase). Taking the most similar phase regardless can remove a phase that stays
     * stable (diopside when titanite replaces rutile beside orthopyroxene), and the assemblage
     * left after the negative one is dropped may have no Newton solution.
     *
     * @return true if a swap succeeded (it then holds the new state)
     */
    private boolean swapIn(int cand, Iterate backup, Iterate it) {
        double[] target = dominantStoichiometry(cand, backup.lambda);
        Integer[] order = new Integer[backup.active.length];
        double[] sim = new double[backup.active.length];
        for (int q = 0; q < order.length; q++) {
            order[q] = q;
            sim[q] = cosine(target, dominantStoichiometry(backup.active[q], backup.lambda));
        }
        Arrays.sort(order, (a, b) -> Double.compare(sim[b], sim[a]));
        Iterate fallback = null;
        for (int i = 0; i < Math.min(SWAP_TRIALS, order.length); i++) {
            if (sim[order[i]] <= 0) {
                break;
            }
            Iterate trial = backup.copy();
            trial.remove(order[i]);
            trial.add(cand, sys.phaseKind(cand) == PhaseKind.SOLUTION ? NewtonKernel.START_LN : 0.0);
            if (kernel.converge(trial) && kernel.vanishing(trial) < 0) {
                if (mostNegative(trial) < 0) {
                    restore(trial, it);
                    return true;
                }
                if (fallback == null) {
                    fallback = trial;
                }
            }
        }
        if (fallback != null) {
            restore(fallback, it);
            return true;
        }
        return false;
    }

    /**
     * A solution brought in beside a present pure phase whose formula is a combination of the
     * solution's end-members (picrochromite MgCr2O4 = spinel + chromite - hercynite) makes the Newton
     * system nearly singular: it creeps until the stall test ends it, and the swap that follows
     * ({@link #swapIn}) is what the reaction does anyway. So the swap is made at once: the pure phase
     * leaves, and the solution starts with its amount in formula units.
     *
     * @return true if a dependent pure phase was replaced by the solution
     */
    private boolean replaceDependent(Iterate it, int solution) {
        Constituent[] members = sys.phase(solution).members;
        int valid = 0;
        double[][] basis = new double[members.length][];
        for (int k = 0; k < members.length; k++) {
            if (st.c[solution][k] != Double.POSITIVE_INFINITY) {
                basis[valid++] = members[k].a;
            }
        }
        for (int q = 0; q < it.active.length; q++) {
            int p = it.active[q];
            if (sys.phaseKind(p) == PhaseKind.PURE && spanCoefficients(basis, valid, sys.phase(p).members[0].a) != null) {
                double moles = it.u[q] * st.scale[p];
                it.remove(q);
                it.add(solution, moles > 0 ? Math.log(moles / st.scale[solution]) : NewtonKernel.START_LN);
                return true;
            }
        }
        return false;
    }

    /**
     * Least-squares coefficients c with sum c_i basis_i = target over the first n rows of basis, or
     * null if target is not their combination (residual above 1e-9 of its norm).
     */
    private static double[] spanCoefficients(double[][] basis, int n, double[] target) {
        if (n == 0) {
            return null;
        }
        double[][] g = new double[n][n];
        double[] rhs = new double[n];
        for (int i = 0; i < n; i++) {
            for (int l = 0; l < n; l++) {
                g[i][l] = dot(basis[i], basis[l]);
            }
            rhs[i] = dot(basis[i], target);
        }
        if (!LinearSystem.solve(g, rhs, n)) {
            return null;
        }
        double res = 0;
        for (int j = 0; j < target.length; j++) {
            double v = target[j];
            for (int i = 0; i < n; i++) {
                v -= rhs[i] * basis[i][j];
            }
            res += v * v;
        }
        return res <= 1e-18 * dot(target, target) ? rhs : null;
    }

    private static double dot(double[] a, double[] b) {
        double s = 0;
        for (int j = 0; j < a.length; j++) {
            s += a[j] * b[j];
        }
        return s;
    }

    /** How many of the most similar present phases {@link #swapIn} tries to replace. */
    private static final int SWAP_TRIALS = 3;

    private double[] dominantStoichiometry(int p, double[] lambda) {
        PhaseDef ph = sys.phase(p);
        int best = 0;
        double bv = Double.NEGATIVE_INFINITY;
        for (int k = 0; k < ph.members.length; k++) {
            double c = st.c[p][k];
            double v = c == Double.POSITIVE_INFINITY ? Double.NEGATIVE_INFINITY
                    : (ph.members[k].dot(lambda) - c) / ph.members[k].multiplicity;
            if (v > bv) {
                bv = v;
                best = k;
            }
        }
        return ph.members[best].a;
    }

    private static double cosine(double[] a, double[] b) {
        double ab = 0;
        double aa = 0;
        double bb = 0;
        for (int j = 0; j < a.length; j++) {
            ab += a[j] * b[j];
            aa += a[j] * a[j];
            bb += b[j] * b[j];
        }
        return ab / Math.sqrt(aa * bb);
    }

    /**
     * @return the active index of the solution with the smallest scaled amount if that amount is
     *         really small (below {@link #SMALL_SOLUTION_LN} of its largest amount), or -1: dropping a
     *         substantial solution because Newton failed loses its elements' carrier and leads the
     *         search astray
     */
    private int smallestSolution(Iterate it) {
        int best = -1;
        for (int q = 0; q < it.active.length; q++) {
            if (sys.phaseKind(it.active[q]) == PhaseKind.SOLUTION && (best < 0 || it.u[q] < it.u[best])) {
                best = q;
            }
        }
        return best >= 0 && it.u[best] < SMALL_SOLUTION_LN ? best : -1;
    }

    /** ln of the scaled amount below which a solution may be dropped after a Newton failure. */
    static final double SMALL_SOLUTION_LN = Math.log(1e-4);

    /** Driving force per atom of absent phase p [RT]; positive means supersaturated. */
    double drivingForce(int p, double[] lambda) {
        PhaseDef ph = sys.phase(p);
        if (ph.kind == PhaseKind.PURE) {
            return (ph.members[0].dot(lambda) - st.c[p][0]) / ph.members[0].atoms;
        }
        double mult = 0;
        double atoms = 0;
        for (Constituent c : ph.members) {
            mult += c.multiplicity;
            atoms += c.atoms;
        }
        return kernel.stability(p, lambda) * mult / atoms;
    }

    private int mostSupersaturated(Iterate it, Set<Integer> blocked) {
        int best = -1;
        double bv = opt.affinityTolerance();
        minAffinity = Double.POSITIVE_INFINITY;
        minAffinityPhase = "";
        for (int p = 1; p < sys.phaseCount(); p++) {
            if (!st.available[p] || it.indexOf(p) >= 0) {
                continue;
            }
            double d = drivingForce(p, it.lambda);
            if (-d < minAffinity) {
                minAffinity = -d;
                minAffinityPhase = sys.phaseName(p);
            }
            if (blocked.contains(p)) {
                continue;
            }
            if (d > bv) {
                bv = d;
                best = p;
            }
        }
        return best;
    }

    /**
     * If the stoichiometry of pure phase k is a combination of the present pure phases, replaces
     * the one that the reaction would exhaust first (ratio test) by k, conserving every element.
     *
     * @return true if an exchange was made
     */
    private boolean exchange(Iterate it, int k) {
        int nq = 0;
        int[] pure = new int[it.active.length];
        for (int q = 0; q < it.active.length; q++) {
            if (sys.phaseKind(it.active[q]) == PhaseKind.PURE) {
                pure[nq++] = q;
            }
        }
        if (nq == 0) {
            return false;
        }
        double[] coef = combination(it, pure, nq, sys.phase(k).members[0].a);
        if (coef == null) {
            return false;
        }
        int out = -1;
        double tMin = Double.POSITIVE_INFINITY;
        for (int i = 0; i < nq; i++) {
            if (coef[i] > 1e-12) {
                double n = it.u[pure[i]] * st.scale[it.active[pure[i]]];
                if (n / coef[i] < tMin) {
                    tMin = n / coef[i];
                    out = i;
                }
            }
        }
        if (out < 0) {
            return false;
        }
        for (int i = 0; i < nq; i++) {
            int q = pure[i];
            double n = it.u[q] * st.scale[it.active[q]] - coef[i] * tMin;
            it.u[q] = (i == out ? 0 : n) / st.scale[it.active[q]];
        }
        it.add(k, tMin / st.scale[k]);
        it.remove(pure[out]);
        return true;
    }

    /** Least-squares coefficients c with sum c_i a_i = target, or null if target is independent. */
    private double[] combination(Iterate it, int[] pure, int nq, double[] target) {
        double[][] basis = new double[nq][];
        for (int i = 0; i < nq; i++) {
            basis[i] = sys.phase(it.active[pure[i]]).members[0].a;
        }
        return spanCoefficients(basis, nq, target);
    }

    /**
     * @return the active phases in ascending order, then -1, then the blocked candidates in
     *         ascending order: what determines the next choices of the loop
     */
    private static List<Integer> situation(Iterate it, Set<Integer> blocked) {
        int[] a = it.active.clone();
        Arrays.sort(a);
        List<Integer> key = new ArrayList<>(a.length + 1 + blocked.size());
        for (int p : a) {
            key.add(p);
        }
        key.add(-1);
        key.addAll(new TreeSet<>(blocked));
        return key;
    }

    private String names(Iterate it) {
        StringBuilder sb = new StringBuilder("[");
        for (int q = 0; q < it.active.length; q++) {
            sb.append(q == 0 ? "" : ", ").append(sys.phaseName(it.active[q]));
        }
        return sb.append(']').toString();
    }
}
