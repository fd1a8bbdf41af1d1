package org.nebulith.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.Arrays;
import java.util.List;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Both launchers give the quick-start flags to exactly the commands of {@link QuickStart}, and those exist. */
class QuickStartTest {

    @Test
    void thePosixLauncherListsTheSameCommandsAndFlag() throws IOException {
        String sh = Files.readString(Path.of("src/main/launcher/nebulith"));
        String line = sh.lines().filter(l -> l.contains(") quick=")).findFirst().orElseThrow();
        List<String> names = Arrays.asList(line.strip().substring(0, line.strip().indexOf(')')).split("\\|"));
        assertEquals(QuickStart.COMMANDS, names);
        assertTrue(line.contains("quick=" + QuickStart.FLAG), line);
        assertTrue(sh.contains("gc=" + QuickStart.GC_FLAG), "the same collector");
        assertTrue(sh.contains("exec \"$java\" $quick $gc ${share:+\"$share\"} ${NEBULITH_JAVA_OPTS:-} -jar"),
                "the user's options come after them");
        assertTrue(sh.contains("archive=$here/" + QuickStart.ARCHIVE) && sh.contains("\"$archive.for\""),
                "the launcher and QuickStart name the same archive");
        String pom = Files.readString(Path.of("pom.xml"));
        assertTrue(pom.contains("<arg line=\"" + QuickStart.FLAG + " " + QuickStart.GC_FLAG + " "),
                "the class archive's training runs use the same flags");
        assertTrue(pom.contains("${project.build.directory}/" + QuickStart.ARCHIVE + "\""), "and the same file name");
    }

    @Test
    void theWindowsLauncherListsTheSameCommandsAndFlag() throws IOException {
        String cmd = Files.readString(Path.of("src/main/launcher/nebulith.cmd"));
        String line = cmd.lines().filter(l -> l.startsWith("for %%c in (")).findFirst().orElseThrow();
        List<String> names = Arrays.asList(line.substring("for %%c in (".length(), line.indexOf(')')).split(" "));
        assertEquals(QuickStart.COMMANDS, names);
        assertTrue(line.contains("NEBULITH_QUICK=" + QuickStart.FLAG), line);
        assertTrue(cmd.contains("NEBULITH_GC=" + QuickStart.GC_FLAG), "the same collector");
        assertTrue(cmd.contains("%NEBULITH_QUICK% %NEBULITH_GC% %NEBULITH_JAVA_OPTS% -jar"), "the user's options come after them");
    }

    @Test
    void everyQuickCommandIsACommand() {
        var sink = new java.io.PrintStream(new java.io.ByteArrayOutputStream(), true, java.nio.charset.StandardCharsets.UTF_8);
        var spec = Main.commandLine(sink, sink, new java.io.PrintWriter(sink, true)).getSubcommands();
        for (String c : QuickStart.COMMANDS) {
            assertTrue(spec.containsKey(c), c);
        }
        assertEquals(List.of(QuickStart.FLAG, QuickStart.GC_FLAG), QuickStart.jvmFlags("sequence", java.util.Map.of()));
        assertEquals(List.of(QuickStart.FLAG), QuickStart.jvmFlags("sequence", java.util.Map.of("JDK_JAVA_OPTIONS", "-XX:+UseZGC")),
                "a collector of the user's is kept (two stop the JVM)");
        assertEquals(List.of(), QuickStart.jvmFlags("survey", java.util.Map.of()));
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
        List<String> quick = List.of(QuickStart.FLAG, QuickStart.GC_FLAG, "-jar");
        assertEquals(quick, jvmArguments(dir, null, "--quiet", "sequence", "--out", "x"));
        assertEquals(quick, jvmArguments(dir, null, "planet"));
        assertEquals(List.of("-jar"), jvmArguments(dir, null, "--quiet", "survey", "planet"));
        assertEquals(List.of("-jar"), jvmArguments(dir, null, "--version"));
        assertEquals(List.of(QuickStart.FLAG, "-XX:+UseG1GC", "-jar"), jvmArguments(dir, "-XX:+UseG1GC", "planet"),
                "a collector of the user's replaces the serial one");
    }

