package org.nebulith.equilibrium;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.Locale;
import java.util.SplittableRandom;
import java.util.stream.IntStream;
import java.util.stream.Stream;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.CarbonToOxygen;
import org.nebulith.composition.DustEnrichment;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.thermo.Element;

/**
 * Seeded random states over the range the tool is meant for: T 300-2500 K, P 1e-8-1 bar
 * (log-uniform), C/O 0.1-2, dust enrichment 1-1000 (log-uniform) of the proto-solar gas (Lodders
 * 2003, Table 2, preset {@value AbundancePresets#PROTOSOLAR_LODDERS2003}) with CI-chondrite dust.
 * Default data set; three states in four with all solutions, one in four in pure-phase mode. Each
 * state is solved from a cold start and must pass the {@link IndependentCheck} (element balance
 * 1e-10, refitted potentials, no supersaturated absent phase). A failure prints
 * the seed and the state so that it can be rerun alone.
 */
@Tag("slow")
class RandomStatesTest {
    /** Number of states. */
    static final int STATES = 300;
    /** Seed of the whole series; state i uses the i-th split of it. */
    static final long SEED = 20240611L;

    private static ChemicalSystem withSolutions;
    private static ChemicalSystem pure;

    /**
     * One random state.
     *
     * @param index          position in the series
     * @param seed           seed that reproduces it ({@link #state(int, long)})
     * @param tK             temperature [K]
     * @param pBar           pressure [bar]
     * @param carbonToOxygen C/O
     * @param dust           dust enrichment factor
     * @param solutions      true with all solutions, false in pure-phase mode
     */
    record State(int index, long seed, double tK, double pBar, double carbonToOxygen, double dust, boolean solutions) {
        @Override
        public String toString() {
            return String.format(Locale.ROOT, "#%d seed %d: T = %.2f K, P = %.4g bar, C/O = %.4f, dust x%.4g, %s", index,
                    seed, tK, pBar, carbonToOxygen, dust, solutions ? "all solutions" : "pure phases");
        }

        ElementAbundances composition() {
            ElementAbundances gas = AbundancePresets.preset(AbundancePresets.PROTOSOLAR_LODDERS2003).abundances();
            ElementAbundances ci = AbundancePresets.preset(AbundancePresets.CI_CHONDRITE).abundances();
            ElementAbundances enriched = DustEnrichment.enrich(gas, ci, dust);
            return CarbonToOxygen.withCarbonToOxygen(enriched, carbonToOxygen).perH();
        }
    }

    /** @return the state drawn from seed */
    static State state(int index, long seed) {
        SplittableRandom r = new SplittableRandom(seed);
        double t = 300 + 2200 * r.nextDouble();
        double p = Math.pow(10, -8 + 8 * r.nextDouble());
        double co = 0.1 + 1.9 * r.nextDouble();
        double dust = Math.pow(10, 3 * r.nextDouble());
        return new State(index, seed, t, p, co, dust, index % 4 != 3);
    }

    static Stream<State> states() {
        SplittableRandom master = new SplittableRandom(SEED);
        long[] seeds = master.longs(STATES).toArray();
        return IntStream.range(0, STATES).mapToObj(i -> state(i, seeds[i]));
    }

    private static synchronized ChemicalSystem system(State s, ElementAbundances comp) {
        if (withSolutions == null) {
            withSolutions = SystemSpec.defaults().build(comp.elements());
            pure = SystemSpec.defaults().withSolutions(java.util.List.of()).build(comp.elements());
        }
        return s.solutions() ? withSolutions : pure;
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("states")
    void convergesAndPassesTheChecks(State s) {
        ElementAbundances comp = s.composition();
        ChemicalSystem sys = system(s, comp);
        assertTrue(sys.elementCount() == comp.elements().size(), "every element of the composition is in the system");
        EquilibriumResult r;
        try {
            r = new EquilibriumSolver().solve(EquilibriumProblem.of(sys, s.tK(), s.pBar(), comp.asMap()));
        } catch (ConvergenceException e) {
            fail("state " + s + ": " + e.getMessage());
            return;
        }
        SystemSpec spec = s.solutions() ? SystemSpec.defaults() : SystemSpec.defaults().withSolutions(java.util.List.of());
        String bad = new IndependentCheck(spec).check(r).failure();
        assertTrue(bad == null, "state " + s + ": " + bad);
        double cFrac = r.condensedFraction(Element.Si);
        assertTrue(cFrac >= 0 && cFrac <= 1, "state " + s);
    }
}
