package org.nebulith.survey;

import java.io.Serializable;

/**
 * One row of {@code survey.csv}: the Monte Carlo summary of one quantity of one zone of one star.
 * Percentiles come from the draws that converged and to which the quantity applies; a value that
 * does not exist (no such draws; a nominal estimate to which the quantity does not apply) is NaN
 * here and an empty cell in the file.
 *
 * @param star          the star
 * @param zone          the zone ({@code host} for the star's own ratios)
 * @param quantity      quantity name, e.g. {@code Mg_Si_molar}
 * @param median        50th percentile of the draws behind the row, or NaN if there are none
 * @param p16           16th percentile, or NaN
 * @param p84           84th percentile, or NaN
 * @param unit          the quantity's unit
 * @param nominal       the single estimate at the catalogue values (no draw), or NaN if it does not apply
 * @param draws         the draws run for the star
 * @param nDraws        the draws behind the percentiles (converged, quantity applies)
 * @param notApplicable converged draws to which the quantity does not apply
 */
public record SurveyRow(String star, String zone, String quantity, double median, double p16, double p84,
                        String unit, double nominal, int draws, int nDraws, int notApplicable) implements Serializable {

    private static final long serialVersionUID = 2L;
}
