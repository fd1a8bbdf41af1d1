/**
 * Charts in Nebulith's own style, drawn by XChart: plain data holders
 * ({@link org.nebulith.report.chart.CondensationCurves}, {@link org.nebulith.report.chart.PhaseAssemblage},
 * {@link org.nebulith.report.chart.RadialProfile}, {@link org.nebulith.report.chart.BodyComparison},
 * {@link org.nebulith.report.chart.DevolatilisationPattern}, {@link org.nebulith.report.chart.SurveyScatter},
 * and the interior charts) build XChart XY charts styled by {@link org.nebulith.report.chart.ChartStyle}
 * and laid out in a {@link org.nebulith.report.chart.Figure} (one chart, stacked panels, small multiples);
 * {@link org.nebulith.report.chart.ChartRenderer} writes them atomically as PNG, SVG and PDF, the vector
 * files painted through {@link org.nebulith.report.chart.VectorCanvas}, which turns XChart's glyph
 * outlines back into live text and its line segments into one path per series.
 */
package org.nebulith.report.chart;
