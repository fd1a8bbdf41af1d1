package org.nebulith.equilibrium;

import java.util.List;

/**
 * A phase of a {@link ChemicalSystem}: its kind, name and constituents, with their stoichiometry
 * also laid out in flat arrays (the non-zero counts of member k at positions
 * {@code start[k]} to {@code start[k + 1] - 1}) for the sums over the hundreds of gas species
 * that every Newton evaluation makes.
 */
final class PhaseDef {
    final PhaseKind kind;
    final String name;
    final Constituent[] members;
    /** where each member's non-zero counts start in {@link #index} and {@link #count}; length members + 1 */
    final int[] start;
    /** element index of each non-zero count, member after member */
    final int[] index;
    /** the non-zero counts, member after member */
    final double[] count;
    /** site multiplicity of each member */
    final double[] multiplicity;

    PhaseDef(PhaseKind kind, String name, List<Constituent> members) {
        this.kind = kind;
        this.name = name;
        this.members = members.toArray(new Constituent[0]);
        start = new int[this.members.length + 1];
        multiplicity = new double[this.members.length];
        for (int k = 0; k < this.members.length; k++) {
            start[k + 1] = start[k] + this.members[k].nzIndex.length;
            multiplicity[k] = this.members[k].multiplicity;
        }
        index = new int[start[this.members.length]];
        count = new double[index.length];
        for (int k = 0; k < this.members.length; k++) {
            System.arraycopy(this.members[k].nzIndex, 0, index, start[k], this.members[k].nzIndex.length);
            System.arraycopy(this.members[k].nzCount, 0, count, start[k], this.members[k].nzCount.length);
        }
    }
}
