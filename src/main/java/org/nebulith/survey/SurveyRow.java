package org.nebulith.survey;

import java.io.Serializable;

/**
 * One row of {@code survey.csv}: the Monte Carlo summary of one quantity of one zone of one star.
 *
 * @param star     the star
 * @param zone     the zone ({@code host} for the star's own ratios)
 * @param quantity quantity name, e.g. {@code Mg_Si_molar}
 * @param median   50th percentile of the draws
 * @param p16      16th percentile of the draws
 * @param p84      84th percentile of the draws
 * @param unit     the quantity's unit
 * @param nominal  the single estimate at the catalogue values (no draw)
 * @param draws    the number of draws summarised
 */
public record SurveyRow(String star, String zone, String quantity, double median, double p16, double p84,
                        String unit, double nominal, int draws) implements Serializable {
}
