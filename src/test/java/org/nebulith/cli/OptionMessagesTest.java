package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;
import org.nebulith.planet.FormationOptions;
import org.nebulith.survey.PlanetEstimator;
import org.nebulith.survey.StandInEstimators;
import org.nebulith.survey.SurveySettings;

import picocli.CommandLine.Command;

/**
 * Bad option values are reported against the option (exit 2, one line, nothing computed), and the
 * planet options reach a survey's estimates.
 */
class OptionMessagesTest {

    @TempDir
    Path dir;

    /** The survey command recording the settings its estimators are built for. */
    @Command(name = "survey-recording")
    static final class RecordingSurvey extends SurveyCommand {
        static final List<SurveySettings> SEEN = new ArrayList<>();

        @Override
        protected PlanetEstimator estimatorFor(final SurveySettings settings) {
            SEEN.add(settings);
            return StandInEstimators.fullyCondensed();
        }
    }

    private final CliRun cli = new CliRun(() -> List.of(new RecordingSurvey()));

    @ParameterizedTest
    @CsvSource({
        "planet,--floor-K,100",
        "planet,--core-Si-wt-pct,-1",
        "planet,--data,nosuchset",
        "planet,--variant,NOPE",
        "planet,--solutions,olivine;garnet",
        "survey-recording,--floor-K,150",
        "survey-recording,--variant,NOPE",
    })
    void badValueNamesItsOption(String command, String option, String value) {
        String v = value.replace(';', ',');
        List<String> args = new ArrayList<>(List.of(command, option, v, "--out", dir.resolve("o").toString()));
        if (command.startsWith("survey")) {
            args.addAll(List.of("--catalogue", "presets/demo-catalogue.csv", "--draws", "2"));
        }
        assertEquals(2, cli.run(args.toArray(String[]::new)), cli.err());
        String[] lines = cli.err().strip().split("\n");
        assertEquals(1, lines.length, cli.err());
        assertTrue(lines[0].startsWith("nebulith: option " + option + ": value \""), lines[0]);
        assertTrue(lines[0].contains("; accepted: "), lines[0]);
        assertFalse(dir.resolve("o").toFile().exists());
    }

    /** Values a library precondition would refuse are refused first against their option. */
    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "--elements|point --elements Xx=1 --T-K 1000 --P-bar 1e-4",
        "--elements|point --elements H=abc --T-K 1000 --P-bar 1e-4",
        "--composition|point --composition no-such-preset --T-K 1000 --P-bar 1e-4",
        "--disk|planet --disk no-such-disk",
        "--disk|survey-recording --catalogue presets/demo-catalogue.csv --disk no-such-disk",
    })
    void libraryPreconditionsAreCheckedAgainstTheOption(String option, String commandLine) {
        List<String> args = new ArrayList<>(List.of(commandLine.split(" ")));
        args.addAll(List.of("--out", dir.resolve("o").toString()));
        assertEquals(2, cli.run(args.toArray(String[]::new)), cli.err());
        assertTrue(cli.err().strip().startsWith("nebulith: option " + option + ": value \""), cli.err());
        assertEquals(1, cli.err().strip().lines().count(), cli.err());
    }

    @Test
    void surveyEstimatesGetEveryPlanetOption() {
        RecordingSurvey.SEEN.clear();
        assertEquals(0, cli.run("survey-recording", "--catalogue", "presets/demo-catalogue.csv", "--draws", "2",
                "--threads", "1", "--data", "nasa", "--solutions", "none", "--floor-K", "250", "--sulfide-in-mantle",
                "--core-Si-wt-pct", "5", "--out", dir.resolve("s").toString()), cli.err());
        assertFalse(RecordingSurvey.SEEN.isEmpty());
        FormationOptions planet = RecordingSurvey.SEEN.get(0).planet();
        assertNotNull(planet);
        assertEquals("nasa", planet.dataSet());
        assertEquals(List.of(), planet.solutions());
        assertEquals(250, planet.floorK());
        assertFalse(planet.sulfideInCore());
        assertEquals(5, planet.coreSiWtPct());
    }
}
