package org.nebulith.equilibrium;

/**
 * Gaussian elimination with partial pivoting for the small Newton systems of the solver (tens of
 * unknowns). The systems are sparse (a pure phase's row and column hold only its stoichiometry;
 * trace elements couple to few others), so each elimination step updates only the columns where
 * the pivot row is non-zero: the same arithmetic as the dense loop, without its multiplications by
 * zero.
 */
final class LinearSystem {
    private LinearSystem() {
    }

    /**
     * Solves A x = r in place: on return r holds x. A is destroyed.
     *
     * @return false if the matrix is numerically singular
     */
    static boolean solve(double[][] a, double[] r, int n) {
        int[] nz = new int[n];
        for (int col = 0; col < n; col++) {
            int piv = col;
            double best = Math.abs(a[col][col]);
            for (int i = col + 1; i < n; i++) {
                double v = Math.abs(a[i][col]);
                if (v > best) {
                    best = v;
                    piv = i;
                }
            }
            if (!(best > 1e-300)) {
                return false;
            }
            if (piv != col) {
                double[] t = a[piv];
                a[piv] = a[col];
                a[col] = t;
                double tr = r[piv];
                r[piv] = r[col];
                r[col] = tr;
            }
            double[] rowc = a[col];
            double d = rowc[col];
            int count = 0;
            for (int k = col + 1; k < n; k++) {
                if (rowc[k] != 0) {
                    nz[count++] = k;
                }
            }
            for (int i = col + 1; i < n; i++) {
                double[] rowi = a[i];
                double v = rowi[col];
                if (v == 0) {
                    continue;
                }
                double f = v / d;
                if (f != 0) {
                    for (int t = 0; t < count; t++) {
                        int k = nz[t];
                        rowi[k] -= f * rowc[k];
                    }
                    r[i] -= f * r[col];
                }
            }
        }
        for (int i = n - 1; i >= 0; i--) {
            double s = r[i];
            double[] row = a[i];
            for (int k = i + 1; k < n; k++) {
                s -= row[k] * r[k];
            }
            r[i] = s / row[i];
            if (!Double.isFinite(r[i])) {
                return false;
            }
        }
        return true;
    }
}
