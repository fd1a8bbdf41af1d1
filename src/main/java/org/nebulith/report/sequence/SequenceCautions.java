package org.nebulith.report.sequence;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import org.nebulith.thermo.Element;
import org.nebulith.thermo.Species;

/**
 * The cautions every sequence run states, in the run notes and (short form) on standard error:
 * model assumptions, what is not modelled, and the dependence on the thermodynamic data.
 */
public final class SequenceCautions {
    private SequenceCautions() {
    }

    /**
     * @param dataDescription the data set and solutions used, one line
     * @param extrapolatedGases gas species evaluated below their lowest data temperature (ids), may be empty
     * @return the cautions, one sentence each
     */
    public static List<String> lines(String dataDescription, List<String> extrapolatedGases) {
        List<String> c = new ArrayList<>();
        c.add("Every state is full chemical equilibrium (no kinetics, no supersaturation) and the solutions mix "
                + "ideally; real nebular condensates need not reach either.");
        c.add("Silicate and oxide liquids are not modelled: they can be stable at high pressure or strong dust "
                + "enrichment, where the assemblage shown (solids only) is then not the stable one.");
        c.add("Results depend on the thermodynamic data (" + dataDescription + "); the gaseous Al species, the "
                + "Ca-aluminates and FeS move some temperatures by tens of kelvin: rerun with --variant TAG "
                + "(B88, ds62, Cemdata18, Geiger1988, RH95) for a sensitivity check.");
        c.add("Not in the model: phosphide (schreibersite) and Mn-bearing silicate solutions, so P and Mn "
                + "condense later, and in other hosts, than with them.");
        if (!extrapolatedGases.isEmpty()) {
            c.add("Gas species used below their lowest data temperature (extrapolated by up to 150 K, left out below that): "
                    + String.join(", ", extrapolatedGases) + ".");
        }
        return c;
    }

    /**
     * @param species  the species of the run's data selection
     * @param elements the elements of the system
     * @param tMinK    the lowest temperature of the run [K]
     * @return the gas species of the system whose data start above tMinK, as "id (data from T K)"
     */
    public static List<String> gasesBelowDataRange(List<Species> species, Set<Element> elements, double tMinK) {
        List<String> out = new ArrayList<>();
        for (Species s : species) {
            if (s.isGas() && s.formula().madeOnlyOf(elements) && s.thermo().tMinK() > tMinK) {
                out.add(String.format(Locale.ROOT, "%s (data from %.0f K)", s.id(), s.thermo().tMinK()));
            }
        }
        return out;
    }
}
