package org.nebulith.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * JVM settings of the launchers for the commands that run once and briefly. Their fresh JVM spends
 * more time compiling (the optimising compiler's threads share the cores with the run) than the
 * optimised code saves, so the launchers start them with the quick compiler only. Measured with
 * {@code bench --commands} on the 2-core development machine: the default {@code sequence} 3.2 to 1.8 s,
 * the default {@code planet} 5.0 to 3.3-3.8 s. Surveys and benchmarks keep both compilers (the warm
 * engine step is 110 against 190 us with the quick compiler alone). The brief commands also use the
 * serial collector (no concurrent collector threads beside a run of a few hundred MB; alternating
 * runs on the same machine: {@code sequence} median 1.48 against 1.52 s, {@code planet} 1.82 against
 * 1.93 s), unless the user's JVM options name a collector, since two collectors stop the JVM.
 * {@code NEBULITH_JAVA_OPTS} comes after these flags, so a user's own setting wins. The POSIX launcher
 * also maps the class archive that {@code mvn package} leaves beside the jar ({@link #ARCHIVE}; see
 * {@link #classArchive}).
 */
final class QuickStart {
    /** The JVM flag: tiered compilation stops at the quick (C1) compiler. */
    static final String FLAG = "-XX:TieredStopAtLevel=1";
    /** The collector of the brief commands. */
    static final String GC_FLAG = "-XX:+UseSerialGC";
    /** The commands that get them (the first argument of the launcher that is not an option). */
    static final List<String> COMMANDS = List.of("point", "sequence", "planet", "interior", "measured");
    /** Environment variables whose JVM options the launchers read for a collector of the user's. */
    static final List<String> OPTION_VARIABLES = List.of("NEBULITH_JAVA_OPTS", "JDK_JAVA_OPTIONS", "JAVA_TOOL_OPTIONS");

    /** File name of the class archive beside the jar (made by {@code mvn package}, see pom.xml). */
    static final String ARCHIVE = "nebulith.jsa";
    /** File beside it naming the jar and the java it was made for, a line each. */
    static final String ARCHIVE_FOR = ARCHIVE + ".for";

    private QuickStart() {
    }

    /**
     * The class archive for a run of the jar with this java, as the POSIX launcher decides it: the
     * archive and its {@link #ARCHIVE_FOR} file sit beside the jar, the archive is newer than the jar,
     * and both the jar and the java are the files it was made for. A JVM that refuses an archive
     * drops the JDK's own one too and starts slower than with none, hence the checks.
     *
     * @param jar  the jar to run
     * @param java the java executable
     * @return the JVM flag and the jar named as when the archive was made (the JVM compares the name),
     *         or empty
     */
    static Optional<Archive> classArchive(final Path jar, final Path java) {
        Path archive = jar.resolveSibling(ARCHIVE);
        Path madeFor = jar.resolveSibling(ARCHIVE_FOR);
        try {
            if (!Files.isRegularFile(archive) || !Files.isRegularFile(madeFor)
                    || Files.getLastModifiedTime(archive).compareTo(Files.getLastModifiedTime(jar)) <= 0) {
                return Optional.empty();
            }
            List<String> lines = Files.readAllLines(madeFor);
            if (lines.size() < 2 || !sameFile(Path.of(lines.get(0)), jar) || !sameFile(Path.of(lines.get(1)), java)) {
                return Optional.empty();
            }
            return Optional.of(new Archive("-XX:SharedArchiveFile=" + archive, Path.of(lines.get(0))));
        } catch (IOException | java.nio.file.InvalidPathException e) {
            return Optional.empty();
        }
    }

    private static boolean sameFile(final Path a, final Path b) throws IOException {
        return Files.exists(a) && Files.exists(b) && Files.isSameFile(a, b);
    }

    /**
     * @param flag the JVM flag that maps the archive
     * @param jar  the jar, named as when the archive was made
     */
    record Archive(String flag, Path jar) {
    }

    /**
     * @param command the command's name
     * @param env     the environment (the launcher's variables)
     * @return the JVM flags the launchers add for it
     */
    static List<String> jvmFlags(final String command, final Map<String, String> env) {
        if (!COMMANDS.contains(command)) {
            return List.of();
        }
        boolean ownCollector = OPTION_VARIABLES.stream().map(env::get).anyMatch(v -> v != null && v.contains("GC"));
        return ownCollector ? List.of(FLAG) : List.of(FLAG, GC_FLAG);
    }
}
