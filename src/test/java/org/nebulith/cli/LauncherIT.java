package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.DisabledOnOs;
import org.junit.jupiter.api.condition.OS;

/**
 * After {@code mvn package}: the launchers sit beside the jar in target/, the POSIX one is
 * executable and runs the jar from another working folder (as on PATH). Run by failsafe in
 * {@code mvn verify}.
 */
class LauncherIT {
    private static final Path TARGET = Path.of("target").toAbsolutePath();

    @Test
    void bothLaunchersSitBesideTheJar() {
        assertTrue(Files.isRegularFile(TARGET.resolve("nebulith.jar")), "target/nebulith.jar");
        assertTrue(Files.isRegularFile(TARGET.resolve("nebulith")), "target/nebulith");
        assertTrue(Files.isRegularFile(TARGET.resolve("nebulith.cmd")), "target/nebulith.cmd");
    }

    @Test
    @DisabledOnOs(OS.WINDOWS)
    void posixLauncherPrintsTheVersionFromAnyFolder() throws IOException, InterruptedException {
        Path launcher = TARGET.resolve("nebulith");
        assertTrue(Files.isExecutable(launcher), "target/nebulith is executable");
        Path elsewhere = Files.createTempDirectory("nebulith-launcher");
        Process p = new ProcessBuilder(launcher.toString(), "--version").directory(elsewhere.toFile())
                .redirectErrorStream(true).start();
        assertTrue(p.waitFor(60, TimeUnit.SECONDS), "launcher finished");
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
        assertEquals(0, p.exitValue(), out);
        // the version the pom gives the jar (failsafe passes it as nebulith.version)
        assertTrue(out.startsWith("nebulith " + System.getProperty("nebulith.version", "") + "\n")
                || out.startsWith("nebulith " + System.getProperty("nebulith.version", "") + "\r"), out);
        Files.delete(elsewhere);
    }

    /**
     * {@code mvn package} left a class archive that the launcher maps for a brief command: our own
     * classes come from it ("shared objects file" in the JVM's class-loading log), not from the jar.
     */
    @Test
    @DisabledOnOs(OS.WINDOWS)
    void posixLauncherMapsTheClassArchiveOfTheBuild() throws IOException, InterruptedException {
        assumeFalse(Boolean.getBoolean("classArchive.skip"), "built with -DclassArchive.skip");
        assertTrue(Files.isRegularFile(TARGET.resolve(QuickStart.ARCHIVE)) && Files.isRegularFile(TARGET.resolve(
                QuickStart.ARCHIVE_FOR)), "target/" + QuickStart.ARCHIVE + " and its .for file (if missing: "
                + "target/class-archive/training.log and dump.log)");
        Path elsewhere = Files.createTempDirectory("nebulith-launcher");
        ProcessBuilder pb = new ProcessBuilder(TARGET.resolve("nebulith").toString(), "point", "--help")
                .directory(elsewhere.toFile()).redirectErrorStream(true);
        pb.environment().put("NEBULITH_JAVA_OPTS", "-Xlog:class+load=info");
        Process p = pb.start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(p.waitFor(60, TimeUnit.SECONDS), "launcher finished");
        assertEquals(0, p.exitValue(), out);
        String mainLine = out.lines().filter(l -> l.contains(" " + Main.class.getName() + " ")).findFirst().orElse("");
        assertTrue(mainLine.contains("source: shared objects file"), "Main from the archive: " + mainLine);
        Files.delete(elsewhere);
    }
}
