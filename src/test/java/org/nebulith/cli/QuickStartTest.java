package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;

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
}
