package org.nebulith.zones;

import java.util.Arrays;

/**
 * How {@link RadialIntegrator} judges its error: which integrand components are controlled
 * together (polymorphs and data pieces of one phase, whose sum is smooth where each of them jumps),
 * and how continuous the integrand can be at all.
 *
 * @param groupOf       for each integrand component, the index of its control group (0-based)
 * @param groups        number of groups (each index below it is used)
 * @param continuityRel relative size of the integrand's jumps that no refinement can remove (from
 *                      the thermodynamic data's own continuity, {@link org.nebulith.thermo.PieceJumps}),
 *                      &gt;= 0; a panel whose error stops falling when halved is accepted if its error is
 *                      within {@link RadialIntegrator#CONTINUITY_FACTOR} times this of its integral
 */
public record ErrorControl(int[] groupOf, int groups, double continuityRel) {
    public ErrorControl {
        groupOf = groupOf.clone();
        if (!(continuityRel >= 0) || Double.isInfinite(continuityRel)) {
            throw new IllegalArgumentException("continuity must be finite and >= 0, got " + continuityRel);
        }
        boolean[] used = new boolean[groups];
        for (int g : groupOf) {
            if (g < 0 || g >= groups) {
                throw new IllegalArgumentException("group index " + g + " outside 0.." + (groups - 1));
            }
            used[g] = true;
        }
        for (boolean u : used) {
            if (!u) {
                throw new IllegalArgumentException("every control group needs a component");
            }
        }
    }

    /**
     * @param dimension number of components
     * @return every component on its own, no continuity allowance
     */
    public static ErrorControl separate(int dimension) {
        int[] g = new int[dimension];
        Arrays.setAll(g, i -> i);
        return new ErrorControl(g, dimension, 0.0);
    }

    /** @return the group of each component (a copy) */
    @Override
    public int[] groupOf() {
        return groupOf.clone();
    }

    int group(int component) {
        return groupOf[component];
    }
}
