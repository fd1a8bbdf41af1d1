package org.nebulith.composition;

import org.nebulith.thermo.Element;

/** The unit of the {@code value} column of an abundance file. */
public enum AbundanceUnit {
    /** log10(N/N_H) + 12 [dex]. */
    LOG_EPS("log_eps"),
    /** atoms per 1e6 Si atoms (the cosmochemists' scale). */
    PER_1E6_SI("per_1e6_Si"),
    /** relative moles (any common scale). */
    MOL("mol"),
    /** mass percent; converted to moles with IUPAC atomic weights. */
    WT_PCT("wt_pct");

    private final String token;

    AbundanceUnit(String token) {
        this.token = token;
    }

    /** @return the spelling used in files */
    public String token() {
        return token;
    }

    /**
     * @param value a file value in this unit
     * @param e     its element
     * @return the relative amount of atoms
     */
    public double toRelativeMoles(double value, Element e) {
        switch (this) {
            case LOG_EPS:
                return Math.pow(10.0, value - 12.0);
            case WT_PCT:
                return value / e.atomicWeight();
            default:
                return value;
        }
    }

    /** @return the unit spelled {@code token}, or null */
    public static AbundanceUnit fromToken(String token) {
        for (AbundanceUnit u : values()) {
            if (u.token.equals(token.trim())) {
                return u;
            }
        }
        return null;
    }

    /** @return the accepted spellings, for messages */
    public static String accepted() {
        StringBuilder b = new StringBuilder();
        for (AbundanceUnit u : values()) {
            b.append(b.length() == 0 ? "" : ", ").append(u.token);
        }
        return b.toString();
    }
}
