package org.nebulith.report.planet;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import org.nebulith.composition.ElementAbundances;
import org.nebulith.planet.LocalSolids;
import org.nebulith.planet.MolarRatios;
import org.nebulith.planet.PlanetComposition;
import org.nebulith.planet.ReferenceBodies;
import org.nebulith.planet.ZonePlanet;
import org.nebulith.report.chart.BodyComparison;
import org.nebulith.report.chart.RadialProfile;
import org.nebulith.zones.LocalCondensation;

/** The chart data of a planet run: the radial map and the planet comparison. */
public final class PlanetCharts {
    private static final List<String> SHOWN = List.of("Mg_Si_molar", "Fe_Si_molar", "Ca_Si_molar", "Al_Si_molar");

    private PlanetCharts() {
    }

    /**
     * @param scan    local states, inner first
     * @param planets the zone planets (shaded)
     * @return the radial map
     */
    public static RadialProfile radialMap(List<LocalCondensation.Local> scan, List<ZonePlanet> planets) {
        int n = scan.size();
        double[] r = new double[n];
        double[] f = new double[n];
        double[] mg = new double[n];
        double[] fe = new double[n];
        for (int i = 0; i < n; i++) {
            LocalSolids s = LocalSolids.of(scan.get(i));
            r[i] = scan.get(i).state().rAU();
            f[i] = s.heavyElementCondensedFraction();
            mg[i] = s.mgSi();
            fe[i] = s.feSi();
        }
        List<RadialProfile.Zone> zones = new ArrayList<>();
        for (ZonePlanet zp : planets) {
            zones.add(new RadialProfile.Zone(zp.zoneName(), zp.inventory().zone().rInnerAU(),
                    zp.inventory().zone().rOuterAU()));
        }
        List<RadialProfile.Front> fronts = new ArrayList<>();
        for (Map.Entry<String, Double> e : PlanetTables.fronts(scan).entrySet()) {
            fronts.add(new RadialProfile.Front(e.getKey(), e.getValue()));
        }
        return new RadialProfile(r, f, mg, fe, zones, fronts);
    }

    /**
     * @param planets the zone planets
     * @param host    the host star's composition
     * @return planets beside the host, bulk Earth and CI for the key ratios and the core mass fraction
     */
    public static BodyComparison comparison(List<ZonePlanet> planets, ElementAbundances host) {
        return comparison(planets, host, org.nebulith.composition.CiReference.DEFAULT);
    }

    /**
     * @param planets the zone planets
     * @param host    the host star's composition
     * @param ci      the run's CI reference
     * @return the comparison chart data, the CI bar labelled with its publication
     */
    public static BodyComparison comparison(List<ZonePlanet> planets, ElementAbundances host,
                                            org.nebulith.composition.CiReference ci) {
        List<String> q = new ArrayList<>(SHOWN);
        q.add("core_mass_fraction");
        List<BodyComparison.Body> bodies = new ArrayList<>();
        for (ZonePlanet zp : planets) {
            if (zp.planet().hasSolids() && zp.planet().require().hasRock()) {
                PlanetComposition c = zp.planet().require();
                bodies.add(BodyComparison.Body.of(zp.zoneName() + " (predicted)", values(c.molarRatios(), c.coreMassFraction())));
            }
        }
        bodies.add(BodyComparison.Body.of("host star", values(MolarRatios.of(host), Double.NaN)));
        for (String name : List.of("bulk-earth", ReferenceBodies.CI)) {
            ReferenceBodies.Body b = name.equals(ReferenceBodies.CI) ? ReferenceBodies.ci(ci) : ReferenceBodies.get(name);
            double cmf = b.coreMassFraction().isPresent() ? b.coreMassFraction().getAsDouble() : Double.NaN;
            String label = name.equals(ReferenceBodies.CI) ? "CI chondrite (" + ci.citation() + ")" : name.replace('-', ' ');
            bodies.add(BodyComparison.Body.of(label, values(MolarRatios.of(b.elements()), cmf)));
        }
        return new BodyComparison(q, bodies);
    }

    private static double[] values(Map<String, Double> ratios, double cmf) {
        double[] v = new double[SHOWN.size() + 1];
        for (int i = 0; i < SHOWN.size(); i++) {
            Double x = ratios.get(SHOWN.get(i));
            v[i] = x == null || !(x > 0) ? Double.NaN : x;
        }
        v[SHOWN.size()] = cmf > 0 ? cmf : Double.NaN;
        return v;
    }
}
