package org.nebulith.condensation;

/**
 * Settings of a condensation sequence.
 *
 * @param path          pressure along the path
 * @param tMaxK         starting (hottest) temperature [K]
 * @param tMinK         final temperature [K]
 * @param tStepK        grid step [K], > 0
 * @param removalFraction fraction F in [0, 1] of each step's new condensate withdrawn from further
 *                      reaction (0 = equilibrium condensation, 1 = fractional)
 * @param refineK       bracket to which phase boundaries and 50% points are bisected [K]
 */
public record SequenceSettings(PressurePath path, double tMaxK, double tMinK, double tStepK, double removalFraction,
                               double refineK) {

    public SequenceSettings {
        if (!(tMaxK > tMinK) || !(tMinK > 0)) {
            throw new IllegalArgumentException("need T-max > T-min > 0 K, got " + tMaxK + " and " + tMinK);
        }
        if (!(tStepK > 0) || tStepK > tMaxK - tMinK) {
            throw new IllegalArgumentException("T step must be > 0 K and no larger than the range, got " + tStepK);
        }
        if (!(removalFraction >= 0 && removalFraction <= 1)) {
            throw new IllegalArgumentException("removal fraction must lie in [0, 1], got " + removalFraction);
        }
        if (!(refineK > 0)) {
            throw new IllegalArgumentException("refinement bracket must be > 0 K");
        }
    }

    /**
     * @param pBar constant pressure [bar]
     * @return 2000 K to 300 K in 1 K steps, equilibrium mode, boundaries to 0.05 K
     */
    public static SequenceSettings defaults(double pBar) {
        return new SequenceSettings(PressurePath.constant(pBar), 2000, 300, 1, 0, 0.05);
    }

    /** @return true when condensates are partly or fully withdrawn */
    public boolean isFractional() {
        return removalFraction > 0;
    }
}
