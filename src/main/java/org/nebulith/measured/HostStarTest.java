package org.nebulith.measured;

import java.util.LinkedHashMap;
import java.util.Map;

import org.apache.commons.math3.special.Erf;
import org.nebulith.planet.interior.CoreComposition;
import org.nebulith.planet.interior.CoreMassFractionInversion;
import org.nebulith.planet.interior.InteriorModel;
import org.nebulith.planet.interior.MantleComposition;
import org.nebulith.planet.interior.MassRadiusGrid;
import org.nebulith.planet.interior.StructureSolver;
import org.nebulith.survey.PlanetEstimator;
import org.nebulith.survey.StarJob;
import org.nebulith.survey.StarRow;
import org.nebulith.survey.SurveyRow;
import org.nebulith.survey.SurveySettings;

/**
 * The host-star test (Adibekyan et al. 2021, Science 374, 330; Schulze et al. 2021, PSJ 2, 113): the
 * core mass fraction a planet's mass and radius imply, against the one its star's abundances predict.
 * The star's prediction is the survey's Monte Carlo ({@link StarJob}) over its abundance errors; the
 * planet's is a Monte Carlo over its mass and radius errors, inverted with the interior model whose
 * mantle has the predicted Mg# and Mg/Si. Their difference is expressed in combined standard
 * deviations (half the 16th-84th percentile ranges, a Gaussian reading of both distributions).
 */
public final class HostStarTest {
    /** Mass range of the inversion grid around a planet, in its mass errors. */
    private static final double MASS_SIGMAS = 4.5;
    private static final double SIGMA_FLOOR = 1e-9;

    private final StructureSolver solver = new StructureSolver();
    private final CoreComposition core;
    private final int planetDraws;

    /**
     * @param core        the core's light elements in the interior model
     * @param planetDraws Monte Carlo draws per planet
     */
    public HostStarTest(final CoreComposition core, final int planetDraws) {
        this.core = core;
        this.planetDraws = planetDraws;
    }

    /**
     * @param planet    the planet
     * @param star      its star
     * @param zone      the zone of the estimator's result to use
     * @param estimator the star's planet estimate
     * @param settings  draws, seed and solar reference of the star's Monte Carlo
     * @param seed      the seed of the planet's draws
     * @return the verdict
     */
    public PlanetVerdict test(final MeasuredPlanet planet, final StarRow star, final String zone,
                              final PlanetEstimator estimator, final SurveySettings settings, final long seed) {
        Map<String, SurveyRow> rows = new LinkedHashMap<>();
        for (SurveyRow r : StarJob.run(star, settings, estimator)) {
            if (r.zone().equals(zone)) {
                rows.put(r.quantity(), r);
            }
        }
        SurveyRow cmf = rows.get("core_mass_fraction");
        if (cmf == null) {
            throw new IllegalStateException("the star's estimate has no core mass fraction for zone " + zone);
        }
        double mgNumber = value(rows, "mantle_Mg_number", 100);
        double mgSi = mantleMgSi(rows);
        InteriorModel base = new InteriorModel(planet.mass(), cmf.median(), 0,
                MantleComposition.of(mgSi, Math.max(1e-3, mgNumber)), core);
        MassRadiusGrid grid = grid(planet, base);
        CoreMassFractionInversion.Result m = CoreMassFractionInversion.invert(grid, planet.mass(), planet.massErr(),
                planet.radius(), planet.radiusErr(), planetDraws, seed);
        double sm = Math.max(SIGMA_FLOOR, (m.p84() - m.p16()) / 2);
        double sp = Math.max(SIGMA_FLOOR, (cmf.p84() - cmf.p16()) / 2);
        double z = (m.median() - cmf.median()) / Math.hypot(sm, sp);
        double agreement = Erf.erfc(Math.abs(z) / Math.sqrt(2));
        return new PlanetVerdict(planet, zone, new double[] {cmf.median(), cmf.p16(), cmf.p84()}, mgNumber, mgSi, m, z,
                agreement, grid.radiusRearth(planet.mass(), 0), grid.radiusRearth(planet.mass(), cmf.median()));
    }

    /**
     * @param planet a planet
     * @param base   its composition
     * @return the grid covering its mass range
     */
    public MassRadiusGrid grid(final MeasuredPlanet planet, final InteriorModel base) {
        return new MassRadiusGrid(base, planet.mass() - MASS_SIGMAS * planet.massErr(),
                planet.mass() + MASS_SIGMAS * planet.massErr(), solver);
    }

    /**
     * @param planet a planet
     * @return the radius [R_earth] of the least dense body the model builds at its mass: 75 % water
     *         on Earth-like rock (a larger radius needs a gas envelope)
     */
    public double largestRadius(final MeasuredPlanet planet) {
        return solver.solve(new InteriorModel(planet.mass(), 0.325, 0.75, MantleComposition.magnesiumSilicate(), core))
                .radiusRearth();
    }

    private static double value(final Map<String, SurveyRow> rows, final String name, final double fallback) {
        SurveyRow r = rows.get(name);
        return r == null || !(r.median() > 0) ? fallback : r.median();
    }

    private static double mantleMgSi(final Map<String, SurveyRow> rows) {
        if (rows.containsKey("mantle_Mg_Si_molar")) {
            return value(rows, "mantle_Mg_Si_molar", 1);
        }
        double mgo = value(rows, "mantle_MgO_wt_pct", 0);
        double sio2 = value(rows, "mantle_SiO2_wt_pct", 0);
        return mgo > 0 && sio2 > 0 ? (mgo / 40.304) / (sio2 / 60.084) : 1;
    }
}
