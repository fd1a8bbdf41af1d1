package org.nebulith.equilibrium;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.nebulith.thermo.Element;

/**
 * The oracle's 30 states (NASA CEA, Gordon &amp; McBride 1994, NASA RP-1311; see {@link OracleTest}),
 * each solved from the equilibrium of another composition at the same T and P, as a survey draw
 * starts from its star's nominal state: the answer must be CEA's all the same, and the composition
 * path ({@link CompositionPath}) must get there by itself in most of them.
 */
class CompositionPathTest {
    /**
     * Factors applied in turn to every element but H and He (invented; about 0.3 dex, where 17 of the
     * 30 states start from another assemblage; at 0.5 dex the path alone reaches 3 of 30 and the
     * interior-point path does the rest).
     */
    private static final double[] FACTORS = {2.0, 0.5, 1.5, 0.7, 1.8, 0.6};

    static List<OracleCases.Case> cases() {
        return OracleCases.all();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void reachesTheOracleFromAnotherComposition(OracleCases.Case c) {
        ChemicalSystem sys = OracleTest.system(c);
        EquilibriumSolver solver = new EquilibriumSolver();
        EquilibriumResult from = solver.solve(EquilibriumProblem.of(sys, c.tK(), c.pBar(), other(c)));
        EquilibriumResult r = solver.solve(EquilibriumProblem.of(sys, c.tK(), c.pBar(), c.amounts()), WarmStart.of(from));
        OracleTest.assertAgrees(c, sys, r);
    }

    @Test
    void thePathAloneReachesMostOfThem() {
        int reached = 0;
        int changed = 0;
        StringBuilder missed = new StringBuilder();
        EquilibriumSolver solver = new EquilibriumSolver();
        for (OracleCases.Case c : cases()) {
            ChemicalSystem sys = OracleTest.system(c);
            EquilibriumResult from = solver.solve(EquilibriumProblem.of(sys, c.tK(), c.pBar(), other(c)));
            EquilibriumProblem target = EquilibriumProblem.of(sys, c.tK(), c.pBar(), c.amounts());
            EquilibriumResult r = solver.alongComposition(target, WarmStart.of(from));
            if (!new TreeSet<>(from.presentPhaseNames()).equals(c.present())) {
                changed++;
            }
            if (r == null) {
                missed.append(' ').append(c.id());
                continue;
            }
            OracleTest.assertAgrees(c, sys, r);
            reached++;
        }
        System.out.printf("composition path: %d of %d oracle states reached by the path alone, %d of them from "
                + "another assemblage%n", reached, cases().size(), changed);
        assertTrue(changed >= 15, "the perturbed starts change the assemblage of " + changed + " states only");
        assertTrue(reached >= 27, reached + " of 30 reached by the path; missed:" + missed);
    }

    /** The case's composition with every element but H and He scaled by {@link #FACTORS} in turn. */
    private static Map<Element, Double> other(OracleCases.Case c) {
        Map<Element, Double> m = new EnumMap<>(Element.class);
        int i = 0;
        for (Map.Entry<Element, Double> e : new EnumMap<>(c.amounts()).entrySet()) {
            boolean carrier = e.getKey() == Element.H || e.getKey() == Element.He;
            m.put(e.getKey(), carrier ? e.getValue() : e.getValue() * FACTORS[i++ % FACTORS.length]);
        }
        return m;
    }
}
