package org.nebulith.report;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;

/**
 * The one source of the cautions that every output states where its results could mislead: the
 * model's assumptions and validity ranges, in one wording, shared by the point, sequence, planet and
 * survey outputs (reports, notes and standard error).
 */
public final class Cautions {
    /** Full equilibrium, ideal mixing. */
    public static final String EQUILIBRIUM = "Every state is full chemical equilibrium (no kinetics, no "
            + "supersaturation) and the solutions mix ideally; real nebular condensates need not reach either, and "
            + "non-ideal mixing shifts minor-element condensation.";
    /** No silicate or oxide liquids. */
    public static final String NO_LIQUIDS = "Silicate and oxide liquids are not modelled: they can be stable at "
            + "high pressure or strong dust enrichment, where the solid assemblage shown is then not the stable one.";
    /** Phases missing from the data. */
    public static final String MISSING_PHASES = "Not in the model: phosphide (schreibersite) and Mn-bearing "
            + "silicate solutions, so P condenses late as phosphate and Mn as metal, later and in other hosts than "
            + "with them.";
    /** Below the floor temperature. */
    public static final String FLOOR = "Below the floor temperature the rock assemblage is frozen at its floor "
            + "equilibrium; only water ice is added there (from the ice vapour pressure); CO, CO2, CH4 and NH3 ices "
            + "are not modelled.";
    /** The core-mantle split and accretion. */
    public static final String CORE = "The core-mantle split is bookkeeping of condensates (metal and sulfide to "
            + "the core), not a model of metal-silicate equilibration during differentiation; accretion is assumed "
            + "to collect the local solids in proportion to the zone weights, without radial drift.";
    /** Validity of the mass-radius relation. */
    public static final String MASS_RADIUS = "The mass-radius relation (Zeng et al. 2016) is valid for 1-8 Earth "
            + "masses and core mass fractions 0-0.4; values outside are extrapolations.";
    /** Elements a star lacks. */
    public static final String FOLLOW_FE_H = "Elements a star lacks follow its [Fe/H] (common practice): a ratio "
            + "that involves such an element reflects the solar ratio scaled by [Fe/H], not a measurement of this star.";
    /** What a survey propagates. */
    public static final String RANDOM_ERRORS_ONLY = "Only the catalogue's random errors are propagated; "
            + "systematic offsets between abundance analyses, and the error of the solar reference itself, are not.";
    /** Percentiles from few draws. */
    public static final String FEW_DRAWS = "With few draws the 16th and 84th percentiles are noisy: for a Gaussian "
            + "spread sigma their standard error is about 1.5 sigma / sqrt(draws) (0.15 sigma at 100 draws, 0.05 "
            + "sigma at 1000; asymptotic error of a sample quantile, common practice).";
    /** Draws left out of the percentiles. */
    public static final String DRAWS_LEFT_OUT = "Draws that failed (failures.csv) or to which a quantity does not "
            + "apply are left out of its percentiles (n_draws in survey.csv says how many remain); they are not a "
            + "random sample: if they cluster in one part of the abundance distribution, the percentiles describe "
            + "the rest.";
    /** What survey planets are. */
    public static final String SURVEY_PLANETS = "The planet quantities inherit every assumption of the planet "
            + "estimate (equilibrium condensation in the given disk, solids accreted where they condensed, no later "
            + "processing); they are a composition expected from the star, not a measurement.";

    private Cautions() {
    }

    /**
     * @param dataDescription the data set and solutions used, one line
     * @param variantTags     the alternative-row tags of the data set (read from it)
     * @return the caution on the thermodynamic data
     */
    public static String data(String dataDescription, Collection<String> variantTags) {
        return "Results depend on the thermodynamic data (" + dataDescription + "); the gaseous Al species, the "
                + "Ca-aluminates and FeS move some temperatures by tens of kelvin: rerun with --variant TAG ("
                + String.join(", ", variantTags) + ") for a sensitivity check.";
    }

    /**
     * @param dataDescription the data set and solutions used
     * @param variantTags     the data set's alternative-row tags
     * @param extrapolatedGases gas species evaluated below their lowest data temperature, may be empty
     * @return the cautions of a condensation sequence
     */
    public static List<String> sequence(String dataDescription, Collection<String> variantTags,
                                        List<String> extrapolatedGases) {
        List<String> c = new ArrayList<>(List.of(EQUILIBRIUM, NO_LIQUIDS, data(dataDescription, variantTags),
                MISSING_PHASES));
        if (!extrapolatedGases.isEmpty()) {
            c.add("Gas species used below their lowest data temperature (extrapolated by up to 150 K, left out below "
                    + "that): " + String.join(", ", extrapolatedGases) + ".");
        }
        return c;
    }

    /**
     * @param dataDescription the data set and solutions used
     * @param variantTags     the data set's alternative-row tags
     * @return the cautions of a planet estimate
     */
    public static List<String> planet(String dataDescription, Collection<String> variantTags) {
        return List.of(EQUILIBRIUM, NO_LIQUIDS, data(dataDescription, variantTags), MISSING_PHASES, FLOOR, CORE,
                MASS_RADIUS);
    }

    /** @return the cautions of a survey (beyond those of the planet estimate) */
    public static List<String> survey() {
        return List.of(FOLLOW_FE_H, RANDOM_ERRORS_ONLY, FEW_DRAWS, DRAWS_LEFT_OUT, SURVEY_PLANETS);
    }

    /** @return the one-line caution of a single state */
    public static String point() {
        return "caution: solutions are ideal (no excess Gibbs energy); silicate liquids are not modelled";
    }
}
