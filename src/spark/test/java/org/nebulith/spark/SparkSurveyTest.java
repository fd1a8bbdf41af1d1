package org.nebulith.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.SparkSession;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nebulith.composition.SolarReference;
import org.nebulith.disk.DiskPresets;
import org.nebulith.progress.Progress;
import org.nebulith.files.RunInputs;
import org.nebulith.survey.EstimatorCache;
import org.nebulith.report.survey.LocalSurvey;
import org.nebulith.survey.PlanetSurveyEstimator;
import org.nebulith.survey.StarJob;
import org.nebulith.survey.StarRow;
import org.nebulith.survey.SurveyCsv;
import org.nebulith.survey.SurveySettings;

/**
 * Spark in local mode ({@code local[2]}, loopback, no UI) against the local survey, on the first
 * stars of the demo catalogue (invented stars) with the real planet estimate and few draws. The
 * reference is the local engine itself ({@link LocalSurvey}, {@link StarJob}): equality is exact,
 * byte for byte, because both run the same pure function with the same seeds.
 */
class SparkSurveyTest {

    private static final int DRAWS = 8;
    private static final long SEED = 7;
    private static final String BAD_STAR = "Test Bad-Disk";

    private static SparkSession spark;

    @TempDir
    Path dir;

    @BeforeAll
    static void start() {
        spark = SparkSessions.local(2);
    }

    @AfterAll
    static void stop() {
        spark.stop();
    }

    @Test
    void sameTableAsTheLocalSurveyAndABadStarIsReportedWithoutLosingTheOthers() throws IOException {
        List<String> demo = demoLines(3);
        Path localCatalogue = write("local.csv", demo);
        List<String> withDisk = new ArrayList<>();
        for (String line : demo) {
            withDisk.add(line.startsWith("#") ? line : line.startsWith("star,") ? line + ",disk" : line + ",");
        }
        // The bad row sits between good ones, in the same partition as its neighbours.
        String bad = demo.get(demo.size() - 1).replaceFirst("^[^,]+", BAD_STAR) + ",no-such-disk";
        withDisk.add(withDisk.size() - 1, bad);
        Path sparkCatalogue = write("spark.csv", withDisk);

        SurveySettings settings = new SurveySettings(DRAWS, SEED, SolarReference.ASPLUND2009, null, null);
        Path localOut = dir.resolve("local");
        LocalSurvey.run(new LocalSurvey.Request(localCatalogue, "local.csv", localOut, settings, 2, false, false, false),
                new EstimatorCache(SparkSurveyTest::planet), new RunInputs().add(localCatalogue, "catalogue"),
                total -> Progress.none(), new LocalSurvey.Log() {
                    @Override
                    public void info(String line) {
                    }

                    @Override
                    public void warn(String line) {
                        throw new AssertionError("local survey warned: " + line);
                    }
                });

        List<String> warnings = new ArrayList<>();
        Path sparkOut = dir.resolve("spark");
        SurveyJob.Outcome o = SurveyJob.run(spark, new SurveyJob.Request(sparkCatalogue.toString(), sparkOut.toString(),
                DRAWS, SEED, SolarReference.ASPLUND2009, new SurveyGrid(List.of(), List.of()), 2, false, false),
                EstimatorFactory.PLANET, warnings::add);

        assertEquals(3, o.written().stars());
        assertEquals(1, o.written().failed());
        String local = Files.readString(localOut.resolve(SurveyCsv.FILE));
        String distributed = Files.readString(sparkOut.resolve(SurveyTables.CSV));
        assertEquals(local, distributed, "survey.csv: the same bytes as the local survey");
        assertEquals(sortedByStarAndQuantity(local), sortedByStarAndQuantity(distributed));
        assertEquals(3, local.lines().skip(1).map(SurveyCsv::starOf).distinct().count());

        List<String> failures = Files.readAllLines(sparkOut.resolve(SurveyTables.FAILURES));
        assertEquals(2, failures.size(), failures.toString());
        assertEquals("star,draw,zone,T_K,P_bar,stage,reason", failures.get(0), "the local survey's failure columns");
        assertTrue(failures.get(1).startsWith(BAD_STAR + ",,,,,setup,"), failures.get(1));
        assertEquals(Files.readString(localOut.resolve(SurveyTables.FAILURES)), failures.get(0) + "\n",
                "the local run (without the bad star) has the same header and no failure");
        assertTrue(failures.get(1).contains("disk 'no-such-disk' is neither a preset"), failures.get(1));
        assertEquals(1, warnings.size(), warnings.toString());
        assertTrue(warnings.get(0).startsWith("failed: star '" + BAD_STAR + "' (catalogue line 10), setup:"), warnings.get(0));

        Map<String, Double> parquet = new HashMap<>();
        for (Row r : spark.read().parquet(sparkOut.resolve(SurveyTables.PARQUET).toString()).collectAsList()) {
            parquet.put(r.getAs("star") + "/" + r.getAs("zone") + "/" + r.getAs("quantity"), r.getAs("median"));
        }
        List<String> localRows = local.lines().skip(1).collect(Collectors.toList());
        assertEquals(localRows.size(), parquet.size());
        for (String line : localRows) {
            String[] c = line.split(",");
            Double median = parquet.get(c[0] + "/" + c[1] + "/" + c[2]);
            if (c[3].isEmpty()) {
                assertEquals(null, median, line);
            } else {
                assertEquals(Double.parseDouble(c[3]), median, line);
            }
        }
    }

