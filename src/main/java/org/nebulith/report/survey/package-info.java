/**
 * The survey's file workflow and outputs, beside the other commands' outputs: the local run with its
 * checks, partial file and resume ({@link org.nebulith.report.survey.LocalSurvey},
 * {@link org.nebulith.report.survey.ExistingSurvey}, {@link org.nebulith.report.survey.SurveyResume}),
 * the per-star table, the notes, the chart and the HTML report. The science of a survey is in
 * {@code org.nebulith.survey}.
 */
package org.nebulith.report.survey;
