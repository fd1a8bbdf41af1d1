package org.nebulith.planet;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import org.nebulith.composition.ElementAbundances;
import org.nebulith.thermo.Element;
import org.nebulith.zones.WaterIce;

/**
 * Builds a planet from the condensed inventory of its zone.
 *
 * <p>Rules: the core is every {@link PhaseKind#METAL} phase plus, by default, every
 * {@link PhaseKind#SULFIDE} phase; optional Si and O in the core (wt% of the final core) are taken
 * from the mantle budget. The mantle budget is the {@code SILICATE_OXIDE}, {@code CARBON} and
 * {@code OTHER} phases (plus sulfide when it is kept in the mantle, reported apart); ices form a
 * separate volatile layer and are excluded from the core mass fraction. Caution: this is a
 * bookkeeping split of condensates, not a model of metal-silicate equilibration during differentiation
 * (no FeO reduction or oxidation of metal, no partitioning of Ni, Co, Cr between core and mantle).
 */
public final class PlanetModel {

    private PlanetModel() {
    }

    /**
     * @param phases  the zone's condensed phases (amounts integrated over the zone)
     * @param options core options
     * @return the planet, or a "no solids" notice if the inventory is empty
     * @throws IllegalArgumentException if the mantle lacks the Si or O the core options ask for
     */
    public static PlanetResult build(List<CondensedPhase> phases, CoreOptions options) {
        double total = 0;
        for (CondensedPhase p : phases) {
            total += p.massGrams();
        }
        if (!(total > 0)) {
            return new PlanetResult(null, "no solids: nothing condensed in this zone (it lies entirely"
                    + " where the disk is hotter than the first condensate); no planet composition");
        }
        ElementAbundances core = sum(phases, k -> k == PhaseKind.METAL || (k == PhaseKind.SULFIDE && options.sulfideInCore()));
        ElementAbundances sulfideMantle = sum(phases, k -> k == PhaseKind.SULFIDE && !options.sulfideInCore());
        ElementAbundances mantle = sum(phases, k -> k == PhaseKind.SILICATE_OXIDE || k == PhaseKind.CARBON
                || k == PhaseKind.OTHER);
        ElementAbundances ice = sum(phases, k -> k == PhaseKind.ICE);
        double water = 0;
        for (CondensedPhase p : phases) {
            if (p.kind() == PhaseKind.ICE && p.formula().equals(WaterIce.FORMULA)) {
                water += p.massGrams();
            }
        }
        ElementAbundances[] moved = lightElements(core, mantle, options);
        core = moved[0];
        mantle = moved[1];
        MantleOxides.Result oxides = mantle.isEmpty() ? null : MantleOxides.convert(mantle);
        ElementAbundances bulk = sum(phases, k -> true);
        return new PlanetResult(new PlanetComposition(bulk, core, mantle, sulfideMantle, ice, water, oxides, options), "");
    }

    /** @return {core, mantle} after moving the requested Si and O from the mantle into the core */
    private static ElementAbundances[] lightElements(ElementAbundances core, ElementAbundances mantle, CoreOptions o) {
        double fraction = (o.coreSiWtPct() + o.coreOWtPct()) / 100.0;
        if (fraction == 0) {
            return new ElementAbundances[] {core, mantle};
        }
        double coreMass = core.massGrams() / (1 - fraction);
        EnumMap<Element, Double> add = new EnumMap<>(Element.class);
        add.put(Element.Si, o.coreSiWtPct() / 100.0 * coreMass / Element.Si.atomicWeight());
        add.put(Element.O, o.coreOWtPct() / 100.0 * coreMass / Element.O.atomicWeight());
        EnumMap<Element, Double> left = new EnumMap<>(mantle.asMap());
        for (Map.Entry<Element, Double> e : add.entrySet()) {
            double have = mantle.moles(e.getKey());
            if (e.getValue() > have) {
                throw new IllegalArgumentException("the mantle holds " + have + " mol " + e.getKey() + " but a core with "
                        + (e.getKey() == Element.Si ? o.coreSiWtPct() : o.coreOWtPct()) + " wt% " + e.getKey()
                        + " needs " + e.getValue() + " mol");
            }
            left.put(e.getKey(), Math.max(0.0, have - e.getValue()));
        }
        return new ElementAbundances[] {core.plus(ElementAbundances.of(add)), ElementAbundances.of(left)};
    }

    private static ElementAbundances sum(List<CondensedPhase> phases, java.util.function.Predicate<PhaseKind> keep) {
        EnumMap<Element, Double> m = new EnumMap<>(Element.class);
        for (CondensedPhase p : phases) {
            if (keep.test(p.kind())) {
                p.formula().counts().forEach((el, n) -> m.merge(el, n * p.moles(), Double::sum));
            }
        }
        return ElementAbundances.of(m);
    }
}
