package org.nebulith.thermo.audit;

import java.util.List;
import java.util.Map;

import org.nebulith.thermo.Element;

/**
 * Published Gibbs energies of formation from the oxides. The only measurements held here are those of
 * the Ca-aluminates quoted in the thermodynamic sources' README (section 5c): galvanic-cell study,
 * Tetsu-to-Hagane 75(11), 2023 (1989), J-STAGE abstract, at 1500 K. The oxides are the ds62 lime and
 * corundum of the default data set.
 */
final class OxideReferences {
    /** One published value. */
    record Reference(String formula, double tK, double dGkJPerMol, Map<Element, String> oxideIds, String source) {
    }

    private static final String CELL = "galvanic cell, Tetsu-to-Hagane 75(11):2023 (1989), via thermo-sources README 5c";
    private static final Map<Element, String> CA_AL = Map.of(Element.Ca, "lime", Element.Al, "corundum");

    static final List<Reference> ALL = List.of(
            new Reference("Ca:1 Al:12 O:19", 1500, -72.8, CA_AL, CELL),
            new Reference("Ca:1 Al:4 O:7", 1500, -54.4, CA_AL, CELL),
            new Reference("Ca:1 Al:2 O:4", 1500, -44.0, CA_AL, CELL));

    private OxideReferences() {
    }
}
