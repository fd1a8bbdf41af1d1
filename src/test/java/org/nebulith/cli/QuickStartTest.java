package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Both launchers give the quick-start flag to exactly the commands of {@link QuickStart}, and those exist. */
class QuickStartTest {

    @Test
    void thePosixLauncherListsTheSameCommandsAndFlag() throws IOException {
        String sh = Files.readString(Path.of("src/main/launcher/nebulith"));
        String line = sh.lines().filter(l -> l.contains(") quick=")).findFirst().orElseThrow();
        List<String> names = Arrays.asList(line.strip().substring(0, line.strip().indexOf(')')).split("\\|"));
        assertEquals(QuickStart.COMMANDS, names);
        assertTrue(line.contains("quick=" + QuickStart.FLAG), line);
        assertTrue(sh.contains("exec \"$java\" $quick ${NEBULITH_JAVA_OPTS:-} -jar"), "the user's options come after it");
    }

    @Test
    void theWindowsLauncherListsTheSameCommandsAndFlag() throws IOException {
        String cmd = Files.readString(Path.of("src/main/launcher/nebulith.cmd"));
        String line = cmd.lines().filter(l -> l.startsWith("for %%c in (")).findFirst().orElseThrow();
        List<String> names = Arrays.asList(line.substring("for %%c in (".length(), line.indexOf(')')).split(" "));
        assertEquals(QuickStart.COMMANDS, names);
        assertTrue(line.contains("NEBULITH_QUICK=" + QuickStart.FLAG), line);
        assertTrue(cmd.contains("%NEBULITH_QUICK% %NEBULITH_JAVA_OPTS% -jar"), "the user's options come after it");
    }

    @Test
    void everyQuickCommandIsACommand() {
        var sink = new java.io.PrintStream(new java.io.ByteArrayOutputStream(), true, java.nio.charset.StandardCharsets.UTF_8);
        var spec = Main.commandLine(sink, sink, new java.io.PrintWriter(sink, true)).getSubcommands();
        for (String c : QuickStart.COMMANDS) {
            assertTrue(spec.containsKey(c), c);
        }
        assertEquals(List.of(QuickStart.FLAG), QuickStart.jvmFlags("sequence"));
        assertEquals(List.of(), QuickStart.jvmFlags("survey"));
    }

    /** The command is found after options too, as Main finds it: '--quiet sequence' starts quick. */
    @Test
    void thePosixLauncherFindsTheCommandAfterOptions(@TempDir final Path dir) throws Exception {
        assumeTrue(Files.isExecutable(Path.of("/bin/sh")), "needs a POSIX shell");
        Files.copy(Path.of("src/main/launcher/nebulith"), dir.resolve("nebulith"));
        Files.writeString(dir.resolve("nebulith.jar"), "");
        Path java = dir.resolve("jdk/bin/java");
        Files.createDirectories(java.getParent());
        Files.writeString(java, "#!/bin/sh\nprintf '%s\\n' \"$@\"\n");
        assertTrue(java.toFile().setExecutable(true));
        assertEquals(List.of(QuickStart.FLAG, "-jar"), jvmArguments(dir, "--quiet", "sequence", "--out", "x"));
        assertEquals(List.of(QuickStart.FLAG, "-jar"), jvmArguments(dir, "planet"));
        assertEquals(List.of("-jar"), jvmArguments(dir, "--quiet", "survey", "planet"));
        assertEquals(List.of("-jar"), jvmArguments(dir, "--version"));
    }

    /** @return the arguments the launcher gives java before the jar's path */
    private static List<String> jvmArguments(final Path dir, final String... args) throws Exception {
        List<String> cmd = new java.util.ArrayList<>(List.of("/bin/sh", dir.resolve("nebulith").toString()));
        cmd.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(cmd).redirectErrorStream(true);
        pb.environment().put("JAVA_HOME", dir.resolve("jdk").toString());
        pb.environment().remove("NEBULITH_JAVA_OPTS");
        Process p = pb.start();
        List<String> lines = new String(p.getInputStream().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8)
                .lines().toList();
        assertEquals(0, p.waitFor(), String.join("\n", lines));
        return lines.subList(0, lines.indexOf("-jar") + 1);
    }
}
