package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Temperatures and pressures outside what the data cover are bad input in every command (exit 2,
 * one line naming the option, the value and the accepted range, nothing written); the documented
 * lower limit of 200 K itself works; and the runs that once stopped in the phase selection finish.
 */
class StateDomainCommandsTest {
    @TempDir
    Path dir;

    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();

    private int run(final String... args) {
        out.reset();
        err.reset();
        return Main.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), List.of());
    }

    private String err() {
        return err.toString(StandardCharsets.UTF_8);
    }

    /** The error is one line (notices about the inputs, such as overlapping zones, may come before it). */
    private void assertOneLine(final String option) {
        List<String> lines = err().strip().lines().filter(l -> !l.startsWith("notice: ")).toList();
        assertEquals(1, lines.size(), err());
        assertTrue(lines.get(0).contains(option) && lines.get(0).contains("accepted"), err());
    }

    @Test
    void pointAtTheDocumentedLowerLimitWorks() {
        assertEquals(0, run("point", "--composition", "protosolar-lodders2003", "--T-K", "200", "--P-bar", "1e-4", "-q"), err());
        assertTrue(out.toString(StandardCharsets.UTF_8).startsWith("species,"), "CSV on standard output");
    }

    @Test
    void pointBelowTheDataIsRefused() {
        assertEquals(2, run("point", "--composition", "protosolar-lodders2003", "--T-K", "50", "--P-bar", "1e-4"));
        assertOneLine("--T-K");
        assertTrue(err().contains("200 to 6000 K"), err());
        assertEquals(2, run("point", "--composition", "protosolar-lodders2003", "--T-K", "7000", "--P-bar", "1e-4"));
        assertOneLine("--T-K");
    }

    @Test
    void pressureOutsideTheModelIsRefused() {
        assertEquals(2, run("point", "--composition", "protosolar-lodders2003", "--T-K", "1000", "--P-bar", "1e3"));
        assertOneLine("--P-bar");
        assertEquals(2, run("point", "--composition", "protosolar-lodders2003", "--T-K", "1000", "--P-bar", "1e-14"));
        assertOneLine("--P-bar");
        Path seq = dir.resolve("seq");
        assertEquals(2, run("sequence", "--P-bar", "500", "--out", seq.toString()));
        assertOneLine("--P-bar");
        assertFalse(Files.exists(seq), "nothing written");
    }

    @Test
    void sequenceAndPlanetBelowTheDataAreRefused() {
        Path seq = dir.resolve("seq");
        assertEquals(2, run("sequence", "--T-min-K", "100", "--out", seq.toString()));
        assertOneLine("--T-min-K");
        assertFalse(Files.exists(seq), "nothing written");
        Path planet = dir.resolve("planet");
        assertEquals(2, run("planet", "--floor-K", "150", "--out", planet.toString()));
        assertOneLine("--floor-K");
        assertFalse(Files.exists(planet), "nothing written");
    }

    @Test
    void benchRobustReportsEveryModeAndStart() {
        assertEquals(0, run("bench-robust", "--states", "3", "--seed", "5", "-q"), err() + out);
        String o = out.toString(StandardCharsets.UTF_8);
        for (String s : new String[] {"all solutions, cold:", "all solutions, warm:", "pure phases, cold:", "pure phases, warm:"}) {
            assertTrue(o.contains(s + " converged 3 of 3") || o.contains(s + "  converged 3 of 3")
                    || o.matches("(?s).*" + java.util.regex.Pattern.quote(s) + "\\s+converged 3 of 3.*"), o);
        }
        assertTrue(o.contains("every state converged"), o);
    }

    /** Once exit 3 at the documented floor (the assemblage at 200 K had no valid condensed data). */
    @Test
    @Tag("slow")
    void planetAtTheDocumentedFloorFinishes() {
        Path planet = dir.resolve("planet");
        assertEquals(0, run("planet", "--floor-K", "200", "--out", planet.toString(), "-q"), err());
    }

    /**
     * Once exit 3 after 3 s (star NDC Birch at 300 K, wollastonite): the demo catalogue with the
     * MMSN disk runs to the end.
     */
    @Test
    @Tag("slow")
    void demoCatalogueWithTheMmsnDiskFinishes() {
        Path survey = dir.resolve("survey");
        assertEquals(0, run("survey", "--catalogue", "presets/demo-catalogue.csv", "--disk", "mmsn-hayashi1981", "--draws",
                "20", "--seed", "7", "--out", survey.toString(), "-q"), err());
        assertTrue(Files.exists(survey.resolve("survey.csv")));
    }

    /**
     * Once stopped at 16 % (continuation stalled at 674.74 K, whitlockite supersaturated): an invented
     * catalogue of 2,000 near-solar stars with 0.1-0.3 dex scatter (default disk and zone, 10 draws
     * each) runs to the end with no failed draw (about a minute on two cores).
     */
    @Test
    @Tag("slow")
    void twoThousandInventedNearSolarStarsFinish() throws Exception {
        assertInventedSurveyFinishes(2000);
    }

    private void assertInventedSurveyFinishes(final int stars) throws Exception {
        Path catalogue = dir.resolve("invented.csv");
        Files.writeString(catalogue, org.nebulith.survey.InventedCatalogue.text(stars, 11));
        Path survey = dir.resolve("survey");
        assertEquals(0, run("survey", "--catalogue", catalogue.toString(), "--draws", "10", "--seed", "3",
                "--threads", "2", "--out", survey.toString(), "-q"), err());
        List<String> failures = Files.readAllLines(survey.resolve("failures.csv"));
        assertEquals(1, failures.size(), "no failed draw: " + failures);
        List<String> table = Files.readAllLines(survey.resolve("survey-stars.csv"));
        assertEquals(stars + 1, table.size());
        assertEquals(stars, table.stream().filter(l -> l.contains(",computed,")).count(), "every star computed");
    }
}
