package org.nebulith.progress;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.concurrent.atomic.AtomicLong;

import org.junit.jupiter.api.Test;

class LineProgressTest {

    @Test
    void printsOneLinePerTenthWithEtaAndAFinalLine() {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        AtomicLong clock = new AtomicLong();
        try (PrintStream sink = new PrintStream(bytes, true, StandardCharsets.UTF_8);
             LineProgress progress = new LineProgress("zones", 20, sink, clock::get)) {
            for (int i = 0; i < 20; i++) {
                clock.addAndGet(1_000_000_000L); // one second per step
                progress.step();
            }
        }
        String[] lines = bytes.toString(StandardCharsets.UTF_8).split("\n");
        assertEquals(10, lines.length); // nine intermediate tenths and the final line
        assertEquals("zones: 2/20 (10%), elapsed 2 s, ETA 18 s", lines[0]);
        assertEquals("zones: 20/20 (100%), elapsed 20 s", lines[9]);
    }

    @Test
    void silentModeAndModeChoice() {
        assertEquals(ProgressMode.SILENT, ProgressMode.choose(true, true));
        assertEquals(ProgressMode.TERMINAL_BAR, ProgressMode.choose(false, true));
        assertEquals(ProgressMode.LINES, ProgressMode.choose(false, false));
        Progress.none().advance(5); // shows nothing, throws nothing
    }

    @Test
    void terminalBarWritesToItsSink() {
        ByteArrayOutputStream bytes = new ByteArrayOutputStream();
        try (PrintStream sink = new PrintStream(bytes, true, StandardCharsets.UTF_8);
             Progress bar = org.nebulith.progress.terminal.ProgressDisplays.open(ProgressMode.TERMINAL_BAR, "stars", 4, sink)) {
            bar.advance(4);
        }
        String text = bytes.toString(StandardCharsets.UTF_8);
        org.junit.jupiter.api.Assertions.assertTrue(text.contains("stars") && text.contains("4/4"), text);
    }
}
