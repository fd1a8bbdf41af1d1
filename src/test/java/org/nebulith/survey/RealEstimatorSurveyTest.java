package org.nebulith.survey;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.composition.SolarReference;
import org.nebulith.disk.DiskModel;
import org.nebulith.disk.DiskPresets;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.planet.FormationSettings;
import org.nebulith.planet.PlanetFormation;
import org.nebulith.planet.ZonePlanet;
import org.nebulith.thermo.Element;
import org.nebulith.zones.ZoneCondensation;
import org.nebulith.zones.ZoneFileReader;

/** The survey checks with the real planet estimate (not the mass-balance stand-in). */
@Tag("slow")
class RealEstimatorSurveyTest {
    @TempDir
    static Path dir;
    private static SurveySettings cold;
    private static PlanetEstimator coldEstimator;

    @BeforeAll
    static void coldZone() throws Exception {
        // A zone of the minimum-mass solar nebula (Hayashi 1981) at 2.5-3.5 AU, below 300 K: every
        // refractory element is condensed there.
        Path zones = dir.resolve("cold.csv");
        Files.writeString(zones, "zone,shape,r_center_AU,half_width_AU\ncold,tophat,3.0,0.5\n");
        cold = new SurveySettings(2, 5, SolarReference.ASPLUND2009, DiskPresets.MMSN_HAYASHI1981, zones.toString());
        coldEstimator = PlanetSurveyEstimator.create(cold);
    }

    @Test
    void solarStarWithZeroErrorsReproducesTheSinglePlanetResult() throws Exception {
        // With zero errors every draw is the catalogue composition: median = p16 = p84 = nominal exactly.
        // The single planet run (PlanetFormation, same integration settings, cold start) reaches the same
        // equilibria by another warm-start path, so it agrees to the solver's tolerance (element balance
        // 1e-12), not bit for bit: compared to 1e-9 relative.
        Map<Element, Measurement> m = new EnumMap<>(Element.class);
        for (Element e : new Element[] {Element.Fe, Element.Mg, Element.Si, Element.Ca, Element.Al}) {
            m.put(e, new Measurement(0, 0));
        }
        SurveySettings s = new SurveySettings(4, 9, SolarReference.ASPLUND2009, null, null);
        List<SurveyRow> rows = StarJob.run(StarRow.of("Sun-like", m), s, PlanetSurveyEstimator.create(s));
        ElementAbundances solar = AbundancePresets.preset(AbundancePresets.PHOTOSPHERE_ASPLUND2009).abundances();
        DiskModel disk = DiskPresets.preset(PlanetSurveyEstimator.DEFAULT_DISK);
        var zones = ZoneFileReader.read(Files.newBufferedReader(Path.of(PlanetSurveyEstimator.DEFAULT_ZONES)),
                PlanetSurveyEstimator.DEFAULT_ZONES, disk);
        ZonePlanet single = new PlanetFormation(FormationSettings.defaults().withIntegration(ZoneCondensation.fast()),
                new EquilibriumSolver()).run(solar, disk, zones).planets().get(0);
        for (var q : PlanetSurveyEstimator.quantities(single)) {
            SurveyRow r = SurveyTestData.find(rows, single.zoneName(), q.name());
            assertEquals(r.nominal(), r.median(), 0, q.name());
            assertEquals(r.nominal(), r.p16(), 0, q.name());
            assertEquals(r.nominal(), r.p84(), 0, q.name());
            assertEquals(q.value(), r.nominal(), 1e-9 * Math.max(1, Math.abs(q.value())), q.name());
        }
    }

    @Test
    void coldZoneRatiosTrackTheStarWithSlopeOneAcrossTheDemoCatalogue() throws Exception {
        // Mass balance: where Mg, Si, Fe are fully condensed the planet inherits the star's ratios
        // (Thiabaud et al. 2015, A&A 580, A30, reach the same conclusion for refractory ratios).
        List<StarRow> stars = SurveyTestData.demoRows();
        for (String ratio : new String[] {"Mg_Si_molar", "Fe_Si_molar"}) {
            double sxy = 0;
            double sxx = 0;
            for (StarRow star : stars) {
                List<SurveyRow> rows = StarJob.run(star, cold.forStar(star), coldEstimator);
                double host = SurveyTestData.find(rows, "host", ratio).nominal();
                double planet = SurveyTestData.find(rows, "cold", ratio).nominal();
                assertEquals(1, planet / host, 0.01, star.star() + " " + ratio);
                sxy += host * planet;
                sxx += host * host;
            }
            assertEquals(1, sxy / sxx, 0.01, ratio + " slope through the origin");
        }
    }
}
