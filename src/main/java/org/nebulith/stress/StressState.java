package org.nebulith.stress;

import java.util.Locale;

import org.nebulith.composition.ElementAbundances;

/**
 * One random state of the stress series.
 *
 * @param index          position in the series (0-based)
 * @param tK             temperature [K]
 * @param pBar           pressure [bar]
 * @param composition    element amounts [mol per mol H]
 * @param carbonToOxygen the molar C/O imposed
 * @param dust           the dust enrichment factor applied
 */
public record StressState(long index, double tK, double pBar, ElementAbundances composition, double carbonToOxygen,
                          double dust) {

    /**
     * @param pureOnly true for the pure-phase mode ({@code --solutions none})
     * @return a {@code nebulith point} command line that solves this state from a cold start
     */
    public String pointCommand(boolean pureOnly) {
        return "nebulith point --T-K " + tK + " --P-bar " + pBar + " --elements " + composition.toInline()
                + (pureOnly ? " --solutions none" : "");
    }

    @Override
    public String toString() {
        return String.format(Locale.ROOT, "#%d: T = %.6g K, P = %.6g bar, C/O = %.4g, dust x%.4g", index, tK, pBar,
                carbonToOxygen, dust);
    }
}
