package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Tag;
import org.nebulith.thermo.PhaseNames;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import java.nio.charset.StandardCharsets;
import org.nebulith.composition.AbundancePresets;
import org.nebulith.composition.ElementAbundances;
import org.nebulith.condensation.CondensationSequence;
import org.nebulith.condensation.ElementCondensation;
import org.nebulith.condensation.PhaseEvent;
import org.nebulith.condensation.PressurePath;
import org.nebulith.condensation.SequenceRunner;
import org.nebulith.condensation.SequenceSettings;
import org.nebulith.condensation.SequenceStep;
import org.nebulith.report.sequence.SequenceTables;
import org.nebulith.equilibrium.ChemicalSystem;
import org.nebulith.equilibrium.EquilibriumSolver;
import org.nebulith.equilibrium.SystemSpec;
import org.nebulith.thermo.Element;

/** {@code nebulith sequence} end to end: the four CSVs read back against a library run of the same settings. */
@Tag("slow")
class SequenceCommandTest {
    private static final String[] GRID = {"--T-max-K", "1700", "--T-min-K", "1300", "--T-step-K", "10", "--P-bar", "1e-4"};

    @TempDir
    static Path dir;
    private static Path folder;
    private static int exit;
    private static CondensationSequence expected;
    private final CliRun cli = new CliRun();

    @BeforeAll
    static void runOnce() {
        folder = dir.resolve("run");
        String[] args = Stream.concat(Stream.of("sequence", "--out", folder.toString()), Stream.of(GRID)).toArray(String[]::new);
        exit = new CliRun().run(args);
        ElementAbundances comp = AbundancePresets.preset(AbundancePresets.PROTOSOLAR_LODDERS2003).abundances();
        ChemicalSystem sys = SystemSpec.defaults().build(comp.elements());
        double[] b = new double[sys.elementCount()];
        for (int j = 0; j < b.length; j++) {
            b[j] = comp.moles(sys.elements().get(j));
        }
        expected = new SequenceRunner(new EquilibriumSolver()).run(sys, b,
                new SequenceSettings(PressurePath.constant(1e-4), 1700, 1300, 10, 0, 0.05));
    }

    private static List<CSVRecord> read(String name) throws IOException {
        try (Reader r = Files.newBufferedReader(folder.resolve(name), StandardCharsets.UTF_8);
             CSVParser p = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(r)) {
            return p.getRecords();
        }
    }

    @Test
    void writesTheFourTablesAndNotes() {
        assertEquals(0, exit);
        for (String f : List.of(SequenceTables.SEQUENCE, SequenceTables.FRACTIONS, SequenceTables.TEMPERATURES,
                SequenceTables.APPEARANCE, "run-notes.md")) {
            assertTrue(Files.isRegularFile(folder.resolve(f)), f);
        }
    }

    @Test
    void sequenceAndFractionsMatchTheRun() throws IOException {
        List<CSVRecord> seq = read(SequenceTables.SEQUENCE);
        List<CSVRecord> frac = read(SequenceTables.FRACTIONS);
        assertEquals(expected.steps().size(), seq.size());
        ChemicalSystem sys = expected.system();
        int olivine = sys.phaseIndex("olivine");
        double perSi = 1e6 / expected.inputTotals()[sys.elementIndex(Element.Si)];
        for (int i = 0; i < seq.size(); i++) {
            SequenceStep s = expected.steps().get(i);
            assertEquals(s.temperatureK(), Double.parseDouble(seq.get(i).get("T_K")));
            assertEquals(s.result().memberMoles(olivine, 0) * perSi,
                    Double.parseDouble(seq.get(i).get("olivine.forsterite_per_1e6_Si")), 1e-9);
            for (Element e : List.of(Element.Al, Element.Mg, Element.Fe)) {
                assertEquals(s.condensedFraction(e),
                        Double.parseDouble(frac.get(i).get(SequenceTables.fractionColumn(e))), 1e-12);
            }
        }
    }

