package org.nebulith.disk;

/**
 * A disk given as a table of r, T, P and Sigma, interpolated monotonically in log space
 * (log T, log P and log Sigma against log r, {@link MonotoneCubic}): between two rows every
 * quantity stays between the row values, and power-law tables are reproduced exactly.
 * The range of validity is the first to the last row.
 */
public final class TabulatedDisk implements DiskModel {
    private final double rMin;
    private final double rMax;
    private final MonotoneCubic logT;
    private final MonotoneCubic logP;
    private final MonotoneCubic logSigma;
    private final String description;
    private final double[] tK;
    private final double[] pBar;
    private final double[] sigma;

    /**
     * @param rAU         strictly increasing radii [AU], &gt; 0 (at least 2)
     * @param tK          temperatures [K], &gt; 0
     * @param pBar        pressures [bar], &gt; 0
     * @param sigmaGcm2   gas surface densities [g cm^-2], &gt; 0
     * @param description one line with its source
     */
    public TabulatedDisk(double[] rAU, double[] tK, double[] pBar, double[] sigmaGcm2, String description) {
        int n = rAU.length;
        if (n < 2 || tK.length != n || pBar.length != n || sigmaGcm2.length != n) {
            throw new IllegalArgumentException("a tabulated disk needs at least 2 rows of r, T, P, Sigma");
        }
        double[] lr = logs(rAU, "r_AU");
        this.logT = new MonotoneCubic(lr, logs(tK, "T_K"));
        this.logP = new MonotoneCubic(lr, logs(pBar, "P_bar"));
        this.logSigma = new MonotoneCubic(lr, logs(sigmaGcm2, "sigma_gas_g_cm2"));
        this.rMin = rAU[0];
        this.rMax = rAU[n - 1];
        this.description = description;
        this.tK = tK.clone();
        this.pBar = pBar.clone();
        this.sigma = sigmaGcm2.clone();
    }

    private static double[] logs(double[] v, String name) {
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            if (!(v[i] > 0) || Double.isInfinite(v[i])) {
                throw new IllegalArgumentException(name + " must be finite and > 0 (row " + (i + 1) + ")");
            }
            out[i] = Math.log(v[i]);
        }
        return out;
    }

    @Override
    public DiskState stateAt(double rAU) {
        checkRange(rAU);
        double lr = Math.log(rAU);
        return new DiskState(rAU, interpolate(logT, tK, lr), interpolate(logP, pBar, lr),
                interpolate(logSigma, sigma, lr));
    }

    private static double interpolate(MonotoneCubic logs, double[] rows, double lr) {
        int node = logs.exactNode(lr);
        return node >= 0 ? rows[node] : Math.exp(logs.value(lr));
    }

    @Override
    public double rMinAU() {
        return rMin;
    }

    @Override
    public double rMaxAU() {
        return rMax;
    }

    @Override
    public String description() {
        return description;
    }
}
