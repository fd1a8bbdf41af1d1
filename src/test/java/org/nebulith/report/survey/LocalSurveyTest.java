package org.nebulith.report.survey;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.function.Function;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nebulith.composition.SolarReference;
import org.nebulith.errors.InputException;
import org.nebulith.errors.NumericalException;
import org.nebulith.planet.Quantity;
import org.nebulith.progress.Progress;
import org.nebulith.files.RunInputs;
import org.nebulith.survey.EstimatorCache;
import org.nebulith.survey.FullyCondensedEstimator;
import org.nebulith.survey.PlanetEstimator;
import org.nebulith.survey.StarJob;
import org.nebulith.survey.StarJobException;
import org.nebulith.survey.StarRow;
import org.nebulith.survey.SurveyCsv;
import org.nebulith.survey.SurveySettings;
import org.nebulith.survey.SurveyTestData;
import org.nebulith.thermo.Element;

/** Whole surveys on the demo catalogue: threads, resume, bad input, skipping. */
@Tag("slow")
class LocalSurveyTest {

    @TempDir
    Path dir;

    private final List<String> warnings = new ArrayList<>();

    private static final SurveySettings SETTINGS = new SurveySettings(64, 2024, SolarReference.ASPLUND2009, null, null);

    private LocalSurvey.Result run(Path catalogue, Path out, int threads, boolean skipBad, boolean resume, boolean force,
                                   SurveySettings settings, Function<SurveySettings, PlanetEstimator> factory)
            throws IOException {
        LocalSurvey.Request r = new LocalSurvey.Request(catalogue, catalogue.getFileName().toString(), out, settings,
                threads, skipBad, resume, force);
        RunInputs inputs = new RunInputs().add(catalogue, "catalogue");
        return LocalSurvey.run(r, new EstimatorCache(factory), inputs, total -> Progress.none(), new LocalSurvey.Log() {
            @Override
            public void info(String line) {
            }

            @Override
            public void warn(String line) {
                warnings.add(line);
            }
        });
    }

    private LocalSurvey.Result run(Path out, int threads) throws IOException {
        return run(SurveyTestData.DEMO, out, threads, false, false, false, SETTINGS, s -> new FullyCondensedEstimator());
    }

    @Test
    void oneAndFourThreadsGiveByteIdenticalFiles() throws IOException {
        run(dir.resolve("one"), 1);
        LocalSurvey.Result four = run(dir.resolve("four"), 4);
        assertEquals(20, four.stars());
        for (String f : List.of(SurveyCsv.FILE, StarsTable.FILE, LocalSurvey.NOTES)) {
            assertArrayEquals(Files.readAllBytes(dir.resolve("one").resolve(f)), Files.readAllBytes(dir.resolve("four").resolve(f)), f);
        }
        List<String> lines = Files.readAllLines(dir.resolve("four").resolve(SurveyCsv.FILE));
        assertTrue(lines.get(0).startsWith("star,zone,quantity,median,p16,p84,unit"));
        assertEquals(1 + 20 * 8, lines.size());
        assertEquals("NDC Alder,host,Mg_Si_molar", lines.get(1).substring(0, 26));
        assertFalse(Files.exists(dir.resolve("four").resolve(LocalSurvey.PARTIAL)));
        String stars = Files.readString(dir.resolve("four").resolve(StarsTable.FILE));
        assertTrue(stars.contains("NDC Elder,12,computed,Mg Si Fe Ni,"), stars);
    }

    @Test
    void resumeAfterAnInterruptionGivesTheSameBytes() throws IOException {
        Path full = dir.resolve("full");
        run(full, 2);
        byte[] expected = Files.readAllBytes(full.resolve(SurveyCsv.FILE));
        String text = new String(expected, StandardCharsets.UTF_8);
        // an interrupted run: whole stars, then a star cut in the middle of a line
        int cut = nthLineEnd(text, 1 + 7 * 8 + 3) + 17;
        Path broken = dir.resolve("broken");
        Files.createDirectories(broken);
        Files.writeString(broken.resolve(LocalSurvey.PARTIAL), text.substring(0, cut));
        assertThrows(InputException.class, () -> run(broken, 2));
        LocalSurvey.Result resumed = run(SurveyTestData.DEMO, broken, 2, false, true, false, SETTINGS,
                s -> new FullyCondensedEstimator());
        assertEquals(8, resumed.resumed());
        assertArrayEquals(expected, Files.readAllBytes(broken.resolve(SurveyCsv.FILE)));
        assertFalse(Files.exists(broken.resolve(LocalSurvey.PARTIAL)));
        for (String f : List.of(StarsTable.FILE, LocalSurvey.NOTES)) {
            assertArrayEquals(Files.readAllBytes(full.resolve(f)), Files.readAllBytes(broken.resolve(f)), f);
        }
    }

    @Test
    void resumeExtendsACompleteRunOfAShorterCatalogue() throws IOException {
        Path full = dir.resolve("full");
        run(full, 1);
        List<String> demo = Files.readAllLines(SurveyTestData.DEMO);
        Path shorter = dir.resolve("shorter.csv");
        Files.write(shorter, demo.subList(0, demo.size() - 5));
        Path out = dir.resolve("grow");
        run(shorter, out, 1, false, false, false, SETTINGS, s -> new FullyCondensedEstimator());
        run(SurveyTestData.DEMO, out, 3, false, true, false, SETTINGS, s -> new FullyCondensedEstimator());
        assertArrayEquals(Files.readAllBytes(full.resolve(SurveyCsv.FILE)), Files.readAllBytes(out.resolve(SurveyCsv.FILE)));
    }

