package org.nebulith.equilibrium;

/**
 * A starting point for the solver taken from earlier results of the same system: the element
 * potentials, gas amount and active condensed phases. With two earlier states the chemical
 * potentials mu = lambda RT and the amounts are extrapolated linearly in temperature, which makes
 * a 1 K step of a condensation sequence converge in one or two Newton steps.
 */
public final class WarmStart {
    final Iterate iterate;
    final double fromTK;
    final double fromPBar;
    final double[] fromTotals;

    private WarmStart(Iterate iterate, EquilibriumProblem from) {
        this(iterate, from.temperatureK(), from.pressureBar(), from.totals());
    }

    private WarmStart(Iterate iterate, double fromTK, double fromPBar, double[] fromTotals) {
        this.iterate = iterate;
        this.fromTK = fromTK;
        this.fromPBar = fromPBar;
        this.fromTotals = fromTotals;
    }

    /** @param r an earlier result @return a start that reuses it as is */
    public static WarmStart of(EquilibriumResult r) {
        return new WarmStart(r.iterate.copy(), r.problem());
    }

    /**
     * @param last     the latest result
     * @param previous the one before (same system and active set preferred)
     * @param newTK    the temperature to solve at [K]
     * @return a start extrapolated linearly in T from the two results
     */
    public static WarmStart extrapolate(EquilibriumResult last, EquilibriumResult previous, double newTK) {
        if (previous == null || last.system() != previous.system()) {
            return of(last);
        }
        double t1 = last.problem().temperatureK();
        double t0 = previous.problem().temperatureK();
        if (t1 == t0) {
            return of(last);
        }
        return linear(last, previous, (newTK - t1) / (t1 - t0), newTK);
    }

    /**
     * A start on the straight line through two earlier states of the same system, at parameter w:
     * w = 0 gives {@code last}, w = -1 gives {@code previous}, w &gt; 0 extrapolates beyond
     * {@code last}. Chemical potentials mu = lambda RT and amounts are interpolated; use it along any
     * path (radius in a disk, composition) that moves T and P smoothly.
     *
     * @param last     one state
     * @param previous another state of the same system
     * @param w        the parameter
     * @param newTK    temperature at the new state [K]
     * @return the start
     */
    public static WarmStart linear(EquilibriumResult last, EquilibriumResult previous, double w, double newTK) {
        if (previous == null || last.system() != previous.system()) {
            return of(last);
        }
        double t1 = last.problem().temperatureK();
        double t0 = previous.problem().temperatureK();
        Iterate a = last.iterate.copy();
        Iterate b = previous.iterate;
        for (int j = 0; j < a.lambda.length; j++) {
            double mu1 = a.lambda[j] * t1;
            double mu0 = b.lambda[j] * t0;
            a.lambda[j] = (mu1 + w * (mu1 - mu0)) / newTK;
        }
        a.lnGas += w * (a.lnGas - b.lnGas);
        for (int q = 0; q < a.active.length; q++) {
            int qb = b.indexOf(a.active[q]);
            if (qb >= 0) {
                double v = a.u[q] + w * (a.u[q] - b.u[qb]);
                boolean logAmount = last.system().phaseKind(a.active[q]) == PhaseKind.SOLUTION;
                a.u[q] = logAmount || v > 0 ? v : a.u[q];
            }
        }
        return new WarmStart(a, last.problem());
    }

    /**
     * A start for {@code from}'s composition at the state of {@code refTo}, made by carrying over
     * the change that another composition of the same system makes between two states:
     * mu = mu(from) + mu(refTo) - mu(refFrom) for the chemical potentials mu = lambda RT, and the same
     * difference for ln N_gas and for the amounts of the phases present in all three (a negative pure
     * amount keeps {@code from}'s value). The active phases are {@code from}'s: the composition
     * follows its own assemblage, the reference path supplies the change with temperature and
     * pressure.
     *
     * @param from    a solved state of the composition to continue
     * @param refFrom the reference composition at {@code from}'s temperature and pressure
     * @param refTo   the reference composition at the state to solve
     * @return the start (its origin is {@code from}: a continuation falls back to a path from there)
     */
    public static WarmStart transported(EquilibriumResult from, EquilibriumResult refFrom, EquilibriumResult refTo) {
        if (from.system() != refFrom.system() || from.system() != refTo.system()) {
            return of(from);
        }
        double t = from.problem().temperatureK();
        double t0 = refFrom.problem().temperatureK();
        double t1 = refTo.problem().temperatureK();
        Iterate a = shifted(from.system(), from.iterate, t, refFrom.iterate, t0, refTo.iterate, t1);
        return new WarmStart(a, from.problem());
    }

    /**
     * A start extrapolated along this composition's own path ({@link #linear}) and corrected by the
     * error that the same extrapolation makes on the reference path: own + (refTo - refGuess), with
     * refGuess the reference's extrapolation to the same state. The reference path's curvature
     * (its change of slope from one radius to the next) is carried over, so the start misses only by
     * the difference in curvature between the two compositions.
     *
     * @param own      the extrapolation of this composition's states
     * @param refGuess the same extrapolation of the reference composition's states
     * @param refTo    the reference composition solved at the state
     * @return the start
     */
    public static WarmStart corrected(WarmStart own, WarmStart refGuess, EquilibriumResult refTo) {
        ChemicalSystem sys = refTo.system();
        double t1 = refTo.problem().temperatureK();
        Iterate a = shifted(sys, own.iterate, t1, refGuess.iterate, t1, refTo.iterate, t1);
        return new WarmStart(a, own.fromTK, own.fromPBar, own.fromTotals);
    }

    /** base + (r1 - r0) in mu = lambda T, ln N_gas and the amounts of phases present in all three. */
    private static Iterate shifted(ChemicalSystem sys, Iterate base, double t, Iterate r0, double t0, Iterate r1,
                                   double t1) {
        Iterate a = base.copy();
        for (int j = 0; j < a.lambda.length; j++) {
            a.lambda[j] = (a.lambda[j] * t + r1.lambda[j] * t1 - r0.lambda[j] * t0) / t1;
        }
        a.lnGas += r1.lnGas - r0.lnGas;
        for (int q = 0; q < a.active.length; q++) {
            int q0 = r0.indexOf(a.active[q]);
            int q1 = r1.indexOf(a.active[q]);
            if (q0 >= 0 && q1 >= 0) {
                double v = a.u[q] + r1.u[q1] - r0.u[q0];
                boolean logAmount = sys.phaseKind(a.active[q]) == PhaseKind.SOLUTION;
                a.u[q] = logAmount || v > 0 ? v : a.u[q];
            }
        }
        return a;
    }
}
