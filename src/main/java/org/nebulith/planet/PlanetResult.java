package org.nebulith.planet;

/**
 * A planet estimate, or the notice that its zone collected no solids.
 *
 * @param composition the composition, or null when there are no solids
 * @param notice      empty when there is a composition; otherwise a one-line explanation
 */
public record PlanetResult(PlanetComposition composition, String notice) {

    /** @return true if the zone collected solids */
    public boolean hasSolids() {
        return composition != null;
    }

    /** @return the composition @throws IllegalStateException with the notice if there are no solids */
    public PlanetComposition require() {
        if (composition == null) {
            throw new IllegalStateException(notice);
        }
        return composition;
    }
}
