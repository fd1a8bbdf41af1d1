package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nebulith.survey.PlanetEstimator;
import org.nebulith.survey.StandInEstimators;
import org.nebulith.survey.SurveySettings;

import picocli.CommandLine.Command;

/** {@code nebulith survey} through the command line, with the test stand-in plugged into the seam. */
class SurveyCommandTest {

    @TempDir
    Path dir;

    private final CliRun cli = new CliRun(() -> List.of(new StandInSurvey(), new FailingSurvey()));

    /** The survey command with the fully condensed (mass-balance) stand-in as its estimate. */
    @Command(name = "survey-standin")
    static final class StandInSurvey extends SurveyCommand {
        @Override
        protected PlanetEstimator estimatorFor(final SurveySettings settings) {
            return StandInEstimators.fullyCondensed();
        }
    }

    /**
     * The real survey estimate, with a failure injected at the seam: a composition without Ti
     * (Ti/H below 1e-11) cannot converge, and says so as the zone integration would.
     */
    @Command(name = "survey-failing")
    static final class FailingSurvey extends SurveyCommand {
        @Override
        protected PlanetEstimator estimatorFor(final SurveySettings settings) {
            PlanetEstimator real = SurveyCommand.estimator(settings);
            return new PlanetEstimator() {
                @Override
                public java.util.LinkedHashMap<String, java.util.List<org.nebulith.planet.Quantity>> estimate(
                        final org.nebulith.composition.ElementAbundances gas) {
                    check(gas);
                    return real.estimate(gas);
                }

                @Override
                public PlanetEstimator near(final org.nebulith.composition.ElementAbundances nominal) {
                    check(nominal);
                    PlanetEstimator star = real.near(nominal);
                    return gas -> {
                        check(gas);
                        return star.estimate(gas);
                    };
                }
            };
        }

        private static void check(final org.nebulith.composition.ElementAbundances gas) {
            if (gas.moles(org.nebulith.thermo.Element.Ti) < 1e-11 * gas.moles(org.nebulith.thermo.Element.H)) {
                throw org.nebulith.errors.NumericalException.inZone("earth-analogue", 1.0, 612.5, 3.2e-5,
                        "equilibrium did not converge (injected test failure)", null);
            }
        }
    }

    private int run(String... args) {
        return cli.run(args);
    }

