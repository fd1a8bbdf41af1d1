package org.nebulith.cli;

import java.util.ArrayList;
import java.util.List;

import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumResult;
import org.nebulith.equilibrium.PhaseKind;
import org.nebulith.thermo.PhaseNames;

/**
 * The rows of {@code nebulith point}: every gas species with data at T (trace species included,
 * however small), then every member of each condensed phase present, in system order.
 * Columns:
 * <ul>
 * <li>{@code species}: the species id (for a solution, the end-member's species id at T);</li>
 * <li>{@code phase}: {@code gas}, the pure phase's id, or the solution's name;</li>
 * <li>{@code moles}: amount on the basis of the input composition [mol];</li>
 * <li>{@code mole_fraction}: the member's mole fraction within its phase (1 for a pure phase);</li>
 * <li>{@code state}: {@code gas}, {@code pure} or {@code solution}.</li>
 * </ul>
 */
final class PointTable {
    static final String[] COLUMNS = {"species", "phase", "moles", "mole_fraction", "state", "data_id"};

    private PointTable() {
    }

    /** @param r a checked result @return its rows */
    static List<List<Object>> rows(final EquilibriumResult r) {
        ChemicalSystem sys = r.system();
        List<List<Object>> rows = new ArrayList<>();
        addMembers(r, 0, "gas", rows);
        for (int p : r.presentCondensedPhases()) {
            addMembers(r, p, sys.phaseKind(p) == PhaseKind.SOLUTION ? "solution" : "pure", rows);
        }
        return rows;
    }

    private static void addMembers(final EquilibriumResult r, final int p, final String state,
                                   final List<List<Object>> rows) {
        double total = r.phaseMoles(p);
        int members = r.system().memberNames(p).size();
        for (int k = 0; k < members; k++) {
            String species = r.memberSpecies(p, k);
            if (species.isEmpty()) {
                continue; // no data at this temperature: not part of the state
            }
            double n = r.memberMoles(p, k);
            String phase = p == 0 ? "gas" : PhaseNames.display(r.system().phaseName(p));
            rows.add(List.of(PhaseNames.display(species), phase, n, total > 0 ? n / total : 0.0, state, species));
        }
    }
}
