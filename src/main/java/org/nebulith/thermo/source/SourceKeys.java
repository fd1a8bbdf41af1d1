package org.nebulith.thermo.source;

/**
 * Source keys of the species database are named after the primary publication (author year:
 * {@code McBride2002}, {@code HollandPowell2011}, ...); the files the numbers were read from are
 * recorded in {@code src/data/thermo-sources/PROVENANCE.md} only. The keys and citations are declared
 * in the database header ({@link SpeciesFileWriter}); the mineral table's source column is mapped to
 * them by {@link MineralTableReader}.
 */
public final class SourceKeys {
    /** The NASA Glenn coefficients: McBride, Zehe &amp; Gordon (2002) NASA TP-2002-211556. */
    public static final String NASA = "McBride2002";

    private SourceKeys() {
    }
}
