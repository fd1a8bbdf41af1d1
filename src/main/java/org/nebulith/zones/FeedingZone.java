package org.nebulith.zones;

import java.util.Objects;
import java.util.OptionalDouble;

/**
 * The region one planet accretes from.
 *
 * @param name             zone (planet) name
 * @param shape            kernel shape
 * @param rCenterAU        centre [AU], &gt; 0
 * @param halfWidthAU      half width (tophat) or sigma (gaussian) [AU], &gt; 0
 * @param planetMassMearth optional planet mass [M_earth] for the mass-radius estimate
 */
public record FeedingZone(String name, KernelShape shape, double rCenterAU, double halfWidthAU,
                          OptionalDouble planetMassMearth) {
    public FeedingZone {
        Objects.requireNonNull(name);
        Objects.requireNonNull(shape);
        Objects.requireNonNull(planetMassMearth);
        if (!(rCenterAU > 0) || !(halfWidthAU > 0) || Double.isInfinite(rCenterAU + halfWidthAU)) {
            throw new IllegalArgumentException("zone " + name + ": r_center_AU and half_width_AU must be finite and > 0");
        }
        if (rInner(shape, rCenterAU, halfWidthAU) <= 0) {
            throw new IllegalArgumentException("zone " + name + ": kernel reaches r <= 0 (inner edge "
                    + rInner(shape, rCenterAU, halfWidthAU) + " AU)");
        }
    }

    private static double rInner(KernelShape s, double c, double hw) {
        return c - s.supportInHalfWidths() * hw;
    }

    /** @return inner edge of the kernel's support [AU] */
    public double rInnerAU() {
        return rInner(shape, rCenterAU, halfWidthAU);
    }

    /** @return outer edge of the kernel's support [AU] */
    public double rOuterAU() {
        return rCenterAU + shape.supportInHalfWidths() * halfWidthAU;
    }

    /** @return the kernel weight at rAU, in [0, 1] */
    public double weight(double rAU) {
        return shape.weight(rAU, rCenterAU, halfWidthAU);
    }
}
