package org.nebulith.condensation;

import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.equilibrium.SolutionModel;
import org.nebulith.equilibrium.SolutionModels;
import org.nebulith.composition.ElementAbundances;

class ZzProbeTest {
    static void show(String label, List<SolutionModel> sol) {
        ElementAbundances comp = SequenceRuns.protosolar();
        ChemicalSystem sys = ChemicalSystem.of(SequenceRuns.elementsOf(comp), SequenceRuns.defaultData(), sol);
        SequenceSettings s = new SequenceSettings(PressurePath.constant(1e-4), 2000, 300, 5, 0, 0.05);
        long t0 = System.nanoTime();
        try {
            CondensationSequence seq = new SequenceRunner(new EquilibriumSolver()).run(sys, SequenceRuns.totals(sys, comp), s);
            System.out.println("PROBE " + label + " time_s=" + (System.nanoTime() - t0) / 1e9);
            for (ElementCondensation c : seq.condensationTemperatures()) {
                System.out.println("PROBE " + label + " " + c.element() + " " + c.t50K() + " " + c.hostPhase());
            }
            var last = seq.steps().get(seq.steps().size() - 1);
            System.out.println("PROBE " + label + " last " + last);
        } catch (RuntimeException e) {
            System.out.println("PROBE " + label + " FAILED " + e.getMessage());
        }
    }

    @Test
    void probe() {
        String which = System.getProperty("probe", "all");
        if (which.contains("all")) show("all", SolutionModels.all());
        if (which.contains("feld")) {
            List<SolutionModel> l = new ArrayList<>(SolutionModels.all());
            l.set(l.indexOf(SolutionModels.FELDSPAR), SolutionModels.PLAGIOCLASE);
            show("feldspar", l);
        }
        if (which.contains("old")) show("old", List.of(SolutionModels.METAL, SolutionModels.OLIVINE_FE_MG,
                SolutionModels.ORTHOPYROXENE_FE_MG, SolutionModels.MELILITE, SolutionModels.PLAGIOCLASE, SolutionModels.SPINEL_HERCYNITE));
    }
}
