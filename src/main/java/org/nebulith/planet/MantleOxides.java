package org.nebulith.planet;

import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.Map;

import org.nebulith.composition.ElementAbundances;
import org.nebulith.thermo.Element;
import org.nebulith.thermo.Formula;

/**
 * Converts a mantle element budget to oxides (the geochemists' convention, common practice):
 * each cation is written as its usual oxide (all Fe as FeO), oxygen follows from the oxides'
 * stoichiometry, and the oxygen actually present minus the oxygen the oxides need is reported as
 * the oxygen excess (positive: more O than the oxides need, e.g. ferric iron or water; negative:
 * a deficit, e.g. reduced phases). Oxide wt% are normalised to the sum of the oxides = 100.
 */
public final class MantleOxides {
    /** The oxide written for each cation, in the usual reporting order. */
    public static final Map<Element, Formula> OXIDES = oxides();

    private static Map<Element, Formula> oxides() {
        Map<Element, Formula> m = new LinkedHashMap<>();
        m.put(Element.Si, Formula.parse("Si:1 O:2"));
        m.put(Element.Ti, Formula.parse("Ti:1 O:2"));
        m.put(Element.Al, Formula.parse("Al:2 O:3"));
        m.put(Element.Cr, Formula.parse("Cr:2 O:3"));
        m.put(Element.Fe, Formula.parse("Fe:1 O:1"));
        m.put(Element.Mn, Formula.parse("Mn:1 O:1"));
        m.put(Element.Mg, Formula.parse("Mg:1 O:1"));
        m.put(Element.Ca, Formula.parse("Ca:1 O:1"));
        m.put(Element.Na, Formula.parse("Na:2 O:1"));
        m.put(Element.K, Formula.parse("K:2 O:1"));
        m.put(Element.P, Formula.parse("P:2 O:5"));
        m.put(Element.Ni, Formula.parse("Ni:1 O:1"));
        m.put(Element.Co, Formula.parse("Co:1 O:1"));
        return Collections.unmodifiableMap(m);
    }

    /**
     * @param oxideWtPct   oxide name (e.g. "SiO2") to wt%, normalised to sum 100, in {@link #OXIDES} order
     * @param oxideMassG   total oxide mass [g]
     * @param oxygenNeeded O the oxides need [mol]
     * @param oxygenExcess O present minus O needed [mol]
     * @param nonOxide     elements without an oxide form (S, C, N, H, Cl, F, He) [mol]
     * @param mgNumber     mantle Mg# = 100 Mg/(Mg+Fe) molar (FeO only), or -1 when the mantle has neither Mg nor Fe
     */
    public record Result(Map<String, Double> oxideWtPct, double oxideMassG, double oxygenNeeded, double oxygenExcess,
                         ElementAbundances nonOxide, double mgNumber) {
        /** @return true if the mantle holds Mg or Fe, so Mg# is defined */
        public boolean hasMgNumber() {
            return mgNumber >= 0;
        }
    }

    private MantleOxides() {
    }

    /**
     * @param mantle the mantle element budget [mol]
     * @return oxides, oxygen balance and Mg#
     */
    public static Result convert(ElementAbundances mantle) {
        Map<String, Double> mass = new LinkedHashMap<>();
        double total = 0;
        double oNeeded = 0;
        EnumMap<Element, Double> rest = new EnumMap<>(Element.class);
        for (Element el : mantle.elements()) {
            if (el != Element.O && !OXIDES.containsKey(el)) {
                rest.put(el, mantle.moles(el));
            }
        }
        for (Map.Entry<Element, Formula> e : OXIDES.entrySet()) {
            double n = mantle.moles(e.getKey());
            if (n <= 0) {
                continue;
            }
            Formula ox = e.getValue();
            double units = n / ox.count(e.getKey());
            mass.put(name(ox), units * ox.molarMass());
            total += units * ox.molarMass();
            oNeeded += units * ox.count(Element.O);
        }
        Map<String, Double> wt = new LinkedHashMap<>();
        for (Map.Entry<String, Double> e : mass.entrySet()) {
            wt.put(e.getKey(), 100.0 * e.getValue() / total);
        }
        double mg = mantle.moles(Element.Mg);
        double fe = mantle.moles(Element.Fe);
        double mgNo = mg + fe > 0 ? 100.0 * mg / (mg + fe) : -1;
        return new Result(Collections.unmodifiableMap(wt), total, oNeeded, mantle.moles(Element.O) - oNeeded,
                ElementAbundances.of(rest), mgNo);
    }

    /** @return the conventional oxide name, e.g. "Al2O3" */
    public static String name(Formula oxide) {
        StringBuilder b = new StringBuilder();
        for (Map.Entry<Element, Double> e : oxide.counts().entrySet()) {
            if (e.getKey() != Element.O) {
                b.append(e.getKey().symbol()).append(count(e.getValue()));
            }
        }
        return b.append('O').append(count(oxide.count(Element.O))).toString();
    }

    private static String count(double c) {
        return c == 1 ? "" : Long.toString(Math.round(c));
    }
}
