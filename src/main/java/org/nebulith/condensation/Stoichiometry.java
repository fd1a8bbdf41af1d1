package org.nebulith.condensation;

import org.nebulith.equilibrium.ChemicalSystem;

/**
 * The member stoichiometries of a chemical system, copied once so that the sequence loops do not
 * ask the system for a fresh copy of every row at every step.
 */
final class Stoichiometry {
    private final double[][][] a;
    private final int elements;

    Stoichiometry(ChemicalSystem sys) {
        elements = sys.elementCount();
        a = new double[sys.phaseCount()][][];
        for (int p = 0; p < a.length; p++) {
            int nk = sys.memberNames(p).size();
            a[p] = new double[nk][];
            for (int k = 0; k < nk; k++) {
                a[p][k] = sys.memberStoichiometry(p, k);
            }
        }
    }

    /** @param p phase @param k member @return atoms of each element per formula unit (shared, do not modify) */
    double[] of(int p, int k) {
        return a[p][k];
    }

    /** @param p phase @return number of members */
    int members(int p) {
        return a[p].length;
    }

    /**
     * @param amounts moles per phase and member (condensed phases only are summed, from p = 1)
     * @return moles of each element in those amounts
     */
    double[] condensedElements(double[][] amounts) {
        int ne = elements;
        double[] out = new double[ne];
        for (int p = 1; p < a.length; p++) {
            for (int k = 0; k < a[p].length; k++) {
                double n = amounts[p][k];
                if (n > 0) {
                    double[] row = a[p][k];
                    for (int j = 0; j < ne; j++) {
                        out[j] += n * row[j];
                    }
                }
            }
        }
        return out;
    }
}
