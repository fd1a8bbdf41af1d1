package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nebulith.thermo.audit.AuditReport;

/** {@code nebulith data-audit}: the report files, their header, bad input; the CI reference option. */
class DataAuditCommandTest {
    @TempDir
    Path dir;
    private final CliRun cli = new CliRun();

    private int run(String... args) {
        return cli.run(args);
    }

    @Test
    void writesTheMarkdownAndCsvReports() throws Exception {
        Path o = dir.resolve("audit");
        assertEquals(0, run("data-audit", "--sources", "src/data/thermo-sources", "--out", o.toString()),
                cli.err());
        String csv = Files.readString(o.resolve("data-audit.csv"));
        assertTrue(csv.startsWith(String.join(",", AuditReport.COLUMNS) + "\n"), csv.substring(0, 80));
        assertFalse(csv.contains(",new,"), "every finding accepted");
        assertTrue(csv.contains("Ni(cr) g/RT at 631 K"));
        String md = Files.readString(o.resolve("data-audit.md"));
        assertTrue(md.contains("| FeCL3 | H_f_298_J_per_mol | -1059104.288 | -253131.0 |"), md.substring(0, 400));
    }

    @Test
    void aSourceFolderWithoutTheNasaFileIsOneLineExit2() {
        Path o = dir.resolve("audit2");
        assertEquals(2, run("data-audit", "--sources", dir.toString(), "--out", o.toString()));
        String e = cli.err().strip();
        assertTrue(e.contains("--sources") && e.contains("nasa_glenn_thermo.inp") && !e.contains("\n"), e);
        assertFalse(Files.exists(o));
    }

    @Test
    void twoFormsOfOneSolutionAreRefused() {
        assertEquals(2, run("point", "--T-K", "1500", "--P-bar", "1e-4", "--solutions", "olivine,olivine-fe-mg"));
        String e = cli.err().strip();
        assertTrue(e.contains("--solutions") && e.contains("two solutions") && !e.contains("\n"), e);
    }

    @Test
    void unknownCiReferenceIsOneLineExit2() {
        assertEquals(2, run("point", "--T-K", "1500", "--P-bar", "1e-4", "--dust-enrichment", "2", "--ci-reference",
                "orgueil1864"));
        String e = cli.err().strip();
        assertTrue(e.contains("--ci-reference") && e.contains("lodders-palme-gail2009, palme-oneill2014"), e);
    }
}
