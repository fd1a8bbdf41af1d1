package org.nebulith.zones;

/**
 * How well a zone's radial integral is known.
 *
 * @param worstLoAU       inner edge of the panel with the largest estimated error [AU]
 * @param worstHiAU       its outer edge [AU]
 * @param worstRelError   that panel's estimated error, relative to the zone's integral of the
 *                        component group concerned (trace groups: to the trace floor)
 * @param totalRelError   the summed error estimate of all panels, relative, worst group
 * @param acceptedPanels  panels accepted because their error stopped falling when halved (within
 *                        the data's continuity); 0 when every panel met the tolerance
 * @param fixedRule       true for the fixed composite rule (no error estimate: the error fields are 0)
 */
public record IntegrationQuality(double worstLoAU, double worstHiAU, double worstRelError, double totalRelError,
                                 int acceptedPanels, boolean fixedRule) {

    /** @return the quality record of a fixed composite rule */
    public static IntegrationQuality fixed() {
        return new IntegrationQuality(0, 0, 0, 0, 0, true);
    }

    /** @return the radius at the middle of the worst panel [AU] */
    public double worstRadiusAU() {
        return 0.5 * (worstLoAU + worstHiAU);
    }
}
