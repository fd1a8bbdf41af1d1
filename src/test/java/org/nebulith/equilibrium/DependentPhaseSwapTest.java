package org.nebulith.equilibrium;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;

/**
 * Where spinel takes over from picrochromite (MgCr2O4 = spinel + chromite - hercynite, a combination
 * of the solution's end-members) in the proto-solar gas at 1e-4 bar, near 729 K in the default
 * sequence (common practice: the one-site ideal spinel of this data set): the warm step across it
 * reaches the equilibrium that the independent check accepts, and the swap is made at once instead of
 * after a creeping Newton solve with both phases.
 */
class DependentPhaseSwapTest {
    private static final ElementAbundances SOLAR =
            AbundancePresets.preset(AbundancePresets.PROTOSOLAR_LODDERS2003).abundances().perH();

    @Test
    void spinelReplacesPicrochromiteInOneSwap() {
        SystemSpec spec = SystemSpec.defaults();
        ChemicalSystem sys = spec.build(SOLAR.elements());
        EquilibriumSolver solver = new EquilibriumSolver();
        EquilibriumResult warm = solver.solve(EquilibriumProblem.of(sys, 730, 1e-4, SOLAR.asMap()));
        assertTrue(warm.presentPhaseNames().contains("picrochromite"), "picrochromite at 730 K: " + warm.presentPhaseNames());
        assertFalse(warm.presentPhaseNames().contains("spinel"), "no spinel at 730 K");
        EquilibriumResult r = solver.solve(EquilibriumProblem.of(sys, 728, 1e-4, SOLAR.asMap()), WarmStart.of(warm));
        assertTrue(r.presentPhaseNames().contains("spinel"), "spinel at 728 K: " + r.presentPhaseNames());
        assertFalse(r.presentPhaseNames().contains("picrochromite"), "picrochromite gone at 728 K");
        assertNull(new IndependentCheck(spec).check(r).failure());
        int its = r.diagnostics().newtonIterations();
        // before the direct swap: 16 Newton iterations and 2 changes (add spinel, creep, swap); after: 9 and 1
        assertEquals(1, r.diagnostics().phaseChanges(), "one change: spinel for picrochromite");
        assertTrue(its <= 10, its + " Newton iterations");
    }
}
