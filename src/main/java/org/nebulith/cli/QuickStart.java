package org.nebulith.cli;

import java.util.List;

/**
 * JVM setting of the launchers for the commands that run once and briefly. Their fresh JVM spends
 * more time compiling (the optimising compiler's threads share the cores with the run) than the
 * optimised code saves, so the launchers start them with the quick compiler only. Measured with
 * {@code bench --commands} on the 2-core development machine: the default {@code sequence} 3.2 to 1.8 s,
 * the default {@code planet} 5.0 to 3.3-3.8 s. Surveys and benchmarks keep both compilers (the warm
 * engine step is 110 against 190 us with the quick compiler alone). {@code NEBULITH_JAVA_OPTS} comes
 * after this flag, so a user's own setting wins.
 */
final class QuickStart {
    /** The JVM flag: tiered compilation stops at the quick (C1) compiler. */
    static final String FLAG = "-XX:TieredStopAtLevel=1";
    /** The commands that get it (the first argument of the launcher). */
    static final List<String> COMMANDS = List.of("point", "sequence", "planet", "interior", "measured");

    private QuickStart() {
    }

    /** @param command the command's name @return the JVM flags the launchers add for it */
    static List<String> jvmFlags(final String command) {
        return COMMANDS.contains(command) ? List.of(FLAG) : List.of();
    }
}
