package org.nebulith.report.planet;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.planet.LocalSolids;
import org.nebulith.planet.MolarRatios;
import org.nebulith.planet.PlanetComposition;
import org.nebulith.planet.ReferenceBodies;
import org.nebulith.planet.ZonePlanet;
import org.nebulith.report.PhaseLabels;
import org.nebulith.report.chart.BodyComparison;
import org.nebulith.report.chart.DevolatilisationPattern;
import org.nebulith.thermo.Element;
import org.nebulith.report.chart.RadialProfile;
import org.nebulith.zones.FeedingZone;
import org.nebulith.zones.LocalCondensation;

/** The chart data of a planet run: the radial map and the planet comparison. */
public final class PlanetCharts {
    /** Ratio keys shown in the comparison, in panel order. */
    static final List<String> SHOWN = List.of("Mg_Si_molar", "Fe_Si_molar", "Ca_Si_molar", "Al_Si_molar");
    /** Panel titles of the comparison. */
    static final List<String> TITLES = List.of("Mg/Si [mol/mol]", "Fe/Si [mol/mol]", "Ca/Si [mol/mol]",
            "Al/Si [mol/mol]", "Core mass fraction");
    /** Phases whose fronts the radial map labels (display names). */
    static final Set<String> FRONT_PHASES = Set.of("metal", "olivine", "orthopyroxene", "troilite", "water ice",
            "plagioclase", "spinel-hercynite", "melilite", "diopside");

    /** Where the reference values of the comparison come from, for the caption. */
    public static final String REFERENCE_SOURCES = "Sun: photosphere of Asplund et al. (2009, ARA&A 47, 481, Table 1); "
            + "bulk Earth and its core mass fraction 0.325: McDonough (2003, Treatise on Geochemistry vol. 2); "
            + "bulk silicate Earth: McDonough & Sun (1995, Chem. Geol. 120, 223); CI chondrites: Palme & O'Neill "
            + "(2014, Treatise on Geochemistry 2nd ed. vol. 3); Mars core mass fraction 0.217: Wanke & Dreibus "
            + "(1988, Phil. Trans. R. Soc. A 325, 545), a value recalled, not checked against the paper";

    private PlanetCharts() {
    }

    /**
     * @param scan    local states, inner first
     * @param planets the zone planets
     * @param host    the host star's composition (its Mg/Si and Fe/Si are drawn as lines)
     * @return the radial map
     */
    public static RadialProfile radialMap(List<LocalCondensation.Local> scan, List<ZonePlanet> planets,
                                          ElementAbundances host) {
        int n = scan.size();
        double[] r = new double[n];
        double[] t = new double[n];
        double[] p = new double[n];
        double[] f = new double[n];
        double[] mg = new double[n];
        double[] fe = new double[n];
        for (int i = 0; i < n; i++) {
            LocalSolids s = LocalSolids.of(scan.get(i));
            r[i] = scan.get(i).state().rAU();
            t[i] = scan.get(i).state().temperatureK();
            p[i] = scan.get(i).state().pressureBar();
            f[i] = Math.min(1, Math.max(0, s.heavyElementCondensedFraction()));
            mg[i] = s.mgSi();
            fe[i] = s.feSi();
        }
        List<RadialProfile.Zone> zones = new ArrayList<>();
        for (ZonePlanet zp : planets) {
            FeedingZone z = zp.inventory().zone();
            double[] w = new double[n];
            for (int i = 0; i < n; i++) {
                w[i] = z.weight(r[i]);
            }
            zones.add(new RadialProfile.Zone(zp.zoneName(), z.rInnerAU(), z.rOuterAU(), w));
        }
        Map<String, Double> ratios = MolarRatios.of(host);
        return new RadialProfile(r, t, p, f, mg, fe, orNaN(ratios.get("Mg_Si_molar")), orNaN(ratios.get("Fe_Si_molar")),
                zones, fronts(scan));
    }

    /**
     * Fronts between neighbouring scan radii where a tracked phase appears or disappears (at the
     * geometric mean of the two radii); a phase already present at the first radius has no front there.
     *
     * @param scan local states, inner first
     * @return the fronts, inner first
     */
    static List<RadialProfile.Front> fronts(List<LocalCondensation.Local> scan) {
        List<RadialProfile.Front> out = new ArrayList<>();
        Set<String> before = null;
        for (int i = 0; i < scan.size(); i++) {
            Set<String> now = tracked(scan.get(i));
            if (before != null) {
                double at = Math.sqrt(scan.get(i - 1).state().rAU() * scan.get(i).state().rAU());
                for (String ph : now) {
                    if (!before.contains(ph)) {
                        out.add(new RadialProfile.Front(ph, at, true));
                    }
                }
                for (String ph : before) {
                    if (!now.contains(ph)) {
                        out.add(new RadialProfile.Front(ph, at, false));
                    }
                }
            }
            before = now;
        }
        return out;
    }

