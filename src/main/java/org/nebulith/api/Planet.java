package org.nebulith.api;

import java.util.Locale;
import java.util.Map;

import org.nebulith.planet.PlanetComposition;
import org.nebulith.planet.ZonePlanet;

/**
 * One planet's bulk composition read by name: {@code ratio("Mg", "Si")} (bulk molar ratio),
 * {@code oxideWtPct("FeO")} (mantle), {@code bulkWtPct("Fe")}, {@code coreMassFraction()}. The model's
 * assumptions (equilibrium at each radius, no radial mixing, core by metal and sulfide) are those of
 * the {@code planet} package; see its cautions before comparing with a real planet.
 */
public final class Planet {
    private final ZonePlanet planet;

    Planet(ZonePlanet planet) {
        this.planet = planet;
    }

    /** @return the feeding zone's name */
    public String zone() {
        return planet.zoneName();
    }

    /** @return true if the zone collected solids (otherwise every lookup is 0) */
    public boolean hasSolids() {
        return planet.planet().hasSolids();
    }

    /**
     * @param numerator   element symbol
     * @param denominator element symbol
     * @return the bulk molar ratio [mol/mol]; NaN if the denominator is absent
     */
    public double ratio(String numerator, String denominator) {
        if (!hasSolids()) {
            return Double.NaN;
        }
        var bulk = composition().bulk();
        double d = bulk.moles(Compositions.element(denominator));
        return d > 0 ? bulk.moles(Compositions.element(numerator)) / d : Double.NaN;
    }

    /** @param symbol element symbol @return its bulk mass fraction [wt%] (0 if absent) */
    public double bulkWtPct(String symbol) {
        return hasSolids() ? composition().bulk().weightPercent().getOrDefault(Compositions.element(symbol), 0.0) : 0;
    }

    /** @param oxide oxide name as in the mantle table, e.g. {@code "MgO"}, {@code "FeO"} @return its mantle wt% (0 if absent) */
    public double oxideWtPct(String oxide) {
        if (!hasSolids() || composition().oxides() == null) {
            return 0;
        }
        return composition().oxides().oxideWtPct().getOrDefault(oxide, 0.0);
    }

    /** @return core mass / rock mass (ices excluded); 0 without rock */
    public double coreMassFraction() {
        return hasSolids() ? composition().coreMassFraction() : 0;
    }

    /** @return the bulk molar ratios by their table names (e.g. {@code Mg_Si_molar}) */
    public Map<String, Double> molarRatios() {
        return hasSolids() ? composition().molarRatios() : Map.of();
    }

    /** @return the full model result (inventory, core, mantle, oxides) */
    public ZonePlanet result() {
        return planet;
    }

    /** @return one line: zone, Mg/Si, Fe/Si, core mass fraction */
    public String summary() {
        if (!hasSolids()) {
            return zone() + ": no solids";
        }
        return String.format(Locale.ROOT, "%s: Mg/Si %.4f, Fe/Si %.4f, core mass fraction %.3f", zone(),
                ratio("Mg", "Si"), ratio("Fe", "Si"), coreMassFraction());
    }

    @Override
    public String toString() {
        return summary();
    }

    private PlanetComposition composition() {
        return planet.planet().composition();
    }
}
