package org.nebulith.thermo.mineral;

/**
 * Maier-Kelley heat capacity {@code Cp = a + b T + c T^-2} [J/(mol K)]
 * (Maier &amp; Kelley 1932, J. Am. Chem. Soc. 54, 3243; the form of the Cemdata18 rows,
 * Lothenbach et al. 2019, Cem. Concr. Res. 115, 472).
 */
public final class MaierKelleyHeatCapacity extends HeatCapacity {
    /** @param a J/(mol K) @param b J/(mol K^2) @param c J K/mol */
    public MaierKelleyHeatCapacity(double a, double b, double c) {
        super(new double[] {0, 1, -2}, new double[] {a, b, c});
    }
}
