package org.nebulith.planet.interior;

import java.util.ArrayList;
import java.util.List;

import org.apache.commons.math3.analysis.interpolation.SplineInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;

/**
 * Radii of solved structures on a grid of masses (log-spaced, at most 0.15 dex apart) and core mass
 * fractions (0 to 1 by 0.2), for one mantle, core and water setting, with cubic-spline interpolation
 * of ln R in ln M and in the core mass fraction. The interpolation error is below 0.1 % in radius
 * (checked against direct solutions in the tests).
 */
public final class MassRadiusGrid {
    private static final int CMF_NODES = 6;
    private static final double MAX_DEX_STEP = 0.15;

    private final InteriorModel base;
    private final double[] lnMass;
    private final double[] cmf;
    private final PolynomialSplineFunction[] lnRadiusOfLnMass;

    /**
     * @param base         the planet whose mass and core mass fraction are varied (its mantle, core and water)
     * @param minMassMearth lowest mass to cover [M_earth]
     * @param maxMassMearth highest mass to cover [M_earth]
     * @param solver       the structure solver
     */
    public MassRadiusGrid(final InteriorModel base, final double minMassMearth, final double maxMassMearth,
                          final StructureSolver solver) {
        this.base = base;
        double lo = Math.max(InteriorModel.MASS_MIN, minMassMearth);
        double hi = Math.min(InteriorModel.MASS_MAX, Math.max(maxMassMearth, lo * 1.0001));
        int steps = Math.max(3, (int) Math.ceil(Math.log10(hi / lo) / MAX_DEX_STEP));
        lnMass = new double[steps + 1];
        for (int i = 0; i <= steps; i++) {
            lnMass[i] = Math.log(lo) + (Math.log(hi) - Math.log(lo)) * i / steps;
        }
        cmf = new double[CMF_NODES];
        lnRadiusOfLnMass = new PolynomialSplineFunction[CMF_NODES];
        SplineInterpolator spline = new SplineInterpolator();
        for (int j = 0; j < CMF_NODES; j++) {
            cmf[j] = j / (double) (CMF_NODES - 1);
            double[] lnR = new double[lnMass.length];
            for (int i = 0; i < lnMass.length; i++) {
                double m = Math.min(InteriorModel.MASS_MAX, Math.max(InteriorModel.MASS_MIN, Math.exp(lnMass[i])));
                lnR[i] = Math.log(solver.solve(base.withMass(m).withCoreMassFraction(cmf[j])).radiusRearth());
            }
            lnRadiusOfLnMass[j] = spline.interpolate(lnMass, lnR);
        }
    }

    /** @return the lowest mass covered [M_earth] */
    public double minMassMearth() {
        return Math.exp(lnMass[0]);
    }

    /** @return the highest mass covered [M_earth] */
    public double maxMassMearth() {
        return Math.exp(lnMass[lnMass.length - 1]);
    }

    /** @return the planet model the grid varies */
    public InteriorModel base() {
        return base;
    }

    /**
     * @param massMearth mass inside the grid [M_earth]
     * @param coreMassFraction in [0, 1]
     * @return the interpolated radius [R_earth]
     */
    public double radiusRearth(final double massMearth, final double coreMassFraction) {
        return Math.exp(cmfSpline(massMearth).value(coreMassFraction));
    }

    /**
     * @param massMearth   mass inside the grid [M_earth]
     * @param radiusRearth radius [R_earth]
     * @return the core mass fraction of that radius; below 0 (lighter than pure rock) returns
     *         {@link Double#NEGATIVE_INFINITY}, above 1 (denser than pure iron) {@link Double#POSITIVE_INFINITY}
     */
    public double coreMassFraction(final double massMearth, final double radiusRearth) {
        double[] lnR = nodeRadii(massMearth);
        double target = Math.log(radiusRearth);
        if (target > lnR[0]) {
            return Double.NEGATIVE_INFINITY;
        }
        if (target < lnR[CMF_NODES - 1]) {
            return Double.POSITIVE_INFINITY;
        }
        PolynomialSplineFunction f = new SplineInterpolator().interpolate(cmf, lnR);
        int j = 0;
        while (j < CMF_NODES - 2 && lnR[j + 1] > target) {
            j++;
        }
        double a = cmf[j];
        double b = cmf[j + 1];
        for (int k = 0; k < 60; k++) {
            double mid = 0.5 * (a + b);
            if (f.value(mid) > target) {
                a = mid;
            } else {
                b = mid;
            }
        }
        return 0.5 * (a + b);
    }

    private double[] nodeRadii(final double massMearth) {
        double x = Math.log(massMearth);
        if (x < lnMass[0] - 1e-12 || x > lnMass[lnMass.length - 1] + 1e-12) {
            throw new IllegalArgumentException("mass " + massMearth + " M_earth outside the grid [" + minMassMearth()
                    + ", " + maxMassMearth() + "]");
        }
        x = Math.max(lnMass[0], Math.min(lnMass[lnMass.length - 1], x));
        double[] lnR = new double[CMF_NODES];
        for (int j = 0; j < CMF_NODES; j++) {
            lnR[j] = lnRadiusOfLnMass[j].value(x);
        }
        return lnR;
    }

    private PolynomialSplineFunction cmfSpline(final double massMearth) {
        return new SplineInterpolator().interpolate(cmf, nodeRadii(massMearth));
    }

    /** @return the core mass fractions of the grid's nodes */
    public List<Double> cmfNodes() {
        List<Double> l = new ArrayList<>();
        for (double c : cmf) {
            l.add(c);
        }
        return l;
    }
}
