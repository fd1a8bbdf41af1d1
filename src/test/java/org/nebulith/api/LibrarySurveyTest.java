package org.nebulith.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nebulith.errors.InputException;

/** The library survey: rows by name, the same on 1 and 2 threads, a bad catalogue in the one message shape. */
@Tag("slow")
class LibrarySurveyTest {

    @TempDir
    Path dir;

    @Test
    void twoStarsOnOneAndTwoThreads() throws Exception {
        List<String> lines = Files.readAllLines(Path.of("presets/demo-catalogue.csv"));
        List<String> kept = lines.stream().filter(l -> l.startsWith("#")).collect(java.util.stream.Collectors.toList());
        lines.stream().filter(l -> !l.startsWith("#")).limit(3).forEach(kept::add);
        Path cat = Files.write(dir.resolve("two.csv"), kept);
        Survey one = Nebulith.survey().catalogue(cat).draws(4).seed(5).threads(1).run();
        Survey two = Nebulith.survey().catalogue(cat).draws(4).seed(5).threads(2).run();
        assertEquals(2, one.stars());
        assertEquals(one.rows(), two.rows(), "same rows on 1 and 2 threads");
        String star = one.rows().get(0).star();
        assertTrue(one.median(star, "host", "Mg_Si_molar").isPresent(), one.toString());
        assertTrue(one.toString().startsWith("survey of 2 stars"), one.toString());
    }

    @Test
    void badCatalogueIsTheOneInputMessage() throws Exception {
        Path bad = Files.writeString(dir.resolve("bad.csv"), "star,Fe_H,Fe_H_err\nA,high,0.05\n");
        InputException e = org.junit.jupiter.api.Assertions.assertThrows(InputException.class,
                () -> Nebulith.survey().catalogue(bad).draws(2).run());
        assertTrue(e.getMessage().matches(".*bad\\.csv: line 2: field \"Fe_H\": value \"high\": .*; accepted: .*"),
                e.getMessage());
    }
}
