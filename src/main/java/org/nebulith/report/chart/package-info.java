/**
 * Charts (XChart 4.0.3) in Nebulith's own style, built from plain data holders
 * ({@link org.nebulith.report.chart.CondensationCurves}, {@link org.nebulith.report.chart.PhaseAssemblage},
 * {@link org.nebulith.report.chart.RadialProfile}, {@link org.nebulith.report.chart.BodyComparison},
 * {@link org.nebulith.report.chart.SurveyScatter}) and written atomically as PNG, SVG and PDF by
 * {@link org.nebulith.report.chart.ChartRenderer}.
 */
package org.nebulith.report.chart;
