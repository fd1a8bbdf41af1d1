package org.nebulith.cli;

import java.nio.file.Path;

import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;
import org.nebulith.files.AtomicOutput;

import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/**
 * Where a run that writes a folder writes: {@code --out DIR}, else {@code reports/<run-name>/}
 * (default run name: {@link DefaultRunName}); {@code --force} to replace an existing output; and the
 * {@code --preset} that supplied default settings. Mixed into every command that writes a run folder.
 */
public final class RunOptions implements OutputTarget {

    /** The folder under which run folders go by default. */
    public static final Path REPORTS = Path.of("reports");

    @Option(names = "--out", paramLabel = "PATH",
            description = "Output folder. Default: reports/<command>-<yyyyMMdd-HHmmss>/ (UTC start time).")
    private Path out;

    @Option(names = "--run-name", paramLabel = "NAME",
            description = "Name of the run folder under reports/ instead of the default (letters, digits, '.', '_', '-').")
    private String runName;

    @Option(names = "--force", description = "Replace an existing output folder or file (never an input).")
    private boolean force;

    @Mixin
    private PresetOption preset;

    @Override
    public boolean force() {
        return force;
    }

    @Override
    public Path out() {
        return out;
    }

    @Override
    public String runName() {
        return runName;
    }


    /**
     * @param defaultRunName the run name the command chooses when none is given
     * @return --out if given, else {@code reports/<run-name>}
     * @throws InputException if the run name is not a plain name
     */
    public static Path outputFolder(final OutputTarget target, final String defaultRunName) {
        if (target.out() != null) {
            return target.out();
        }
        String name = target.runName() == null ? defaultRunName : target.runName();
        if (!AtomicOutput.SAFE_NAME.matcher(name).matches()) {
            throw new InputException(Messages.BAD_OUTPUT_NAME, null, name, AtomicOutput.SAFE_NAME_TEXT);
        }
        return REPORTS.resolve(name);
    }
}
