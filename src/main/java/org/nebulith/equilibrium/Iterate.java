package org.nebulith.equilibrium;

import java.util.Arrays;

/**
 * The mutable unknowns of the element-potential method: element potentials lambda [RT], the log
 * of the total gas moles, and the scaled amounts u of the active condensed phases
 * (moles = u x {@link StateData#scale}).
 */
final class Iterate {
    double[] lambda;
    double lnGas;
    int[] active;
    double[] u;

    Iterate(double[] lambda, double lnGas, int[] active, double[] u) {
        this.lambda = lambda;
        this.lnGas = lnGas;
        this.active = active;
        this.u = u;
    }

    Iterate copy() {
        return new Iterate(lambda.clone(), lnGas, active.clone(), u.clone());
    }

    int indexOf(int phase) {
        for (int q = 0; q < active.length; q++) {
            if (active[q] == phase) {
                return q;
            }
        }
        return -1;
    }

    void add(int phase, double amount) {
        active = Arrays.copyOf(active, active.length + 1);
        u = Arrays.copyOf(u, u.length + 1);
        active[active.length - 1] = phase;
        u[u.length - 1] = amount;
    }

    void remove(int q) {
        int n = active.length - 1;
        int[] a = new int[n];
        double[] v = new double[n];
        for (int i = 0, k = 0; i <= n; i++) {
            if (i != q) {
                a[k] = active[i];
                v[k++] = u[i];
            }
        }
        active = a;
        u = v;
    }
}
