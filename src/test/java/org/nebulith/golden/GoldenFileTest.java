package org.nebulith.golden;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;
import org.nebulith.format.Decimal;

/**
 * Golden-file harness: a validated output frozen as {@code key,value} rows under
 * {@code src/test/resources/golden/}, with a header of {@code #} lines that names its source (what
 * produced it and what it was validated against), its units and its tolerance. Each subclass computes
 * the same keys afresh; every key must be there and every value within the tolerance.
 *
 * <p>When a change moves a value on purpose, re-validate it against its outside reference first, then
 * rewrite the file with {@code -Dnebulith.updateGolden=true} (the header is kept) and say why in the
 * commit. Without that switch a missing or different file fails; nothing is written silently.
 */
public abstract class GoldenFileTest {

    /** The switch that rewrites the golden files from the computed values. */
    public static final String UPDATE = "nebulith.updateGolden";

    private static final Path FOLDER = Path.of("src/test/resources/golden");

    /** @return the file name under {@code src/test/resources/golden/} */
    protected abstract String fileName();

    /** @return the header lines (without {@code #}) written when the file is created */
    protected abstract List<String> header();

    /** @return the values, in a fixed key order */
    protected abstract Map<String, Double> compute();

    /**
     * @param key a key
     * @return the absolute tolerance of that key's value
     */
    protected abstract double tolerance(String key, double expected);

    @Test
    void matchesTheGoldenFile() throws IOException {
        Path file = FOLDER.resolve(fileName());
        Map<String, Double> actual = compute();
        assertFalse(actual.isEmpty(), "nothing computed");
        if (Boolean.getBoolean(UPDATE)) {
            write(file, actual);
            return;
        }
        assertTrue(Files.exists(file), file + " missing: validate the values, then run with -D" + UPDATE + "=true");
        List<String> header = new ArrayList<>();
        Map<String, Double> expected = read(file, header);
        assertTrue(header.stream().anyMatch(l -> l.startsWith("source:")), file + ": the header names no source");
        assertEquals(expected.keySet(), actual.keySet(), file + ": keys");
        List<String> off = new ArrayList<>();
        for (Map.Entry<String, Double> e : expected.entrySet()) {
            double a = actual.get(e.getKey());
            double tol = tolerance(e.getKey(), e.getValue());
            if (!(Math.abs(a - e.getValue()) <= tol)) {
                off.add(e.getKey() + ": golden " + e.getValue() + ", now " + a + " (tolerance " + tol + ")");
            }
        }
        assertEquals(List.of(), off, file + ": values moved; re-validate, then update with -D" + UPDATE + "=true");
    }

    private void write(Path file, Map<String, Double> values) throws IOException {
        List<String> header = new ArrayList<>();
        if (Files.exists(file)) {
            read(file, header);
        } else {
            header.addAll(header());
        }
        StringBuilder b = new StringBuilder();
        header.forEach(l -> b.append("# ").append(l).append('\n'));
        b.append("key,value\n");
        values.forEach((k, v) -> b.append(k).append(',').append(Decimal.format(v)).append('\n'));
        Files.createDirectories(file.getParent());
        Files.writeString(file, b.toString(), StandardCharsets.UTF_8);
    }

    private static Map<String, Double> read(Path file, List<String> header) throws IOException {
        Map<String, Double> values = new LinkedHashMap<>();
        for (String line : Files.readAllLines(file, StandardCharsets.UTF_8)) {
            if (line.startsWith("#")) {
                header.add(line.substring(1).strip());
            } else if (!line.isBlank() && !line.equals("key,value")) {
                int comma = line.lastIndexOf(',');
                values.put(line.substring(0, comma), Double.parseDouble(line.substring(comma + 1)));
            }
        }
        return values;
    }
}
