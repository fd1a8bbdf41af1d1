package org.nebulith.planet;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Zeng, Sasselov & Jacobsen 2016, ApJ 819, 127: R = (1.07 - 0.21 CMF) M^(1/3.7). */
class MassRadiusTest {

    /** The paper's own example: an Earth-like CMF of 0.325 at 1 M_earth gives R = 1.0 R_earth. */
    @Test
    void earthLikeExample() {
        assertEquals(1.0, MassRadius.radiusRearth(1.0, 0.325), 0.005);
        assertEquals(0.325, MassRadius.coreMassFraction(1.0, MassRadius.radiusRearth(1.0, 0.325)), 1e-14);
        assertEquals(1.07 * Math.pow(8, 1 / 3.7), MassRadius.radiusRearth(8, 0), 1e-14);
        assertTrue(MassRadius.validityFlags(1.0, 0.325).isEmpty());
    }

    @Test
    void impliedCmfWithErrors() {
        double r = MassRadius.radiusRearth(4, 0.3);
        MassRadius.CmfEstimate e = MassRadius.impliedCoreMassFraction(4, 0.04, r, 0.005, 20000, 42);
        assertEquals(0.3, e.cmf(), 1e-12);
        assertEquals(e.sigmaLinear(), (e.p84() - e.p16()) / 2, 0.05 * e.sigmaLinear());
        assertEquals(0.3, e.median(), 0.2 * e.sigmaLinear());
        assertTrue(e.flags().isEmpty());
        assertEquals(e, MassRadius.impliedCoreMassFraction(4, 0.04, r, 0.005, 20000, 42));
        MassRadius.CmfEstimate puffy = MassRadius.impliedCoreMassFraction(0.5, 0.05, 1.1, 0.05, 100, 1);
        assertEquals(0.0, puffy.clamped(), 0);
        assertEquals(2, puffy.flags().size(), puffy.flags().toString());
    }
}
