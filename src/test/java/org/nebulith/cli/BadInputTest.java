package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.nebulith.files.RunFolder;
import org.nebulith.survey.PlanetEstimator;
import org.nebulith.survey.StandInEstimators;
import org.nebulith.survey.SurveySettings;

import picocli.CommandLine.Command;

/**
 * The bad inputs of the contributors' guide's bad-input table, through the command line: each
 * gives exit 2, one line naming the file or option, and writes nothing. Every case is checked
 * before anything is computed, so these runs take milliseconds.
 */
class BadInputTest {

    @TempDir
    Path dir;

    private final CliRun cli = commandLine();

    /** A survey whose estimate waits for a signal at its first draw (to hold a run open). */
    @Command(name = "survey-held")
    static final class HeldSurvey extends SurveyCommand {
        static volatile CountDownLatch started = new CountDownLatch(1);
        static volatile CountDownLatch release = new CountDownLatch(1);

        @Override
        protected PlanetEstimator estimatorFor(final SurveySettings settings) {
            PlanetEstimator inner = StandInEstimators.fullyCondensed();
            return gas -> {
                started.countDown();
                try {
                    release.await(60, TimeUnit.SECONDS);
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                }
                return inner.estimate(gas);
            };
        }
    }

    private static CliRun commandLine() {
        return new CliRun(() -> List.of(new SurveyCommandTest.StandInSurvey(), new HeldSurvey()));
    }

    private int run(final String... args) {
        return cli.run(args);
    }

    private String err() {
        return cli.err();
    }

    private List<String> listing() throws IOException {
        try (Stream<Path> files = Files.walk(dir)) {
            return files.map(p -> dir.relativize(p).toString()).sorted().toList();
        }
    }

    /** Writes {@code source} with byte 0xFF inserted in line {@code line} (1-based). */
    private Path withFF(final Path source, final String name, final int line) throws IOException {
        byte[] bytes = Files.readAllBytes(source);
        int at = 0;
        for (int l = 1; l < line; l++) {
            at = indexOf(bytes, (byte) '\n', at) + 1;
        }
        byte[] out2 = new byte[bytes.length + 1];
        System.arraycopy(bytes, 0, out2, 0, at + 1);
        out2[at + 1] = (byte) 0xFF;
        System.arraycopy(bytes, at + 1, out2, at + 2, bytes.length - at - 1);
        return Files.write(dir.resolve(name), out2);
    }

    private static int indexOf(final byte[] bytes, final byte b, final int from) {
        for (int i = from; i < bytes.length; i++) {
            if (bytes[i] == b) {
                return i;
            }
        }
        throw new IllegalArgumentException("too few lines");
    }