    private static Set<String> tracked(LocalCondensation.Local l) {
        Set<String> out = new LinkedHashSet<>();
        for (String n : PlanetTables.phases(l).split(";")) {
            String name = n.equals("water ice") ? n : PhaseLabels.display(n);
            if (FRONT_PHASES.contains(name)) {
                out.add(name);
            }
        }
        return out;
    }

    /**
     * @param planets the zone planets
     * @param host    the host star's composition
     * @param errors  per-zone 16th and 84th percentiles from the Monte Carlo over the host's errors, or null
     * @return one row per planet, then the host star and the reference bodies, one panel per quantity
     */
    public static BodyComparison comparison(List<ZonePlanet> planets, ElementAbundances host) {
        return comparison(planets, host, null, org.nebulith.composition.CiReference.DEFAULT);
    }

    /**
     * @param planets the zone planets
     * @param host    the host star's composition
     * @param ci      the run's CI reference
     * @return the comparison chart data, the CI row labelled with its publication
     */
    public static BodyComparison comparison(List<ZonePlanet> planets, ElementAbundances host,
                                            org.nebulith.composition.CiReference ci) {
        return comparison(planets, host, null, ci);
    }

    /**
     * @param planets the zone planets
     * @param host    the host star's composition
     * @param errors  per-zone 16th and 84th percentile ends of the error bars, or null
     * @param ci      the run's CI reference
     * @return one row per planet, then the host star and the reference bodies, one panel per quantity
     */
    public static BodyComparison comparison(List<ZonePlanet> planets, ElementAbundances host,
                                            Map<String, double[][]> errors, org.nebulith.composition.CiReference ci) {
        List<BodyComparison.Body> bodies = new ArrayList<>();
        for (ZonePlanet zp : planets) {
            if (zp.planet().hasSolids()) {
                PlanetComposition c = zp.planet().require();
                double[] v = values(c.molarRatios(), c.hasRock() ? c.coreMassFraction() : Double.NaN);
                double[][] e = errors == null ? null : errors.get(zp.zoneName());
                bodies.add(new BodyComparison.Body(zp.zoneName(), BodyComparison.Kind.PLANET, v,
                        e == null ? null : e[0], e == null ? null : e[1]));
            } else {
                bodies.add(BodyComparison.Body.of(zp.zoneName() + " (no solids)", BodyComparison.Kind.PLANET,
                        values(Map.of(), Double.NaN)));
            }
        }
        bodies.add(BodyComparison.Body.of("host star", BodyComparison.Kind.HOST, values(MolarRatios.of(host), Double.NaN)));
        ElementAbundances sun = AbundancePresets.preset(AbundancePresets.PHOTOSPHERE_ASPLUND2009).abundances();
        bodies.add(BodyComparison.Body.of("Sun (photosphere)", BodyComparison.Kind.REFERENCE,
                values(MolarRatios.of(sun), Double.NaN)));
        for (String[] ref : new String[][] {{"bulk-earth", "bulk Earth"}, {"bulk-silicate-earth", "bulk silicate Earth"},
                {ReferenceBodies.CI, "CI chondrites"}, {"mars", "Mars"}}) {
            ReferenceBodies.Body b = ref[0].equals(ReferenceBodies.CI) ? ReferenceBodies.ci(ci) : ReferenceBodies.get(ref[0]);
            double cmf = b.coreMassFraction().isPresent() ? b.coreMassFraction().getAsDouble() : Double.NaN;
            Map<String, Double> ratios = b.elements().isEmpty() ? Map.of() : MolarRatios.of(b.elements());
            String label = ref[0].equals(ReferenceBodies.CI) ? "CI chondrites (" + ci.citation() + ")" : ref[1];
            bodies.add(BodyComparison.Body.of(label, BodyComparison.Kind.REFERENCE, values(ratios, cmf)));
        }
        return new BodyComparison(TITLES, bodies);
    }

