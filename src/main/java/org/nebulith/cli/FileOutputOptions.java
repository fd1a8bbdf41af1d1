package org.nebulith.cli;

import java.nio.file.Path;

import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

/** Output options of a command that writes one table: {@code --out FILE} (else standard output), --force, --preset. */
public final class FileOutputOptions implements OutputTarget {

    @Option(names = "--out", paramLabel = "FILE",
            description = "Write the table to FILE (atomically) instead of standard output.")
    private Path out;

    @Option(names = "--force", description = "Replace an existing output file (never an input).")
    private boolean force;

    @Mixin
    private PresetOption preset;

    @Override
    public Path out() {
        return out;
    }

    @Override
    public boolean force() {
        return force;
    }
}
