/**
 * Everything a run shows to people: the one source of {@link org.nebulith.report.Cautions}, charts
 * ({@code report.chart}), the HTML and Markdown report ({@code report.html}) and each command's outputs
 * ({@code report.sequence}, {@code report.planet}, {@code report.interior}, {@code report.survey}). The
 * file primitives they write with are in {@code org.nebulith.files}.
 */
package org.nebulith.report;