    /**
     * @param planets the zone planets
     * @param offsets per zone, percentile offsets from the nominal (see {@code HostMonteCarlo}), or null
     * @return per zone, the absolute 16th and 84th percentile ends of the error bars, or null
     */
    public static Map<String, double[][]> bars(List<ZonePlanet> planets, Map<String, double[][]> offsets) {
        if (offsets == null) {
            return null;
        }
        Map<String, double[][]> out = new java.util.LinkedHashMap<>();
        for (ZonePlanet zp : planets) {
            double[][] off = offsets.get(zp.zoneName());
            if (off == null || !zp.planet().hasSolids()) {
                continue;
            }
            PlanetComposition c = zp.planet().require();
            double[] v = values(c.molarRatios(), c.hasRock() ? c.coreMassFraction() : Double.NaN);
            double[][] b = new double[2][v.length];
            for (int q = 0; q < v.length; q++) {
                b[0][q] = v[q] + Math.min(0, off[0][q]);
                b[1][q] = v[q] + Math.max(0, off[1][q]);
            }
            out.put(zp.zoneName(), b);
        }
        return out;
    }

    /** Normalising element of the devolatilisation pattern (refractory, condenses early, no volatile host). */
    public static final Element NORMALISING = Element.Al;

    /**
     * The devolatilisation pattern: (X/Al) of each planet over (X/Al) of the host star, and of bulk Earth
     * (McDonough 2003) over the solar photosphere (Asplund et al. 2009), against T50.
     *
     * @param planets the zone planets
     * @param host    the host star's composition
     * @param t50K    50% condensation temperature per element [K] (the host composition at 1e-4 bar)
     * @return the chart data
     */
    public static DevolatilisationPattern devolatilisation(List<ZonePlanet> planets, ElementAbundances host,
                                                           Map<Element, Double> t50K) {
        List<Element> shown = new ArrayList<>();
        for (Element e : Element.values()) {
            if (e != Element.H && e != Element.He && e != NORMALISING && t50K.containsKey(e)
                    && Double.isFinite(t50K.get(e)) && host.moles(e) > 0) {
                shown.add(e);
            }
        }
        List<String> labels = new ArrayList<>();
        double[] t = new double[shown.size()];
        for (int i = 0; i < t.length; i++) {
            labels.add(shown.get(i).symbol());
            t[i] = t50K.get(shown.get(i));
        }
        List<DevolatilisationPattern.Body> bodies = new ArrayList<>();
        for (ZonePlanet zp : planets) {
            if (zp.planet().hasSolids()) {
                bodies.add(new DevolatilisationPattern.Body(zp.zoneName() + " / host",
                        ratios(zp.planet().require().bulk(), host, shown)));
            }
        }
        ElementAbundances sun = AbundancePresets.preset(AbundancePresets.PHOTOSPHERE_ASPLUND2009).abundances();
        bodies.add(new DevolatilisationPattern.Body("bulk Earth / Sun",
                ratios(ReferenceBodies.get("bulk-earth").elements(), sun, shown)));
        return new DevolatilisationPattern(labels, t, bodies, "(X/" + NORMALISING.symbol() + ") body / (X/"
                + NORMALISING.symbol() + ") star", List.of("T50: host composition, 1e-4 bar"));
    }

    private static double[] ratios(ElementAbundances body, ElementAbundances star, List<Element> shown) {
        double[] r = new double[shown.size()];
        double bodyRef = body.moles(NORMALISING);
        double starRef = star.moles(NORMALISING);
        for (int i = 0; i < r.length; i++) {
            Element e = shown.get(i);
            double v = bodyRef > 0 && starRef > 0 && star.moles(e) > 0
                    ? (body.moles(e) / bodyRef) / (star.moles(e) / starRef) : Double.NaN;
            r[i] = v > 0 ? v : Double.NaN;
        }
        return r;
    }

    /** @return the comparison's quantity names as in survey.csv, in panel order */
    public static List<String> quantityNames() {
        List<String> q = new ArrayList<>(SHOWN);
        q.add("core_mass_fraction");
        return q;
    }

    private static double[] values(Map<String, Double> ratios, double cmf) {
        double[] v = new double[SHOWN.size() + 1];
        for (int i = 0; i < SHOWN.size(); i++) {
            v[i] = orNaN(ratios.get(SHOWN.get(i)));
        }
        v[SHOWN.size()] = cmf;
        return v;
    }

    private static double orNaN(Double x) {
        return x == null || !Double.isFinite(x) ? Double.NaN : x;
    }
}
