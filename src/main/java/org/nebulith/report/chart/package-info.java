/**
 * Charts in Nebulith's own style, drawn by our own small kit: a {@link org.nebulith.report.chart.Drawing}
 * (display list in points) built through {@link org.nebulith.report.chart.Panel} and
 * {@link org.nebulith.report.chart.Axis} from plain data holders
 * ({@link org.nebulith.report.chart.CondensationCurves}, {@link org.nebulith.report.chart.PhaseAssemblage},
 * {@link org.nebulith.report.chart.RadialProfile}, {@link org.nebulith.report.chart.BodyComparison},
 * {@link org.nebulith.report.chart.DevolatilisationPattern}, {@link org.nebulith.report.chart.SurveyScatter},
 * and the interior charts) and written atomically as PNG, SVG with live text and PDF with the font embedded
 * by {@link org.nebulith.report.chart.ChartRenderer}.
 */
package org.nebulith.report.chart;
