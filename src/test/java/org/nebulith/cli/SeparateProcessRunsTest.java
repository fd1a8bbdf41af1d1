package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.nebulith.files.OutputLock;

/**
 * Runs of the real command line in separate JVMs: outputs next to or above the working folder
 * (which only a child process can have in a scratch folder), two processes writing one output at
 * once, and the stale lock of a killed process.
 */
class SeparateProcessRunsTest {

    @TempDir
    Path dir;

    /** A finished child run. */
    private record Outcome(int code, String err) {
    }

    private Process start(final Path cwd, final String... args) throws IOException {
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", System.getProperty("java.class.path"), Main.class.getName()));
        command.addAll(List.of(args));
        return new ProcessBuilder(command).directory(cwd.toFile()).redirectOutput(ProcessBuilder.Redirect.DISCARD)
                .start();
    }

    private static Outcome finish(final Process p) throws Exception {
        String err = new String(p.getErrorStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(300, TimeUnit.SECONDS), "child finished");
        return new Outcome(p.exitValue(), err);
    }

    private Outcome run(final Path cwd, final String... args) throws Exception {
        return finish(start(cwd, args));
    }

    @Test
    void forceNeverReplacesTheWorkingFolderOrAFolderAboveIt() throws Exception {
        Path home = dir.resolve("home");
        Path work = Files.createDirectories(home.resolve("work"));
        Path precious = Files.writeString(home.resolve("precious.txt"), "keep\n");
        for (String out : List.of(home.toString(), ".", "..")) {
            Outcome o = run(work, "sequence", "--T-step-K", "50", "--out", out, "--force");
            assertEquals(2, o.code(), o.err());
            assertTrue(o.err().contains("refusing to replace it: it is ") && o.err().contains("which a run never replaces"),
                    o.err());
            assertEquals(1, o.err().strip().lines().count(), o.err());
        }
        assertEquals("keep\n", Files.readString(precious));
        assertEquals(List.of("precious.txt", "work"), names(home));
        assertEquals(List.of(), names(work));
    }

    @Test
    void twoPointRunsOnOneFileWithoutForceNeverBothSucceed() throws Exception {
        for (int attempt = 0; attempt < 3; attempt++) {
            Path file = dir.resolve("state-" + attempt + ".csv");
            String[] args = {"point", "--T-K", "1500", "--P-bar", "1e-4", "--out", file.toString()};
            Process a = start(dir, args);
            Process b = start(dir, args);
            Outcome first = finish(a);
            Outcome second = finish(b);
            List<Integer> codes = new ArrayList<>(List.of(first.code(), second.code()));
            codes.sort(null);
            assertEquals(List.of(0, 2), codes, first.err() + second.err());
            String refused = first.code() == 2 ? first.err() : second.err();
            assertTrue(refused.contains("another nebulith run is writing this output")
                    || refused.contains("output already exists"), refused);
            assertTrue(Files.readString(file).startsWith("species,phase,moles,mole_fraction,state"));
        }
    }

    @Test
    void theLockOfAKilledRunIsNamedAsStaleAndNotTaken() throws Exception {
        Path out = dir.resolve("S");
        Path lock = OutputLock.lockFile(out);
        Process victim = start(dir, "sequence", "--T-step-K", "0.01", "--out", out.toString(), "-q");
        long waited = 0;
        Path partial = dir.resolve(".S.partial-" + victim.pid() + "-1");
        while (!Files.exists(lock) || Files.size(lock) == 0 || !Files.isDirectory(partial)) {
            assertTrue(victim.isAlive() && waited < 120_000, "the run took its lock");
            Thread.sleep(50);
            waited += 50;
        }
        victim.destroyForcibly(); // SIGKILL: no shutdown hook runs, the lock file stays
        assertTrue(victim.waitFor(30, TimeUnit.SECONDS));
        Outcome o = run(dir, "sequence", "--T-step-K", "50", "--out", out.toString());
        assertEquals(2, o.code(), o.err());
        assertTrue(o.err().contains("locked by process " + victim.pid()) && o.err().contains("no longer running")
                && o.err().contains("delete " + lock), o.err());
        assertTrue(o.err().contains(" and " + partial),
                "the hidden folder the killed run left is named too: " + o.err());
        assertTrue(Files.exists(lock), "the stale lock is left for the user to judge");
    }

    private static List<String> names(final Path folder) throws IOException {
        try (var s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
