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

    private WarmStart(Iterate iterate, double fromTK, double fromPBar) {
        this.iterate = iterate;
        this.fromTK = fromTK;
        this.fromPBar = fromPBar;
    }

    /** @param r an earlier result @return a start that reuses it as is */
    public static WarmStart of(EquilibriumResult r) {
        return new WarmStart(r.iterate.copy(), r.problem().temperatureK(), r.problem().pressureBar());
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
        double w = (newTK - t1) / (t1 - t0);
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
        return new WarmStart(a, t1, last.problem().pressureBar());
    }
}
