package org.nebulith.planet.interior;

/**
 * What the structure of one planet is computed from.
 *
 * @param massMearth         total mass [M_earth], in [{@link #MASS_MIN}, {@link #MASS_MAX}]
 * @param coreMassFraction   core mass / rock mass (core + mantle, water excluded, as in the planet
 *                           command), in [0, 1]
 * @param waterMassFraction  water mass / total mass, in [0, 1)
 * @param mantle             the mantle's composition
 * @param core               the core's light elements
 */
public record InteriorModel(double massMearth, double coreMassFraction, double waterMassFraction,
                            MantleComposition mantle, CoreComposition core) {
    /** Smallest mass the model accepts [M_earth] (about a fifth of the Moon's). */
    public static final double MASS_MIN = 0.002;
    /** Largest mass the model accepts [M_earth]: beyond it the cold fits are extrapolated too far. */
    public static final double MASS_MAX = 30;

    public InteriorModel {
        if (!(massMearth >= MASS_MIN && massMearth <= MASS_MAX)) {
            throw new IllegalArgumentException("mass must be in [" + MASS_MIN + ", " + MASS_MAX + "] M_earth, got "
                    + massMearth);
        }
        if (!(coreMassFraction >= 0 && coreMassFraction <= 1)) {
            throw new IllegalArgumentException("core mass fraction must be in [0, 1], got " + coreMassFraction);
        }
        if (!(waterMassFraction >= 0 && waterMassFraction < 1)) {
            throw new IllegalArgumentException("water mass fraction must be in [0, 1), got " + waterMassFraction);
        }
        if (mantle == null || core == null) {
            throw new IllegalArgumentException("mantle and core compositions are required");
        }
    }

    /**
     * @param massMearth       mass [M_earth]
     * @param coreMassFraction core mass fraction of the rock
     * @return a planet of pure iron and MgSiO3 (the convention of the published curves), no water
     */
    public static InteriorModel ironAndMgSilicate(final double massMearth, final double coreMassFraction) {
        return new InteriorModel(massMearth, coreMassFraction, 0, MantleComposition.magnesiumSilicate(),
                CoreComposition.pureIron());
    }

    /** @return the same planet with another mass */
    public InteriorModel withMass(final double m) {
        return new InteriorModel(m, coreMassFraction, waterMassFraction, mantle, core);
    }

    /** @return the same planet with another core mass fraction */
    public InteriorModel withCoreMassFraction(final double cmf) {
        return new InteriorModel(massMearth, cmf, waterMassFraction, mantle, core);
    }
}
