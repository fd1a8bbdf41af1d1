package org.nebulith.equilibrium;

/**
 * The all-gas starting point of a cold start: each element as its monatomic gas, with mole
 * fraction equal to its share of the atoms. At the high starting temperature of the continuation
 * the gas is close to atomic, so Newton converges from here.
 */
final class GasGuess {
    private GasGuess() {
    }

    static Iterate initial(StateData st, double[] totals) {
        ChemicalSystem sys = st.system;
        int m = sys.elementCount();
        double sum = 0;
        for (double v : totals) {
            sum += v;
        }
        double[] lambda = new double[m];
        PhaseDef gas = sys.phase(0);
        for (int j = 0; j < m; j++) {
            double best = Double.NaN;
            double bestAtoms = Double.POSITIVE_INFINITY;
            for (int k = 0; k < gas.members.length; k++) {
                Constituent c = gas.members[k];
                if (st.c[0][k] == Double.POSITIVE_INFINITY || c.a[j] == 0) {
                    continue;
                }
                if (c.atoms < bestAtoms) {
                    bestAtoms = c.atoms;
                    best = (st.c[0][k] + Math.log(totals[j] / sum)) / c.a[j];
                }
            }
            if (Double.isNaN(best)) {
                throw new IllegalArgumentException("no gas species at " + st.tK + " K carries element "
                        + sys.elements().get(j));
            }
            lambda[j] = best;
        }
        return new Iterate(lambda, Math.log(sum), new int[0], new double[0]);
    }
}
