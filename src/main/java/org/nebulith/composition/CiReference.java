package org.nebulith.composition;

import java.util.Arrays;
import java.util.stream.Collectors;

/**
 * The CI-chondrite composition used everywhere a CI chondrite enters a run: the dust added by dust
 * enrichment and the CI column of the planet comparisons. One choice per run, so the planet of a
 * dust-rich zone is never compared with another CI than the one that was added.
 * <ul>
 * <li>{@link #LODDERS_PALME_GAIL_2009} (default): Lodders, Palme &amp; Gail 2009 as listed in Asplund et al.
 *     2009 Table 1 (preset {@code ci-chondrite}; molar Mg/Si 1.047). Chosen because it is the only CI
 *     table in the reference data with C, N, O and Cl, which the dust must carry.</li>
 * <li>{@link #PALME_ONEILL_2014}: Palme &amp; O'Neill 2014 (preset {@code ci-chondrite-palme-oneill2014};
 *     Mg/Si 1.030); no C, N, Cl, so as dust it adds rock only.</li>
 * </ul>
 */
public enum CiReference {
    /** Lodders, Palme &amp; Gail 2009. */
    LODDERS_PALME_GAIL_2009("lodders-palme-gail2009", AbundancePresets.CI_CHONDRITE, "Lodders, Palme & Gail 2009"),
    /** Palme &amp; O'Neill 2014. */
    PALME_ONEILL_2014("palme-oneill2014", AbundancePresets.CI_CHONDRITE_PALME_ONEILL2014, "Palme & O'Neill 2014");

    /** The default choice. */
    public static final CiReference DEFAULT = LODDERS_PALME_GAIL_2009;

    private final String optionName;
    private final String preset;
    private final String citation;

    CiReference(String optionName, String preset, String citation) {
        this.optionName = optionName;
        this.preset = preset;
        this.citation = citation;
    }

    /** @return the name used by {@code --ci-reference} */
    public String optionName() {
        return optionName;
    }

    /** @return the abundance preset holding the composition */
    public String preset() {
        return preset;
    }

    /** @return the publication, for reports */
    public String citation() {
        return citation;
    }

    /** @return the composition (relative amounts) */
    public ElementAbundances abundances() {
        return AbundancePresets.preset(preset).abundances();
    }

    /**
     * @param name an option name
     * @return the reference
     * @throws IllegalArgumentException listing the accepted names
     */
    public static CiReference fromOptionName(String name) {
        for (CiReference r : values()) {
            if (r.optionName.equals(name)) {
                return r;
            }
        }
        throw new IllegalArgumentException("unknown CI reference '" + name + "'; accepted: " + accepted());
    }

    /** @return the option names, comma-separated */
    public static String accepted() {
        return Arrays.stream(values()).map(CiReference::optionName).collect(Collectors.joining(", "));
    }
}
