package org.nebulith.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;

import org.nebulith.report.html.Report;
import org.nebulith.thermo.Element;
import org.nebulith.thermo.Species;

/**
 * The sources a run's report cites, complete and only those used, in a fixed order: the
 * composition, then the thermodynamic data of the species that take part (those made only of the
 * system's elements), by key, then what the command adds (disk, reference bodies, mass-radius
 * relation).
 */
public final class SourceList {

    private SourceList() {
    }

    /**
     * @param composition  one-line reference of the composition (name and provenance)
     * @param species      the species selected for the run
     * @param elements     the elements of the run's system
     * @param dataSources  the data set's source keys and references
     * @param extra        further sources, in the order given
     * @return the citations
     */
    public static List<Report.Citation> of(final String composition, final List<Species> species,
                                           final Set<Element> elements, final Map<String, String> dataSources,
                                           final List<Report.Citation> extra) {
        List<Report.Citation> out = new ArrayList<>();
        out.add(new Report.Citation("composition", composition));
        Map<String, String> used = new TreeMap<>();
        for (Species s : species) {
            if (s.formula().madeOnlyOf(elements) && s.source() != null) {
                for (String key : s.source().split("[;+]")) {
                    String k = key.strip();
                    String ref = dataSources.get(k);
                    if (ref != null) {
                        used.put(k, ref);
                    }
                }
            }
        }
        used.forEach((k, v) -> out.add(new Report.Citation(k, v)));
        out.addAll(extra);
        return out;
    }
}
