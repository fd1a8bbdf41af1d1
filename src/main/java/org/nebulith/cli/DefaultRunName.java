package org.nebulith.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;

/**
 * Default names of run folders: {@code <command>-<yyyyMMdd-HHmmss>} of the run's start (UTC), so a
 * second run never meets the first one's folder; {@code -2}, {@code -3}, ... are appended when two
 * runs of one command start within the same second.
 */
final class DefaultRunName {
    private static final DateTimeFormatter STAMP = DateTimeFormatter.ofPattern("yyyyMMdd-HHmmss")
            .withZone(ZoneOffset.UTC);

    private DefaultRunName() {
    }

    /**
     * @param command the sub-command name, e.g. {@code sequence}
     * @param started when the run started
     * @param parent  the folder the run folder goes into (checked for a folder of the same name)
     * @return the run name
     */
    static String of(final String command, final Instant started, final Path parent) {
        String base = command + "-" + STAMP.format(started);
        String name = base;
        for (int n = 2; Files.exists(parent.resolve(name)); n++) {
            name = base + "-" + n;
        }
        return name;
    }
}
