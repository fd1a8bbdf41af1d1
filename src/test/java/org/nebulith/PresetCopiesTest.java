package org.nebulith;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;

/**
 * The build ships the top-level data folders {@code presets/} and {@code feeding-zones/} on the
 * classpath (pom.xml resources). Every file there must be byte-identical on the classpath, so the
 * jar and a checkout give the same results.
 */
class PresetCopiesTest {

    @Test
    void classpathCopiesEqualTheRepositoryFiles() throws IOException {
        int checked = 0;
        for (String folder : List.of("presets", "feeding-zones")) {
            List<Path> files;
            try (Stream<Path> s = Files.list(Path.of(folder))) {
                files = s.filter(p -> p.toString().endsWith(".csv")).sorted().toList();
            }
            for (Path f : files) {
                String res = "/" + folder + "/" + f.getFileName();
                try (InputStream in = PresetCopiesTest.class.getResourceAsStream(res)) {
                    assertNotNull(in, "missing on the classpath: " + res);
                    assertArrayEquals(Files.readAllBytes(f), in.readAllBytes(), res);
                }
                checked++;
            }
        }
        assertTrue(checked >= 3, "expected the abundance presets at least");
    }
}
