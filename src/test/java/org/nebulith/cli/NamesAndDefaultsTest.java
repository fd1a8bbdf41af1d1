package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.Instant;
import java.util.HexFormat;
import java.util.List;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The renamed options and columns, the default run-folder names, the resolution order of named
 * inputs and the presets listing, checked from the command line.
 */
class NamesAndDefaultsTest {
    @TempDir
    Path dir;
    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();

    private int run(String... args) {
        return Main.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
    }

    private String err() {
        return err.toString(StandardCharsets.UTF_8);
    }

    @Test
    void theOldRemovalOptionIsRefusedWithAOneLineHint() {
        for (String[] args : List.of(new String[] {"sequence", "--isolation", "1"},
                new String[] {"sequence", "--isolation=0.5", "--out", dir.resolve("x").toString()})) {
            err.reset();
            assertEquals(ExitCodes.BAD_INPUT, run(args));
            assertEquals(1, err().strip().lines().count(), err());
            assertTrue(err().contains("--isolation") && err().contains("--removal-fraction F"), err());
        }
        assertFalse(Files.exists(dir.resolve("x")));
    }

    @Test
    void aPresetWithTheOldKeyIsRefusedNamingFileLineAndTheNewKey() throws IOException {
        Path preset = dir.resolve("old.settings");
        Files.writeString(preset, "command = sequence\nisolation = 1\n");
        assertEquals(ExitCodes.BAD_INPUT, run("sequence", "--preset", preset.toString(), "--out", dir.resolve("o").toString()));
        assertTrue(err().contains("old.settings") && err().contains("line 2") && err().contains("removal-fraction"), err());
    }

