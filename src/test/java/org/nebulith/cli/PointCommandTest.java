package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.nebulith.thermo.PhaseNames;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.nebulith.equilibrium.OracleCases;

/**
 * {@code nebulith point} in-process: an oracle case from the command line against CEA's polished
 * amounts (NASA CEA, Gordon &amp; McBride 1994, as packaged in Debian rocketcea 1.1.18; see
 * {@code src/test/resources/oracle/README.md}), and bad input.
 */
class PointCommandTest {
    @TempDir
    Path dir;
    private final CliRun cli = new CliRun();

    private int run(String... args) {
        return cli.run(args);
    }

    private Path copyList(String resource) throws IOException {
        Path target = dir.resolve(Path.of(resource).getFileName().toString());
        try (InputStream in = PointCommandTest.class.getResourceAsStream(OracleCases.FOLDER + resource)) {
            Files.copy(in, target);
        }
        return target;
    }

    private static List<CSVRecord> parse(String csv) throws IOException {
        return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(new StringReader(csv))
                .getRecords();
    }

    @ParameterizedTest(name = "{0}")
    @ValueSource(strings = {"extended_T600_P1e-04", "core_T1400_P1e-02"})
    void reproducesAnOracleCaseFromTheCommandLine(String caseId) throws IOException {
        OracleCases.Case c = OracleCases.byId(caseId);
        Path gases = copyList(c.gasList());
        Path condensed = copyList(c.condensedList());
        Path csv = dir.resolve("state.csv");
        assertEquals(0, run("point", "--data", "nasa", "--gases", gases.toString(), "--condensed", condensed.toString(),
                "--elements", c.inlineElements(), "--T-K", Double.toString(c.tK()), "--P-bar", Double.toString(c.pBar()),
                "--out", csv.toString()), cli.err());
        List<CSVRecord> rows = parse(Files.readString(csv));
        assertEquals(List.of("species", "phase", "moles", "mole_fraction", "state", "data_id"),
                rows.get(0).getParser().getHeaderNames());

        Map<String, Double> gas = new HashMap<>();
        Map<String, Double> solid = new HashMap<>();
        for (CSVRecord r : rows) {
            double n = Double.parseDouble(r.get("moles"));
            assertTrue(Double.isFinite(n) && n >= 0, r.toString());
            assertTrue(Double.isFinite(Double.parseDouble(r.get("mole_fraction"))), r.toString());
            (r.get("phase").equals("gas") ? gas : solid).put(r.get("data_id"), n);
            assertEquals(PhaseNames.display(r.get("data_id")), r.get("species"));
        }
        assertEquals(c.present(), new TreeSet<>(solid.keySet()), "condensed phases present");
        int compared = 0;
        for (OracleCases.Expected e : c.expected()) {
            if (e.gas() ? !(e.moleFraction() > 1e-15) : e.moles() == 0) {
                continue;
            }
            Double ours = (e.gas() ? gas : solid).get(e.species());
            assertTrue(ours != null, e.species() + " missing from the output");
            assertEquals(1, ours / e.moles(), 1e-6, e.species() + " against CEA moles_polished");
            compared++;
        }
        assertTrue(compared > 20, "compared " + compared);
        assertTrue(cli.err().contains("condensed phases present"), cli.err());
    }

    @Test
    void writesToStandardOutputWithoutAnOutFile() throws IOException {
        assertEquals(0, run("point", "--elements", "H=1,He=0.085,O=4.9e-4,C=2.7e-4,Mg=3.98e-5,Si=3.24e-5,Fe=2.88e-5",
                "--T-K", "1300", "--P-bar", "1e-4"), cli.err());
        List<CSVRecord> rows = parse(cli.out());
        Set<String> states = new TreeSet<>();
        rows.forEach(r -> states.add(r.get("state")));
        assertTrue(states.contains("gas") && states.size() > 1, "gas and condensed rows: " + states);
        assertFalse(cli.out().contains("NaN"));
    }

    @Test
    void anUnknownSpeciesIdIsOneLineNamingFileAndLine() throws IOException {
        Path gases = Files.writeString(dir.resolve("my-gases.txt"), "# gases\nH2\nH2O-typo\nCO\n");
        Path csv = dir.resolve("never.csv");
        assertEquals(2, run("point", "--data", "nasa", "--gases", gases.toString(), "--elements", "H=1,O=5e-4,C=3e-4",
                "--T-K", "1500", "--P-bar", "1e-3", "--out", csv.toString()));
        String[] lines = cli.err().strip().split("\n");
        assertEquals(1, lines.length, cli.err());
        assertTrue(lines[0].contains("my-gases.txt") && lines[0].contains("line 3") && lines[0].contains("H2O-typo"),
                lines[0]);
        assertFalse(Files.exists(csv), "nothing written");
    }

    @Test
    void aNonPositiveTemperatureIsBadInput() {
        assertEquals(2, run("point", "--T-K", "-5", "--P-bar", "1e-4"));
        assertTrue(cli.err().contains("--T-K"), cli.err());
        assertEquals(2, run("point", "--T-K", "1000"));
        assertTrue(cli.err().contains("--P-bar"), cli.err());
    }
}
