package org.nebulith.condensation;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumResult;
import org.nebulith.equilibrium.SolutionModel;
import org.nebulith.equilibrium.SolutionModels;

/** Exact identity: with phi = 1 every solid is withdrawn, so withdrawn solids plus the last gas are the input. */
class WithdrawalMassBalanceTest {

    @Test
    void withdrawnSolidsPlusRemainingGasEqualTheInput() {
        // the whole default range, 2000 to 300 K
        assertBalanced(SequenceRuns.run(SequenceRuns.defaultData(), SequenceRuns.protosolar(), 1e-4, 2000, 300, 1));
    }

    /**
     * The orthopyroxene with the Mn2Si2O6 end-member in place of the standard form: this fractional run
     * stalled at 1056.68 K (Mn-rich residual gas, the absent orthopyroxene supersaturated) before the
     * interior-point path of the solver; it must run to the floor and balance.
     */
    @Test
    @Tag("slow")
    void withTheManganeseOrthopyroxeneTheFractionalRunFinishesAndBalances() {
        List<SolutionModel> solutions = new ArrayList<>(SolutionModels.all());
        solutions.set(solutions.indexOf(SolutionModels.ORTHOPYROXENE), SolutionModels.ORTHOPYROXENE_MN);
        CondensationSequence seq = SequenceRuns.run(SequenceRuns.defaultData(), solutions,
                SequenceRuns.protosolar(), 1e-4, 2000, 300, 1);
        assertBalanced(seq);
        ChemicalSystem sys = seq.system();
        double inOpx = 0;
        for (int k = 0; k < sys.memberNames(sys.phaseIndex("orthopyroxene-mn")).size(); k++) {
            inOpx += seq.finalWithdrawnMoles(sys.phaseIndex("orthopyroxene-mn"), k);
        }
        assertTrue(inOpx > 0, "orthopyroxene-mn was withdrawn");
    }

    private static void assertBalanced(final CondensationSequence seq) {
        ChemicalSystem sys = seq.system();
        EquilibriumResult last = seq.steps().get(seq.steps().size() - 1).result();
        double[] in = seq.inputTotals();
        double[] floor = seq.floorAddedMoles();
        double[] sum = new double[in.length];
        for (int p = 1; p < sys.phaseCount(); p++) {
            for (int k = 0; k < sys.memberNames(p).size(); k++) {
                double[] a = sys.memberStoichiometry(p, k);
                for (int j = 0; j < in.length; j++) {
                    sum[j] += seq.finalWithdrawnMoles(p, k) * a[j];
                }
            }
        }
        double[] gas = new double[in.length];
        for (int k = 0; k < sys.memberNames(0).size(); k++) {
            double[] a = sys.memberStoichiometry(0, k);
            for (int j = 0; j < in.length; j++) {
                gas[j] += last.memberMoles(0, k) * a[j];
            }
        }
        for (int j = 0; j < in.length; j++) {
            String el = sys.elements().get(j).symbol();
            double rel = Math.abs(sum[j] + gas[j] - in[j]) / in[j];
            // rules: every element conserved to 1e-10 relative, floor additions included (they are at most
            // steps x 1e-14 of the input and are recorded)
            assertTrue(rel < 1e-10, el + ": relative imbalance " + rel);
            assertTrue(floor[j] / in[j] < 1e-10, el + ": floor added " + floor[j] / in[j]);
        }
        assertTrue(seq.finalWithdrawnMoles(sys.phaseIndex("corundum"), 0) > 0, "corundum was withdrawn");
    }
}
