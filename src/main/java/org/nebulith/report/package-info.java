/**
 * Run outputs: atomic files and run folders ({@link org.nebulith.report.AtomicOutput},
 * {@link org.nebulith.report.RunFolder}), their checks before computing ({@code OutputChecks}), one
 * writer per output ({@link org.nebulith.report.OutputLock}), the marker of a finished run that
 * {@code --force} may replace ({@link org.nebulith.report.RunMarker}), write failures named by the final
 * path ({@link org.nebulith.report.OutputWriteException}), input checksums, UTF-8 check and protection
 * ({@link org.nebulith.report.RunInputs}),
 * tables and deterministic CSV ({@link org.nebulith.report.Table}, {@link org.nebulith.report.CsvTableWriter}).
 * Charts are in {@code report.chart}, the HTML and Markdown report in {@code report.html}.
 */
package org.nebulith.report;
