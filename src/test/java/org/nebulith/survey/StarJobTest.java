package org.nebulith.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.composition.SolarReference;
import org.nebulith.planet.Quantity;
import org.nebulith.thermo.Element;

/**
 * The survey of one star. The planet estimate here is {@link FullyCondensedEstimator} (mass balance
 * in a cold zone); {@link #coldZoneEstimator()} is the one place to substitute the real estimate.
 */
@Tag("slow")
class StarJobTest {

    /** @return the estimator for the cold-zone checks (swap in the real planet estimate's cold zone here) */
    static PlanetEstimator coldZoneEstimator() {
        return new FullyCondensedEstimator();
    }

    private static final String[] RATIOS = {"Mg_Si_molar", "Fe_Si_molar", "Ca_Si_molar", "Al_Si_molar"};

    @Test
    void solarStarWithZeroErrorsReproducesTheSingleEstimateExactly() {
        // Identity: with zero errors every draw is the catalogue composition, and [X/H] = 0 is the
        // reference itself (Asplund et al. 2009 photosphere, presets/photosphere-asplund2009.csv).
        Map<Element, Measurement> m = new EnumMap<>(Element.class);
        for (Element e : new Element[] {Element.Fe, Element.Mg, Element.Si, Element.Ca, Element.Al}) {
            m.put(e, new Measurement(0, 0));
        }
        PlanetEstimator estimator = coldZoneEstimator();
        List<SurveyRow> rows = StarJob.run(StarRow.of("Sun-like", m), new SurveySettings(50, 9, SolarReference.ASPLUND2009,
                null, null), estimator);
        ElementAbundances solar = AbundancePresets.preset(AbundancePresets.PHOTOSPHERE_ASPLUND2009).abundances();
        LinkedHashMap<String, List<Quantity>> single = estimator.estimate(solar);
        int compared = 0;
        for (Map.Entry<String, List<Quantity>> zone : single.entrySet()) {
            for (Quantity q : zone.getValue()) {
                SurveyRow r = SurveyTestData.find(rows, zone.getKey(), q.name());
                assertEquals(q.value(), r.median(), 0);
                assertEquals(q.value(), r.p16(), 0);
                assertEquals(q.value(), r.p84(), 0);
                assertEquals(q.value(), r.nominal(), 0);
                assertEquals(q.unit(), r.unit());
                compared++;
            }
        }
        assertTrue(compared >= 4);
        assertEquals(solar.ratio(Element.Mg, Element.Si), SurveyTestData.find(rows, "host", "Mg_Si_molar").median(), 0);
    }

    @Test
    void coldZoneRatiosTrackTheStarWithSlopeOne() throws Exception {
        // Mass balance: where Mg, Si, Fe, Ca, Al are fully condensed the planet inherits the star's
        // refractory ratios (Thiabaud et al. 2015, A&A 580, A30, reach the same conclusion), so the
        // planet/star relation across the demo catalogue has slope 1 within 1%.
        List<StarRow> stars = SurveyTestData.demoRows();
        SurveySettings settings = new SurveySettings(200, 5, SolarReference.ASPLUND2009, null, null);
        PlanetEstimator estimator = coldZoneEstimator();
        for (String ratio : new String[] {"Mg_Si_molar", "Fe_Si_molar"}) {
            double[] host = new double[stars.size()];
            double[] planet = new double[stars.size()];
            for (int i = 0; i < stars.size(); i++) {
                List<SurveyRow> rows = StarJob.run(stars.get(i), settings, estimator);
                host[i] = SurveyTestData.find(rows, "host", ratio).median();
                planet[i] = SurveyTestData.find(rows, FullyCondensedEstimator.ZONE, ratio).median();
                assertEquals(1, planet[i] / host[i], 0.01, stars.get(i).star() + " " + ratio);
            }
            assertEquals(1, slope(host, planet), 0.01, ratio);
        }
    }

    @Test
    void mediansFrom1000And4000DrawsAgreeWithin1Percent() throws Exception {
        // Convergence of the Monte Carlo. Independent draws would give the median a standard error of
        // about 1.25 sigma / sqrt(N) (asymptotic error of a sample median, common practice), 0.8% for
        // the widest demo ratio (sigma ~ 20%); the antithetic pairs of StarJob bring it far below 1%.
        PlanetEstimator estimator = coldZoneEstimator();
        for (StarRow star : SurveyTestData.demoRows()) {
            List<SurveyRow> a = StarJob.run(star, new SurveySettings(1000, 11, SolarReference.ASPLUND2009, null, null), estimator);
            List<SurveyRow> b = StarJob.run(star, new SurveySettings(4000, 11, SolarReference.ASPLUND2009, null, null), estimator);
            assertEquals(a.size(), b.size());
            for (int i = 0; i < a.size(); i++) {
                assertEquals(1, a.get(i).median() / b.get(i).median(), 0.01, star.star() + " " + a.get(i).quantity());
            }
        }
    }

    @Test
    void spreadOfARatioMatchesTheCombinedErrors() {
        // [Mg/H] and [Si/H] independent with errors 0.06 and 0.08 dex: log10(Mg/Si) is normal with
        // sigma = 0.1 dex, and the 16th/84th percentiles of a normal lie at -1/+1 sigma (common practice),
        // so log10(p84/p16) = 0.2 dex; the estimate from 4000 draws is good to about 2%.
        Map<Element, Measurement> m = new EnumMap<>(Element.class);
        m.put(Element.Fe, new Measurement(0.1, 0.05));
        m.put(Element.Mg, new Measurement(0.1, 0.06));
        m.put(Element.Si, new Measurement(0.0, 0.08));
        List<SurveyRow> rows = StarJob.run(StarRow.of("Spread", m), new SurveySettings(4000, 2, SolarReference.ASPLUND2009,
                null, null), coldZoneEstimator());
        SurveyRow mgSi = SurveyTestData.find(rows, "host", "Mg_Si_molar");
        assertEquals(0.2, Math.log10(mgSi.p84() / mgSi.p16()), 0.2 * 0.04);
        assertEquals(mgSi.nominal(), mgSi.median(), mgSi.nominal() * 0.01);
    }

