package org.nebulith.spark;

import java.io.Serializable;

import org.nebulith.survey.StarRow;

/**
 * The unit of distribution: one star under one disk model and zone file of the grid. The row
 * carries the disk and zones of its grid cell ({@link SurveyGrid}); the survey's settings resolve
 * them with {@link org.nebulith.survey.SurveySettings#forStar}, exactly as the local survey does.
 *
 * @param index position in the grid (cell-major, then catalogue order); the order of the output
 * @param row   the star, with the cell's disk and zones
 */
public record GridTask(long index, StarRow row) implements Serializable {
}
