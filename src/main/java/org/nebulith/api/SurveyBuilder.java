package org.nebulith.api;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.stream.IntStream;

import org.nebulith.composition.SolarReference;
import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;
import org.nebulith.planet.FormationOptions;
import org.nebulith.survey.CatalogueCheck;
import org.nebulith.survey.CatalogueProblem;
import org.nebulith.survey.CatalogueReader;
import org.nebulith.survey.DrawFailure;
import org.nebulith.survey.EstimatorCache;
import org.nebulith.survey.PlanetEstimator;
import org.nebulith.survey.PlanetSurveyEstimator;
import org.nebulith.survey.StarJob;
import org.nebulith.survey.StarResult;
import org.nebulith.survey.StarRow;
import org.nebulith.survey.SurveyRow;
import org.nebulith.survey.SurveySettings;

/**
 * A Monte Carlo survey of a star catalogue, kept in memory (the command line's {@code survey} writes
 * the same rows to files). Defaults, as on the command line: 1000 draws per star, seed 1, [X/H]
 * relative to Asplund et al. 2009, the planet estimate's default disk and zone, every processor, the
 * default planet options ({@link FormationOptions#defaults()}).
 */
public final class SurveyBuilder {
    private Path catalogue;
    private int draws = 1000;
    private long seed = 1;
    private SolarReference solar = SolarReference.ASPLUND2009;
    private String disk;
    private String zones;
    private int threads = Runtime.getRuntime().availableProcessors();
    private FormationOptions planet = FormationOptions.defaults();

    SurveyBuilder() {
    }

    /** @param file the star catalogue CSV ({@code star,Fe_H,Fe_H_err,...}) @return this */
    public SurveyBuilder catalogue(Path file) {
        this.catalogue = file;
        return this;
    }

    /** @param n Monte Carlo draws per star, &gt;= 1 @return this */
    public SurveyBuilder draws(int n) {
        this.draws = n;
        return this;
    }

    /** @param s the seed (same seed, same results on any number of threads) @return this */
    public SurveyBuilder seed(long s) {
        this.seed = s;
        return this;
    }

    /** @param ref the solar reference the catalogue's [X/H] are relative to @return this */
    public SurveyBuilder solarReference(SolarReference ref) {
        this.solar = ref;
        return this;
    }

    /** @param presetOrFile disk preset or file for every star without its own @return this */
    public SurveyBuilder disk(String presetOrFile) {
        this.disk = presetOrFile;
        return this;
    }

    /** @param file feeding-zone file for every star without its own @return this */
    public SurveyBuilder zones(String file) {
        this.zones = file;
        return this;
    }

    /** @param n worker threads, &gt;= 1 @return this */
    public SurveyBuilder threads(int n) {
        this.threads = n;
        return this;
    }

    /** @param options every other planet option (data set, variants, solutions, floor, core) @return this */
    public SurveyBuilder planet(FormationOptions options) {
        this.planet = options;
        return this;
    }

    /**
     * @return the survey rows, in catalogue order, and the estimates that failed (a failed draw is
     *         left out of its star's percentiles; a star whose nominal estimate fails has no rows)
     * @throws InputException for the first problem of the catalogue (nothing is computed)
     */
    public Survey run() {
        if (catalogue == null) {
            throw new IllegalStateException("no catalogue: call catalogue(Path) first");
        }
        SurveySettings settings = new SurveySettings(draws, seed, solar, disk, zones, planet);
        EstimatorCache estimators = new EstimatorCache(SurveyBuilder::estimator);
        try {
            CatalogueCheck check = CatalogueCheck.run(catalogue, settings, estimators);
            if (!check.problems().isEmpty()) {
                CatalogueProblem p = check.problems().get(0);
                throw new InputException(Messages.BAD_INPUT_FIELD, null, catalogue, p.line(), p.column(),
                        InputException.shown(p.value()), p.problem(), p.accepted());
            }
            List<StarRow> stars = stars();
            List<PlanetEstimator> perStar = new ArrayList<>();
            for (StarRow row : stars) {
                perStar.add(estimators.get(settings.forStar(row)));
            }
            ForkJoinPool pool = new ForkJoinPool(threads);
            List<StarResult> results;
            try {
                results = pool.submit(() -> IntStream.range(0, stars.size()).parallel()
                        .mapToObj(i -> StarJob.survey(stars.get(i), settings, perStar.get(i))).toList()).get();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IllegalStateException("survey interrupted", e);
            } catch (ExecutionException e) {
                throw e.getCause() instanceof RuntimeException r ? r : new IllegalStateException(e.getCause());
            } finally {
                pool.shutdownNow();
            }
            List<SurveyRow> rows = new ArrayList<>();
            List<DrawFailure> failures = new ArrayList<>();
            results.forEach(r -> {
                rows.addAll(r.rows());
                failures.addAll(r.failures());
            });
            return new Survey(rows, failures);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private List<StarRow> stars() throws IOException {
        List<StarRow> out = new ArrayList<>();
        try (CatalogueReader reader = CatalogueReader.open(catalogue)) {
            for (CatalogueReader.Parsed p = reader.next(); p != null; p = reader.next()) {
                out.add(p.row());
            }
        }
        return out;
    }

    private static PlanetEstimator estimator(SurveySettings s) {
        try {
            return PlanetSurveyEstimator.create(s);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
