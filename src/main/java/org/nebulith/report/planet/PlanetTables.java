package org.nebulith.report.planet;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.StringJoiner;

import org.nebulith.composition.ElementAbundances;
import org.nebulith.planet.PlanetRadius;
import org.nebulith.planet.MolarRatios;
import org.nebulith.planet.PlanetComposition;
import org.nebulith.planet.Quantity;
import org.nebulith.planet.ReferenceBodies;
import org.nebulith.planet.ZoneNotices;
import org.nebulith.planet.ZonePlanet;
import org.nebulith.planet.LocalSolids;
import org.nebulith.report.FormulaText;
import org.nebulith.files.Table;
import org.nebulith.thermo.PhaseNames;
import org.nebulith.zones.LocalCondensation;
import org.nebulith.zones.ZoneInventory;

/**
 * The CSV tables of a planet run: bulk composition per zone, the comparison with the host star and
 * reference bodies, the phases each zone collected, and the radial profile.
 */
public final class PlanetTables {
    /** Ratios compared with the host star and the reference bodies. */
    public static final List<String> COMPARED = List.of("Mg_Si_molar", "Fe_Si_molar", "Ca_Si_molar", "Al_Si_molar",
            "Ti_Si_molar", "Ni_Fe_molar");
    /** Reference bodies in the comparison, by their ReferenceBodies names. */
    public static final List<String> BODIES = List.of("bulk-earth", "bulk-silicate-earth", "ci-chondrite");

    private PlanetTables() {
    }

    /**
     * @param planets the zone planets
     * @return {@code bulk-composition.csv}: zone,quantity,value,unit (plus radius where a mass is given)
     */
    public static Table bulkComposition(List<ZonePlanet> planets) {
        Table t = Table.withColumns("bulk-composition.csv", "zone", "quantity", "value", "unit");
        for (ZonePlanet zp : planets) {
            if (!zp.planet().hasSolids()) {
                continue;
            }
            PlanetComposition c = zp.planet().require();
            for (Quantity q : c.quantities()) {
                t.row(zp.zoneName(), q.name(), q.valueOrNull(), q.unit());
            }
            t.row(zp.zoneName(), "solids_mass_g", c.bulk().massGrams(), "g");
            zp.inventory().zone().planetMassMearth().ifPresent(m -> {
                PlanetRadius r = PlanetRadius.zeng2016(m, c);
                t.row(zp.zoneName(), "radius_Rearth_Zeng2016", r.radiusRearth().orElse(null),
                        "R_earth (for " + m + " M_earth" + (r.note().isEmpty() ? "" : "; " + r.note()) + ")");
                if (c.hasRock()) {
                    double refractory = c.refractoryOxideFraction();
                    boolean fits = refractory <= ZoneNotices.REFRACTORY_LIMIT;
                    t.row(zp.zoneName(), "radius_Rearth_structure", fits ? StructureRadius.of(c, m) : null,
                            "R_earth (for " + m + " M_earth" + (fits ? "" : String.format(java.util.Locale.ROOT,
                                    "; not applicable: solids %.0f %% refractory oxides, outside the model's Fe core"
                                            + " + Mg-silicate mantle", 100 * refractory)) + ")");
                }
            });
        }
        return t;
    }

    /**
     * @param planets the zone planets
     * @param host    the host star's (gas) composition
     * @return {@code comparison.csv}: zone,quantity,planet,host_star,bulk_earth,bulk_silicate_earth,ci_chondrite,unit
     */
    public static Table comparison(List<ZonePlanet> planets, ElementAbundances host) {
        return comparison(planets, host, org.nebulith.composition.CiReference.DEFAULT);
    }

    /**
     * @param planets the zone planets
     * @param host    the host star's (gas) composition
     * @param ci      the CI reference of the run (the {@code ci_chondrite} column)
     * @return {@code comparison.csv} as {@link #comparison(List, ElementAbundances)}
     */
    public static Table comparison(List<ZonePlanet> planets, ElementAbundances host,
                                   org.nebulith.composition.CiReference ci) {
        Table t = Table.withColumns("comparison.csv", "zone", "quantity", "planet", "host_star", "bulk_earth",
                "bulk_silicate_earth", "ci_chondrite", "unit");
        Map<String, Double> hostRatios = MolarRatios.of(host);
        List<Map<String, Double>> refs = new ArrayList<>();
        for (String b : BODIES) {
            ElementAbundances e = body(b, ci).elements();
            refs.add(e.isEmpty() ? Map.of() : MolarRatios.of(e));
        }
        for (ZonePlanet zp : planets) {
            if (!zp.planet().hasSolids()) {
                continue;
            }
            Map<String, Double> ratios = zp.planet().require().molarRatios();
            for (String q : COMPARED) {
                List<Object> row = new ArrayList<>(List.of(zp.zoneName(), q));
                row.add(ratios.get(q));
                row.add(hostRatios.get(q));
                refs.forEach(r -> row.add(r.get(q)));
                row.add("mol/mol");
                t.row(row);
            }
            List<Object> cmf = new ArrayList<>(List.of(zp.zoneName(), "core_mass_fraction"));
            PlanetComposition c = zp.planet().require();
            cmf.add(c.hasRock() ? c.coreMassFraction() : null);
            cmf.add(null);
            for (String b : BODIES) {
                ReferenceBodies.Body body = body(b, ci);
                cmf.add(body.coreMassFraction().isPresent() ? body.coreMassFraction().getAsDouble() : null);
            }
            cmf.add("mass fraction of rock");
            t.row(cmf);
        }
        return t;
    }