    @Test
    void demoCatalogueGivesTheTableWithTheRequiredColumns() throws Exception {
        Path outDir = dir.resolve("demo");
        assertEquals(0, run("survey-standin", "--catalogue", "presets/demo-catalogue.csv", "--draws", "40", "--seed", "7",
                "--threads", "2", "--out", outDir.toString()), cli.err());
        List<String> lines = Files.readAllLines(outDir.resolve("survey.csv"));
        assertEquals("star,zone,quantity,median,p16,p84,unit,nominal,draws,n_draws,n_not_applicable", lines.get(0));
        assertTrue(lines.get(1).startsWith("NDC Alder,host,Mg_Si_molar,"), lines.get(1));
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("NDC Tamarack,cold,Fe_Si_molar,")));
        assertTrue(Files.exists(outDir.resolve("survey-stars.csv")) && Files.exists(outDir.resolve("survey-notes.txt")));
        assertTrue(Files.size(outDir.resolve("survey-chart.png")) > 1000 && Files.exists(outDir.resolve("survey-chart.svg")));
        assertTrue(cli.err().contains("survey: 20 stars"), cli.err());
    }

    @Test
    void badCatalogueExitsTwoWithOneLinePerProblemAndWritesNothing() throws Exception {
        Path bad = Files.writeString(dir.resolve("bad.csv"), "star,Fe_H,Fe_H_err,Qq_H,Qq_H_err\nA,x,0.1,0,0\n");
        Path outDir = dir.resolve("never");
        assertEquals(2, run("survey-standin", "--catalogue", bad.toString(), "--out", outDir.toString()));
        assertTrue(cli.err().contains(bad + ": line 1: field \"Qq_H\": value \"Qq_H\": unknown element 'Qq'"), cli.err());
        assertTrue(cli.err().contains("nothing was computed"), cli.err());
        assertFalse(cli.err().contains("\tat "), "no stack trace");
        assertFalse(Files.exists(outDir));
    }

    @Test
    void badOptionsExitTwo() {
        assertEquals(2, run("survey-standin", "--catalogue", "presets/demo-catalogue.csv", "--draws", "0",
                "--out", dir.resolve("x").toString()));
        assertTrue(cli.err().contains("--draws"), cli.err());
        assertEquals(2, run("survey-standin", "--catalogue", "presets/demo-catalogue.csv", "--solar-reference", "sun1900",
                "--out", dir.resolve("y").toString()));
        assertTrue(cli.err().contains("asplund2009, lodders2003"), cli.err());
        assertEquals(2, run("survey-standin", "--catalogue", dir.resolve("missing.csv").toString()));
    }

    @Test
    void theRealCommandRunsThePlanetEstimateOnASmallCatalogue() throws Exception {
        Path cat = dir.resolve("two-stars.csv");
        Files.writeString(cat, "# two invented stars for a smoke test\n"
                + "star,Fe_H,Fe_H_err,Mg_H,Mg_H_err,Si_H,Si_H_err\n"
                + "Smoke-A,0.1,0.05,0.05,0.04,0.08,0.04\n"
                + "Smoke-B,-0.2,0.05,-0.15,0.04,-0.18,0.04\n");
        assertEquals(0, run("survey", "--catalogue", cat.toString(), "--draws", "4", "--seed", "3", "--threads", "2",
                "--out", dir.resolve("r").toString()), cli.err());
        List<String> lines = Files.readAllLines(dir.resolve("r").resolve("survey.csv"));
        assertEquals("star,zone,quantity,median,p16,p84,unit,nominal,draws,n_draws,n_not_applicable", lines.get(0));
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("Smoke-B,earth-analogue,core_mass_fraction,")), lines.toString());
        assertTrue(lines.stream().anyMatch(l -> l.startsWith("Smoke-A,host,Mg_Si_molar,")), lines.toString());
        Path report = dir.resolve("r").resolve("report.html");
        String html = Files.readString(report);
        assertTrue(html.contains("Settings") && html.contains("Predicted planets") && html.contains("Asplund"), html);
        assertFalse(html.contains("run time 0.0 s"), "run time measured from the start of the survey");
        assertTrue(Files.readString(dir.resolve("r").resolve("survey-chart.svg")).contains("<text"), "live text");
        if (org.nebulith.report.html.ChromiumProbe.chromium().isPresent()) {
            org.nebulith.report.html.ChromiumProbe.Result page = org.nebulith.report.html.ChromiumProbe.open(report, dir);
            assertEquals(1, page.images(), "the survey chart");
            assertEquals(0, page.bad(), "images not decoded");
            assertEquals(0, page.errors(), "errors in the page");
            assertEquals(List.of(), page.console(), "console messages");
            assertTrue(page.overflow() <= 0, "no horizontal overflow: " + page.overflow() + " px");
        }
    }

    @Test
    void aFailingStarIsRecordedAndTheSurveyFinishesIdenticallyOnOneAndTwoThreads() throws Exception {
        Path cat = dir.resolve("three-stars.csv");
        Files.writeString(cat, "# three invented stars; the second cannot converge (no Ti)\n"
                + "star,Fe_H,Fe_H_err,Mg_H,Mg_H_err,Si_H,Si_H_err,Ti_H,Ti_H_err\n"
                + "Smoke-A,0.1,0.05,0.05,0.04,0.08,0.04,,\n"
                + "Smoke-X,0.0,0.05,0.0,0.04,0.0,0.04,-5,0.05\n"
                + "Smoke-B,-0.2,0.05,-0.15,0.04,-0.18,0.04,,\n");
        for (String threads : List.of("1", "2")) {
            assertEquals(0, run("survey-failing", "--catalogue", cat.toString(), "--draws", "4", "--seed", "3",
                    "--threads", threads, "--max-failed-fraction", "0.5", "--out", dir.resolve("t" + threads).toString()),
                    cli.err() + cli.out());
            assertEquals("4 of 12 draws failed (failures.csv)", cli.out().strip());
        }
        for (String f : List.of("survey.csv", "failures.csv", "survey-stars.csv", "survey-notes.txt")) {
            assertEquals(Files.readString(dir.resolve("t1").resolve(f)), Files.readString(dir.resolve("t2").resolve(f)), f);
        }
        assertEquals(List.of("star,draw,zone,T_K,P_bar,stage,reason",
                "Smoke-X,,earth-analogue,612.5,3.2e-5,nominal,equilibrium did not converge (injected test failure)"),
                Files.readAllLines(dir.resolve("t2").resolve("failures.csv")));
        assertTrue(Files.readString(dir.resolve("t2").resolve("survey-stars.csv")).contains("Smoke-X,4,failed,"));
        List<String> survey = Files.readAllLines(dir.resolve("t2").resolve("survey.csv"));
        assertTrue(survey.stream().anyMatch(l -> l.startsWith("Smoke-B,earth-analogue,")));
        assertFalse(survey.stream().anyMatch(l -> l.startsWith("Smoke-X,")));
        // the default limit (1 % of the draws) is exceeded: exit 3, the partial results kept
        assertEquals(3, run("survey-failing", "--catalogue", cat.toString(), "--draws", "4", "--seed", "3",
                "--out", dir.resolve("limit").toString()));
        assertTrue(cli.err().contains("4 of 12 draws failed, more than --max-failed-fraction 0.01"), cli.err());
        assertTrue(Files.exists(org.nebulith.report.survey.LocalSurvey.partialTable(dir.resolve("limit"))));
    }
}
