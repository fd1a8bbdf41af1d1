package org.nebulith.equilibrium;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * All 30 fixed-T,P cases of the oracle (source: NASA CEA, Gordon &amp; McBride 1994, NASA RP-1311,
 * as packaged in Debian rocketcea 1.1.18, with the NASA Glenn data it ships; see
 * {@code src/test/resources/oracle/README.md}): with the same species lists, data set {@code nasa}
 * and no solutions, the condensed phases present are the same, and every condensed amount and every
 * gas with mole fraction above 1e-15 agrees with CEA's polished mole numbers to 1e-6 relative; the
 * result passes the {@link IndependentCheck}, and its total Gibbs energy is not above CEA's.
 */
class OracleTest {
    /** Relative agreement required with {@code moles_polished}. */
    static final double REL_TOL = 1e-6;
    /** Gases below this mole fraction are not compared (CEA's own trace limit is far below). */
    static final double TRACE = 1e-15;

    private static final Map<Set<String>, ChemicalSystem> SYSTEMS = new HashMap<>();
    private static double worst;
    private static String worstAt = "";

    static List<OracleCases.Case> cases() {
        return OracleCases.all();
    }

    static synchronized ChemicalSystem system(OracleCases.Case c) {
        return SYSTEMS.computeIfAbsent(Set.of(c.gasList(), c.condensedList()),
                k -> c.spec().build(c.amounts().keySet()));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void reproducesTheOracle(OracleCases.Case c) {
        assertEquals(30, cases().size(), "the oracle has 30 cases");
        ChemicalSystem sys = system(c);
        EquilibriumResult r = new EquilibriumSolver().solve(EquilibriumProblem.of(sys, c.tK(), c.pBar(), c.amounts()));
        assertAgrees(c, sys, r);
    }

    /**
     * The comparisons of {@link #reproducesTheOracle}: independent check, phases present, every
     * amount to {@link #REL_TOL}, G/RT not above CEA's.
     */
    static void assertAgrees(OracleCases.Case c, ChemicalSystem sys, EquilibriumResult r) {
        IndependentCheck.Report report = new IndependentCheck(c.spec()).check(r);
        assertNull(report.failure(), c.id() + ": independent check");

        assertEquals(c.present(), new TreeSet<>(r.presentPhaseNames()), c.id() + ": condensed phases present");

        List<String> gasNames = sys.memberNames(0);
        Map<String, Integer> gasIndex = new HashMap<>();
        for (int i = 0; i < gasNames.size(); i++) {
            gasIndex.put(gasNames.get(i), i);
        }
        assertEquals(OracleCases.ids(c.gasList()).size(), gasNames.size(), "every listed gas is in the system");

        List<String> bad = new ArrayList<>();
        int compared = 0;
        for (OracleCases.Expected e : c.expected()) {
            double ours;
            if (e.gas()) {
                if (!(e.moleFraction() > TRACE)) {
                    continue;
                }
                Integer i = gasIndex.get(e.species());
                assertTrue(i != null, "gas " + e.species() + " missing from the system");
                ours = r.memberMoles(0, i);
            } else {
                if (e.moles() == 0) {
                    continue; // absent: covered by the phase-set comparison
                }
                int p = sys.phaseIndex(e.species());
                assertTrue(p > 0, "condensed " + e.species() + " missing from the system");
                ours = r.phaseMoles(p);
            }
            compared++;
            double rel = Math.abs(ours - e.moles()) / e.moles();
            record(rel, c.id() + " " + e.species());
            if (!(rel <= REL_TOL)) {
                bad.add(String.format("%s: ours %.10e, CEA polished %.10e (rel %.2e)", e.species(), ours, e.moles(), rel));
            }
        }
        assertTrue(compared > 10, "compared " + compared + " amounts");
        assertGibbsNotAboveTheOracle(c, r, report);
        assertTrue(bad.isEmpty(), c.id() + ": " + bad);
    }

    /**
     * Our total G/RT may not exceed CEA's (its polished amounts, evaluated with the same data and
     * corrected to first order for their balance error): both minimise the same function, so a
     * higher value would mean a worse minimum. Allowed excess: 1e-12 of |G| (rounding of the sums).
     */
    private static void assertGibbsNotAboveTheOracle(OracleCases.Case c, EquilibriumResult r, IndependentCheck.Report report) {
        Map<String, Double> gas = new HashMap<>();
        Map<String, Double> condensed = new HashMap<>();
        for (OracleCases.Expected e : c.expected()) {
            (e.gas() ? gas : condensed).put(e.species(), e.moles());
        }
        double oracle = new IndependentCheck(c.spec()).gibbs(r, gas, condensed, report.lambda());
        double ours = report.gibbs();
        assertTrue(ours <= oracle + 1e-12 * Math.abs(oracle),
                String.format("%s: G/RT ours %.15e above CEA's %.15e", c.id(), ours, oracle));
        recordGibbs(ours - oracle, Math.abs(oracle));
    }

    private static double gibbsWorst = Double.NEGATIVE_INFINITY;

    private static synchronized void recordGibbs(double diff, double scale) {
        gibbsWorst = Math.max(gibbsWorst, diff / scale);
    }

    private static synchronized void record(double rel, String where) {
        if (rel > worst) {
            worst = rel;
            worstAt = where;
        }
    }

    @AfterAll
    static void summary() {
        System.out.printf("oracle: largest relative difference %.2e (%s)%n", worst, worstAt);
        System.out.printf("oracle: largest (G_ours - G_CEA)/|G_CEA| %.2e%n", gibbsWorst);
    }
}
