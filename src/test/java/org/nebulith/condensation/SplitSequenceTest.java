package org.nebulith.condensation;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.equilibrium.SolutionModels;
import org.nebulith.thermo.Element;

/**
 * An equilibrium sequence solved in two halves at once (the cooler half from a cold start) is the
 * same sequence as one unbroken warm-started path: equilibrium states depend only on T, P and the
 * totals (the Gibbs energy of an ideal gas with pure phases and ideal solutions is convex, so the
 * minimum is unique; common practice). Compared state by state: the same assemblage, every element's
 * condensed fraction within 1e-9, the same phase events and 50% temperatures within 1e-6 K.
 */
class SplitSequenceTest {

    @Test
    void twoHalvesGiveTheUnbrokenSequence() {
        ElementAbundances comp = SequenceRuns.protosolar();
        ChemicalSystem sys = ChemicalSystem.of(comp.elements(), SequenceRuns.defaultData(), SolutionModels.all());
        SequenceSettings s = new SequenceSettings(PressurePath.constant(1e-4), 1800, 400, 2, 0, 0.05);
        double[] b = SequenceRuns.totals(sys, comp);
        CondensationSequence split = new SequenceRunner(new EquilibriumSolver(), 10).run(sys, b, s);
        CondensationSequence whole = new SequenceRunner(new EquilibriumSolver(), Integer.MAX_VALUE).run(sys, b, s);
        assertEquals(whole.steps().size(), split.steps().size());
        for (int i = 0; i < whole.steps().size(); i++) {
            SequenceStep w = whole.steps().get(i);
            SequenceStep p = split.steps().get(i);
            assertEquals(w.temperatureK(), p.temperatureK());
            assertEquals(w.result().presentPhaseNames(), p.result().presentPhaseNames(), "at " + w.temperatureK() + " K");
            for (Element e : sys.elements()) {
                assertEquals(w.condensedFraction(e), p.condensedFraction(e), 1e-9, e + " at " + w.temperatureK() + " K");
            }
        }
        assertEquals(whole.phaseEvents().size(), split.phaseEvents().size());
        List<ElementCondensation> wt = whole.condensationTemperatures();
        List<ElementCondensation> pt = split.condensationTemperatures();
        assertEquals(wt.size(), pt.size());
        for (int i = 0; i < wt.size(); i++) {
            assertEquals(wt.get(i).t50K().isPresent(), pt.get(i).t50K().isPresent());
            if (wt.get(i).t50K().isPresent()) {
                assertEquals(wt.get(i).t50K().getAsDouble(), pt.get(i).t50K().getAsDouble(), 1e-6, wt.get(i).element().toString());
            }
        }
        assertTrue(whole.steps().size() > 20, "the split is exercised");
    }
}
