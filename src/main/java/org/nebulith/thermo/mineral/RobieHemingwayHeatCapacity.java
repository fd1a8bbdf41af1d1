package org.nebulith.thermo.mineral;

/**
 * Robie &amp; Hemingway heat-capacity polynomial
 * {@code Cp = a + b T + c T^-2 + d T^-1/2 + e T^2} [J/(mol K)]
 * (Robie &amp; Hemingway 1995, USGS Bulletin 2131, doi:10.3133/b2131).
 */
public final class RobieHemingwayHeatCapacity extends HeatCapacity {
    /** @param a J/(mol K) @param b J/(mol K^2) @param c J K/mol @param d J/(mol K^1/2) @param e J/(mol K^3) */
    public RobieHemingwayHeatCapacity(double a, double b, double c, double d, double e) {
        super(new double[] {0, 1, -2, -0.5, 2}, new double[] {a, b, c, d, e});
    }
}
