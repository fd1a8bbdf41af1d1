package org.nebulith.condensation;

import java.util.Arrays;

/**
 * Total pressure along the cooling path: constant, or tabulated against temperature and
 * interpolated linearly in log P between the tabulated points (held constant beyond them).
 */
public final class PressurePath {
    private final double[] tK;
    private final double[] logP;

    private PressurePath(double[] tK, double[] logP) {
        this.tK = tK;
        this.logP = logP;
    }

    /** @param pBar pressure [bar], > 0 @return a constant-pressure path */
    public static PressurePath constant(double pBar) {
        if (!(pBar > 0) || Double.isInfinite(pBar)) {
            throw new IllegalArgumentException("pressure must be a positive number of bar, got " + pBar);
        }
        return new PressurePath(new double[] {0}, new double[] {Math.log10(pBar)});
    }

    /**
     * @param tK   temperatures [K], strictly monotonic (either direction)
     * @param pBar pressures [bar], > 0
     * @return the tabulated path
     */
    public static PressurePath tabulated(double[] tK, double[] pBar) {
        if (tK.length != pBar.length || tK.length < 1) {
            throw new IllegalArgumentException("a P-T path needs matching, non-empty T and P columns");
        }
        int n = tK.length;
        double[] t = new double[n];
        double[] lp = new double[n];
        boolean increasing = n < 2 || tK[1] > tK[0];
        for (int i = 0; i < n; i++) {
            int src = increasing ? i : n - 1 - i;
            t[i] = tK[src];
            lp[i] = Math.log10(pBar[src]);
        }
        return new PressurePath(t, lp);
    }

    /** @param t temperature [K] @return pressure [bar] */
    public double pressureBar(double t) {
        if (tK.length == 1 || t <= tK[0]) {
            return Math.pow(10, logP[0]);
        }
        if (t >= tK[tK.length - 1]) {
            return Math.pow(10, logP[logP.length - 1]);
        }
        int i = Arrays.binarySearch(tK, t);
        if (i >= 0) {
            return Math.pow(10, logP[i]);
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double w = (t - tK[lo]) / (tK[hi] - tK[lo]);
        return Math.pow(10, logP[lo] + w * (logP[hi] - logP[lo]));
    }

    /** @return lowest tabulated temperature [K] (0 for a constant pressure) */
    public double tableMinK() {
        return tK[0];
    }

    /** @return highest tabulated temperature [K] (0 for a constant pressure) */
    public double tableMaxK() {
        return tK[tK.length - 1];
    }

    /** @return number of tabulated points (1 for a constant pressure) */
    public int points() {
        return tK.length;
    }

    /** @return true for a constant pressure */
    public boolean isConstant() {
        return tK.length == 1;
    }
}
