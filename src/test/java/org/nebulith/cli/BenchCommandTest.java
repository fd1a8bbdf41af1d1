package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;


import org.junit.jupiter.api.Test;

/** Smoke test of {@code nebulith bench} with tiny settings: it runs and prints its figures with targets (no timing is asserted). */
class BenchCommandTest {
    @Test
    void printsTheFiguresWithTheirTargets() {
        CliRun cli = new CliRun();
        int code = cli.run("bench", "--T-max-K", "1500", "--T-min-K", "1490", "--warmup", "0", "--repeats", "1");
        String text = cli.out();
        assertEquals(0, code, cli.err());
        assertTrue(text.contains("us per state (target 200 us"), text);
        assertTrue(text.contains("Newton iterations per state (target 3"), text);
        assertTrue(text.contains("sequence: median") && text.contains("(target 0.5 s"), text);
        assertTrue(!text.contains("NaN"), text);
    }

    @Test
    void rejectsAnEmptyRange() {
        int code = new CliRun().run("bench", "--T-max-K", "1500", "--T-min-K", "1500");
        assertEquals(2, code);
    }
}
