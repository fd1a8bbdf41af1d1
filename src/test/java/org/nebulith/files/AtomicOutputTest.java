package org.nebulith.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nebulith.errors.InputException;

class AtomicOutputTest {

    @TempDir
    Path dir;

    private List<Path> listing() throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.sorted().toList();
        }
    }

    @Test
    void aRunThatFailsBeforeCommitLeavesNothing() throws IOException {
        Path target = dir.resolve("run");
        assertThrows(IllegalStateException.class, () -> {
            try (RunFolder run = AtomicOutput.openRunFolder(target, false, new RunInputs())) {
                run.writeText("sequence.csv", "T_K\n2000\n");
                assertTrue(Files.exists(run.workingFolder().resolve("sequence.csv")));
                assertFalse(Files.exists(target), "nothing visible before commit");
                throw new IllegalStateException("solver failed half way");
            }
        });
        assertEquals(List.of(), listing());
    }

    @Test
    void aStoppedJvmLeavesNothing() throws Exception {
        stopChild(dir.resolve("stopped"), "folder", 2);
    }

    @Test
    void aStoppedJvmReleasesTheLockOfAFileItReserved() throws Exception {
        stopChild(dir.resolve("state.csv"), "file", 1);
    }

    private void stopChild(final Path target, final String kind, final int whileRunning) throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process child = new ProcessBuilder(java, "-cp", System.getProperty("java.class.path"),
                InterruptedRunProbe.class.getName(), target.toString(), kind).redirectErrorStream(true).start();
        try (BufferedReader out = new BufferedReader(new InputStreamReader(child.getInputStream(),
                StandardCharsets.UTF_8))) {
            assertEquals("writing", out.readLine());
            assertEquals(whileRunning, listing().size(), "the temporary folder and the lock exist while the run works");
            child.destroy(); // SIGTERM, as from Ctrl-C or a job scheduler: shutdown hooks run
            assertTrue(child.waitFor(20, TimeUnit.SECONDS));
        } finally {
            child.destroyForcibly();
        }
        assertEquals(List.of(), listing(), "no half-written run folder, no temporary folder, no lock");
    }

    @Test
    void anExistingRunIsReplacedOnlyWithForce() throws IOException {
        Path target = dir.resolve("run");
        try (RunFolder run = AtomicOutput.openRunFolder(target, false, new RunInputs())) {
            run.writeText("a.txt", "first");
            run.commit();
        }
        InputException refused = assertThrows(InputException.class,
                () -> AtomicOutput.openRunFolder(target, false, new RunInputs()));
        assertTrue(refused.getMessage().contains("use --force"), refused.getMessage());
        try (RunFolder run = AtomicOutput.openRunFolder(target, true, new RunInputs())) {
            run.writeText("b.txt", "second");
            assertEquals("first", Files.readString(target.resolve("a.txt")), "old run intact until commit");
            run.commit();
        }
        assertEquals("second", Files.readString(target.resolve("b.txt")));
        assertFalse(Files.exists(target.resolve("a.txt")), "the replaced run is gone as a whole");
        assertEquals(List.of(target), listing());
    }

    @Test
    void inputsAreNeverOverwritten() throws IOException {
        Path input = Files.writeString(dir.resolve("zones.csv"), "zone,shape\n");
        RunInputs inputs = new RunInputs().add(input, "feeding zones");
        assertThrows(InputException.class, () -> AtomicOutput.writeText(input, "x", true, inputs));
        assertThrows(InputException.class,
                () -> AtomicOutput.writeText(dir.resolve("sub/../zones.csv"), "x", true, inputs));
        assertThrows(InputException.class, () -> AtomicOutput.openRunFolder(dir, true, inputs),
                "a folder holding an input may not be replaced");
        assertEquals("zone,shape\n", Files.readString(input));
        assertEquals(64, inputs.files().get(0).sha256().length());
    }

    @Test
    void singleFilesAreWrittenAtomicallyAndNotOverwrittenWithoutForce() throws IOException {
        Path file = dir.resolve("point.csv");
        AtomicOutput.writeText(file, "species,phase,moles\n", false, new RunInputs());
        assertThrows(InputException.class, () -> AtomicOutput.writeText(file, "other", false, new RunInputs()));
        InputException foreign = assertThrows(InputException.class,
                () -> AtomicOutput.writeText(file, "v2\n", true, new RunInputs()));
        assertTrue(foreign.getMessage().contains("not an earlier output"), foreign.getMessage());
        AtomicOutput.writeText(file, "species,phase,moles\nH2,gas,1\n", true, new RunInputs());
        assertEquals("species,phase,moles\nH2,gas,1\n", Files.readString(file));
        assertEquals(List.of(file), listing());
        assertThrows(InputException.class, () -> {
            try (RunFolder run = AtomicOutput.openRunFolder(dir.resolve("r"), false, new RunInputs())) {
                run.file("../escape.txt");
            }
        });
    }

    @Test
    void sha256MatchesAPublishedTestVector() throws IOException {
        // FIPS 180-2, appendix B.1: SHA-256("abc")
        Path abc = Files.writeString(dir.resolve("abc.txt"), "abc");
        assertEquals("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad", RunInputs.sha256(abc));
    }
}
