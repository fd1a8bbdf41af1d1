package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
}
