package org.nebulith.planet.interior;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** The inversion of a mass and radius into a core mass fraction. */
@Tag("slow")
class CoreMassFractionInversionTest {
    private final StructureSolver solver = new StructureSolver();

    @Test
    void gridInterpolationMatchesDirectSolutions() {
        InteriorModel base = InteriorModel.ironAndMgSilicate(2, 0.3);
        MassRadiusGrid grid = new MassRadiusGrid(base, 1.2, 3.1, solver);
        for (double m : new double[] {1.3, 2.05, 2.9}) {
            for (double c : new double[] {0.05, 0.33, 0.77}) {
                double direct = solver.solve(base.withMass(m).withCoreMassFraction(c)).radiusRearth();
                assertEquals(direct, grid.radiusRearth(m, c), 1e-3 * direct, m + ", " + c);
            }
        }
    }

    @Test
    void inversionReturnsTheCoreFractionItWasBuiltFrom() {
        InteriorModel base = new InteriorModel(3, 0.45, 0, MantleComposition.of(1.1, 92), new CoreComposition(3, 0));
        double r = solver.solve(base).radiusRearth();
        MassRadiusGrid grid = new MassRadiusGrid(base, 2.9, 3.1, solver);
        assertEquals(0.45, grid.coreMassFraction(3, r), 2e-3);
        CoreMassFractionInversion.Result res = CoreMassFractionInversion.invert(grid, 3, 0.01, r, 0.001, 2000, 5);
        assertEquals(0.45, res.median(), 0.01);
        assertTrue(res.p16() < 0.45 && res.p84() > 0.45);
        assertEquals(0, res.denserThanIron(), 0);
        assertEquals(0, res.lighterThanRock(), 0);
    }

    @Test
    void sameSeedSameResult() {
        MassRadiusGrid grid = new MassRadiusGrid(InteriorModel.ironAndMgSilicate(1, 0.3), 0.5, 1.5, solver);
        CoreMassFractionInversion.Result a = CoreMassFractionInversion.invert(grid, 1, 0.1, 1, 0.05, 500, 9);
        CoreMassFractionInversion.Result b = CoreMassFractionInversion.invert(grid, 1, 0.1, 1, 0.05, 500, 9);
        assertEquals(a, b);
    }

    @Test
    void tooDenseAndTooLightDrawsAreCountedApart() {
        MassRadiusGrid grid = new MassRadiusGrid(InteriorModel.ironAndMgSilicate(1, 0.3), 0.8, 1.2, solver);
        double iron = solver.solve(InteriorModel.ironAndMgSilicate(1, 1)).radiusRearth();
        double rock = solver.solve(InteriorModel.ironAndMgSilicate(1, 0)).radiusRearth();
        CoreMassFractionInversion.Result dense = CoreMassFractionInversion.invert(grid, 1, 0.01, 0.9 * iron, 0.005, 500, 1);
        assertEquals(1, dense.denserThanIron(), 0);
        assertEquals(1, dense.median(), 0);
        CoreMassFractionInversion.Result light = CoreMassFractionInversion.invert(grid, 1, 0.01, 1.1 * rock, 0.005, 500, 1);
        assertEquals(1, light.lighterThanRock(), 0);
        assertEquals(0, light.median(), 0);
    }
}
