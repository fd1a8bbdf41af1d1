package org.nebulith.planet;

import java.util.Locale;
import java.util.Optional;

/**
 * The mass-radius estimate of a zone's planet (Zeng, Sasselov &amp; Jacobsen 2016, {@link MassRadius}),
 * or why it does not apply. The relation is a fit for an Fe core under a MgSiO3 mantle, core mass
 * fraction 0-0.4, 1-8 Earth masses, without water or gas: a body outside that composition gets no
 * radius; a mass outside 1-8 Earth masses gets a radius marked as extrapolated.
 *
 * @param radiusRearth the radius [R_earth], empty when the relation does not apply
 * @param note         empty inside the fit's range; otherwise "extrapolated: ..." or "not applicable: ..."
 */
public record PlanetRadius(Optional<Double> radiusRearth, String note) {
    /** Ice mass fraction above which the rock-only relation is not used. */
    public static final double ICE_LIMIT = 0.05;

    /**
     * @param massMearth the planet's mass [M_earth]
     * @param c          its composition
     * @return the estimate
     */
    public static PlanetRadius zeng2016(double massMearth, PlanetComposition c) {
        if (!c.hasRock()) {
            return none("no rock");
        }
        double refractory = c.refractoryOxideFraction();
        if (refractory > ZoneNotices.REFRACTORY_LIMIT) {
            return none(String.format(Locale.ROOT, "solids %.0f %% refractory oxides, outside the Fe core + MgSiO3"
                    + " mantle of the fit", 100 * refractory));
        }
        if (c.iceMassFraction() > ICE_LIMIT) {
            return none(String.format(Locale.ROOT, "%.0f %% ice; the fit is for rock without water",
                    100 * c.iceMassFraction()));
        }
        double cmf = c.coreMassFraction();
        if (cmf > MassRadius.CMF_MAX) {
            return none(String.format(Locale.ROOT, "core mass fraction %.3f beyond the fit's 0-0.4", cmf));
        }
        double r = MassRadius.radiusRearth(massMearth, cmf);
        if (massMearth < MassRadius.M_MIN || massMearth > MassRadius.M_MAX) {
            return new PlanetRadius(Optional.of(r), "extrapolated: the fit covers 1-8 Earth masses");
        }
        return new PlanetRadius(Optional.of(r), "");
    }

    private static PlanetRadius none(String why) {
        return new PlanetRadius(Optional.empty(), "not applicable: " + why);
    }
}
