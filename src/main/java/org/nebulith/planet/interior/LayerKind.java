package org.nebulith.planet.interior;

/** The layers (and mantle phase regions) of the interior model, with their profile labels. */
public enum LayerKind {
    /** Iron core (with its light elements). */
    CORE("core"),
    /** Lower mantle below the post-bridgmanite transition. */
    MANTLE_POST_BRIDGMANITE("mantle_post_bridgmanite"),
    /** Lower mantle: bridgmanite with ferropericlase or silica. */
    MANTLE_BRIDGMANITE("mantle_bridgmanite"),
    /** Upper mantle: olivine and pyroxene (or periclase or silica). */
    MANTLE_OLIVINE_PYROXENE("mantle_olivine_pyroxene"),
    /** Water as high-pressure ice. */
    WATER_ICE("water_ice");

    private final String label;

    LayerKind(final String label) {
        this.label = label;
    }

    /** @return the label written in the {@code layer} column of profiles */
    public String label() {
        return label;
    }
}
