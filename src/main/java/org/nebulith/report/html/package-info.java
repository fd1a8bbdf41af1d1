/**
 * The per-run report: a {@link org.nebulith.report.html.Report} model written as one self-contained HTML
 * file (no scripts, no network, charts embedded) and a short Markdown summary.
 */
package org.nebulith.report.html;
