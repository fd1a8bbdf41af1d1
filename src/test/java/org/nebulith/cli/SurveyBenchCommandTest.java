package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code nebulith bench-survey}: the figures it prints (no timing is asserted) and its bad input. */
class SurveyBenchCommandTest {
    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();

    private int run(final String... args) {
        out.reset();
        err.reset();
        return Main.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
    }

    @Test
    void printsEveryFigureWithTheRealEstimate() {
        int code = run("bench-survey", "--stars", "1", "--draws", "2", "--threads", "1");
        String text = out.toString(StandardCharsets.UTF_8);
        assertEquals(0, code, err.toString(StandardCharsets.UTF_8));
        for (String line : new String[] {"wall time: ", "draws per second: ", "equilibria per second: ",
            "equilibria per draw: ", "ms per draw (wall, per thread): median ", "99th percentile ",
            "first equilibrium of each draw: ", "CPU time of the process: ", "ms per draw;", "load average"}) {
            assertTrue(text.contains(line), line + " missing in\n" + text);
        }
        assertFalse(text.contains("NaN"), text);
        Matcher share = Pattern.compile("first equilibrium of each draw: ([0-9.]+) %").matcher(text);
        assertTrue(share.find(), text);
        double pct = Double.parseDouble(share.group(1));
        assertTrue(pct > 0 && pct <= 100, "share " + pct);
        Matcher perDraw = Pattern.compile("equilibria per draw: ([0-9.]+)").matcher(text);
        assertTrue(perDraw.find(), text);
        // 1 star x 2 draws: at least one equilibrium per radial node of each draw (12 nodes, fast rule)
        assertTrue(Double.parseDouble(perDraw.group(1)) >= 12, text);
    }

    @Test
    void rejectsAScatterOutOfRangeWithOneLine() {
        assertEquals(2, run("bench-survey", "--scatter", "1.5"));
        String e = err.toString(StandardCharsets.UTF_8).trim();
        assertTrue(e.contains("--scatter") && !e.contains("\n") && !e.contains("Exception"), e);
    }

    @Test
    void rejectsAMissingCatalogue(@TempDir final Path dir) {
        assertEquals(2, run("bench-survey", "--catalogue", dir.resolve("none.csv").toString()));
        assertTrue(err.toString(StandardCharsets.UTF_8).contains("--catalogue"), err.toString(StandardCharsets.UTF_8));
    }

    @Test
    void rejectsABadCatalogueRowNamingItsLine(@TempDir final Path dir) throws Exception {
        Path cat = dir.resolve("stars.csv");
        Files.writeString(cat, "star,Fe_H,Fe_H_err\nTest Star A,0.1,0.05\nTest Star B,abc,0.05\n");
        assertEquals(2, run("bench-survey", "--catalogue", cat.toString(), "--draws", "2"));
        String e = err.toString(StandardCharsets.UTF_8).trim();
        assertTrue(e.contains("stars.csv") && e.contains("3") && e.contains("Fe_H") && !e.contains("\n"), e);
        assertEquals("", out.toString(StandardCharsets.UTF_8), "nothing computed");
    }
}