    @Test
    void resumeRefusesATableMadeWithAnotherSeed() throws IOException {
        Path out = dir.resolve("seed");
        run(out, 1);
        SurveySettings other = new SurveySettings(64, 2025, SolarReference.ASPLUND2009, null, null);
        InputException e = assertThrows(InputException.class, () -> run(SurveyTestData.DEMO, out, 1, false, true, false,
                other, s -> new FullyCondensedEstimator()));
        assertTrue(e.getMessage().contains("differ from a recomputation"), e.getMessage());
    }

    @Test
    void badCatalogueStopsBeforeAnyOutputAndSkipBadListsTheSkippedStars() throws IOException {
        Path bad = dir.resolve("bad.csv");
        Files.writeString(bad, "star,Fe_H,Fe_H_err,Mg_H,Mg_H_err\nGood One,0.1,0.05,0.1,0.04\n"
                + "Bad One,0.1,0.05,,0.04\nGood Two,-0.2,0.03,-0.1,0.05\nGood One,0,0.1,0,0.1\n");
        Path out = dir.resolve("out");
        InputException e = assertThrows(InputException.class, () -> run(bad, out, 2, false, false, false, SETTINGS,
                s -> new FullyCondensedEstimator()));
        assertTrue(e.getMessage().contains("nothing was computed"), e.getMessage());
        assertFalse(Files.exists(out));
        assertEquals(2, warnings.size(), warnings.toString());
        assertTrue(warnings.get(0).startsWith("bad.csv: line 3: field \"Mg_H\": value \"\": star 'Bad One': an error without a value"));
        assertTrue(warnings.get(1).contains("line 5") && warnings.get(1).contains("duplicate star"));

        LocalSurvey.Result r = run(bad, out, 2, true, false, false, SETTINGS, s -> new FullyCondensedEstimator());
        assertEquals(2, r.stars());
        assertEquals(2, r.skipped());
        List<String> stars = Files.readAllLines(out.resolve(StarsTable.FILE));
        assertEquals(5, stars.size());
        assertTrue(stars.get(2).startsWith("Bad One,3,skipped,,,"), stars.get(2));
        assertTrue(stars.get(4).startsWith("Good One,5,skipped,,,"), stars.get(4));
    }

    @Test
    void existingOutputIsNotReplacedWithoutForce() throws IOException {
        Path out = dir.resolve("again");
        run(out, 1);
        assertThrows(InputException.class, () -> run(out, 1));
        run(SurveyTestData.DEMO, out, 1, false, false, true, SETTINGS, s -> new FullyCondensedEstimator());
    }

    @Test
    void aFailingStarStopsTheRunOrIsSkippedAndListed() throws IOException {
        // fails whenever the drawn [Fe/H] exceeds +0.37 (a stand-in for a non-convergent estimate)
        PlanetEstimator failingEstimator = gas -> {
            if (gas.moles(Element.Fe) > Math.pow(10, 7.5 + 0.37 - 12)) {
                throw NumericalException.noConvergence(300, 1e-4, gas.toInline(), 100, 1e-3);
            }
            return new FullyCondensedEstimator().estimate(gas);
        };
        List<StarRow> failingStars = new ArrayList<>();
        for (StarRow row : SurveyTestData.demoRows()) {
            try {
                StarJob.run(row, SETTINGS, failingEstimator);
            } catch (StarJobException e) {
                failingStars.add(row);
            }
        }
        assertFalse(failingStars.isEmpty());
        Path out = dir.resolve("fail");
        StarJobException e = assertThrows(StarJobException.class, () -> run(SurveyTestData.DEMO, out, 2, false, false,
                false, SETTINGS, s -> failingEstimator));
        assertEquals(failingStars.get(0).star(), e.star(), "the first failing star in catalogue order");
        assertTrue(e.getMessage().contains("did not converge"), e.getMessage());
        assertTrue(Files.exists(out.resolve(LocalSurvey.PARTIAL)), "partial results kept for --resume");
        assertFalse(Files.exists(out.resolve(SurveyCsv.FILE)));
        LocalSurvey.Result r = run(SurveyTestData.DEMO, out, 2, true, true, false, SETTINGS, s -> failingEstimator);
        assertEquals(20 - failingStars.size(), r.stars());
        assertEquals(failingStars.size(), r.failed());
        String stars = Files.readString(out.resolve(StarsTable.FILE));
        for (StarRow f : failingStars) {
            assertTrue(stars.contains(f.star() + "," + f.line() + ",failed,"), stars);
        }
    }

    @Test
    void reservedZoneNameIsRefused() {
        PlanetEstimator host = gas -> {
            LinkedHashMap<String, List<Quantity>> z = new LinkedHashMap<>();
            z.put("host", List.of(new Quantity("x", 1, "-")));
            return z;
        };
        assertThrows(StarJobException.class, () -> run(SurveyTestData.DEMO, dir.resolve("h"), 1, false, false, false,
                SETTINGS, s -> host));
    }

    private static int nthLineEnd(String text, int n) {
        int at = -1;
        for (int i = 0; i < n; i++) {
            at = text.indexOf('\n', at + 1);
        }
        return at;
    }
}
