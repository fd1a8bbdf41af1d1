package org.nebulith.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;

/** --force replaces only earlier runs, one writer per output, stale locks named, inputs checked as UTF-8. */
class OutputSafetyTest {

    @TempDir
    Path dir;

    private static final RunMarker MARKER = RunMarker.now("test", "dev");

    private RunFolder open(final Path target, final boolean force) {
        return RunFolder.open(target, force, new RunInputs(), MARKER);
    }

    private void finishedRun(final Path target, final boolean force, final String file) {
        try (RunFolder run = open(target, force)) {
            run.writeText(file, "T_K\n2000\n");
            run.commit();
        }
    }

    private List<String> names(final Path folder) throws IOException {
        try (Stream<Path> files = Files.list(folder)) {
            return files.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void forceOnAUserFolderIsRefusedAndTheUserFileStays() throws IOException {
        Path user = Files.createDirectories(dir.resolve("home"));
        Path precious = Files.writeString(user.resolve("precious.txt"), "keep");
        InputException e = assertThrows(InputException.class, () -> open(user, true));
        assertEquals(Messages.OUTPUT_NOT_REPLACEABLE, e.key());
        assertTrue(e.getMessage().contains("no " + RunMarker.FILE + " marker"), e.getMessage());
        assertEquals("keep", Files.readString(precious));
        assertEquals(List.of("home"), names(dir), "no lock or temporary folder left");
    }

    @Test
    void forceReplacesAnEarlierRunButNotOneWithAUserFileAdded() throws IOException {
        Path target = dir.resolve("run");
        finishedRun(target, false, "a.csv");
        assertTrue(Files.readString(target.resolve(RunMarker.FILE)).contains("command = test"));
        finishedRun(target, true, "b.csv");
        assertEquals(List.of(RunMarker.FILE, "b.csv"), names(target), "the earlier run was replaced as a whole");
        assertEquals(List.of("run"), names(dir), "the old run was moved aside and removed, no temporary left");

        Files.writeString(target.resolve("my-notes.txt"), "mine");
        InputException e = assertThrows(InputException.class, () -> open(target, true));
        assertTrue(e.getMessage().contains("my-notes.txt"), e.getMessage());
        assertEquals("mine", Files.readString(target.resolve("my-notes.txt")));
    }

    @Test
    void theWorkingFolderItsParentsTheHomeAndTheRootAreNeverReplaced() {
        for (Path p : List.of(Path.of(""), Path.of("."), Path.of(".."), Path.of(System.getProperty("user.home")),
                Path.of("/"))) {
            InputException e = assertThrows(InputException.class, () -> open(p, true), p.toString());
            assertEquals(Messages.OUTPUT_NOT_REPLACEABLE, e.key(), e.getMessage());
            assertTrue(e.getMessage().contains("never replaces"), e.getMessage());
        }
    }

    @Test
    void impossibleOutputPathsAreRefusedBeforeAnythingIsWritten() throws IOException {
        Path dangling = Files.createSymbolicLink(dir.resolve("dangling"), dir.resolve("nowhere"));
        InputException link = assertThrows(InputException.class, () -> open(dangling, false));
        assertTrue(link.getMessage().contains("dangling symbolic link"), link.getMessage());
        Path file = Files.writeString(dir.resolve("table.csv"), "x\n");
        InputException notFolder = assertThrows(InputException.class, () -> open(file, true));
        assertTrue(notFolder.getMessage().contains("not a folder"), notFolder.getMessage());
        Path folder = Files.createDirectories(dir.resolve("folder"));
        InputException notFile = assertThrows(InputException.class,
                () -> AtomicOutput.reserveFile(folder, true, new RunInputs(), "species", "point"));
        assertTrue(notFile.getMessage().contains("it is a folder"), notFile.getMessage());
        InputException under = assertThrows(InputException.class, () -> open(file.resolve("sub"), false));
        assertTrue(under.getMessage().contains("is not a folder"), under.getMessage());
        assertEquals(List.of("dangling", "folder", "table.csv"), names(dir));
    }

    @Test
    void aSecondWriterIsRefusedAtOnceNamingTheHolder() throws Exception {
        Path target = dir.resolve("shared");
        try (RunFolder first = open(target, false)) {
            Thread second = new Thread(() -> {
                InputException e = assertThrows(InputException.class, () -> open(target, true));
                assertEquals(Messages.OUTPUT_LOCKED, e.key(), e.getMessage());
                assertTrue(e.getMessage().contains("process " + ProcessHandle.current().pid()), e.getMessage());
            });
            final Throwable[] failure = new Throwable[1];
            second.setUncaughtExceptionHandler((t, x) -> failure[0] = x);
            second.start();
            second.join(10_000);
            if (failure[0] != null) {
                throw new AssertionError(failure[0]);
            }
            first.writeText("a.csv", "first\n");
            first.commit();
        }
        assertEquals("first\n", Files.readString(target.resolve("a.csv")));
        finishedRun(target, true, "b.csv"); // the lock is released with the first run
    }

    @Test
    void aStaleLockOfADeadProcessIsNamedNotTaken() throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process gone = new ProcessBuilder(java, "-version").redirectErrorStream(true).start();
        gone.getInputStream().readAllBytes();
        assertTrue(gone.waitFor(30, TimeUnit.SECONDS));
        Path target = dir.resolve("run");
        Path lock = OutputLock.lockFile(target);
        Files.writeString(lock, "pid=" + gone.pid() + "\nhost=" + OutputLock.host() + "\ncommand=survey\nstarted=then\n",
                StandardCharsets.UTF_8);
        InputException e = assertThrows(InputException.class, () -> open(target, false));
        assertEquals(Messages.OUTPUT_LOCK_STALE, e.key(), e.getMessage());
        assertTrue(e.getMessage().contains("process " + gone.pid()) && e.getMessage().contains("no longer running")
                && e.getMessage().contains("delete " + lock), e.getMessage());
        assertTrue(Files.exists(lock), "a stale lock is never taken over silently");
        Files.delete(lock);
        finishedRun(target, false, "a.csv");
    }

    @Test
    void aLockBeingCreatedCountsAsHeld() throws IOException {
        Path target = dir.resolve("run");
        Files.writeString(OutputLock.lockFile(target), "");
        InputException e = assertThrows(InputException.class, () -> open(target, false));
        assertEquals(Messages.OUTPUT_LOCKED, e.key(), e.getMessage());
    }

    @Test
    void writeFailuresNameTheFinalPathNotTheHiddenOne() throws IOException {
        Path target = dir.resolve("run");
        try (RunFolder run = open(target, false)) {
            AtomicOutput.deleteQuietly(run.workingFolder());
            Files.writeString(run.workingFolder(), "a file where the folder was");
            OutputWriteException e = assertThrows(OutputWriteException.class, () -> run.writeText("a.csv", "x"));
            assertTrue(e.getMessage().startsWith("cannot write " + target.resolve("a.csv")), e.getMessage());
            assertFalse(e.getMessage().contains(".partial"), e.getMessage());
            Files.delete(run.workingFolder());
        }
    }

    @Test
    void inputsMustBeUtf8AndTheBadLineIsNamed() throws IOException {
        Path file = dir.resolve("zones.csv");
        Files.write(file, new byte[] {'z', 'o', 'n', 'e', '\n', 'a', '\n', 'b', (byte) 0xFF, '\n'});
        InputException e = assertThrows(InputException.class, () -> new RunInputs().add(file, "feeding zones"));
        assertEquals(file + ": line 3: byte 0xFF is not UTF-8 text; accepted: UTF-8 text (save the file as UTF-8;"
                + " plain ASCII is UTF-8)", e.getMessage());
        StringBuilder big = new StringBuilder();
        for (int i = 1; i < 20_000; i++) {
            big.append(i % 7 == 0 ? "r\u00e9gion " : "row ").append(i).append('\n');
        }
        Path far = dir.resolve("far.csv");
        byte[] head = big.toString().getBytes(StandardCharsets.UTF_8);
        Files.write(far, head);
        Files.write(far, new byte[] {'x', (byte) 0xC3, '\n'}, java.nio.file.StandardOpenOption.APPEND);
        InputException farError = assertThrows(InputException.class, () -> new RunInputs().add(far, "catalogue"));
        assertTrue(farError.getMessage().startsWith(far + ": line 20000: byte 0xC3 is not UTF-8 text"),
                farError.getMessage());
        Path fine = Files.writeString(dir.resolve("ok.csv"), "\uFEFFzone,\u00e9\n");
        assertEquals(1, new RunInputs().add(fine, "zones").files().size());
    }

    @Test
    void echoedValuesAreCutTo80Characters() {
        String huge = "7".repeat(20_000_000);
        String message = InputException.atOption("--T-K", huge, "not a number", "a number").getMessage();
        assertTrue(message.length() < 200, message.length() + " characters");
        assertTrue(message.contains("7".repeat(80) + "... (20000000 characters)"), message);
    }
}
