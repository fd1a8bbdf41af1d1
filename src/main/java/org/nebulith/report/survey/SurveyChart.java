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
import org.nebulith.survey.StarJob;

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

    /** @return the PNG bytes of the chart, or null if there is nothing to draw */
    static byte[] write(Path survey, RunFolder run) throws IOException {
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
        Figure chart = new SurveyScatter(stars, planets, references()).chart(ChartSize.COLUMN_TALL);
        return ChartRenderer.write(chart, run, BASE, java.util.EnumSet.allOf(ChartFormat.class)).png();
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
                SurveyScatter.Point p = new SurveyScatter.Point(star + " " + zone, v[0], v[1], v[2], v[3], v[4], v[5]);
                (zone.equals(StarJob.HOST_ZONE) ? stars : planets).add(p);
            }
        });
        zones.clear();
    }
}
