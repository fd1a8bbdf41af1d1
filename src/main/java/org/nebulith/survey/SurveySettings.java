package org.nebulith.survey;

import java.io.Serializable;

import org.nebulith.composition.SolarReference;
import org.nebulith.planet.FormationOptions;

/**
 * The settings that, with a star's row, determine its survey result (thread count and output
 * paths do not).
 *
 * @param draws   Monte Carlo draws per star, &gt;= 1
 * @param seed    the run's seed
 * @param solar   the solar reference the catalogue's [X/H] are relative to
 * @param disk    disk preset name or file, or null for the estimator's default
 * @param zones   feeding-zone file, or null for the estimator's default zone
 * @param planet  every other option of the planet estimate (data set, variants, species, solutions,
 *                floor temperature, core)
 */
public record SurveySettings(int draws, long seed, SolarReference solar, String disk, String zones,
                             FormationOptions planet) implements Serializable {

    /**
     * Settings with the default planet options.
     *
     * @param draws Monte Carlo draws per star, &gt;= 1
     * @param seed  the run's seed
     * @param solar the solar reference
     * @param disk  disk preset name or file, or null
     * @param zones feeding-zone file, or null
     */
    public SurveySettings(int draws, long seed, SolarReference solar, String disk, String zones) {
        this(draws, seed, solar, disk, zones, FormationOptions.defaults());
    }

    /** Checks the values. */
    public SurveySettings {
        if (planet == null) {
            throw new IllegalArgumentException("planet options are required (FormationOptions.defaults())");
        }
        if (draws < 1) {
            throw new IllegalArgumentException("draws must be >= 1, got " + draws);
        }
        if (solar == null) {
            throw new IllegalArgumentException("a solar reference is required");
        }
    }

    /**
     * @param row a star
     * @return these settings with the star's own disk and zones, where it gives them
     */
    public SurveySettings forStar(StarRow row) {
        return new SurveySettings(draws, seed, solar, row.disk() == null ? disk : row.disk(),
                row.zones() == null ? zones : row.zones(), planet);
    }
}
