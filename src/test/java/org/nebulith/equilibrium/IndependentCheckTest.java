package org.nebulith.equilibrium;

import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;

/** The {@link IndependentCheck} can fail: it rejects states that are not the equilibrium. */
class IndependentCheckTest {
    private static final ElementAbundances SOLAR =
            AbundancePresets.preset(AbundancePresets.PROTOSOLAR_LODDERS2003).abundances().perH();

    @Test
    void acceptsTheEquilibrium() {
        SystemSpec spec = SystemSpec.defaults();
        EquilibriumResult r = solve(spec, 1100);
        assertNull(new IndependentCheck(spec).check(r).failure());
    }

    /** Pure forsterite beside an absent olivine solution: the solution is supersaturated (ideal mixing, common practice). */
    @Test
    void flagsAnAbsentSupersaturatedSolution() {
        EquilibriumResult pure = solve(SystemSpec.defaults().withSolutions(List.of()), 1300);
        assertTrue(pure.presentPhaseNames().contains("forsterite"), "forsterite condenses at 1300 K, 1e-4 bar");
        SystemSpec withOlivine = SystemSpec.defaults().withSolutions(List.of(SolutionModels.OLIVINE));
        String f = new IndependentCheck(withOlivine).check(pure).failure();
        assertNotNull(f);
        assertTrue(f.contains("olivine"), f);
    }

    /** Moving one condensed amount by 1e-6 of itself breaks the element balance. */
    @Test
    void flagsABalanceError() {
        SystemSpec spec = SystemSpec.defaults();
        EquilibriumResult r = solve(spec, 1100);
        ChemicalSystem sys = r.system();
        int np = sys.phaseCount();
        double[] phaseMoles = new double[np];
        double[][] memberMoles = new double[np][];
        String[][] species = new String[np][];
        for (int p = 0; p < np; p++) {
            phaseMoles[p] = r.phaseMoles(p);
            int k = sys.memberNames(p).size();
            memberMoles[p] = new double[k];
            species[p] = new String[k];
            for (int i = 0; i < k; i++) {
                memberMoles[p][i] = r.memberMoles(p, i);
                species[p][i] = r.memberSpecies(p, i).isEmpty() ? null : r.memberSpecies(p, i);
            }
        }
        int first = r.presentCondensedPhases()[0];
        memberMoles[first][0] *= 1 + 1e-6;
        EquilibriumResult bad = new EquilibriumResult(r.problem(), r.elementPotentials(), phaseMoles, memberMoles, species,
                r.diagnostics(), r.iterate);
        String f = new IndependentCheck(spec).check(bad).failure();
        assertNotNull(f);
        assertTrue(f.contains("balance"), f);
    }

    private static EquilibriumResult solve(SystemSpec spec, double tK) {
        ChemicalSystem sys = spec.build(SOLAR.elements());
        return new EquilibriumSolver().solve(EquilibriumProblem.of(sys, tK, 1e-4, SOLAR.asMap()));
    }
}
