package org.nebulith.planet;

import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumResult;
import org.nebulith.thermo.Element;
import org.nebulith.zones.LocalCondensation;

/**
 * Summary of the solids condensed from one gram of gas at one radius: mass, heavy-element
 * condensed fraction, ice, and the molar Mg/Si and Fe/Si of the solids.
 *
 * @param solidsPerGasMass          mass of solids (rock and ice) per mass of gas [g/g]
 * @param heavyElementCondensedFraction condensed mass of elements heavier than He over their total mass [-]
 * @param iceMassFraction           water ice over all solids by mass [-]
 * @param mgSi                      molar Mg/Si of the solids (NaN when no Si is condensed)
 * @param feSi                      molar Fe/Si of the solids (NaN when no Si is condensed)
 */
public record LocalSolids(double solidsPerGasMass, double heavyElementCondensedFraction, double iceMassFraction,
                          double mgSi, double feSi) {

    private static final double WATER_G_PER_MOL = 2 * Element.H.atomicWeight() + Element.O.atomicWeight();

    /**
     * @param l the local state of one gram of gas
     * @return its solids
     */
    public static LocalSolids of(LocalCondensation.Local l) {
        EquilibriumResult r = l.result();
        ChemicalSystem sys = r.system();
        double rock = 0;
        double heavy = 0;
        double[] totals = r.problem().totals();
        for (int j = 0; j < sys.elementCount(); j++) {
            Element e = sys.elements().get(j);
            double cond = r.condensedMoles(e);
            rock += cond * e.atomicWeight();
            if (e != Element.H && e != Element.He) {
                heavy += totals[j] * e.atomicWeight();
            }
        }
        double ice = l.iceMoles() * WATER_G_PER_MOL;
        double heavyCond = rock + ice - l.iceMoles() * 2 * Element.H.atomicWeight() - hydrogenInRock(r);
        double si = r.condensedMoles(Element.Si);
        double solids = rock + ice;
        return new LocalSolids(solids, heavy > 0 ? Math.min(1, heavyCond / heavy) : 0,
                solids > 0 ? ice / solids : 0,
                si > 0 ? r.condensedMoles(Element.Mg) / si : Double.NaN,
                si > 0 ? r.condensedMoles(Element.Fe) / si : Double.NaN);
    }

    private static double hydrogenInRock(EquilibriumResult r) {
        return r.condensedMoles(Element.H) * Element.H.atomicWeight() + r.condensedMoles(Element.He) * Element.He.atomicWeight();
    }
}
