package org.nebulith.report.survey;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.planet.MolarRatios;
import org.nebulith.planet.ReferenceBodies;
import org.nebulith.report.chart.Figure;
import org.nebulith.files.RunFolder;
import org.nebulith.report.chart.ChartFormat;
import org.nebulith.report.chart.ChartRenderer;
import org.nebulith.report.chart.ChartSize;
import org.nebulith.report.chart.SurveyScatter;
import org.nebulith.survey.CatalogueReader;
import org.nebulith.survey.StarJob;
import org.nebulith.survey.StarRow;
import org.nebulith.thermo.Element;

/**
 * The survey chart, {@code survey-chart.png} and {@code .svg}: molar Mg/Si against Fe/Si of the
 * host stars and of every predicted planet zone, medians with 16th-84th percentile bars, read back
 * from {@code survey.csv}. At most {@value #MAX_STARS} stars are drawn (the first ones).
 */
final class SurveyChart {

    static final String BASE = "survey-chart";
    static final int MAX_STARS = 2000;

    private SurveyChart() {
    }

    /**
     * @param survey    the survey table
     * @param catalogue the catalogue (the stars' [X/H] errors and their correlation), or null
     * @param run       the run folder
     * @return the PNG bytes of the chart, or null if there is nothing to draw
     * @throws IOException if a table cannot be read
     */
    static byte[] write(Path survey, Path catalogue, RunFolder run) throws IOException {
        List<SurveyScatter.Point> stars = new ArrayList<>();
        List<SurveyScatter.Point> planets = new ArrayList<>();
        Map<String, double[]> pending = new HashMap<>();
        String current = null;
        int count = 0;
        try (BufferedReader in = Files.newBufferedReader(survey, StandardCharsets.UTF_8)) {
            for (CSVRecord r : CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(in)) {
                if (!r.get("star").equals(current)) {
                    flush(current, pending, stars, planets);
                    current = r.get("star");
                    if (++count > MAX_STARS) {
                        break;
                    }
                }
                int slot = r.get("quantity").equals("Fe_Si_molar") ? 0 : r.get("quantity").equals("Mg_Si_molar") ? 3 : -1;
                if (slot >= 0 && !r.get("median").isEmpty()) {
                    double[] v = pending.computeIfAbsent(r.get("zone"), z -> new double[6]);
                    v[slot] = Double.parseDouble(r.get("median"));
                    v[slot + 1] = Double.parseDouble(r.get("p16"));
                    v[slot + 2] = Double.parseDouble(r.get("p84"));
                }
            }
        }
        if (count <= MAX_STARS) {
            flush(current, pending, stars, planets);
        }
        if (stars.isEmpty()) {
            return null;
        }
        List<SurveyScatter.Ellipse> ellipses = catalogue == null ? List.of() : ellipses(catalogue, stars);
        Figure chart = new SurveyScatter(stars, planets, references(), ellipses).chart(ChartSize.COLUMN_TALL);
        return ChartRenderer.write(chart, run, BASE, java.util.EnumSet.allOf(ChartFormat.class)).png();
    }

    /**
     * The covariance of each star's molar Fe/Si and Mg/Si from its catalogue errors, propagated to
     * first order: with [X/H] = value + error (sqrt(rho) z0 + sqrt(1 - rho) z_X) as the survey draws
     * them (elements the star lacks follow [Fe/H]), cov([X/H], [Y/H]) = rho e_X e_Y for X != Y, and
     * d ln(X/Si) = ln 10 (d[X/H] - d[Si/H]).
     */
    static List<SurveyScatter.Ellipse> ellipses(Path catalogue, List<SurveyScatter.Point> stars) throws IOException {
        Map<String, StarRow> rows = new HashMap<>();
        try (CatalogueReader reader = CatalogueReader.open(catalogue)) {
            for (CatalogueReader.Parsed p = reader.next(); p != null; p = reader.next()) {
                if (p.row() != null) {
                    rows.putIfAbsent(p.row().star(), p.row());
                }
            }
        }
        List<SurveyScatter.Ellipse> out = new ArrayList<>();
        for (SurveyScatter.Point s : stars) {
            StarRow row = rows.get(s.label());
            if (row != null) {
                out.add(ellipse(row, s));
            }
        }
        return out;
    }

    /**
     * @param row  a catalogue row
     * @param star the star's point (its medians)
     * @return the covariance of its Fe/Si and Mg/Si at the medians, to first order
     */
    static SurveyScatter.Ellipse ellipse(StarRow row, SurveyScatter.Point star) {
        double[] c = logCovariance(row);
        double ln10 = Math.log(10);
        double fe = star.feSi() * ln10;
        double mg = star.mgSi() * ln10;
        return new SurveyScatter.Ellipse(star.label(), fe * fe * c[0], mg * mg * c[1], fe * mg * c[2]);
    }

    /** @return var([Fe/H] - [Si/H]), var([Mg/H] - [Si/H]) and their covariance [dex^2] */
    private static double[] logCovariance(StarRow row) {
        Element[] e = {Element.Fe, Element.Mg, Element.Si};
        double[][] cov = new double[3][3];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                Element a = row.abundances().containsKey(e[i]) ? e[i] : Element.Fe;
                Element b = row.abundances().containsKey(e[j]) ? e[j] : Element.Fe;
                double ea = row.abundances().get(a).error();
                double eb = row.abundances().get(b).error();
                cov[i][j] = a == b ? ea * eb : row.errorCorrelation() * ea * eb;
            }
        }
        double varFe = cov[0][0] + cov[2][2] - 2 * cov[0][2];
        double varMg = cov[1][1] + cov[2][2] - 2 * cov[1][2];
        double both = cov[0][1] - cov[0][2] - cov[1][2] + cov[2][2];
        return new double[] {varFe, varMg, both};
    }

    /** @return the Sun (photosphere, Asplund et al. 2009) and bulk Earth (McDonough 2003) */
    static List<SurveyScatter.Point> references() {
        Map<String, Double> sun = MolarRatios.of(AbundancePresets.preset(AbundancePresets.PHOTOSPHERE_ASPLUND2009)
                .abundances());
        Map<String, Double> earth = MolarRatios.of(ReferenceBodies.get("bulk-earth").elements());
        return List.of(SurveyScatter.Point.of("Sun", sun.get("Fe_Si_molar"), sun.get("Mg_Si_molar")),
                SurveyScatter.Point.of("Earth", earth.get("Fe_Si_molar"), earth.get("Mg_Si_molar")));
    }

    private static void flush(String star, Map<String, double[]> zones, List<SurveyScatter.Point> stars,
                              List<SurveyScatter.Point> planets) {
        zones.forEach((zone, v) -> {
            if (v[0] > 0 && v[3] > 0) {
                boolean host = zone.equals(StarJob.HOST_ZONE);
                SurveyScatter.Point p = new SurveyScatter.Point(host ? star : star + " " + zone, v[0], v[1], v[2], v[3],
                        v[4], v[5]);
                (host ? stars : planets).add(p);
            }
        });
        zones.clear();
    }
}
