package org.nebulith.planet.interior;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

/**
 * The Earth against PREM (Dziewonski &amp; Anderson 1981, Phys. Earth Planet. Inter. 25, 297):
 * radius 6371 km, core radius 3480 km, central pressure 364 GPa.
 */
class EarthStructureTest {
    /** Core mass fraction of the Earth: McDonough 2003 (Treatise on Geochemistry 2, 547). */
    private static final double EARTH_CMF = 0.325;
    /**
     * The light elements of McDonough's 2003 core model: Si 6.0, S 1.9, C 0.2, P 0.2, H 0.06 wt%
     * (from memory), 8.4 wt% in all, carried by the model's FeSi stand-in.
     */
    private static final double MCDONOUGH_LIGHT_WT_PCT = 8.4;

    private final StructureSolver solver = new StructureSolver();

    @Test
    void earthWithItsLightCoreMatchesPrem() {
        Structure s = solver.solve(new InteriorModel(1, EARTH_CMF, 0, MantleComposition.magnesiumSilicate(),
                new CoreComposition(MCDONOUGH_LIGHT_WT_PCT, 0)));
        assertEquals(6371, s.radiusKm(), 0.02 * 6371, "radius within 2 % of PREM");
        assertEquals(3480, s.coreRadiusKm(), 0.05 * 3480, "core radius within 5 % of PREM");
        assertEquals(364, s.centralGpa(), 0.10 * 364, "central pressure within 10 % of PREM");
    }

    @Test
    void defaultIronCoreGivesEarthRadiusWithinTwoPercent() {
        Structure s = solver.solve(InteriorModel.ironAndMgSilicate(1, EARTH_CMF));
        assertEquals(6371, s.radiusKm(), 0.02 * 6371, "PREM radius");
        assertEquals(3480, s.coreRadiusKm(), 0.06 * 3480, "a pure cold iron core is smaller than PREM's");
        assertTrue(s.centralGpa() > 364, "a pure cold iron core is denser than Earth's: higher central pressure");
    }

    @Test
    void profileIsConsistentWithHydrostaticEquilibrium() {
        Structure s = solver.solve(new InteriorModel(2, 0.3, 0.1, MantleComposition.of(1.2, 90), CoreComposition.pureIron()));
        List<ProfilePoint> p = s.profile();
        assertEquals(0, p.get(0).rKm(), 0.01);
        ProfilePoint last = p.get(p.size() - 1);
        assertEquals(2, last.mMearth(), 1e-8, "the surface encloses the mass");
        assertEquals(0, last.pGpa(), 1e-6);
        assertEquals(s.radiusKm(), last.rKm(), 1e-6);
        // dP/dr = -g rho between neighbouring points (trapezoid, away from the layer jumps)
        int checked = 0;
        for (int i = 1; i < p.size(); i++) {
            ProfilePoint a = p.get(i - 1);
            ProfilePoint b = p.get(i);
            double dr = (b.rKm() - a.rKm()) * 1e3;
            if (a.layer() != b.layer() || dr < 5e3) {
                continue;
            }
            double dp = (b.pGpa() - a.pGpa()) * 1e9;
            double expect = -0.5 * (a.gMs2() * a.rhoKgM3() + b.gMs2() * b.rhoKgM3()) * dr;
            assertEquals(expect, dp, 2e-3 * Math.abs(expect) + 1e4, "at r = " + a.rKm());
            checked++;
        }
        assertTrue(checked > 100);
        assertTrue(p.stream().anyMatch(x -> x.layer() == LayerKind.WATER_ICE));
        assertTrue(p.stream().anyMatch(x -> x.layer() == LayerKind.MANTLE_OLIVINE_PYROXENE));
    }

    @Test
    void meanDensityMatchesTheEarthsWithinFourPercent() {
        // Earth's mean density 5514 kg/m3 (common practice)
        Structure s = solver.solve(InteriorModel.ironAndMgSilicate(1, EARTH_CMF));
        assertEquals(5514, s.meanDensity(), 0.04 * 5514, "cold, so a little denser");
    }
}
