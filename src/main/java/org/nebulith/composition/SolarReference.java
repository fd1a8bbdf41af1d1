package org.nebulith.composition;

/**
 * The solar composition that stellar [X/H] values are measured against.
 *
 * <p>Catalogue [X/H] are photospheric differences. With {@link #ASPLUND2009} (default) they are
 * applied to the photospheric table. With {@link #LODDERS2003} they are applied to the
 * proto-solar Table 2 (the reference data hold no confirmed photospheric Lodders table); the
 * settling offset (about 0.07 dex) is nearly the same for all metals, so metal ratios such as Mg/Si
 * and Fe/Si are unaffected, but metals/H are then proto-solar (bulk) rather than photospheric.
 */
public enum SolarReference {
    /** Asplund et al. 2009, ARA&amp;A 47, 481, Table 1, photosphere. */
    ASPLUND2009(AbundancePresets.PHOTOSPHERE_ASPLUND2009),
    /** Lodders 2003, ApJ 591, 1220, Table 2, proto-solar. */
    LODDERS2003(AbundancePresets.PROTOSOLAR_LODDERS2003);

    private final String preset;

    SolarReference(String preset) {
        this.preset = preset;
    }

    /** @return the preset name */
    public String presetName() {
        return preset;
    }

    /** @return the reference composition */
    public ElementAbundances abundances() {
        return AbundancePresets.preset(preset).abundances();
    }
}