    private static ReferenceBodies.Body body(String name, org.nebulith.composition.CiReference ci) {
        return name.equals(ReferenceBodies.CI) ? ReferenceBodies.ci(ci) : ReferenceBodies.get(name);
    }

    /**
     * @param planets the zone planets
     * @return {@code zone-phases.csv}: what each zone collected, phase by phase, under display names
     *         ({@link PhaseNames}); data pieces of one phase are summed into one row, their ids joined
     *         by {@code +} in {@code data_id}
     */
    public static Table zonePhases(List<ZonePlanet> planets) {
        Table t = Table.withColumns("zone-phases.csv", "zone", "phase", "member", "species", "moles", "mass_g",
                "wt_pct_of_solids", "reservoir", "data_id");
        for (ZonePlanet zp : planets) {
            ZoneInventory inv = zp.inventory();
            double total = zp.planet().hasSolids() ? zp.planet().require().bulk().massGrams() : 0;
            Map<String, PhaseRow> rows = new LinkedHashMap<>();
            for (var p : org.nebulith.planet.PlanetFormation.condensedPhases(inv)) {
                String[] parts = p.name().split(":", 2);
                String phase = PhaseNames.display(parts[0]);
                String member = parts.length > 1 ? PhaseNames.display(parts[1]) : phase;
                String kind = p.kind().name().toLowerCase(java.util.Locale.ROOT);
                String key = phase + "|" + member + "|" + FormulaText.conventional(p.formula()) + "|" + kind;
                rows.computeIfAbsent(key, k -> new PhaseRow(phase, member, FormulaText.conventional(p.formula()), kind))
                        .add(parts[0], p.moles(), p.massGrams());
            }
            for (PhaseRow r : rows.values()) {
                t.row(inv.zone().name(), r.phase, r.member, r.species, r.moles, r.mass,
                        total > 0 ? 100 * r.mass / total : null, r.kind, PhaseNames.dataIdCell(r.ids));
            }
        }
        return t;
    }

    /** One row of zone-phases.csv while its pieces are summed. */
    private static final class PhaseRow {
        private final String phase;
        private final String member;
        private final String species;
        private final String kind;
        private final java.util.Set<String> ids = new java.util.LinkedHashSet<>();
        private double moles;
        private double mass;

        PhaseRow(String phase, String member, String species, String kind) {
            this.phase = phase;
            this.member = member;
            this.species = species;
            this.kind = kind;
        }

        void add(String id, double n, double grams) {
            ids.add(id);
            moles += n;
            mass += grams;
        }
    }

    /**
     * @param scan the local states, inner first
     * @return {@code radial-profile.csv}
     */
    public static Table radialProfile(List<LocalCondensation.Local> scan) {
        Table t = Table.withColumns("radial-profile.csv", "r_AU", "T_K", "P_bar", "sigma_gas_g_cm2",
                "T_equilibrium_K", "solids_per_gas_mass", "heavy_element_condensed_fraction", "ice_mass_fraction",
                "Mg_Si_molar", "Fe_Si_molar", "phases");
        for (LocalCondensation.Local l : scan) {
            LocalSolids s = LocalSolids.of(l);
            t.row(l.state().rAU(), l.state().temperatureK(), l.state().pressureBar(), l.state().sigmaGasGcm2(),
                    l.equilibriumK(), s.solidsPerGasMass(), s.heavyElementCondensedFraction(), s.iceMassFraction(),
                    finiteOrNull(s.mgSi()), finiteOrNull(s.feSi()), phases(l));
        }
        return t;
    }

    static Double finiteOrNull(double v) {
        return Double.isFinite(v) ? v : null;
    }

    /** @param l a local state @return its condensed phases under display names, ';'-separated */
    static String phases(LocalCondensation.Local l) {
        java.util.Set<String> names = new java.util.LinkedHashSet<>();
        for (String n : l.result().presentPhaseNames()) {
            names.add(PhaseNames.display(n));
        }
        StringJoiner j = new StringJoiner(";");
        names.forEach(j::add);
        if (l.iceMoles() > 0) {
            j.add("water ice");
        }
        return j.toString();
    }

    /**
     * @param scan the local states, inner first
     * @return the radius where each tracked phase first appears going outwards, phase name to r [AU]
     */
    public static Map<String, Double> fronts(List<LocalCondensation.Local> scan) {
        Map<String, Double> out = new LinkedHashMap<>();
        for (LocalCondensation.Local l : scan) {
            for (String n : phases(l).split(";")) {
                String key = n;
                if (!key.isEmpty() && (key.equals("metal") || key.equals("olivine") || key.equals("orthopyroxene")
                        || key.equals("troilite") || key.equals("water ice"))) {
                    out.putIfAbsent(key, l.state().rAU());
                }
            }
        }
        return out;
    }
}