    @Test
    void fractionalRunsWriteWithdrawnColumnsAndNoOldWordsAndListTheBuiltInPresetWithItsChecksum()
            throws IOException, NoSuchAlgorithmException {
        Path folder = dir.resolve("frac");
        assertEquals(ExitCodes.OK, run("sequence", "--removal-fraction", "1", "--T-max-K", "1700", "--T-min-K", "1500",
                "--T-step-K", "10", "--out", folder.toString()), err());
        String header = Files.readAllLines(folder.resolve("sequence.csv")).get(0);
        assertTrue(header.contains(",withdrawn_corundum_per_1e6_Si"), header);
        try (Stream<Path> files = Files.list(folder)) {
            for (Path f : files.filter(p -> p.toString().matches(".*\\.(csv|md|html)$")).toList()) {
                String text = Files.readString(f).toLowerCase(java.util.Locale.ROOT);
                assertFalse(text.contains("isolat"), f + " uses the old wording");
            }
        }
        String notes = Files.readString(folder.resolve("run-notes.md"));
        // the tests run in the repository folder, whose presets/ copy comes before the built-in one
        Path local = Path.of("presets/protosolar-lodders2003.csv");
        byte[] used;
        String shown;
        if (Files.isRegularFile(local)) {
            used = Files.readAllBytes(local);
            shown = "`presets/protosolar-lodders2003.csv`";
        } else {
            try (InputStream in = getClass().getResourceAsStream("/presets/protosolar-lodders2003.csv")) {
                used = in.readAllBytes();
            }
            shown = "`built-in presets/protosolar-lodders2003.csv`";
        }
        String sha = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(used));
        assertTrue(notes.contains(shown) && notes.contains(sha), notes);
        assertTrue(err().contains("cautions: ") && err().contains("report.html"), err());
    }

    @Test
    void quietRunsPrintNoCautions() {
        assertEquals(ExitCodes.OK, run("sequence", "-q", "--T-max-K", "1700", "--T-min-K", "1600", "--T-step-K", "20",
                "--out", dir.resolve("q").toString()), err());
        assertEquals("", err());
    }

    @Test
    void defaultRunFoldersAreCommandAndStartTimeWithASuffixForASecondRunInTheSameSecond() throws IOException {
        Instant t = Instant.parse("2031-04-05T06:07:08Z");
        assertEquals("sequence-20310405-060708", DefaultRunName.of("sequence", t, dir));
        Files.createDirectories(dir.resolve("sequence-20310405-060708"));
        assertEquals("sequence-20310405-060708-2", DefaultRunName.of("sequence", t, dir));
        Files.createDirectories(dir.resolve("sequence-20310405-060708-2"));
        assertEquals("sequence-20310405-060708-3", DefaultRunName.of("sequence", t, dir));
        assertEquals("planet-20310405-060708", DefaultRunName.of("planet", t, dir));
        assertEquals(Path.of("reports", "survey-20310405-060708"),
                RunOptions.outputFolder(OutputTarget.NONE, DefaultRunName.of("survey", t, dir)));
    }

    @Test
    void surveyResumeWithoutAFolderIsRefused() throws IOException {
        Path cat = dir.resolve("cat.csv");
        Files.writeString(cat, "star,Fe_H,Fe_H_err\nInvented A,0.0,0.05\n");
        assertEquals(ExitCodes.BAD_INPUT, run("survey", "--catalogue", cat.toString(), "--resume"));
        assertTrue(err().contains("--resume") && err().contains("--run-name"), err());
    }

    @Test
    void aNameResolvesToTheWorkingFolderCopyFirstThenToTheBuiltInOne() throws IOException {
        PresetCatalogue catalogue = new PresetCatalogue(dir);
        PresetCatalogue.Entry builtIn = catalogue.find(PresetCatalogue.Kind.COMPOSITION, "star-tessaly").orElseThrow();
        assertTrue(builtIn.builtIn());
        assertEquals("built-in presets/star-tessaly.csv", builtIn.shown());
        Files.createDirectories(dir.resolve("presets"));
        String edited = builtIn.text().replace("Fe,", "Fe,0.01+").replaceFirst("(?m)^# ", "# edited copy: ");
        Files.writeString(dir.resolve("presets/star-tessaly.csv"), edited);
        PresetCatalogue.Entry local = catalogue.find(PresetCatalogue.Kind.COMPOSITION, "star-tessaly").orElseThrow();
        assertFalse(local.builtIn());
        assertEquals(dir.resolve("presets/star-tessaly.csv"), local.file());
        assertEquals(edited, local.text());
        // a file of another kind under the name does not hide the built-in copy
        Files.writeString(dir.resolve("presets/hot-early-disk.csv"), "element,value,unit\nH,1,mol\n");
        assertTrue(catalogue.find(PresetCatalogue.Kind.DISK, "hot-early-disk").orElseThrow().builtIn());
        assertTrue(catalogue.find(PresetCatalogue.Kind.SETTINGS, "dusty-sequence").orElseThrow().builtIn());
        assertTrue(catalogue.find(PresetCatalogue.Kind.COMPOSITION, "../escape").isEmpty());
    }

    @Test
    void presetsListsEveryKindOneLineEach() {
        assertEquals(ExitCodes.OK, run("presets"), err());
        List<String> lines = out.toString(StandardCharsets.UTF_8).lines().toList();
        for (String name : List.of("composition protosolar-lodders2003", "composition star-tessaly",
                "disk mmsn-hayashi1981", "zones demo-system", "catalogue demo-catalogue", "planets demo-planets",
                "settings dusty-sequence", "settings fractional-sequence", "settings tessaly-planets",
                "settings quick-survey")) {
            assertEquals(1, lines.stream().filter(l -> (l.replaceAll("\\s+", " ") + " ").startsWith(name + " ")).count(),
                    name + " in\n" + lines);
        }
    }

    @Test
    void strongDustEnrichmentRaisesTheDefaultStartAndRefusesAnExplicitOne() throws IOException {
        // the reproduction of the report: at 100x and 1000x CI dust, phases are stable at 2000 K, 1e-4 bar
        assertEquals(ExitCodes.BAD_INPUT, run("sequence", "--dust-enrichment", "1000", "--T-max-K", "2000",
                "--out", dir.resolve("explicit").toString()));
        assertTrue(err().contains("--T-max-K") && err().contains("already stable"), err());
        assertEquals(1, err().strip().lines().count(), err());
        assertFalse(Files.exists(dir.resolve("explicit")));
        err.reset();
        Path folder = dir.resolve("raised");
        assertEquals(ExitCodes.OK, run("sequence", "--dust-enrichment", "100", "--T-min-K", "1900", "--T-step-K", "10",
                "--out", folder.toString()), err());
        String notes = Files.readString(folder.resolve("run-notes.md"));
        assertTrue(notes.contains("start raised from 2000 K"), notes);
        assertTrue(notes.contains("dust composition preset: `") && notes.contains("ci-chondrite.csv`"), notes);
        String firstRow = Files.readAllLines(folder.resolve("phase-appearance.csv")).get(1);
        assertTrue(firstRow.contains(",false,"), "first phase appears during the run, not at its start: " + firstRow);
    }
}
