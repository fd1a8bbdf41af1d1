package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;

import org.junit.jupiter.api.Test;

/** Smoke test of {@code nebulith bench} with tiny settings: it runs and prints its figures with targets (no timing is asserted). */
class BenchCommandTest {
    @Test
    void printsTheFiguresWithTheirTargets() {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Main.run(new String[] {"bench", "--T-max-K", "1500", "--T-min-K", "1490", "--warmup", "0", "--repeats", "1"},
                new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8));
        String text = out.toString(StandardCharsets.UTF_8);
        assertEquals(0, code, err.toString(StandardCharsets.UTF_8));
        assertTrue(text.contains("us per state (target 200 us"), text);
        assertTrue(text.contains("Newton iterations per state (target 3"), text);
        assertTrue(text.contains("sequence: median") && text.contains("(target 0.5 s"), text);
        assertTrue(!text.contains("NaN"), text);
    }

    @Test
    void rejectsAnEmptyRange() {
        int code = Main.run(new String[] {"bench", "--T-max-K", "1500", "--T-min-K", "1500"},
                new PrintStream(new ByteArrayOutputStream()), new PrintStream(new ByteArrayOutputStream()));
        assertEquals(2, code);
    }
}