    @BeforeEach
    void inputs() throws IOException {
        Files.writeString(dir.resolve("zero.csv"), "element,value,unit\nH,0,mol\nMg,0,mol\n");
        Files.writeString(dir.resolve("eps400.csv"), "element,value,unit\nH,12,log_eps\nMg,400,log_eps\n");
        withFF(Path.of("feeding-zones/demo-system.csv"), "ff-zones.csv", 6);
        withFF(Path.of("presets/steady-viscous-default.csv"), "ff-disk.csv", 3);
        withFF(Path.of("presets/demo-catalogue.csv"), "ff-catalogue.csv", 5);
        withFF(Path.of("presets/star-tessaly.csv"), "ff-composition.csv", 4);
        Files.copy(Path.of("presets/demo-catalogue.csv"), dir.resolve("cat.csv"));
        StringBuilder many = new StringBuilder("star,Fe_H,Fe_H_err\n");
        for (int i = 0; i < 1001; i++) {
            many.append("S").append(i).append(",0,0.05\n");
        }
        Files.writeString(dir.resolve("many.csv"), many);
        Files.createDirectories(dir.resolve("existing"));
        Files.createSymbolicLink(dir.resolve("dangling"), dir.resolve("nowhere"));
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
        "sequence --T-step-K 1e-9 --out {d}/o | option --T-step-K: value \"1e-9\": gives 1700000000001 grid temperatures",
        "sequence --T-step-K 1e-6 --out {d}/o | more than 1000000",
        "sequence --T-step-K 1e-3 --out {d}/o | gives 1700001 grid temperatures",
        "survey --catalogue {d}/cat.csv --draws 2000000000 --out {d}/o | option --draws: value \"2000000000\"",
        "survey --catalogue {d}/many.csv --draws 100000 --out {d}/o | 1001 stars x 100000 draws = 100100000 draws",
        "survey --catalogue {d}/cat.csv --threads 2000000000 --out {d}/o | option --threads: value \"2000000000\"",
        "planet --profile-points 2000000000 --out {d}/o | option --profile-points: value \"2000000000\"",
        "planet --zones {d}/ff-zones.csv --out {d}/o | {d}/ff-zones.csv: line 6: byte 0xFF is not UTF-8 text",
        "planet --disk {d}/ff-disk.csv --out {d}/o | {d}/ff-disk.csv: line 3: byte 0xFF is not UTF-8 text",
        "survey --catalogue {d}/ff-catalogue.csv --out {d}/o | {d}/ff-catalogue.csv: line 5: byte 0xFF",
        "survey --catalogue {d}/absent.csv --out {d}/o | {d}/absent.csv: cannot read input file (no such file); accepted: an existing, readable file",
        "survey --catalogue {d}/existing --out {d}/o | {d}/existing: cannot read input file (a folder, not a file)",
        "point --composition {d}/ff-composition.csv --T-K 1500 --P-bar 1e-4 | {d}/ff-composition.csv: line 4: byte 0xFF",
        "point --composition {d}/zero.csv --T-K 1500 --P-bar 1e-4 | {d}/zero.csv: line 0: field \"value\": value \"\": every amount is zero",
        "point --elements H=0,Mg=0 --T-K 1500 --P-bar 1e-4 | option --elements: value \"H=0,Mg=0\": every amount is zero",
        "point --composition {d}/eps400.csv --T-K 1500 --P-bar 1e-4 | {d}/eps400.csv: line 3: field \"value\": value \"400\": log eps outside",
        "point --dust-enrichment 1e308 --T-K 1500 --P-bar 1e-4 | option --dust-enrichment: value \"1.0E308\"",
        "point --composition {d}/huge.csv --T-K 1500 --P-bar 1e-4 | ... (20000000 characters)\": not a number",
        "point --T-K 1500 --P-bar 1e-4 --out {d}/existing --force | {d}/existing: cannot write the output here: it is a folder",
        "point --T-K 1500 --P-bar 1e-4 --out {d}/dangling | {d}/dangling: cannot write the output here: it is a dangling",
        "sequence --out {d}/dangling | {d}/dangling: cannot write the output here: it is a dangling symbolic link",
        "sequence --out {d}/cat.csv --force | {d}/cat.csv: cannot write the output here: it exists and is not a folder",
        "survey --catalogue {d}/cat.csv --out {d}/cat.csv | {d}/cat.csv: refusing to write here",
        "survey --catalogue {d}/cat.csv --out {d} --force | {d}: refusing to write here",
        "sequence --out / --force | /: refusing to replace it: it is the file-system root",
    })
    void badInputExitsTwoWithOneLineAndWritesNothing(final String command, final String message) throws IOException {
        if (command.contains("huge.csv")) {
            Files.writeString(dir.resolve("huge.csv"), "element,value,unit\nH,12,log_eps\nMg," + "x".repeat(20_000_000)
                    + ",log_eps\n");
        }
        List<String> before = listing();
        String[] args = command.replace("{d}", dir.toString()).split(" ");
        assertEquals(2, run(args), err());
        String shown = err().strip();
        assertTrue(shown.startsWith("nebulith: "), shown);
        assertTrue(shown.contains(message.replace("{d}", dir.toString())), shown);
        assertEquals(1, shown.lines().filter(l -> !l.startsWith("notice: ")).count(), shown);
        assertTrue(shown.length() < 400, shown.length() + " characters");
        assertEquals(before, listing(), "nothing written");
    }

    @Test
    void forceOnAFolderHoldingAUserFileIsRefusedAndTheFileStays() throws IOException {
        Path mine = Files.createDirectories(dir.resolve("mine"));
        Files.writeString(mine.resolve("precious.txt"), "keep");
        assertEquals(2, run("sequence", "--T-step-K", "50", "--out", mine.toString(), "--force"));
        assertTrue(err().contains("no .nebulith-run marker"), err());
        assertEquals("keep", Files.readString(mine.resolve("precious.txt")));
        assertEquals(List.of("precious.txt"), Arrays.stream(mine.toFile().list()).toList());
        assertEquals(2, run("sequence", "--T-step-K", "50", "--out", mine.toString()));
        assertTrue(err().contains("refusing to replace it") && !err().contains("use --force"),
                "without --force the message does not suggest it either: " + err());
    }

    @Test
    void filesNamedInTheCatalogueAreInputsAndNeverOverwritten() throws IOException {
        Path cc = Files.createDirectories(dir.resolve("cc"));
        Path notes = Files.writeString(cc.resolve("survey-notes.txt"), "my own notes\n");
        Path cat = Files.writeString(dir.resolve("own-zones.csv"), "star,Fe_H,Fe_H_err,zones\nA,0,0.05," + notes + "\n");
        assertEquals(2, run("survey-standin", "--catalogue", cat.toString(), "--draws", "3", "--out", cc.toString(),
                "--force"));
        assertTrue(err().contains("refusing to write here") && err().contains(notes.toString()), err());
        assertEquals("my own notes\n", Files.readString(notes));
    }

    @Test
    void aSurveyPartialThatIsNotUtf8IsNamed() throws IOException {
        Path outDir = dir.resolve("s");
        Path partial = org.nebulith.report.survey.LocalSurvey.partialTable(outDir);
        Files.createDirectories(partial.getParent());
        Files.write(partial, ("star,zone,quantity,median,p16,p84,unit,nominal,draws\nNDC Alder,host,Mg_Si_molar,1"
                + "\n").getBytes(StandardCharsets.UTF_8));
        Files.write(partial, new byte[] {'N', (byte) 0xFF, '\n'}, java.nio.file.StandardOpenOption.APPEND);
        assertEquals(2, run("survey-standin", "--catalogue", "presets/demo-catalogue.csv", "--draws", "4",
                "--out", outDir.toString(), "--resume"));
        assertTrue(err().contains("line 3: byte 0xFF is not UTF-8 text"), err());
        assertTrue(Files.exists(partial), "the partial results are kept");
    }

    @Test
    void aSecondSurveyOnTheSameFolderIsRefusedAndTheFirstFinishesAlone() throws Exception {
        HeldSurvey.started = new CountDownLatch(1);
        HeldSurvey.release = new CountDownLatch(1);
        Path x = dir.resolve("X");
        CliRun firstRun = commandLine();
        int[] firstCode = {-1};
        Thread first = new Thread(() -> firstCode[0] = firstRun.run("survey-held",
                "--catalogue", "presets/demo-catalogue.csv", "--draws", "20", "--threads", "1", "--seed", "7",
                "--out", x.toString(), "--force"));
        first.start();
        try {
            assertTrue(HeldSurvey.started.await(60, TimeUnit.SECONDS), "the first survey is computing");
            assertEquals(2, run("survey-standin", "--catalogue", "presets/demo-catalogue.csv", "--draws", "20",
                    "--threads", "1", "--seed", "8", "--out", x.toString(), "--force"));
            assertTrue(err().contains("another nebulith run is writing this output (process "
                    + ProcessHandle.current().pid()), err());
            assertFalse(Files.exists(x), "nothing under the final name while the first run works");
        } finally {
            HeldSurvey.release.countDown();
            first.join(120_000);
        }
        assertEquals(0, firstCode[0], firstRun.err());
        assertTrue(Files.readString(x.resolve("survey-notes.txt")).contains("seed: 7"));
        assertTrue(Files.readString(x.resolve(".nebulith-run")).contains("command = survey"));
        assertFalse(Files.exists(RunFolder.unfinished(x)));
    }

    @Test
    void aForcedSurveyReplacesItsEarlierRunAndAllFilesAppearTogether() throws IOException {
        Path x = dir.resolve("again");
        List<String> files = new ArrayList<>();
        for (String seed : List.of("7", "8")) {
            assertEquals(0, run("survey-standin", "--catalogue", "presets/demo-catalogue.csv", "--draws", "8",
                    "--seed", seed, "--out", x.toString(), "--force"), err());
            try (Stream<Path> s = Files.list(x)) {
                files = s.map(p -> p.getFileName().toString()).sorted().toList();
            }
        }
        assertEquals(List.of(".nebulith-run", "failures.csv", "report.html", "summary.md", "survey-chart.pdf",
                "survey-chart.png", "survey-chart.svg", "survey-notes.txt", "survey-stars.csv", "survey.csv"), files);
        assertTrue(Files.readString(x.resolve("survey-notes.txt")).contains("seed: 8"));
        assertEquals(List.of("again"), Arrays.stream(dir.toFile().list()).filter(n -> n.contains("again")).toList(),
                "no temporary, aside or lock file left");
    }

    @Test
    void quietPlanetRunNoticesOverlapsEscapesZoneNamesAndPointsToTheCautions() throws IOException {
        Path zones = Files.writeString(dir.resolve("odd.csv"), "\uFEFFzone,shape,r_center_AU,half_width_AU\n"
                + "a|b*c,tophat,1.0,0.3\n<z>,tophat,1.4,0.3\n");
        Path outDir = dir.resolve("p");
        assertEquals(0, run("planet", "-q", "--zones", zones.toString(), "--profile-points", "2", "--out",
                outDir.toString()), err());
        assertEquals("", err().strip(), "quiet: no standing warnings (they are in the report)");
        String html = Files.readString(outDir.resolve("report.html"));
        assertTrue(html.contains("Feeding zones &#39;a|b*c&#39; (0.700-1.30 AU) and &#39;&lt;z&gt;&#39; (1.10-1.70 AU)"
                + " overlap: the same solids feed both planets.") || html.contains("Feeding zones 'a|b*c' (0.700-1.30 AU)"
                + " and '&lt;z&gt;' (1.10-1.70 AU) overlap: the same solids feed both planets."), html);
        assertEquals(2, run("planet", "--zones", zones.toString(), "--out", dir.resolve("dangling").toString()));
        assertTrue(err().startsWith("notice: feeding zones 'a|b*c' (0.700-1.30 AU) and '<z>' (1.10-1.70 AU) overlap:"
                + " the same solids feed both planets\n"), err());
        String md = Files.readString(outDir.resolve("summary.md"));
        assertTrue(md.contains("| a\\|b\\*c |") && md.contains("| \\<z\\> |"), md);
    }

    @Test
    void aByteOrderMarkIsDroppedByEveryReader() throws IOException {
        Path comp = dir.resolve("bom-composition.csv");
        Files.write(comp, concat(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF},
                Files.readAllBytes(Path.of("presets/star-tessaly.csv"))));
        assertEquals(0, run("point", "--composition", comp.toString(), "--T-K", "1800", "--P-bar", "1e-4"), err());
        Path disk = dir.resolve("bom-disk.csv");
        Files.write(disk, concat(new byte[] {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF},
                Files.readAllBytes(Path.of("presets/steady-viscous-default.csv"))));
        assertEquals(2, run("planet", "--disk", disk.toString(), "--out", dir.resolve("dangling").toString()));
        assertTrue(err().contains("dangling symbolic link"), "the disk file was read: " + err());
        Path path = Files.writeString(dir.resolve("bom-path.csv"), "\uFEFFT_K,P_bar\n2000,1e-4\n300,1e-5\n");
        assertEquals(2, run("sequence", "--path", path.toString(), "--out", dir.resolve("dangling").toString()));
        assertTrue(err().contains("dangling symbolic link"), "the path file was read: " + err());
    }

    @Test
    void hugeCatalogueFieldsAreCutInTheMessages() throws IOException {
        Path cat = Files.writeString(dir.resolve("huge-cat.csv"), "star,Fe_H,Fe_H_err\n" + "S".repeat(5_000_000) + ","
                + "9".repeat(5_000_000) + ",0.05\n");
        assertEquals(2, run("survey-standin", "--catalogue", cat.toString(), "--out", dir.resolve("o").toString()));
        assertTrue(err().contains("field \"Fe_H\": value \"" + "9".repeat(80) + "... (5000000 characters)\": star '"
                + "S".repeat(80) + "... (5000000 characters)': out of range"), err().substring(0, Math.min(2000,
                err().length())));
        assertTrue(err().length() < 1500, err().length() + " characters");
    }

    private static byte[] concat(final byte[] a, final byte[] b) {
        byte[] c = Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, c, a.length, b.length);
        return c;
    }
}
