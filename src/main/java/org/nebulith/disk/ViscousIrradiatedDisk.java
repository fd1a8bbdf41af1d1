package org.nebulith.disk;

import static org.nebulith.disk.DiskConstants.AU_CM;
import static org.nebulith.disk.DiskConstants.GM_SUN;
import static org.nebulith.disk.DiskConstants.M_SUN_G;
import static org.nebulith.disk.DiskConstants.SIGMA_SB;
import static org.nebulith.disk.DiskConstants.YEAR_S;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.MathIllegalStateException;

/**
 * A steady accretion disk heated by viscous dissipation and by its star.
 *
 * <p>Viscous disk (Pringle 1981, ARA&amp;A 19, 137), far from the inner edge (the inner boundary
 * factor 1 - sqrt(r_in/r) is dropped): Sigma = Mdot / (3 pi nu), nu = alpha c_s H (Shakura-Sunyaev
 * alpha), H = c_s / Omega; effective temperature T_eff,visc^4 = 3 G M Mdot / (8 pi sigma_SB r^3).
 * Midplane temperature: T^4 = (3/4) tau T_eff,visc^4 + T_irr^4 with tau = kappa(T) Sigma / 2 and
 * T_irr from {@link FlaringIrradiation}. Because Sigma ~ 1/T, the right side grows as T^(b-1)
 * for kappa ~ T^b, so for b &lt; 5 the equation in ln T has exactly one root, found by Brent's
 * method (commons-math3 {@link BrentSolver}) between T_irr and an expanding upper bracket.
 * Midplane pressure from hydrostatic balance ({@link Hydrostatic}).
 *
 * <p>Caution: the (3/4) tau law assumes an optically thick disk (tau &gt;&gt; 1); where tau is
 * small T_mid tends to T_irr. No dust sublimation in the opacity, no inner rim.
 */
public final class ViscousIrradiatedDisk implements DiskModel {
    private static final double LN_T_TOL = 1e-12;
    private static final int MAX_EVAL = 200;

    private final double mStarMsun;
    private final double lStarLsun;
    private final double mdotGs;
    private final double mdotMsunYr;
    private final double alpha;
    private final double mu;
    private final OpacityLaw opacity;
    private final FlaringIrradiation irradiation;
    private final double rMin;
    private final double rMax;
    private final String label;

    /**
     * @param mStarMsun  stellar mass [M_sun]
     * @param lStarLsun  stellar luminosity [L_sun]
     * @param mdotMsunYr accretion rate [M_sun yr^-1]
     * @param alpha      viscosity parameter (0, 1]
     * @param mu         mean molecular weight
     * @param opacity    opacity law
     * @param irradiation stellar heating law
     * @param rMinAU     inner edge of validity [AU]
     * @param rMaxAU     outer edge of validity [AU]
     * @param label      a name for reports
     */
    public ViscousIrradiatedDisk(double mStarMsun, double lStarLsun, double mdotMsunYr, double alpha, double mu,
                                 OpacityLaw opacity, FlaringIrradiation irradiation, double rMinAU, double rMaxAU,
                                 String label) {
        for (double v : new double[] {mStarMsun, lStarLsun, mdotMsunYr, alpha, mu, rMinAU, rMaxAU}) {
            if (!(v > 0) || Double.isInfinite(v)) {
                throw new IllegalArgumentException("steady-disk parameters must be finite and > 0"
                        + " (M_star, L_star, Mdot, alpha, mu, r_min, r_max)");
            }
        }
        if (alpha > 1 || rMaxAU <= rMinAU || opacity.temperatureExponent() >= 5) {
            throw new IllegalArgumentException("need alpha <= 1, r_max > r_min and an opacity exponent < 5");
        }
        this.mStarMsun = mStarMsun;
        this.lStarLsun = lStarLsun;
        this.mdotMsunYr = mdotMsunYr;
        this.mdotGs = mdotMsunYr * M_SUN_G / YEAR_S;
        this.alpha = alpha;
        this.mu = mu;
        this.opacity = opacity;
        this.irradiation = irradiation;
        this.rMin = rMinAU;
        this.rMax = rMaxAU;
        this.label = label;
    }

    /** @return T_eff,visc^4 = 3 G M Mdot / (8 pi sigma_SB r^3) [K^4] */
    public double viscousEffectiveTemperature4(double rAU) {
        double r = rAU * AU_CM;
        return 3 * GM_SUN * mStarMsun * mdotGs / (8 * Math.PI * SIGMA_SB * r * r * r);
    }

    /** @return Sigma = Mdot / (3 pi alpha c_s^2 / Omega) at midplane temperature tK [g cm^-2] */
    public double sigmaAt(double rAU, double tK) {
        double nu = alpha * Hydrostatic.soundSpeed2(tK, mu) / Hydrostatic.omegaKepler(rAU, mStarMsun);
        return mdotGs / (3 * Math.PI * nu);
    }

    /** @return the stellar-irradiation temperature at rAU [K] */
    public double irradiationTemperatureK(double rAU) {
        return irradiation.temperatureK(rAU, lStarLsun, mStarMsun);
    }

    /** @return residual 4 ln T - ln((3/4) tau Teff^4 + Tirr^4) at ln T = lnT */
    double residual(double rAU, double lnT) {
        double t = Math.exp(lnT);
        double tau = opacity.kappaCm2PerG(t) * sigmaAt(rAU, t) / 2;
        double tirr = irradiationTemperatureK(rAU);
        double rhs = 0.75 * tau * viscousEffectiveTemperature4(rAU) + Math.pow(tirr, 4);
        return 4 * lnT - Math.log(rhs);
    }

    /**
     * @param rAU radius [AU]
     * @return the self-consistent midplane temperature [K]
     * @throws IllegalStateException naming r and the parameters if no root is bracketed or found
     */
    public double solveTemperatureK(double rAU) {
        checkRange(rAU);
        UnivariateFunction f = x -> residual(rAU, x);
        double lo = Math.log(irradiationTemperatureK(rAU));
        if (f.value(lo) >= 0) {
            return Math.exp(lo);
        }
        double hi = lo + 1;
        for (int i = 0; f.value(hi) < 0; i++) {
            if (i > 40) {
                throw failure(rAU, "no upper bracket up to T = " + Math.exp(hi) + " K");
            }
            hi += 1;
        }
        try {
            return Math.exp(new BrentSolver(LN_T_TOL).solve(MAX_EVAL, f, lo, hi));
        } catch (MathIllegalStateException e) {
            throw failure(rAU, e.getMessage());
        }
    }

    private IllegalStateException failure(double rAU, String why) {
        return new IllegalStateException("steady disk '" + label + "': midplane temperature not found at r = " + rAU
                + " AU (M = " + mStarMsun + " M_sun, L = " + lStarLsun + " L_sun, Mdot = " + mdotMsunYr
                + " M_sun/yr, alpha = " + alpha + "): " + why);
    }

    @Override
    public DiskState stateAt(double rAU) {
        double t = solveTemperatureK(rAU);
        double sigma = sigmaAt(rAU, t);
        return new DiskState(rAU, t, Hydrostatic.midplanePressureBar(sigma, t, mu, rAU, mStarMsun), sigma);
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
        return label + ": steady viscous disk (Pringle 1981) with flaring-disk irradiation (Chiang & Goldreich 1997);"
                + " M = " + mStarMsun + " M_sun, L = " + lStarLsun + " L_sun, Mdot = " + mdotMsunYr
                + " M_sun/yr, alpha = " + alpha + ", " + opacity.description();
    }
}
