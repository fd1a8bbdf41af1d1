package org.nebulith.planet;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.nebulith.composition.ElementAbundances;
import org.nebulith.thermo.Element;

/**
 * The bulk composition of one planet and its core-mantle split (see {@link PlanetModel} for the
 * rules). Masses in grams of whatever amount the inventory held (mol x g/mol).
 *
 * @param bulk          all condensed elements, ices included [mol]
 * @param core          core elements [mol]
 * @param mantle        mantle silicate/oxide budget after light elements went to the core [mol]
 * @param mantleSulfide sulfide kept in the mantle (empty by default) [mol]
 * @param ice           ice-phase elements [mol]
 * @param waterMassG    mass of H2O ice [g]
 * @param oxides        the mantle written as oxides (null if the mantle budget is empty)
 * @param options       the core options used
 */
public record PlanetComposition(ElementAbundances bulk, ElementAbundances core, ElementAbundances mantle,
                                ElementAbundances mantleSulfide, ElementAbundances ice, double waterMassG,
                                MantleOxides.Result oxides, CoreOptions options) {

    /** @return core mass [g] */
    public double coreMassG() {
        return core.massGrams();
    }

    /** @return rock mass, core + mantle (silicate and sulfide), ices excluded [g] */
    public double rockMassG() {
        return core.massGrams() + mantle.massGrams() + mantleSulfide.massGrams();
    }

    /** @return true if there is rock, so the core mass fraction is defined */
    public boolean hasRock() {
        return rockMassG() > 0;
    }

    /** @return core mass / rock mass (ices excluded); 0 if there is no rock */
    public double coreMassFraction() {
        return hasRock() ? coreMassG() / rockMassG() : 0.0;
    }

    /** @return ice mass / total condensed mass */
    public double iceMassFraction() {
        return ice.massGrams() / bulk.massGrams();
    }

    /** @return H2O ice mass / total condensed mass */
    public double waterMassFraction() {
        return waterMassG / bulk.massGrams();
    }

    /**
     * @return whether the mantle Mg# means anything: the mantle holds Mg and Fe as a major part
     *         (MgO + FeO at least {@value #MG_NUMBER_MIN_WT_PCT} wt% of its oxides; our threshold). A
     *         mantle of Ca-Al oxides with a trace of Mg would otherwise get "Mg# 100".
     */
    public boolean hasMgNumber() {
        if (oxides == null || !oxides.hasMgNumber()) {
            return false;
        }
        double mgFe = oxides.oxideWtPct().getOrDefault("MgO", 0.0) + oxides.oxideWtPct().getOrDefault("FeO", 0.0);
        return mgFe >= MG_NUMBER_MIN_WT_PCT;
    }

    /** Smallest MgO + FeO [wt% of the mantle oxides] for which a mantle Mg# is reported. */
    public static final double MG_NUMBER_MIN_WT_PCT = 1.0;

    /**
     * @return mass fraction of the solids (ices included) that the refractory oxides CaO, Al2O3 and
     *         TiO2 would make of the solids' Ca, Al and Ti
     */
    public double refractoryOxideFraction() {
        double m = bulk.moles(Element.Ca) * (Element.Ca.atomicWeight() + Element.O.atomicWeight())
                + bulk.moles(Element.Al) * (Element.Al.atomicWeight() + 1.5 * Element.O.atomicWeight())
                + bulk.moles(Element.Ti) * (Element.Ti.atomicWeight() + 2 * Element.O.atomicWeight());
        return m / bulk.massGrams();
    }

    /** @return bulk molar ratios ({@link MolarRatios}) */
    public Map<String, Double> molarRatios() {
        return MolarRatios.of(bulk);
    }

    /**
     * @return the reported quantities in a fixed order: molar ratios, core mass fraction, mantle
     *         Mg#, ice and water fractions, mantle O excess, mantle oxides, bulk element wt%
     */
    public List<Quantity> quantities() {
        List<Quantity> q = new ArrayList<>();
        molarRatios().forEach((k, v) -> q.add(new Quantity(k, v, "mol/mol")));
        if (hasRock()) {
            q.add(new Quantity("core_mass_fraction", coreMassFraction(), "mass fraction of rock"));
        }
        if (hasMgNumber()) {
            q.add(new Quantity("mantle_Mg_number", oxides.mgNumber(), "100 Mg/(Mg+Fe) molar"));
        }
        q.add(new Quantity("ice_mass_fraction", iceMassFraction(), "mass fraction of solids"));
        q.add(new Quantity("water_mass_fraction", waterMassFraction(), "mass fraction of solids"));
        if (oxides != null && oxides.oxygenNeeded() > 0) {
            q.add(new Quantity("mantle_O_excess", oxides.oxygenExcess() / oxides.oxygenNeeded(),
                    "mol O per mol O in oxides"));
            oxides.oxideWtPct().forEach((k, v) -> q.add(new Quantity("mantle_" + k + "_wt_pct", v, "wt_pct")));
        }
        for (Map.Entry<Element, Double> e : bulk.weightPercent().entrySet()) {
            q.add(new Quantity("bulk_" + e.getKey().symbol() + "_wt_pct", e.getValue(), "wt_pct"));
        }
        return q;
    }
}
