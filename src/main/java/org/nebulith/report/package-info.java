/**
 * Run outputs: atomic files and run folders ({@link org.nebulith.report.AtomicOutput},
 * {@link org.nebulith.report.RunFolder}), input checksums and protection ({@link org.nebulith.report.RunInputs}),
 * tables and deterministic CSV ({@link org.nebulith.report.Table}, {@link org.nebulith.report.CsvTableWriter}).
 * Charts are in {@code report.chart}, the HTML and Markdown report in {@code report.html}.
 */
package org.nebulith.report;
