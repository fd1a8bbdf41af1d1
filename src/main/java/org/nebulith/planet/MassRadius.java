package org.nebulith.planet;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;

/**
 * Mass-radius relation of rocky planets, Zeng, Sasselov &amp; Jacobsen 2016 (ApJ 819, 127), their
 * fitting formula R / R_earth = (1.07 - 0.21 CMF) (M / M_earth)^(1/3.7), valid for 1-8 M_earth and
 * core mass fraction 0-0.4 (Earth-like CMF 0.325 at 1 M_earth gives R = 1.00). Caution: the fit
 * assumes an Fe core and a MgSiO3 mantle with no water or atmosphere; a planet less dense than CMF 0
 * needs volatiles, which this relation cannot tell apart.
 */
public final class MassRadius {
    /** Lower mass limit of the fit [M_earth]. */
    public static final double M_MIN = 1.0;
    /** Upper mass limit of the fit [M_earth]. */
    public static final double M_MAX = 8.0;
    /** Upper CMF limit of the fit. */
    public static final double CMF_MAX = 0.4;
    private static final double EXPONENT = 1 / 3.7;

    /**
     * The core mass fraction implied by a mass and a radius.
     *
     * @param cmf         best estimate from the central values (unclamped)
     * @param sigmaLinear 1-sigma error by linear propagation
     * @param p16         16th percentile of the Monte Carlo draws (unclamped)
     * @param median      median of the draws
     * @param p84         84th percentile of the draws
     * @param clamped     cmf clamped into [0, 0.4]
     * @param flags       validity warnings (empty when inside the fit's range)
     */
    public record CmfEstimate(double cmf, double sigmaLinear, double p16, double median, double p84, double clamped,
                              List<String> flags) {
    }

    private MassRadius() {
    }

    /**
     * @param massMearth planet mass [M_earth]
     * @param cmf        core mass fraction
     * @return radius [R_earth]
     */
    public static double radiusRearth(double massMearth, double cmf) {
        if (!(massMearth > 0) || !Double.isFinite(cmf)) {
            throw new IllegalArgumentException("mass must be > 0 and CMF finite");
        }
        return (1.07 - 0.21 * cmf) * Math.pow(massMearth, EXPONENT);
    }

    /** @return the CMF for which the relation gives this radius (may fall outside 0-0.4) */
    public static double coreMassFraction(double massMearth, double radiusRearth) {
        if (!(massMearth > 0) || !(radiusRearth > 0)) {
            throw new IllegalArgumentException("mass and radius must be > 0");
        }
        return (1.07 - radiusRearth * Math.pow(massMearth, -EXPONENT)) / 0.21;
    }

    /** @return warnings if the mass or the CMF lies outside the fit's validity */
    public static List<String> validityFlags(double massMearth, double cmf) {
        List<String> f = new ArrayList<>();
        if (massMearth < M_MIN || massMearth > M_MAX) {
            f.add("mass " + massMearth + " M_earth outside the fit's range 1-8 M_earth");
        }
        if (cmf < 0) {
            f.add("CMF < 0: less dense than a pure-rock planet; volatiles (water, gas) needed");
        } else if (cmf > CMF_MAX) {
            f.add("CMF > 0.4: beyond the fit's range (use an interior model)");
        }
        return f;
    }

    /**
     * The CMF implied by an observed mass and radius with 1-sigma errors: linear propagation and a
     * seeded Monte Carlo of normal draws (draws with non-positive mass or radius are redrawn).
     *
     * @param m      mass [M_earth]
     * @param sigmaM its error [M_earth], &gt;= 0
     * @param r      radius [R_earth]
     * @param sigmaR its error [R_earth], &gt;= 0
     * @param draws  Monte Carlo draws, &gt;= 1
     * @param seed   random seed (same seed, same result)
     * @return the estimate
     */
    public static CmfEstimate impliedCoreMassFraction(double m, double sigmaM, double r, double sigmaR, int draws,
                                                      long seed) {
        if (!(sigmaM >= 0) || !(sigmaR >= 0) || draws < 1) {
            throw new IllegalArgumentException("errors must be >= 0 and draws >= 1");
        }
        double cmf = coreMassFraction(m, r);
        double dR = -Math.pow(m, -EXPONENT) / 0.21;
        double dM = r * EXPONENT * Math.pow(m, -EXPONENT - 1) / 0.21;
        double sigma = Math.hypot(dR * sigmaR, dM * sigmaM);
        SplittableRandom rng = new SplittableRandom(seed);
        double[] s = new double[draws];
        for (int i = 0; i < draws; i++) {
            double mi;
            double ri;
            do {
                mi = m + sigmaM * rng.nextGaussian();
                ri = r + sigmaR * rng.nextGaussian();
            } while (mi <= 0 || ri <= 0);
            s[i] = coreMassFraction(mi, ri);
        }
        Arrays.sort(s);
        double clamped = Math.max(0, Math.min(CMF_MAX, cmf));
        return new CmfEstimate(cmf, sigma, quantile(s, 0.16), quantile(s, 0.5), quantile(s, 0.84), clamped,
                List.copyOf(validityFlags(m, cmf)));
    }

    private static double quantile(double[] sorted, double q) {
        double pos = q * (sorted.length - 1);
        int i = (int) Math.floor(pos);
        int j = Math.min(sorted.length - 1, i + 1);
        return sorted[i] + (pos - i) * (sorted[j] - sorted[i]);
    }
}
