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
import org.nebulith.survey.SurveyFailures;
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
        for (String f : List.of(SurveyCsv.FILE, SurveyFailures.FILE, StarsTable.FILE, LocalSurvey.NOTES)) {
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
        Files.createDirectories(LocalSurvey.partialTable(broken).getParent());
        Files.writeString(LocalSurvey.partialTable(broken), text.substring(0, cut));
        Files.writeString(LocalSurvey.partialTable(broken).resolveSibling(LocalSurvey.FAILURES_PARTIAL),
                SurveyFailures.HEADER);
        assertThrows(InputException.class, () -> run(broken, 2));
        LocalSurvey.Result resumed = run(SurveyTestData.DEMO, broken, 2, false, true, false, SETTINGS,
                s -> new FullyCondensedEstimator());
        assertEquals(8, resumed.resumed());
        assertArrayEquals(expected, Files.readAllBytes(broken.resolve(SurveyCsv.FILE)));
        assertFalse(Files.exists(LocalSurvey.partialTable(broken)));
        assertFalse(Files.exists(LocalSurvey.partialTable(broken).getParent()), "the unfinished folder became the run");
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

    /**
     * A stand-in estimate that cannot converge for some compositions, as the solver's failures name
     * them (zone, radius, T, P): every draw whose [Fe/H] exceeds +0.37, and every composition with
     * Ti/H below 1e-11 (the test star "NDC Nonesuch", nominal included).
     */
    static final PlanetEstimator FAILING = gas -> {
        if (gas.moles(Element.Ti) < 1e-11) {
            throw NumericalException.inZone("cold", 1.0, 400.0, 1e-5, "equilibrium did not converge (Ti-free test"
                    + " composition)", null);
        }
        if (gas.moles(Element.Fe) > Math.pow(10, 7.5 + 0.37 - 12)) {
            throw NumericalException.noConvergence(300, 1e-4, gas.toInline(), 100, 1e-3);
        }
        return new FullyCondensedEstimator().estimate(gas);
    };

    /** The demo catalogue with the failing test star appended (Ti_H -5: Ti/H about 1e-12.05). */
    private Path catalogueWithAFailingStar() throws IOException {
        List<String> lines = new ArrayList<>(Files.readAllLines(SurveyTestData.DEMO));
        String header = lines.stream().filter(l -> l.startsWith("star,")).findFirst().orElseThrow();
        List<String> cols = List.of(header.split(","));
        String[] cells = new String[cols.size()];
        java.util.Arrays.fill(cells, "");
        cells[0] = "NDC Nonesuch";
        cells[cols.indexOf("Fe_H")] = "0.0";
        cells[cols.indexOf("Fe_H_err")] = "0.05";
        cells[cols.indexOf("Ti_H")] = "-5";
        cells[cols.indexOf("Ti_H_err")] = "0.05";
        lines.add(String.join(",", cells));
        return Files.write(dir.resolve("with-failing.csv"), lines);
    }

    private static final List<String> OUTPUTS = List.of(SurveyCsv.FILE, SurveyFailures.FILE, StarsTable.FILE,
            LocalSurvey.NOTES);

    private LocalSurvey.Result runFailing(Path catalogue, Path out, int threads, boolean resume, double fraction,
                                          boolean strict) throws IOException {
        LocalSurvey.Request r = new LocalSurvey.Request(catalogue, catalogue.getFileName().toString(), out, SETTINGS,
                threads, false, resume, false, fraction, strict);
        return LocalSurvey.run(r, new EstimatorCache(s -> FAILING), new RunInputs().add(catalogue, "catalogue"),
                total -> Progress.none(), new LocalSurvey.Log() {
                    @Override
                    public void info(String line) {
                    }

                    @Override
                    public void warn(String line) {
                        warnings.add(line);
                    }
                });
    }

    @Test
    void failedDrawsAndAFailingStarAreRecordedAndTheRunFinishesIdenticallyOnOneAndTwoThreads() throws IOException {
        Path catalogue = catalogueWithAFailingStar();
        LocalSurvey.Result one = runFailing(catalogue, dir.resolve("one"), 1, false, 0.2, false);
        LocalSurvey.Result two = runFailing(catalogue, dir.resolve("two"), 2, false, 0.2, false);
        for (String f : OUTPUTS) {
            assertArrayEquals(Files.readAllBytes(dir.resolve("one").resolve(f)), Files.readAllBytes(dir.resolve("two")
                    .resolve(f)), f);
        }
        assertEquals(19, two.stars());
        assertEquals(2, two.failed(), "NDC Nonesuch, and NDC Tamarack ([Fe/H] +0.38 at its catalogue values)");
        assertEquals(21 * 64, two.runDraws());
        assertTrue(two.failedDraws() > 128, "the failing stars' 2 x 64 draws and some high-[Fe/H] draws");
        assertEquals(two.failedDraws() + " of 1344 draws failed (failures.csv)", two.failureLine());
        List<String> failures = Files.readAllLines(dir.resolve("two").resolve(SurveyFailures.FILE));
        assertEquals("star,draw,zone,T_K,P_bar,stage,reason", failures.get(0));
        assertEquals("NDC Nonesuch,,cold,400,1e-5,nominal,equilibrium did not converge (Ti-free test composition)",
                failures.get(failures.size() - 1));
        assertEquals(two.failedDraws() - 128, failures.size() - 3, "one line per failed draw, one per failed star");
        String drawLine = failures.get(1);
        assertTrue(drawLine.matches("[^,]+,\\d+,,300,[^,]+,draw,\"equilibrium did not converge at T = 300 K.*"),
                drawLine);
        String stars = Files.readString(dir.resolve("two").resolve(StarsTable.FILE));
        assertTrue(stars.contains("NDC Nonesuch,28,failed,"), stars);
        assertTrue(stars.contains("nominal estimate, zone 'cold', T = 400 K, P = 1e-5 bar: equilibrium did not"), stars);
        assertTrue(stars.contains(" of 64 draws failed (failures.csv)"), stars);
        // percentiles come from the converged draws: n_draws says how many
        List<String> survey = Files.readAllLines(dir.resolve("two").resolve(SurveyCsv.FILE));
        assertTrue(survey.get(0).endsWith(",nominal,draws,n_draws,n_not_applicable"), survey.get(0));
        assertTrue(survey.stream().anyMatch(l -> l.matches(".*,64,(\\d+),0") && !l.endsWith(",64,64,0")),
                "a star with failed draws has n_draws < draws");
        assertFalse(survey.stream().anyMatch(l -> l.startsWith("NDC Nonesuch,")));
    }

    @Test
    void tooManyFailedDrawsStopWithANumericalFailureAndResumeFinishesWithTheSameBytes() throws IOException {
        Path catalogue = catalogueWithAFailingStar();
        Path reference = dir.resolve("reference");
        runFailing(catalogue, reference, 2, false, 0.2, false);
        Path out = dir.resolve("stopped");
        NumericalException e = assertThrows(NumericalException.class, () -> runFailing(catalogue, out, 2, false,
                LocalSurvey.DEFAULT_MAX_FAILED_FRACTION, false));
        assertTrue(e.getMessage().contains("draws failed, more than --max-failed-fraction 0.01"), e.getMessage());
        Path partial = LocalSurvey.partialTable(out);
        assertTrue(Files.exists(partial) && Files.exists(partial.resolveSibling(LocalSurvey.FAILURES_PARTIAL)));
        assertTrue(warnings.stream().anyMatch(w -> w.contains("--resume")), warnings.toString());
        assertFalse(Files.exists(out.resolve(SurveyCsv.FILE)));
        runFailing(catalogue, out, 1, true, 0.2, false);
        for (String f : List.of(SurveyCsv.FILE, SurveyFailures.FILE, StarsTable.FILE)) {
            assertArrayEquals(Files.readAllBytes(reference.resolve(f)), Files.readAllBytes(out.resolve(f)), f);
        }
    }

    @Test
    void strictStopsAtTheFirstFailureNamingTheState() throws IOException {
        Path out = dir.resolve("strict");
        NumericalException e = assertThrows(NumericalException.class, () -> runFailing(catalogueWithAFailingStar(), out,
                2, false, 1.0, true));
        assertTrue(e.getMessage().startsWith("--strict: stopped at the first failed estimate: star '"), e.getMessage());
        assertTrue(e.getMessage().contains("draw ") && e.getMessage().contains("T = 300 K, P = "), e.getMessage());
        assertTrue(Files.exists(LocalSurvey.partialTable(out)), "partial results kept for --resume");
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
