/**
 * What a condensation sequence run leaves behind: the four CSV tables (phase amounts, element
 * fractions, condensation temperatures, phase appearance), the run notes with the settings, data
 * sources and cautions, and the hook for charts. Data flows one way: from
 * {@link org.nebulith.condensation.CondensationSequence} to {@link org.nebulith.files.Table}s.
 */
package org.nebulith.report.sequence;