    @Test
    void fullyCorrelatedEqualErrorsLeaveTheRatioFixed() {
        // err_corr = 1 with equal errors shifts [Mg/H] and [Si/H] together: Mg/Si is constant
        // (to rounding) while Fe/Si, with a different error, still spreads.
        Map<Element, Measurement> m = new EnumMap<>(Element.class);
        m.put(Element.Fe, new Measurement(0.0, 0.02));
        m.put(Element.Mg, new Measurement(0.0, 0.08));
        m.put(Element.Si, new Measurement(0.0, 0.08));
        StarRow row = new StarRow("Correlated", 1, m, null, null, 1.0);
        List<SurveyRow> rows = StarJob.run(row, new SurveySettings(500, 4, SolarReference.ASPLUND2009, null, null),
                coldZoneEstimator());
        SurveyRow mgSi = SurveyTestData.find(rows, "host", "Mg_Si_molar");
        assertEquals(mgSi.p16(), mgSi.p84(), mgSi.median() * 1e-12);
        SurveyRow feSi = SurveyTestData.find(rows, "host", "Fe_Si_molar");
        assertTrue(feSi.p84() / feSi.p16() > 1.1);
    }

    @Test
    void anEstimateWhoseLayoutChangesBetweenDrawsIsRefused() {
        PlanetEstimator shifting = gas -> {
            LinkedHashMap<String, List<Quantity>> z = new LinkedHashMap<>();
            z.put("cold", gas.moles(Element.Fe) > 3.2e-5
                    ? List.of(new Quantity("a", 1, "-")) : List.of(new Quantity("b", 1, "-")));
            return z;
        };
        Map<Element, Measurement> m = new EnumMap<>(Element.class);
        m.put(Element.Fe, new Measurement(0.0, 0.3));
        StarJobException e = assertThrows(StarJobException.class, () -> StarJob.run(StarRow.of("Shifty", m),
                new SurveySettings(100, 1, SolarReference.ASPLUND2009, null, null), shifting));
        assertTrue(e.getMessage().contains("Shifty") && e.getMessage().contains("draw"), e.getMessage());
    }

    @Test
    void lacksFollowFeH() throws Exception {
        StarRow elder = SurveyTestData.demoRows().stream().filter(r -> r.star().equals("NDC Elder")).findFirst().orElseThrow();
        assertTrue(StarJob.followedFeH(elder, SolarReference.ASPLUND2009).containsAll(
                List.of(Element.Al, Element.Ca, Element.Ti, Element.Na, Element.Cr, Element.O)));
        assertTrue(!StarJob.followedFeH(elder, SolarReference.ASPLUND2009).contains(Element.Mg));
    }

    /** Least-squares slope of y on x. */
    private static double slope(double[] x, double[] y) {
        double mx = 0;
        double my = 0;
        for (int i = 0; i < x.length; i++) {
            mx += x[i] / x.length;
            my += y[i] / x.length;
        }
        double sxy = 0;
        double sxx = 0;
        for (int i = 0; i < x.length; i++) {
            sxy += (x[i] - mx) * (y[i] - my);
            sxx += (x[i] - mx) * (x[i] - mx);
        }
        return sxy / sxx;
    }

    @Test
    void notApplicableDrawsAreLeftOutOfThePercentilesAndCounted() {
        // A stand-in whose quantity "x" is [Fe/H]-dependent: it does not apply where Fe/H exceeds the
        // solar value; the percentiles must come from the other draws only, and failures from neither.
        double solarFe = SolarReference.ASPLUND2009.abundances().moles(Element.Fe)
                / SolarReference.ASPLUND2009.abundances().moles(Element.H);
        PlanetEstimator partial = gas -> {
            double fe = gas.moles(Element.Fe) / gas.moles(Element.H);
            LinkedHashMap<String, List<Quantity>> z = new LinkedHashMap<>();
            z.put("cold", List.of(fe > solarFe ? Quantity.notApplicable("x", "-") : new Quantity("x", fe / solarFe, "-")));
            if (fe > 1.4 * solarFe) {
                throw new org.nebulith.errors.NumericalException(org.nebulith.errors.Messages.NUMERICAL_FAILURE, null,
                        "test failure", 300.0, 1e-4, "test");
            }
            return z;
        };
        Map<Element, Measurement> m = new EnumMap<>(Element.class);
        m.put(Element.Fe, new Measurement(-0.01, 0.1));
        StarResult r = StarJob.survey(StarRow.of("Partial", m), new SurveySettings(400, 5, SolarReference.ASPLUND2009,
                null, null), partial);
        SurveyRow x = SurveyTestData.find(r.rows(), "cold", "x");
        assertEquals(400, x.draws());
        assertEquals(400, x.nDraws() + x.notApplicable() + r.failures().size());
        assertTrue(x.notApplicable() > 100 && x.nDraws() > 100 && !r.failures().isEmpty(), x + " " + r.failures().size());
        assertTrue(x.p84() <= 1.0 && x.median() < 1.0, "only draws with Fe/H below solar: " + x);
        for (DrawFailure f : r.failures()) {
            assertEquals("draw", f.stage());
            assertEquals(300.0, f.tK());
            assertEquals(1e-4, f.pBar());
        }
        SurveyRow host = SurveyTestData.find(r.rows(), "host", "Fe_Si_molar");
        assertEquals(400 - r.failures().size(), host.nDraws());
    }
}
