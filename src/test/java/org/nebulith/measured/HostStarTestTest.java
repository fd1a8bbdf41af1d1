package org.nebulith.measured;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

import org.junit.jupiter.api.Test;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.composition.SolarReference;
import org.nebulith.planet.Quantity;
import org.nebulith.planet.interior.CoreComposition;
import org.nebulith.planet.interior.InteriorModel;
import org.nebulith.planet.interior.MantleComposition;
import org.nebulith.planet.interior.StructureSolver;
import org.nebulith.survey.Measurement;
import org.nebulith.survey.StarRow;
import org.nebulith.survey.SurveySettings;
import org.nebulith.thermo.Element;

/** The host-star test and the stoichiometric prediction. */
class HostStarTestTest {

    @Test
    void stoichiometricCoreFractionIsTheMassBalance() {
        // exact identity: 1 mol Fe, 0.5 mol S, 1 mol Mg, 1 mol Si -> core Fe + S (as FeS), mantle MgO + SiO2
        Map<Element, Double> m = new EnumMap<>(Element.class);
        m.put(Element.H, 1e6);
        m.put(Element.Fe, 1.0);
        m.put(Element.S, 0.5);
        m.put(Element.Mg, 1.0);
        m.put(Element.Si, 1.0);
        List<Quantity> q = new StoichiometricEstimator().estimate(ElementAbundances.of(m)).get(StoichiometricEstimator.ZONE);
        double core = Element.Fe.atomicWeight() + 0.5 * Element.S.atomicWeight();
        double mantle = Element.Mg.atomicWeight() + Element.Si.atomicWeight() + 3 * Element.O.atomicWeight();
        assertEquals(core / (core + mantle), q.get(0).value(), 1e-12);
        assertEquals(1.0, q.get(1).value(), 1e-12);
    }

    @Test
    void solarCompositionGivesAnEarthLikeCoreFraction() {
        // Asplund et al. 2009 Sun, all rock condensed: iron mass fraction about 0.33 (Santos et al. 2015 and
        // Adibekyan et al. 2021 find f_iron ~ 33 % for the Sun; from memory); our core also holds Ni, Co and S
        double cmf = new StoichiometricEstimator().estimate(SolarReference.ASPLUND2009.abundances())
                .get(StoichiometricEstimator.ZONE).get(0).value();
        assertEquals(0.36, cmf, 0.04);
    }

    @Test
    void planetBuiltFromItsStarsPredictionAgrees() {
        Map<Element, Measurement> ab = new EnumMap<>(Element.class);
        ab.put(Element.Fe, new Measurement(0.10, 0.05));
        ab.put(Element.Mg, new Measurement(0.05, 0.05));
        ab.put(Element.Si, new Measurement(0.02, 0.05));
        StarRow star = StarRow.of("Test Star", ab);
        SurveySettings settings = new SurveySettings(400, 3, SolarReference.ASPLUND2009, null, null);
        HostStarTest test = new HostStarTest(CoreComposition.pureIron(), 3000);
        // the star's own prediction at its catalogue values
        Map<Element, Double> dex = new EnumMap<>(Element.class);
        ab.forEach((e, x) -> dex.put(e, x.dex()));
        ElementAbundances gas = org.nebulith.composition.StellarAbundances.apply(SolarReference.ASPLUND2009.abundances(),
                dex).abundances();
        List<Quantity> q = new StoichiometricEstimator().estimate(gas).get(StoichiometricEstimator.ZONE);
        double cmf = q.get(0).value();
        double mgSi = q.get(1).value();
        double radius = new StructureSolver().solve(new InteriorModel(2.5, cmf, 0, MantleComposition.of(mgSi, 100),
                CoreComposition.pureIron())).radiusRearth();
        MeasuredPlanet p = new MeasuredPlanet("Test b", "Test Star", 2.5, 0.1, radius, 0.02, OptionalDouble.empty(), 2);
        PlanetVerdict v = test.test(p, star, StoichiometricEstimator.ZONE, new StoichiometricEstimator(), settings, 11);
        assertEquals(0, v.differenceSigma(), 0.25, "a planet made of its star's prediction");
        assertTrue(v.agreement() > 0.8, "agreement " + v.agreement());
        assertEquals(cmf, v.predicted()[0], 0.01);
    }
}
