package org.nebulith.thermo.mineral;

/**
 * Berman heat capacity {@code Cp = k0 + k1 T^-1/2 + k2 T^-2 + k3 T^-3} [J/(mol K)]
 * (Berman &amp; Brown 1985, Contrib. Mineral. Petrol. 89, 168; Berman 1988, J. Petrol. 29, 445, eq. 4).
 * Also the form of the MELTS solid table (Ghiorso &amp; Sack 1995) and of Zhu &amp; Sverjensky 1992.
 */
public final class BermanHeatCapacity extends HeatCapacity {
    /** @param k0 J/(mol K) @param k1 J/(mol K^1/2) @param k2 J K/mol @param k3 J K^2/mol */
    public BermanHeatCapacity(double k0, double k1, double k2, double k3) {
        super(new double[] {0, -0.5, -2, -3}, new double[] {k0, k1, k2, k3});
    }
}