    /**
     * The class archive is mapped only for a quick command, when it is newer than the jar and was
     * made for this jar and this java; the jar is then named as the archive's file says.
     */
    @Test
    void thePosixLauncherMapsTheClassArchiveMadeForItsJarAndJava(@TempDir final Path dir) throws Exception {
        assumeTrue(Files.isExecutable(Path.of("/bin/sh")), "needs a POSIX shell");
        Files.copy(Path.of("src/main/launcher/nebulith"), dir.resolve("nebulith"));
        Path jar = dir.resolve("nebulith.jar");
        Files.writeString(jar, "");
        Path java = dir.resolve("jdk/bin/java");
        Files.createDirectories(java.getParent());
        Files.writeString(java, "#!/bin/sh\nprintf '%s\\n' \"$@\"\n");
        assertTrue(java.toFile().setExecutable(true));
        Path archive = dir.resolve(QuickStart.ARCHIVE);
        Files.writeString(archive, "");
        Files.setLastModifiedTime(jar, FileTime.fromMillis(System.currentTimeMillis() - 60_000));
        // named through a link, as a build folder reached by another path would be
        Path link = Files.createSymbolicLink(dir.resolve("same-jar.jar"), jar);
        Files.writeString(dir.resolve(QuickStart.ARCHIVE_FOR), link + "\n" + java + "\n");
        String flag = "-XX:SharedArchiveFile=" + archive;
        assertEquals(List.of(QuickStart.FLAG, QuickStart.GC_FLAG, flag, "-jar", link.toString()),
                jvmArguments(dir, null, true, "sequence"));
        assertEquals(List.of("-jar", jar.toString()), jvmArguments(dir, null, true, "survey"), "only the brief commands");
        assertEquals(new QuickStart.Archive(flag, link), QuickStart.classArchive(jar, java).orElseThrow(),
                "the benchmark decides as the launcher does");

        Files.writeString(dir.resolve(QuickStart.ARCHIVE_FOR), jar + "\n" + dir.resolve("nebulith") + "\n");
        assertEquals(List.of(QuickStart.FLAG, QuickStart.GC_FLAG, "-jar", jar.toString()),
                jvmArguments(dir, null, true, "sequence"), "made for another java");
        assertTrue(QuickStart.classArchive(jar, java).isEmpty());

        Files.writeString(dir.resolve(QuickStart.ARCHIVE_FOR), jar + "\n" + java + "\n");
        Files.setLastModifiedTime(jar, FileTime.fromMillis(System.currentTimeMillis() + 60_000));
        assertEquals(List.of(QuickStart.FLAG, QuickStart.GC_FLAG, "-jar", jar.toString()),
                jvmArguments(dir, null, true, "sequence"), "a jar rebuilt after the archive");
        assertTrue(QuickStart.classArchive(jar, java).isEmpty());
    }

    private static List<String> jvmArguments(final Path dir, final String opts, final String... args) throws Exception {
        return jvmArguments(dir, opts, false, args);
    }

    /**
     * @param withJar also the jar's path that follows {@code -jar}
     * @return the arguments the launcher gives java before the jar's path, with NEBULITH_JAVA_OPTS = opts
     */
    private static List<String> jvmArguments(final Path dir, final String opts, final boolean withJar,
                                             final String... args) throws Exception {
        List<String> cmd = new java.util.ArrayList<>(List.of("/bin/sh", dir.resolve("nebulith").toString()));
        cmd.addAll(List.of(args));
        ProcessBuilder pb = new ProcessBuilder(cmd).redirectErrorStream(true);
        pb.environment().put("JAVA_HOME", dir.resolve("jdk").toString());
        QuickStart.OPTION_VARIABLES.forEach(pb.environment()::remove);
        if (opts != null) {
            pb.environment().put("NEBULITH_JAVA_OPTS", opts);
        }
        Process p = pb.start();
        List<String> lines = new String(p.getInputStream().readAllBytes(), java.nio.charset.StandardCharsets.UTF_8)
                .lines().toList();
        assertEquals(0, p.waitFor(), String.join("\n", lines));
        return lines.subList(0, lines.indexOf("-jar") + (withJar ? 2 : 1));
    }
}
