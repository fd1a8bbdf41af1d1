package org.nebulith.report.sequence;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;

import org.nebulith.report.Cautions;
import org.nebulith.thermo.DataSet;
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
        return Cautions.sequence(dataDescription, DataSet.named(DataSet.DEFAULT).variants(), extrapolatedGases);
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
