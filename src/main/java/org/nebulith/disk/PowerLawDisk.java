package org.nebulith.disk;

/**
 * A power-law disk: T = T1 (r/AU)^-q, P = P1 (r/AU)^-p, Sigma = Sigma1 (r/AU)^-s.
 *
 * <p>{@link #hydrostatic} derives P from vertical hydrostatic balance ({@link Hydrostatic}):
 * P = Sigma c_s Omega / sqrt(2 pi), which for power-law T and Sigma is itself a power law with
 * p = s + q/2 + 3/2.
 */
public final class PowerLawDisk implements DiskModel {
    private final double t1K;
    private final double q;
    private final double p1Bar;
    private final double p;
    private final double sigma1;
    private final double s;
    private final double rMin;
    private final double rMax;
    private final String description;

    /**
     * @param t1K         temperature at 1 AU [K], &gt; 0
     * @param q           temperature exponent
     * @param p1Bar       pressure at 1 AU [bar], &gt; 0
     * @param p           pressure exponent
     * @param sigma1Gcm2  gas surface density at 1 AU [g cm^-2], &gt; 0
     * @param s           surface-density exponent
     * @param rMinAU      inner edge of validity [AU], &gt; 0
     * @param rMaxAU      outer edge of validity [AU], &gt; rMinAU
     * @param description one line with its source
     */
    public PowerLawDisk(double t1K, double q, double p1Bar, double p, double sigma1Gcm2, double s,
                        double rMinAU, double rMaxAU, String description) {
        requirePositive(t1K, "T1_K");
        requirePositive(p1Bar, "P1_bar");
        requirePositive(sigma1Gcm2, "sigma1_g_cm2");
        requirePositive(rMinAU, "r_min_AU");
        if (!(rMaxAU > rMinAU) || Double.isInfinite(rMaxAU)) {
            throw new IllegalArgumentException("r_max_AU must be finite and > r_min_AU, got " + rMaxAU);
        }
        for (double e : new double[] {q, p, s}) {
            if (!Double.isFinite(e)) {
                throw new IllegalArgumentException("power-law exponents must be finite");
            }
        }
        this.t1K = t1K;
        this.q = q;
        this.p1Bar = p1Bar;
        this.p = p;
        this.sigma1 = sigma1Gcm2;
        this.s = s;
        this.rMin = rMinAU;
        this.rMax = rMaxAU;
        this.description = description;
    }

    /**
     * A power-law disk whose pressure follows from hydrostatic balance.
     *
     * @param mStarMsun stellar mass [M_sun]
     * @param mu        mean molecular weight of the gas
     * @return the disk with P1 and p derived (see class javadoc)
     */
    public static PowerLawDisk hydrostatic(double t1K, double q, double sigma1Gcm2, double s, double mStarMsun,
                                           double mu, double rMinAU, double rMaxAU, String description) {
        requirePositive(mStarMsun, "M_star_Msun");
        requirePositive(mu, "mu");
        double p1 = Hydrostatic.midplanePressureBar(sigma1Gcm2, t1K, mu, 1.0, mStarMsun);
        return new PowerLawDisk(t1K, q, p1, s + q / 2 + 1.5, sigma1Gcm2, s, rMinAU, rMaxAU, description);
    }

    /**
     * The minimum-mass solar nebula of Hayashi 1981 (Prog. Theor. Phys. Suppl. 70, 35):
     * Sigma = 1700 g cm^-2 (r/AU)^-3/2, T = 280 K (r/AU)^-1/2, mu = 2.34, M = 1 M_sun, midplane P
     * from hydrostatic balance (P = 1.34e-5 bar (r/AU)^-13/4). Range 0.1-40 AU (Hayashi's model
     * spans the planets, about 0.35-36 AU; the inner extension is ours).
     *
     * @return the MMSN disk
     */
    public static PowerLawDisk mmsnHayashi1981() {
        return hydrostatic(280.0, 0.5, 1700.0, 1.5, 1.0, DiskConstants.MU_DEFAULT, 0.1, 40.0,
                "minimum-mass solar nebula, Hayashi 1981 (Prog. Theor. Phys. Suppl. 70, 35); hydrostatic midplane P");
    }

    private static void requirePositive(double v, String name) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException(name + " must be finite and > 0, got " + v);
        }
    }

    @Override
    public DiskState stateAt(double rAU) {
        checkRange(rAU);
        return new DiskState(rAU, t1K * Math.pow(rAU, -q), p1Bar * Math.pow(rAU, -p), sigma1 * Math.pow(rAU, -s));
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

    /** @return pressure at 1 AU [bar] */
    public double p1Bar() {
        return p1Bar;
    }

    /** @return pressure exponent p */
    public double pressureExponent() {
        return p;
    }
}
