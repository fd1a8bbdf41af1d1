package org.nebulith.survey;

import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.nebulith.composition.ElementAbundances;
import org.nebulith.composition.SolarReference;
import org.nebulith.disk.DiskModel;
import org.nebulith.thermo.Element;
import org.nebulith.zones.FeedingZone;

/**
 * Error bars of a planet run from the host star's [X/H] errors: the survey's Monte Carlo
 * ({@link StarJob}: seeded antithetic Normal draws of [X/H], percentiles by Hyndman and Fan
 * definition 7) run on the planet run's own disk and zones. The [X/H] are those of the run's gas
 * relative to the solar photosphere of Asplund et al. (2009); elements without a given error are
 * held at their value. The survey's planet estimate integrates the zones on a coarser rule than the
 * planet command, so the bands are returned as offsets from the estimate's own nominal value, to be
 * added to the planet command's values.
 */
public final class HostMonteCarlo {

    private HostMonteCarlo() {
    }

    /**
     * @param gas        the run's gas composition
     * @param errors     1-sigma errors of [X/H] [dex] by element
     * @param disk       the run's disk
     * @param zones      the run's zones
     * @param quantities the quantities wanted (names as in survey.csv)
     * @param draws      number of draws, &gt;= 2
     * @param seed       the seed
     * @return per zone name: [0] the 16th and [1] the 84th percentile offsets from the nominal, per quantity
     */
    public static Map<String, double[][]> offsets(ElementAbundances gas, Map<Element, Double> errors, DiskModel disk,
                                                   List<FeedingZone> zones, List<String> quantities, int draws,
                                                   long seed) {
        ElementAbundances solar = SolarReference.ASPLUND2009.abundances();
        Map<Element, Measurement> m = new EnumMap<>(Element.class);
        for (Element e : gas.elements()) {
            if (e == Element.H || e == Element.He || !(gas.moles(e) > 0) || !(solar.moles(e) > 0)) {
                continue;
            }
            double dex = Math.log10(gas.moles(e) / gas.moles(Element.H)) - Math.log10(solar.moles(e) / solar.moles(Element.H));
            m.put(e, new Measurement(dex, errors.getOrDefault(e, 0.0)));
        }
        SurveySettings settings = new SurveySettings(draws, seed, SolarReference.ASPLUND2009, null, null);
        PlanetSurveyEstimator estimator = PlanetSurveyEstimator.of(disk, zones, SolarReference.ASPLUND2009);
        Map<String, double[][]> out = new LinkedHashMap<>();
        for (SurveyRow r : StarJob.run(StarRow.of("host", m), settings, estimator)) {
            int q = quantities.indexOf(r.quantity());
            if (q < 0 || r.zone().equals(StarJob.HOST_ZONE)) {
                continue;
            }
            double[][] band = out.computeIfAbsent(r.zone(), z -> new double[2][quantities.size()]);
            band[0][q] = r.p16() - r.nominal();
            band[1][q] = r.p84() - r.nominal();
        }
        return out;
    }
}
