package org.nebulith.thermo.mineral;

import java.util.List;
import java.util.Map;

/**
 * The heat-capacity forms of mineral rows in the species file, with the parameter keys each needs.
 * Every form also needs {@code H_f_298} [J/mol] and {@code S_298} [J/(mol K)].
 */
public enum MineralForm {
    /** Holland &amp; Powell: a + b T + c T^-2 + d T^-1/2. */
    HP("hp", List.of("a", "b", "c", "d")),
    /** Berman: k0 + k1 T^-1/2 + k2 T^-2 + k3 T^-3. */
    BERMAN("berman", List.of("k0", "k1", "k2", "k3")),
    /** Robie &amp; Hemingway: a + b T + c T^-2 + d T^-1/2 + e T^2. */
    RH95("rh95", List.of("a", "b", "c", "d", "e")),
    /** Maier-Kelley: a + b T + c T^-2. */
    MAIER_KELLEY("maier-kelley", List.of("a", "b", "c"));

    private final String code;
    private final List<String> cpKeys;

    MineralForm(String code, List<String> cpKeys) {
        this.code = code;
        this.cpKeys = cpKeys;
    }

    /** @return the code used in the {@code form} column */
    public String code() {
        return code;
    }

    /** @return the heat-capacity coefficient keys, in polynomial order */
    public List<String> cpKeys() {
        return cpKeys;
    }

    /** @param code a form code @return the form, or null if unknown */
    public static MineralForm fromCode(String code) {
        for (MineralForm f : values()) {
            if (f.code.equals(code)) {
                return f;
            }
        }
        return null;
    }

    /** @param c coefficients by key @return the heat-capacity polynomial of this form */
    HeatCapacity heatCapacity(Map<String, Double> c) {
        switch (this) {
            case HP:
                return new HollandPowellHeatCapacity(c.get("a"), c.get("b"), c.get("c"), c.get("d"));
            case BERMAN:
                return new BermanHeatCapacity(c.get("k0"), c.get("k1"), c.get("k2"), c.get("k3"));
            case RH95:
                return new RobieHemingwayHeatCapacity(c.get("a"), c.get("b"), c.get("c"), c.get("d"), c.get("e"));
            case MAIER_KELLEY:
                return new MaierKelleyHeatCapacity(c.get("a"), c.get("b"), c.get("c"));
            default:
                throw new IllegalStateException("unhandled form " + this);
        }
    }
}
