package org.nebulith.measured;

import java.util.LinkedHashMap;
import java.util.List;

import org.nebulith.composition.ElementAbundances;
import org.nebulith.planet.MantleOxides;
import org.nebulith.planet.Quantity;
import org.nebulith.survey.PlanetEstimator;
import org.nebulith.thermo.Element;
import org.nebulith.thermo.Formula;

/**
 * The planet of a zone cold enough for every rock-forming element to condense, by the
 * stoichiometric assumption of Santos et al. 2015 (A&amp;A 580, L13), as used by Adibekyan et al.
 * 2021 (Science 374, 330): the rock keeps the star's ratios of the rock-forming elements; Fe, Ni and
 * Co form the metal core, S joins it as FeS; Mg, Si, Ca, Al, Na, Ti, Cr, Mn and K form the mantle
 * as their usual oxides (no FeO: Mg# 100). A pure function of the composition (thread-safe).
 */
public final class StoichiometricEstimator implements PlanetEstimator {
    /** The zone name of the prediction. */
    public static final String ZONE = "all-rock-condensed";
    private static final List<Element> CORE = List.of(Element.Fe, Element.Ni, Element.Co, Element.S);
    private static final List<Element> MANTLE = List.of(Element.Mg, Element.Si, Element.Ca, Element.Al, Element.Na,
            Element.Ti, Element.Cr, Element.Mn, Element.K);

    @Override
    public LinkedHashMap<String, List<Quantity>> estimate(final ElementAbundances gas) {
        double core = 0;
        for (Element e : CORE) {
            double n = e == Element.S ? Math.min(gas.moles(Element.S), gas.moles(Element.Fe)) : gas.moles(e);
            core += n * e.atomicWeight();
        }
        double mantle = 0;
        for (Element e : MANTLE) {
            Formula oxide = MantleOxides.OXIDES.get(e);
            mantle += gas.moles(e) / oxide.count(e) * oxide.molarMass();
        }
        double mg = gas.moles(Element.Mg);
        double si = gas.moles(Element.Si);
        LinkedHashMap<String, List<Quantity>> out = new LinkedHashMap<>();
        out.put(ZONE, List.of(new Quantity("core_mass_fraction", core / (core + mantle), "mass fraction of rock"),
                new Quantity("mantle_Mg_Si_molar", si > 0 ? mg / si : 0, "mol/mol"),
                new Quantity("mantle_Mg_number", 100, "100 Mg/(Mg+Fe) molar")));
        return out;
    }
}
