package org.nebulith.survey;

import java.util.LinkedHashMap;
import java.util.List;

import org.nebulith.composition.ElementAbundances;
import org.nebulith.planet.MolarRatios;
import org.nebulith.planet.Quantity;
import org.nebulith.thermo.Element;

/**
 * TEST-ONLY stand-in for the planet estimate, and a legitimate model in its own right: one zone,
 * {@code cold}, where every refractory element is fully condensed, so by mass balance the planet's
 * molar Mg/Si, Fe/Si, Ca/Si and Al/Si are those of the gas (the limit that the planet command's
 * cold-zone check also uses). It exercises the survey statistics; it is not the survey's science,
 * which comes from {@code SurveyCommand.estimator}.
 */
public final class FullyCondensedEstimator implements PlanetEstimator {

    static final String ZONE = "cold";
    private static final Element[][] RATIOS = {
        {Element.Mg, Element.Si}, {Element.Fe, Element.Si}, {Element.Ca, Element.Si}, {Element.Al, Element.Si}};

    @Override
    public LinkedHashMap<String, List<Quantity>> estimate(ElementAbundances gas) {
        LinkedHashMap<String, List<Quantity>> zones = new LinkedHashMap<>();
        Quantity[] q = new Quantity[RATIOS.length];
        for (int i = 0; i < RATIOS.length; i++) {
            q[i] = new Quantity(MolarRatios.key(RATIOS[i][0], RATIOS[i][1]), gas.ratio(RATIOS[i][0], RATIOS[i][1]), "mol/mol");
        }
        zones.put(ZONE, List.of(q));
        return zones;
    }
}
