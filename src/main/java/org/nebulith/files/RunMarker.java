package org.nebulith.files;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.TreeSet;
import java.util.stream.Stream;

/**
 * The small marker file {@value #FILE} that every finished run folder carries: the tool, its
 * version, the command, the start time and the list of files the run wrote. {@code --force} replaces
 * a folder only if it carries the marker and holds nothing but the files listed there, so a user's
 * own folder, or a file a user added to an earlier run, is never lost.
 *
 * @param command the sub-command, e.g. {@code sequence}
 * @param version the tool version
 * @param started when the run started
 */
public record RunMarker(String command, String version, Instant started) {

    /** The marker's file name inside a run folder. */
    public static final String FILE = ".nebulith-run";

    /** The tool name written in the marker. */
    static final String TOOL = "nebulith";

    private static final String FILE_KEY = "file";

    /**
     * @param command the sub-command
     * @param version the tool version
     * @return a marker for a run starting now
     */
    public static RunMarker now(final String command, final String version) {
        return new RunMarker(command, version, Instant.now());
    }

    /**
     * Writes the marker into a finished run folder, listing every file in it.
     *
     * @param folder the folder (the run's working folder, before it is renamed into place)
     * @throws IOException if it cannot be written
     */
    void writeInto(final Path folder) throws IOException {
        StringBuilder text = new StringBuilder("# a run folder written by nebulith; 'nebulith ... --force' may replace"
                + " it as long as it holds only the files listed here\n");
        text.append("tool = ").append(TOOL).append('\n');
        text.append("version = ").append(version).append('\n');
        text.append("command = ").append(command).append('\n');
        text.append("started = ").append(started).append('\n');
        for (String name : filesIn(folder)) {
            text.append(FILE_KEY).append(" = ").append(name).append('\n');
        }
        Files.writeString(folder.resolve(FILE), text, StandardCharsets.UTF_8);
    }

    /**
     * Why a folder may not be replaced by {@code --force}.
     *
     * @param folder an existing folder
     * @return empty if it is a finished run of this tool holding only its own files, else the reason
     */
    static Optional<String> whyNotReplaceable(final Path folder) {
        Path marker = folder.resolve(FILE);
        if (!Files.isRegularFile(marker, LinkOption.NOFOLLOW_LINKS)) {
            return Optional.of("it has no " + FILE + " marker, so it is not a run folder written by nebulith");
        }
        List<String> listed = new ArrayList<>();
        boolean ours = false;
        try {
            for (String line : Files.readAllLines(marker, StandardCharsets.UTF_8)) {
                String[] kv = line.split("=", 2);
                if (kv.length == 2 && kv[0].strip().equals("tool")) {
                    ours = kv[1].strip().equals(TOOL);
                } else if (kv.length == 2 && kv[0].strip().equals(FILE_KEY)) {
                    listed.add(kv[1].strip());
                }
            }
            if (!ours) {
                return Optional.of("its " + FILE + " marker does not name nebulith");
            }
            List<String> foreign = new ArrayList<>(filesIn(folder));
            foreign.removeAll(listed);
            if (!foreign.isEmpty()) {
                return Optional.of("it holds " + foreign.size() + " file(s) that the earlier run did not write ("
                        + String.join(", ", foreign.subList(0, Math.min(3, foreign.size())))
                        + (foreign.size() > 3 ? ", ..." : "") + ")");
            }
        } catch (IOException | UncheckedIOException e) {
            return Optional.of("its contents cannot be read (" + e.getClass().getSimpleName() + ")");
        }
        return Optional.empty();
    }

    /** @return the relative paths ('/'-separated) of every file and link under the folder, but the marker */
    private static TreeSet<String> filesIn(final Path folder) throws IOException {
        TreeSet<String> names = new TreeSet<>();
        try (Stream<Path> walk = Files.walk(folder)) {
            walk.filter(p -> !Files.isDirectory(p, LinkOption.NOFOLLOW_LINKS))
                    .map(p -> folder.relativize(p).toString().replace('\\', '/'))
                    .filter(name -> !name.equals(FILE))
                    .forEach(names::add);
        }
        return names;
    }
}