    @Test
    void temperaturesAndAppearanceMatchTheRun() throws IOException {
        List<CSVRecord> t = read(SequenceTables.TEMPERATURES);
        for (ElementCondensation ec : expected.condensationTemperatures()) {
            CSVRecord r = t.stream().filter(x -> x.get("element").equals(ec.element().symbol())).findFirst().orElseThrow();
            // written to the 0.05 K bisection bracket: two decimals, within half a hundredth of the run's value
            assertEquals(ec.t50K().isPresent(), !r.get("T50_K").isEmpty(), ec.element().symbol());
            if (ec.t50K().isPresent()) {
                assertEquals(ec.t50K().getAsDouble(), Double.parseDouble(r.get("T50_K")), 0.005 + 1e-9);
                assertTrue(r.get("T50_K").matches("\\d+(\\.\\d{1,2})?"), r.get("T50_K"));
            }
            assertEquals(ec.hostPhase().isEmpty() ? "" : PhaseNames.display(ec.hostPhase()), r.get("host_phase"));
            assertEquals(ec.hostPhase(), r.get("host_data_id"));
            assertFalse(r.get("T_onset_K").contains("NaN"));
        }
        // pieces of one phase are merged into one interval: every event lies inside a row of its display name
        List<CSVRecord> a = read(SequenceTables.APPEARANCE);
        assertTrue(a.size() <= expected.phaseEvents().size());
        for (PhaseEvent ev : expected.phaseEvents()) {
            double off = ev.disappearK().isPresent() ? ev.disappearK().getAsDouble() : -1;
            assertTrue(a.stream().anyMatch(r -> List.of(r.get("data_id").split("\\+")).contains(ev.phase())
                    && r.get("phase").equals(PhaseNames.display(ev.phase()))
                    && Double.parseDouble(r.get("T_appear_K")) >= ev.appearK()
                    && (off < 0 ? r.get("T_disappear_K").isEmpty()
                            : r.get("T_disappear_K").isEmpty() || Double.parseDouble(r.get("T_disappear_K")) <= off)),
                    ev.toString());
        }
        for (CSVRecord r : a) {
            assertFalse(r.get("phase").matches(".*\\((cr|a|b|c|L)\\)$"), r.get("phase"));
        }
    }

    @Test
    void reportOpensInChromiumWithoutOverflowErrorsOrBrokenImages() throws Exception {
        org.junit.jupiter.api.Assumptions.assumeTrue(org.nebulith.report.html.ChromiumProbe.chromium().isPresent(),
                "no chromium binary on PATH");
        org.nebulith.report.html.ChromiumProbe.Result page =
                org.nebulith.report.html.ChromiumProbe.open(folder.resolve("report.html"), dir);
        assertEquals(2, page.images(), "condensation curves and phase assemblage");
        assertEquals(0, page.bad(), "images not decoded");
        assertEquals(0, page.errors(), "errors in the page");
        assertEquals(List.of(), page.console(), "console messages");
        assertTrue(page.overflow() <= 0, "no horizontal overflow: " + page.overflow() + " px");
    }

    @Test
    void reportNumbersAreForPeopleAndChartsHaveLiveText() throws IOException {
        String summary = Files.readString(folder.resolve("summary.md"));
        // no 16-digit numbers: temperatures to 0.1 K, the rest to four significant figures
        String tables = summary.lines().filter(l -> l.startsWith("|")).collect(java.util.stream.Collectors.joining("\n"));
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("\\d+\\.\\d+").matcher(tables);
        while (m.find()) {
            String digits = m.group().replace(".", "").replaceFirst("^0+", "");
            assertTrue(digits.length() <= 5, "at most four significant figures (five for kelvin): " + m.group());
        }
        assertFalse(summary.contains("E-"), "settings in shortest decimal, not 1.0E-4");
        String svg = Files.readString(folder.resolve("condensation-curves.svg"));
        assertTrue(svg.contains("<text"), "live text");
        assertTrue(Files.size(folder.resolve("condensation-curves.svg")) < 500_000);
        assertTrue(Files.size(folder.resolve("phase-assemblage.svg")) < 500_000);
    }

    @Test
    void badPathFileExitsTwoNamingFileLineAndFieldAndWritesNothing() throws IOException {
        Path path = dir.resolve("path.csv");
        Files.writeString(path, "# demo path of an invented disk\nT_K,P_bar\n1600,1e-4\n1500,-3\n");
        Path out = dir.resolve("bad-run");
        int code = cli.run("sequence", "--path", path.toString(), "--out", out.toString());
        String msg = cli.err().trim();
        assertEquals(2, code, msg);
        assertTrue(msg.contains("path.csv") && msg.contains("line 4") && msg.contains("P_bar"), msg);
        assertEquals(1, msg.lines().count(), msg);
        assertFalse(Files.exists(out));
        try (Stream<Path> files = Files.list(dir)) {
            assertTrue(files.noneMatch(f -> f.getFileName().toString().contains("bad-run")));
        }
    }

    @Test
    void existingFolderIsNotOverwrittenWithoutForce() {
        String[] args = Stream.concat(Stream.of("sequence", "--out", folder.toString()), Stream.of(GRID)).toArray(String[]::new);
        assertEquals(2, cli.run(args), cli.err());
    }
}
