package org.nebulith.cli;

import picocli.CommandLine.Option;

/**
 * The {@code --preset NAME|FILE} option. Its value is read from the raw arguments before parsing
 * ({@link PresetDefaults#fromArguments}); this declaration makes the option known to the parser
 * and to the help.
 */
public final class PresetOption {

    @Option(names = PresetDefaults.OPTION, paramLabel = "NAME|FILE",
            description = "Run settings from presets/NAME.settings or FILE; options on the command line override them.")
    private String preset;

    /** @return the --preset value, or null */
    public String preset() {
        return preset;
    }
}
