/**
 * The science of a survey of host stars: the catalogue reader and its checks, the Monte Carlo draws of
 * each star ({@link org.nebulith.survey.StarJob}, a pure function of the row, the settings and the
 * seed), the ordered parallel runner ({@link org.nebulith.survey.SurveyRunner}) and the planet
 * estimate ({@link org.nebulith.survey.PlanetSurveyEstimator}) with every planet option
 * ({@link org.nebulith.survey.SurveySettings}). Files and reports are in {@code report.survey}.
 */
package org.nebulith.survey;
