package org.nebulith.thermo.mineral;

/**
 * Holland &amp; Powell heat capacity {@code Cp = a + b T + c T^-2 + d T^-1/2} [J/(mol K)]
 * (Holland &amp; Powell 1998, J. Metamorphic Geol. 16, 309, eq. 1; used unchanged in ds62,
 * Holland &amp; Powell 2011, J. Metamorphic Geol. 29, 333).
 */
public final class HollandPowellHeatCapacity extends HeatCapacity {
    /** @param a J/(mol K) @param b J/(mol K^2) @param c J K/mol @param d J/(mol K^1/2) */
    public HollandPowellHeatCapacity(double a, double b, double c, double d) {
        super(new double[] {0, 1, -2, -0.5}, new double[] {a, b, c, d});
    }
}
