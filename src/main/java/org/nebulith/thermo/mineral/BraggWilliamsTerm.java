package org.nebulith.thermo.mineral;

import org.nebulith.thermo.ThermoModel;

/**
 * Bragg-Williams order-disorder term of Holland &amp; Powell (1996, Am. Mineral. 81, 1413, the
 * "symmetric formalism" at 1 bar) as used in ds62. The equilibrium order parameter Q in [0, 1]
 * minimises
 * <pre>
 * G_BW(Q) = (1 - Q) dH + (1 - Q) Q W - T S_conf(Q)
 * S_conf  = -R f/(n+1) [(1+nQ) ln((1+nQ)/(n+1)) + n(1-Q) ln(n(1-Q)/(n+1))
 *                       + n(1-Q) ln((1-Q)/(n+1)) + n(n+Q) ln((n+Q)/(n+1))]
 * </pre>
 * so that {@code dH + R T f n/(n+1) [ln(n(1-Q)) + ln(1-Q) - ln(1+nQ) - ln(n+Q)] + (2Q-1) W = 0}.
 * Because G_BW is stationary in Q, S_BW = S_conf(Q) and H_BW = (1-Q) dH + (1-Q) Q W.
 * With W close to dH the equation can have two roots (a first-order change of Q), so all roots are
 * bracketed on a grid in ln(1-Q) and the one of lowest G is taken. Only f &gt; 0 is supported (every
 * ds62 phase in the mineral table has f &gt; 0).
 */
public final class BraggWilliamsTerm implements TransitionTerm {
    private static final double R = ThermoModel.R;
    private static final double[] GRID_LN_P = grid();

    private final double dh;
    private final double w;
    private final double n;
    private final double f;
    private volatile Solution last = new Solution(Double.NaN, 1.0);
    /** ln p of the global minimum every TABLE_STEP kelvin from TABLE_T0, built on first use. */
    private volatile double[] table;
    private static final double TABLE_T0 = 150;
    private static final double TABLE_STEP = 2;
    private static final int TABLE_SIZE = 1301;

    private record Solution(double tK, double p) {
    }

    /**
     * @param dhJ enthalpy of disordering [J/mol] @param wJ interaction energy [J/mol]
     * @param n   site-multiplicity parameter (&gt; 0) @param f entropy factor (&gt; 0)
     */
    public BraggWilliamsTerm(double dhJ, double wJ, double n, double f) {
        if (!Double.isFinite(dhJ) || !Double.isFinite(wJ) || !(n > 0) || !(f > 0)) {
            throw new IllegalArgumentException("Bragg-Williams term needs finite dH, W and n > 0, f > 0, got dH="
                    + dhJ + ", W=" + wJ + ", n=" + n + ", f=" + f);
        }
        this.dh = dhJ;
        this.w = wJ;
        this.n = n;
        this.f = f;
    }

    private static double[] grid() {
        double[] g = new double[131];
        int k = 0;
        for (int i = 0; i < 80; i++) {
            g[k++] = -200 + 2.5 * i;         // p = 1e-87 ... 4e-3
        }
        for (int i = 1; i <= 51; i++) {
            g[k++] = Math.log(Math.min(1.0, 0.005 + 0.0199 * (i - 1) + 1e-12 * i)); // p = 0.005 ... 1
        }
        java.util.Arrays.sort(g);
        return g;
    }

    /** @param tK temperature [K] @return the equilibrium order parameter Q (1 = fully ordered) */
    public double orderParameter(double tK) {
        return 1 - disorder(tK);
    }

    /** dG/dp with p = 1 - Q; zero at equilibrium, increasing through the minimum. */
    private double slope(double p, double tK) {
        double bracket = Math.log(n * p) + Math.log(p) - Math.log(1 + n - n * p) - Math.log(n + 1 - p);
        return dh + R * tK * n / (n + 1) * f * bracket + (1 - 2 * p) * w;
    }

    private double gibbs(double p, double tK) {
        return p * dh + p * (1 - p) * w - tK * entropyOf(p);
    }

    private double entropyOf(double p) {
        double q = 1 - p;
        double a = 1 + n * q;
        double b = n + q;
        double sum = a * Math.log(a / (n + 1)) + n * b * Math.log(b / (n + 1));
        if (p > 0) {
            sum += n * p * Math.log(n * p / (n + 1)) + n * p * Math.log(p / (n + 1));
        }
        return -R * f / (n + 1) * sum;
    }

