package org.nebulith.equilibrium;

import java.util.List;

import org.nebulith.thermo.Species;

/**
 * One member of a phase in a {@link ChemicalSystem}: a gas species, a pure condensed species or a
 * solution end-member, with its stoichiometry over the system's elements.
 */
final class Constituent {
    final String name;
    final double[] a;
    final int[] nzIndex;
    final double[] nzCount;
    final double multiplicity;
    final Species[] candidates;
    final double atoms;

    Constituent(String name, double[] a, double multiplicity, List<Species> candidates) {
        this.name = name;
        this.a = a;
        this.multiplicity = multiplicity;
        this.candidates = candidates.toArray(new Species[0]);
        int nz = 0;
        double at = 0;
        for (double v : a) {
            if (v != 0) {
                nz++;
                at += v;
            }
        }
        this.atoms = at;
        nzIndex = new int[nz];
        nzCount = new double[nz];
        int k = 0;
        for (int j = 0; j < a.length; j++) {
            if (a[j] != 0) {
                nzIndex[k] = j;
                nzCount[k++] = a[j];
            }
        }
    }

    /** @return a . lambda */
    double dot(double[] lambda) {
        double s = 0;
        for (int k = 0; k < nzIndex.length; k++) {
            s += nzCount[k] * lambda[nzIndex[k]];
        }
        return s;
    }

    /**
     * @param tK temperature [K]
     * @return the valid candidate with the lowest G/RT, or null if none is valid
     */
    Species stableCandidate(double tK) {
        Species best = null;
        double g = Double.POSITIVE_INFINITY;
        for (Species s : candidates) {
            if (s.isValidAt(tK)) {
                double gs = s.thermo().gOverRT(tK);
                if (gs < g) {
                    g = gs;
                    best = s;
                }
            }
        }
        return best;
    }
}
