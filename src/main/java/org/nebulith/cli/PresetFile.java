package org.nebulith.cli;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.regex.Pattern;

import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;

/**
 * A run-settings preset: a UTF-8 text file of {@code key = value} lines.
 *
 * <pre>
 * # Warm disk around the invented star Keroa (demo scenario)
 * description = Keroa b, warm disk, default zones
 * command = planet
 * T-max-K = 2000
 * P-bar = 1e-4
 * </pre>
 *
 * <ul>
 * <li>Keys are the long option names of the command without the leading {@code --}; a value is
 *     written exactly as it would be on the command line (without shell quoting), and runs to the end
 *     of the line with surrounding spaces removed.</li>
 * <li>Blank lines and lines starting with {@code #} are ignored; there are no inline comments.</li>
 * <li>Two keys are reserved: {@code description} (one line shown by {@code nebulith presets}) and
 *     {@code command} (the command the preset is for; running it with another command is refused).</li>
 * <li>A key may appear once. Options given on the command line override the preset.</li>
 * </ul>
 */
public final class PresetFile {

    /** Reserved key: one-line description. */
    public static final String DESCRIPTION = "description";
    /** Reserved key: the command this preset is for. */
    public static final String COMMAND = "command";

    private static final Pattern KEY = Pattern.compile("[A-Za-z][A-Za-z0-9_-]*");

    /**
     * One setting.
     *
     * @param key   the option name without dashes
     * @param value the value text
     * @param line  1-based line number
     */
    public record Entry(String key, String value, int line) {
    }

    private final Path file;
    private final Map<String, Entry> entries;
    private byte[] builtInContent;

    private PresetFile(final Path file, final Map<String, Entry> entries) {
        this.file = file;
        this.entries = entries;
    }

    /**
     * @param entry a built-in settings preset from the {@link PresetCatalogue}
     * @return the parsed preset, named by its shown name
     */
    static PresetFile builtIn(final PresetCatalogue.Entry entry) {
        try {
            PresetFile p = parse(Path.of(entry.shown()), new java.io.StringReader(entry.text()));
            p.builtInContent = entry.content();
            return p;
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    /** @return the content of a built-in preset, or empty for a file */
    java.util.Optional<byte[]> builtInContent() {
        return java.util.Optional.ofNullable(builtInContent);
    }

    /**
     * @param file a preset file
     * @return the parsed preset
     * @throws InputException if it cannot be read or a line is malformed
     */
    public static PresetFile read(final Path file) {
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            return parse(file, in);
        } catch (IOException e) {
            throw new InputException(Messages.INPUT_NOT_READABLE, e, file, InputException.reason(e));
        }
    }

    /**
     * @param file name used in messages
     * @param in   the content
     * @return the parsed preset
     * @throws IOException if reading fails
     */
    static PresetFile parse(final Path file, final Reader in) throws IOException {
        Map<String, Entry> entries = new LinkedHashMap<>();
        BufferedReader lines = new BufferedReader(org.nebulith.format.TextInput.withoutBom(in));
        int number = 0;
        for (String line = lines.readLine(); line != null; line = lines.readLine()) {
            number++;
            String text = line.strip();
            if (text.isEmpty() || text.startsWith("#")) {
                continue;
            }
            Entry entry = parseLine(file, number, text);
            Entry earlier = entries.putIfAbsent(entry.key(), entry);
            if (earlier != null) {
                throw InputException.atField(file, number, entry.key(), entry.value(), "repeated (first given on line "
                        + earlier.line() + ")", "each key once");
            }
        }
        return new PresetFile(file, entries);
    }

    private static Entry parseLine(final Path file, final int number, final String text) {
        int eq = text.indexOf('=');
        if (eq < 0) {
            throw InputException.atField(file, number, "line", text, "no '=' on the line", "key = value, or # comment");
        }
        String key = text.substring(0, eq).strip();
        String value = text.substring(eq + 1).strip();
        if (!KEY.matcher(key).matches()) {
            throw InputException.atField(file, number, "key", key, "not a valid key",
                    "an option name without the leading --, e.g. T-max-K");
        }
        if (value.isEmpty()) {
            throw InputException.atField(file, number, key, value, "empty value", "a value after '='");
        }
        return new Entry(key, value, number);
    }

    /** @return the file as given */
    public Path file() {
        return file;
    }

    /** @return the one-line description, or empty text */
    public String description() {
        Entry d = entries.get(DESCRIPTION);
        return d == null ? "" : d.value();
    }

    /**
     * @param key an option name without dashes
     * @return its entry if the preset sets it
     */
    public Optional<Entry> get(final String key) {
        return Optional.ofNullable(entries.get(key));
    }

    /** @return all entries in file order, reserved keys included */
    public List<Entry> entries() {
        return new ArrayList<>(entries.values());
    }

    /**
     * Checks that every key is a setting of the command being run.
     *
     * @param command  the command name
     * @param accepted the option names (without dashes) a preset may set for it
     * @throws InputException at the first unknown key, or if the preset is for another command
     */
    public void checkFor(final String command, final Collection<String> accepted) {
        for (Entry entry : entries.values()) {
            if (COMMAND.equals(entry.key())) {
                if (!entry.value().equals(command)) {
                    throw InputException.atField(file, entry.line(), COMMAND, entry.value(), "this preset is for the '" + entry.value()
                            + "' command, not '" + command + "'", "nebulith " + entry.value()
                            + " --preset ...");
                }
            } else if (RetiredOptions.byKey(entry.key()).isPresent() && !accepted.contains(entry.key())) {
                RetiredOptions.Renamed r = RetiredOptions.byKey(entry.key()).get();
                throw InputException.atField(file, entry.line(), entry.key(), entry.value(), "renamed", r.now().substring(2)
                        + " (" + r.meaning() + ")");
            } else if (!DESCRIPTION.equals(entry.key()) && !accepted.contains(entry.key())) {
                throw InputException.atField(file, entry.line(), entry.key(), entry.value(), "not a setting of the '" + command
                        + "' command", String.join(", ", accepted));
            }
        }
    }
}
