package org.nebulith.condensation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.ForkJoinPool;

import org.junit.jupiter.api.Test;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.equilibrium.SolutionModels;
import org.nebulith.thermo.Element;

/**
 * How a run is carried out does not change what it computes: the boundaries bisected on one thread
 * or several, a run begun and abandoned before another, and a run given the cold state at its start
 * (from the all-gas check) give exactly the same numbers as a plain run.
 */
class SequenceRunnerTest {
    private static final ElementAbundances COMP = SequenceRuns.protosolar();
    private static final ChemicalSystem SYS = ChemicalSystem.of(COMP.elements(), SequenceRuns.defaultData(),
            SolutionModels.all());
    private static final double[] B = SequenceRuns.totals(SYS, COMP);
    private static final SequenceSettings SETTINGS = new SequenceSettings(PressurePath.constant(1e-4), 1800, 400, 2, 0,
            0.05);

    @Test
    void boundariesBisectedOnOneThreadAreThoseBisectedOnSeveral() throws Exception {
        SequenceRunner runner = new SequenceRunner(new EquilibriumSolver(), Integer.MAX_VALUE);
        CondensationSequence many = runner.run(SYS, B, SETTINGS);
        ForkJoinPool one = new ForkJoinPool(1);
        CondensationSequence single;
        try {
            single = one.submit(() -> runner.run(SYS, B, SETTINGS)).get();
        } finally {
            one.shutdown();
        }
        assertSame(many, single);
        assertTrue(many.phaseEvents().size() > 10, "many brackets are bisected");
    }

    @Test
    void aRunBegunAndAbandonedLeavesTheNextRunAsItWouldBe() {
        SequenceRunner runner = new SequenceRunner(new EquilibriumSolver(), 10);
        CondensationSequence plain = runner.run(SYS, B, SETTINGS);
        try (SequenceRunner.Begun abandoned = runner.begin(SYS, B, SETTINGS)) {
            assertTrue(abandoned != null);
        }
        assertSame(plain, runner.run(SYS, B, SETTINGS));
    }

    @Test
    void theAllGasStateAtTheStartIsTheFirstStateOfTheRun() {
        SequenceRunner runner = new SequenceRunner(new EquilibriumSolver(), 10);
        CondensationSequence plain = runner.run(SYS, B, SETTINGS);
        AllGasStart.Result start = AllGasStart.find(new EquilibriumSolver(), SYS, B, SETTINGS.path(), SETTINGS.tMaxK());
        assertTrue(start.allGasAtStart() && start.startState().isPresent());
        CondensationSequence seeded;
        try (SequenceRunner.Begun run = runner.begin(SYS, B, SETTINGS)) {
            seeded = run.finish(org.nebulith.progress.Progress.none(), start.startState().get());
        }
        assertEquals(start.startState().get(), seeded.steps().get(0).result(), "the given state is used");
        assertSame(plain, seeded);
    }

    /** Bit for bit: every step's condensed fractions, every phase interval and 50% point with its host. */
    private static void assertSame(CondensationSequence a, CondensationSequence b) {
        assertEquals(a.steps().size(), b.steps().size());
        for (int i = 0; i < a.steps().size(); i++) {
            for (Element e : SYS.elements()) {
                assertEquals(a.steps().get(i).condensedFraction(e), b.steps().get(i).condensedFraction(e),
                        e + " at " + a.steps().get(i).temperatureK() + " K");
            }
        }
        assertEquals(a.phaseEvents(), b.phaseEvents());
        assertEquals(a.condensationTemperatures(), b.condensationTemperatures());
    }
}
