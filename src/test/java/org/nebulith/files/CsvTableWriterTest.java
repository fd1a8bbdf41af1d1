package org.nebulith.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.SplittableRandom;

import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nebulith.errors.NumericalException;

class CsvTableWriterTest {

    @TempDir
    Path dir;

    @Test
    void roundTripIsExactAndColumnOrderFixed() throws IOException {
        SplittableRandom random = new SplittableRandom(42); // seed 42
        Table table = Table.withColumns("sequence.csv", "T_K", "phase", "moles", "present");
        double[] moles = new double[200];
        for (int i = 0; i < moles.length; i++) {
            moles[i] = Math.pow(10, -40 + 45 * random.nextDouble());
            table.row(2000.0 - i * 0.1, i % 3 == 0 ? "olivine, Fe-rich \"ss\"" : "metal", moles[i], i % 2 == 0);
        }
        String csv = CsvTableWriter.toCsv(table);
        assertTrue(csv.startsWith("T_K,phase,moles,present\n2000,"), csv.substring(0, 40));
        try (CSVParser parser = CsvTableWriter.FORMAT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(csv))) {
            assertEquals(List.of("T_K", "phase", "moles", "present"), parser.getHeaderNames());
            List<CSVRecord> records = parser.getRecords();
            assertEquals(200, records.size());
            for (int i = 0; i < records.size(); i++) {
                assertEquals(2000.0 - i * 0.1, Double.parseDouble(records.get(i).get("T_K")));
                assertEquals(moles[i], Double.parseDouble(records.get(i).get("moles")));
                assertEquals(table.rows().get(i).get(1), records.get(i).get("phase"));
            }
        }
        assertEquals(csv, CsvTableWriter.toCsv(table), "byte-identical on repetition");
    }

    @Test
    void nonFiniteNumbersAreRefusedAndNothingIsWritten() throws IOException {
        Table table = Table.withColumns("element-fractions.csv", "T_K", "Al").row(1700.0, 0.5)
                .row(1690.0, Double.NaN);
        NumericalException e = assertThrows(NumericalException.class, () -> CsvTableWriter.toCsv(table));
        assertEquals("element-fractions.csv: column \"Al\", row 2: value NaN is not a finite number; nothing was"
                + " written", e.getMessage());
        try (RunFolder run = AtomicOutput.openRunFolder(dir.resolve("run"), false, new RunInputs())) {
            assertThrows(NumericalException.class, () -> run.writeCsv("element-fractions.csv", table));
            assertTrue(Files.notExists(run.workingFolder().resolve("element-fractions.csv")));
        }
        Table inf = Table.withColumns("x.csv", "v").row(Double.POSITIVE_INFINITY);
        assertThrows(NumericalException.class, () -> CsvTableWriter.toCsv(inf));
        Table wide = Table.withColumns("y.csv", "a", "b");
        assertThrows(IllegalArgumentException.class, () -> wide.row(1.0));
    }

    @Test
    void missingValuesAreEmptyCellsAndIntegersStayIntegers() {
        String csv = CsvTableWriter.toCsv(Table.withColumns("z.csv", "zone", "n", "value").row("b", 3, null));
        assertEquals("zone,n,value\nb,3,\n", csv);
    }
}
