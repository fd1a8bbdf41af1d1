package org.nebulith.cli;

import java.nio.file.Path;

import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;
import org.nebulith.files.AtomicOutput;

import picocli.CommandLine.Option;

/**
 * Where a run writes: {@code --out DIR} (or, for single-table commands, a file), else
 * {@code reports/<run-name>/}; {@code --force} to replace an existing output; and the
 * {@code --preset} that supplied default settings. Mixed into every {@link RunCommand}.
 */
public final class RunOptions {

    /** The folder under which run folders go by default. */
    public static final Path REPORTS = Path.of("reports");

    @Option(names = "--out", paramLabel = "PATH",
            description = "Output folder (or file, for commands that write one table). Default: reports/<run-name>/.")
    private Path out;

    @Option(names = "--run-name", paramLabel = "NAME",
            description = "Name of the run folder under reports/ (letters, digits, '.', '_', '-').")
    private String runName;

    @Option(names = "--force", description = "Replace an existing output folder or file (never an input).")
    private boolean force;

    @Option(names = PresetDefaults.OPTION, paramLabel = "NAME|FILE",
            description = "Run settings from presets/NAME.settings or FILE; options on the command line override them.")
    private String preset;

    /** @return whether existing outputs may be replaced */
    public boolean force() {
        return force;
    }

    /** @return the --out value, or null */
    public Path out() {
        return out;
    }

    /** @return the --preset value, or null */
    public String preset() {
        return preset;
    }

    /**
     * @param defaultRunName the run name the command chooses when none is given
     * @return --out if given, else {@code reports/<run-name>}
     * @throws InputException if the run name is not a plain name
     */
    public Path outputFolder(final String defaultRunName) {
        if (out != null) {
            return out;
        }
        String name = runName == null ? defaultRunName : runName;
        if (!AtomicOutput.SAFE_NAME.matcher(name).matches()) {
            throw new InputException(Messages.BAD_OUTPUT_NAME, null, name, AtomicOutput.SAFE_NAME_TEXT);
        }
        return REPORTS.resolve(name);
    }
}
