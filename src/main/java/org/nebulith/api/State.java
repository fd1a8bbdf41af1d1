package org.nebulith.api;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumResult;
import org.nebulith.format.Decimal;

/**
 * One checked equilibrium state, read by name: {@code moles("forsterite")} (a pure phase, a solution
 * or one of its end-members, or a gas species), {@code condensedFraction("Al")}. Amounts are on the
 * basis of the composition given (e.g. moles per mole of H for the protosolar preset).
 */
public final class State {
    private final EquilibriumResult result;

    State(EquilibriumResult result) {
        this.result = result;
    }

    /** @return temperature [K] */
    public double temperatureK() {
        return result.problem().temperatureK();
    }

    /** @return pressure [bar] */
    public double pressureBar() {
        return result.problem().pressureBar();
    }

    /** @return names of the condensed phases present, in system order */
    public List<String> phases() {
        return result.presentPhaseNames();
    }

    /**
     * @param name a condensed phase, a solution end-member or species id, or a gas species
     * @return its amount [mol]; 0 if it is absent or unknown
     */
    public double moles(String name) {
        ChemicalSystem sys = result.system();
        double sum = 0;
        for (int p = 0; p < sys.phaseCount(); p++) {
            if (sys.phaseName(p).equals(name)) {
                return p == 0 ? result.gasMoles() : result.phaseMoles(p);
            }
            List<String> members = sys.memberNames(p);
            for (int k = 0; k < members.size(); k++) {
                if (members.get(k).equals(name) || result.memberSpecies(p, k).equals(name)) {
                    sum += result.memberMoles(p, k);
                }
            }
        }
        return sum;
    }

    /**
     * @param symbol an element symbol, e.g. {@code "Al"}
     * @return the fraction of it in condensed phases, in [0, 1]
     */
    public double condensedFraction(String symbol) {
        return result.condensedFraction(Compositions.element(symbol));
    }

    /** @return the solver's full result (amounts by index, element potentials, diagnostics) */
    public EquilibriumResult result() {
        return result;
    }

    /** @return a few lines: the state, then each condensed phase and its amount */
    public String summary() {
        StringBuilder b = new StringBuilder("equilibrium at T = " + Decimal.format(temperatureK()) + " K, P = "
                + Decimal.format(pressureBar()) + " bar: ");
        List<String> lines = new ArrayList<>();
        int[] present = result.presentCondensedPhases();
        for (int p : present) {
            lines.add(String.format(Locale.ROOT, "  %-24s %.6g mol", result.system().phaseName(p),
                    result.phaseMoles(p)));
        }
        b.append(present.length == 0 ? "gas only" : present.length + " condensed phases");
        lines.forEach(l -> b.append('\n').append(l));
        return b.toString();
    }

    @Override
    public String toString() {
        return summary();
    }
}
