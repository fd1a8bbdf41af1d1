package org.nebulith.cli;

import java.util.List;
import java.util.Map;

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
 * {@code NEBULITH_JAVA_OPTS} comes after these flags, so a user's own setting wins.
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

    private QuickStart() {
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
