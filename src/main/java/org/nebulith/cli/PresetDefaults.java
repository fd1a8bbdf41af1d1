package org.nebulith.cli;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;

import org.nebulith.errors.InputException;

import picocli.CommandLine;
import picocli.CommandLine.Model.ArgSpec;
import picocli.CommandLine.Model.OptionSpec;

/**
 * Supplies the values of a preset as the default values of the sub-command's options, so that
 * anything given on the command line overrides the preset and everything else falls back to the
 * option's own default. The preset is found before parsing, by looking for {@code --preset X} or
 * {@code --preset=X} in the arguments.
 */
final class PresetDefaults implements CommandLine.IDefaultValueProvider {

    /** The option naming the preset. */
    static final String OPTION = "--preset";

    private final PresetFile preset;

    private PresetDefaults(final PresetFile preset) {
        this.preset = preset;
    }

    /**
     * @param args    the raw arguments
     * @param folders preset folders
     * @return the defaults of the preset named in args, or empty defaults
     */
    static PresetDefaults fromArguments(final List<String> args, final List<Path> folders) {
        for (int i = 0; i < args.size(); i++) {
            String arg = args.get(i);
            if ("--".equals(arg)) {
                break;
            }
            if (arg.startsWith(OPTION + "=")) {
                return load(arg.substring(OPTION.length() + 1), folders);
            }
            if (OPTION.equals(arg) && i + 1 < args.size()) {
                return load(args.get(i + 1), folders);
            }
        }
        return new PresetDefaults(null);
    }

    private static PresetDefaults load(final String nameOrPath, final List<Path> folders) {
        java.util.Optional<PresetCatalogue.Entry> builtIn = PresetLocator.builtIn(nameOrPath, folders);
        if (builtIn.isPresent()) {
            return new PresetDefaults(PresetFile.builtIn(builtIn.get()));
        }
        return new PresetDefaults(PresetFile.read(PresetLocator.resolve(nameOrPath, folders)));
    }

    /** @return the loaded preset, if --preset was given */
    Optional<PresetFile> preset() {
        return Optional.ofNullable(preset);
    }

    @Override
    public String defaultValue(final ArgSpec argSpec) {
        if (preset == null || !argSpec.isOption()) {
            return null;
        }
        return preset.get(key((OptionSpec) argSpec)).map(PresetFile.Entry::value).orElse(null);
    }

    /**
     * @param option an option
     * @return the preset key for it: its longest name without leading dashes
     */
    static String key(final OptionSpec option) {
        return option.longestName().replaceFirst("^-+", "");
    }

    /**
     * Rewrites a bad-value error caused by a preset line so that it names the file and line.
     *
     * @param ex the picocli error
     * @return an {@link InputException} naming the preset line, or ex itself
     */
    RuntimeException explain(final CommandLine.ParameterException ex) {
        ArgSpec arg = ex.getArgSpec();
        if (preset == null || arg == null || !arg.isOption()) {
            return ex;
        }
        String key = key((OptionSpec) arg);
        Optional<PresetFile.Entry> entry = preset.get(key);
        if (entry.isEmpty() || !(entry.get().value().equals(ex.getValue())
                || ex.getValue() == null && ex.getMessage() != null && ex.getMessage().contains(entry.get().value()))) {
            return ex;
        }
        return InputException.atField(preset.file(), entry.get().line(), key, entry.get().value(), ex.getMessage(),
                "see 'nebulith " + ex.getCommandLine().getCommandName() + " --help'");
    }
}