    /** @return p = 1 - Q at equilibrium */
    private double disorder(double tK) {
        Solution s = last;
        if (s.tK() == tK) {
            return s.p();
        }
        double p = fromTable(tK);
        last = new Solution(tK, p);
        return p;
    }

    /**
     * The root from the tabulated global minimum at the neighbouring table temperatures, polished by
     * Newton's method; the full bracketing scan where the table's neighbours lie on different
     * branches (a first-order change of Q between them) or outside the table. A pure function of T.
     */
    private double fromTable(double tK) {
        double x = (tK - TABLE_T0) / TABLE_STEP;
        int i = (int) Math.floor(x);
        if (!(i >= 0 && i + 1 < TABLE_SIZE)) {
            return solve(tK);
        }
        double[] lnp = table();
        double a = lnp[i];
        double b = lnp[i + 1];
        if (Math.abs(a - b) > 0.5) {
            return solve(tK);
        }
        double u = a + (x - i) * (b - a);
        for (int it = 0; it < 30; it++) {
            double p = Math.exp(u);
            double g = slope(p, tK);
            double dgdu = p * slopeDerivative(p, tK);
            if (!(dgdu > 0)) {
                return solve(tK);
            }
            double step = g / dgdu;
            u -= Math.max(-1.0, Math.min(1.0, step));
            if (Math.abs(step) < 1e-14 * Math.max(1.0, Math.abs(u))) {
                return Math.exp(u);
            }
        }
        return solve(tK);
    }

    /** d(slope)/dp. */
    private double slopeDerivative(double p, double tK) {
        double d = 2 / p + n / (1 + n - n * p) + 1 / (n + 1 - p);
        return R * tK * n / (n + 1) * f * d - 2 * w;
    }

    private double[] table() {
        double[] t = table;
        if (t == null) {
            t = new double[TABLE_SIZE];
            for (int k = 0; k < TABLE_SIZE; k++) {
                t[k] = Math.log(solve(TABLE_T0 + k * TABLE_STEP));
            }
            table = t;
        }
        return t;
    }

    private double solve(double tK) {
        double bestP = 1.0;
        double bestG = slope(1.0, tK) < 0 ? gibbs(1.0, tK) : Double.POSITIVE_INFINITY;
        double prevU = GRID_LN_P[0];
        double prevF = slope(Math.exp(prevU), tK);
        for (int i = 1; i < GRID_LN_P.length; i++) {
            double u = GRID_LN_P[i];
            double fu = slope(Math.exp(u), tK);
            if (prevF < 0 && fu >= 0) {
                double p = bisect(prevU, u, tK);
                double g = gibbs(p, tK);
                if (g < bestG) {
                    bestG = g;
                    bestP = p;
                }
            }
            prevU = u;
            prevF = fu;
        }
        if (bestG == Double.POSITIVE_INFINITY) {
            throw new IllegalStateException("Bragg-Williams order parameter not bracketed at T=" + tK
                    + " K (dH=" + dh + ", W=" + w + ", n=" + n + ", f=" + f + ")");
        }
        return bestP;
    }

    /** Root of the slope in u = ln p inside a sign-changing bracket (Brent's method, to 1e-15). */
    private double bisect(double lo, double hi, double tK) {
        org.apache.commons.math3.analysis.solvers.BrentSolver brent =
                new org.apache.commons.math3.analysis.solvers.BrentSolver(1e-15, 1e-15);
        double u = brent.solve(200, x -> slope(Math.exp(x), tK), lo, hi);
        return Math.exp(u);
    }

    @Override
    public double h(double tK) {
        double p = disorder(tK);
        return p * dh + p * (1 - p) * w;
    }

    @Override
    public double s(double tK) {
        return entropyOf(disorder(tK));
    }

    @Override
    public double g(double tK) {
        return gibbs(disorder(tK), tK);
    }

    @Override
    public double cp(double tK) {
        double p = disorder(tK);
        if (p >= 1.0) {
            return 0.0;
        }
        double dSlopeDp = R * tK * n / (n + 1) * f * (2 / p + n / (1 + n - n * p) + 1 / (n + 1 - p)) - 2 * w;
        double dhDp = dh + (1 - 2 * p) * w;
        return dhDp * dhDp / (tK * dSlopeDp);
    }

    @Override
    public double[] singularTemperaturesK() {
        return new double[0];
    }
}
