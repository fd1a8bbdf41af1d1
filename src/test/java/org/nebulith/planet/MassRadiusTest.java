package org.nebulith.planet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The mass-radius relation of Zeng, Sasselov &amp; Jacobsen 2016 (ApJ 819, 127; arXiv:1512.08827v2,
 * abstract and eq. 1): R / R_earth = (1.07 - 0.21 CMF) (M / M_earth)^(1/3.7), valid for 1-8 M_earth and
 * CMF 0-0.4. The expected radii below are the published relation evaluated by hand at the corners of its
 * validity range and written out as numbers, so a change of a coefficient or of the exponent fails.
 */
class MassRadiusTest {

    /** Published relation at the corners of its validity range (hand-evaluated, 1e-12 relative). */
    @Test
    void radiiAtTheCornersOfThePublishedRange() {
        assertEquals(1.07, MassRadius.radiusRearth(1, 0), 1e-12);
        assertEquals(0.986, MassRadius.radiusRearth(1, 0.4), 1e-12);
        assertEquals(1.8769908371662154, MassRadius.radiusRearth(8, 0), 1e-12);
        assertEquals(1.7572668889077163, MassRadius.radiusRearth(8, 0.325), 1e-12);
        assertEquals(1.4646990070045187, MassRadius.radiusRearth(4, 0.3), 1e-12);
    }

    /**
     * The relation is calibrated on the Earth (PREM): the Earth's core mass fraction 0.325 (Dziewonski
     * &amp; Anderson 1981 PREM, common practice) at 1 M_earth gives the Earth's radius within 0.2 %.
     */
    @Test
    void earthIsRecovered() {
        assertEquals(1.0, MassRadius.radiusRearth(1.0, 0.325), 0.002);
        assertEquals(0.325, MassRadius.coreMassFraction(1.0, 1.00175), 1e-12);
        assertTrue(MassRadius.validityFlags(1.0, 0.325).isEmpty());
    }

    /** Outside 1-8 M_earth or CMF 0-0.4 the result is flagged, as the paper states its range. */
    @Test
    void outsideThePublishedRangeIsFlagged() {
        assertFalse(MassRadius.validityFlags(0.5, 0.3).isEmpty());
        assertFalse(MassRadius.validityFlags(9, 0.3).isEmpty());
        assertFalse(MassRadius.validityFlags(2, -0.1).isEmpty());
        assertFalse(MassRadius.validityFlags(2, 0.5).isEmpty());
    }

    /** The Monte Carlo CMF agrees with linear error propagation (exact for a nearly linear map). */
    @Test
    void impliedCmfWithErrors() {
        MassRadius.CmfEstimate e = MassRadius.impliedCoreMassFraction(4, 0.04, 1.4646990070045187, 0.005, 20000, 42);
        assertEquals(0.3, e.cmf(), 1e-12);
        assertEquals(e.sigmaLinear(), (e.p84() - e.p16()) / 2, 0.05 * e.sigmaLinear());
        assertEquals(0.3, e.median(), 0.2 * e.sigmaLinear());
        assertTrue(e.flags().isEmpty());
        assertEquals(e, MassRadius.impliedCoreMassFraction(4, 0.04, 1.4646990070045187, 0.005, 20000, 42));
        MassRadius.CmfEstimate puffy = MassRadius.impliedCoreMassFraction(0.5, 0.05, 1.1, 0.05, 100, 1);
        assertEquals(0.0, puffy.clamped(), 0);
        assertEquals(2, puffy.flags().size(), puffy.flags().toString());
    }
}