    @Test
    void gridResultsDoNotDependOnThePartitioning() throws IOException {
        List<StarRow> stars = CatalogueInput.read(write("two.csv", demoLines(2)), "two.csv",
                new SurveySettings(4, SEED, SolarReference.ASPLUND2009, null, null), false, w -> { });
        SurveyGrid grid = new SurveyGrid(List.of(DiskPresets.STEADY_VISCOUS_DEFAULT, DiskPresets.HOT_EARLY_DISK), List.of());
        SurveySettings settings = grid.settings(4, SEED, SolarReference.ASPLUND2009);
        List<GridTask> tasks = grid.tasks(stars);
        assertEquals(4, tasks.size());
        JavaSparkContext jsc = JavaSparkContext.fromSparkContext(spark.sparkContext());
        List<String> one = blocks(SparkSurvey.results(jsc, tasks, settings, EstimatorFactory.PLANET, 1).collect());
        List<String> three = blocks(SparkSurvey.results(jsc, tasks, settings, EstimatorFactory.PLANET, 3).collect());
        assertEquals(one, three);
        // The first cell is the local engine's own result for the default disk ...
        SurveySettings plain = new SurveySettings(4, SEED, SolarReference.ASPLUND2009, null, null);
        PlanetSurveyEstimator estimator = PlanetSurveyEstimator.create(plain);
        for (int i = 0; i < stars.size(); i++) {
            assertEquals(SurveyCsv.block(StarJob.run(stars.get(i), plain, estimator)), one.get(i));
        }
        // ... and the second cell really uses the other disk.
        assertNotEquals(one.get(0), one.get(2));
    }

    private static List<String> blocks(List<TaskResult> results) {
        List<String> out = new ArrayList<>();
        for (TaskResult r : results) {
            assertTrue(r.ok(), r.failure());
            out.add(r.block());
        }
        return out;
    }

    private static org.nebulith.survey.PlanetEstimator planet(SurveySettings s) {
        try {
            return PlanetSurveyEstimator.create(s);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private static List<String> sortedByStarAndQuantity(String csv) {
        return csv.lines().skip(1).sorted((a, b) -> {
            String[] x = a.split(",");
            String[] y = b.split(",");
            int c = x[0].compareTo(y[0]);
            return c != 0 ? c : (x[1] + "," + x[2]).compareTo(y[1] + "," + y[2]);
        }).collect(Collectors.toList());
    }

    /** @return the demo catalogue's comment and header lines and its first n stars (classpath copy of presets/) */
    private static List<String> demoLines(int n) throws IOException {
        List<String> out = new ArrayList<>();
        try (BufferedReader r = new BufferedReader(new InputStreamReader(
                SparkSurveyTest.class.getResourceAsStream("/presets/demo-catalogue.csv"), StandardCharsets.UTF_8))) {
            int lines = 0;
            for (String line = r.readLine(); line != null && lines < n + 1; line = r.readLine()) {
                out.add(line);
                if (!line.startsWith("#")) {
                    lines++;
                }
            }
        }
        return out;
    }

    private Path write(String name, List<String> lines) throws IOException {
        return Files.write(dir.resolve(name), lines, StandardCharsets.UTF_8);
    }
}
