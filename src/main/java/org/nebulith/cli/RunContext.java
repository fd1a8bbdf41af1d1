package org.nebulith.cli;

import java.io.PrintStream;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.stream.Collectors;

import org.nebulith.progress.Progress;
import org.nebulith.progress.ProgressMode;
import org.nebulith.progress.terminal.ProgressDisplays;
import org.nebulith.files.AtomicOutput;
import org.nebulith.files.RunFolder;
import org.nebulith.files.RunInputs;
import org.nebulith.files.RunMarker;

import picocli.CommandLine;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;

/**
 * What a running sub-command gets from the command-line plumbing: streams, verbosity, progress,
 * the registry of its input files, the effective settings with their origin (for the report),
 * and its output location.
 */
public final class RunContext {

    /** Options a preset may not set. */
    private static final Set<String> NOT_FROM_PRESET = Set.of("preset", "force", "help", "version");

    /**
     * One effective setting of the run.
     *
     * @param key    the option name without dashes
     * @param value  its value as text
     * @param origin {@code command line}, {@code preset FILE:LINE} or {@code default}
     */
    public record Setting(String key, String value, String origin) {
    }

    private final String command;
    private final Verbosity verbosity;
    private final OutputTarget runOptions;
    private final PrintStream out;
    private final PrintStream err;
    private final RunInputs inputs = new RunInputs();
    private final Instant started = Instant.now();
    private final List<Setting> settings;
    private final Optional<PresetFile> preset;

    private RunContext(final CommandSpec spec, final Verbosity verbosity, final OutputTarget runOptions,
                       final Optional<PresetFile> preset) {
        this.command = spec.name();
        this.verbosity = verbosity;
        this.runOptions = runOptions;
        NebulithCommand root = (NebulithCommand) spec.root().userObject();
        this.out = root.out();
        this.err = root.err();
        this.preset = preset;
        this.settings = collectSettings(spec, preset);
    }

    /**
     * @param spec       the running command
     * @param verbosity  the run's verbosity
     * @param runOptions its output options
     * @return the context; the preset (if any) is checked against the command and registered as an input
     */
    static RunContext create(final CommandSpec spec, final Verbosity verbosity, final OutputTarget runOptions) {
        Optional<PresetFile> preset = Optional.empty();
        if (spec.defaultValueProvider() instanceof PresetDefaults) {
            preset = ((PresetDefaults) spec.defaultValueProvider()).preset();
        }
        preset.ifPresent(p -> p.checkFor(spec.name(), presetKeys(spec)));
        RunContext context = new RunContext(spec, verbosity, runOptions, preset);
        preset.ifPresent(p -> {
            if (p.builtInContent().isPresent()) {
                context.inputs.addBuiltIn(p.file().toString(), "settings preset", p.builtInContent().get());
            } else {
                context.inputs.add(p.file(), "settings preset");
            }
        });
        return context;
    }

    /** @return the sub-command name, e.g. {@code planet} */
    public String command() {
        return command;
    }

    /** @return the verbosity */
    public Verbosity verbosity() {
        return verbosity;
    }

    /** @return the stream for results (CSV to standard output, for instance) */
    public PrintStream out() {
        return out;
    }

    /** @param note a line for the user, shown unless --quiet */
    public void info(final String note) {
        if (verbosity != Verbosity.QUIET) {
            err.println(note);
        }
    }

    /** @param note a detail, shown only with --verbose */
    public void detail(final String note) {
        if (verbosity == Verbosity.VERBOSE) {
            err.println(note);
        }
    }

    /** @param caution a warning, always shown (also with --quiet) */
    public void warn(final String caution) {
        err.println("warning: " + caution);
    }

    /**
     * The standing cautions of a run are written in its report; the terminal gets one line pointing
     * to them (nothing with --quiet).
     *
     * @param cautions the cautions
     * @param where    the report that lists them
     */
    public void cautions(final List<String> cautions, final Path where) {
        if (!cautions.isEmpty()) {
            info("cautions: " + cautions.size() + " on model assumptions and data limits, in " + where);
        }
    }

    /**
     * @param task  short task name
     * @param total number of steps
     * @return a bar on a terminal, plain lines otherwise, nothing with --quiet
     */
    public Progress progress(final String task, final long total) {
        return ProgressDisplays.open(ProgressMode.choose(verbosity == Verbosity.QUIET, System.console() != null),
                task, total, err);
    }

    /**
     * Registers an input file: it is checksummed for the report and protected from being overwritten.
     *
     * @param file the file
     * @param role what it is for
     * @return file
     */
    public Path input(final Path file, final String role) {
        inputs.add(file, role);
        return file;
    }

    /**
     * Registers a named input (preset) found by the {@link PresetCatalogue}: a working-folder file
     * like any input, a built-in copy under its shown name; both with their SHA-256.
     *
     * @param entry the input
     * @param role  what it is for
     * @return entry
     */
    public PresetCatalogue.Entry namedInput(final PresetCatalogue.Entry entry, final String role) {
        if (entry.builtIn()) {
            inputs.addBuiltIn(entry.shown(), role, entry.content());
        } else {
            inputs.add(entry.file(), role);
        }
        return entry;
    }

    /** @return the registered inputs */
    public RunInputs inputs() {
        return inputs;
    }

    /** @return whether --force was given */
    public boolean force() {
        return runOptions.force();
    }

    /** @return whether --run-name was given */
    public boolean hasRunName() {
        return runOptions.runName() != null;
    }

    /** @return the --out value, if given (commands writing a single file use it as that file) */
    public Optional<Path> outOption() {
        return Optional.ofNullable(runOptions.out());
    }

    /**
     * @param defaultRunName run name used when neither --out nor --run-name is given
     * @return the output folder: --out, or reports/&lt;run-name&gt;
     */
    public Path outputFolder(final String defaultRunName) {
        return RunOptions.outputFolder(runOptions, defaultRunName);
    }

    /**
     * The one rule for default run folders: {@code <command>-<yyyyMMdd-HHmmss>} of the start time
     * (UTC), with {@code -2}, {@code -3}, ... appended if {@code reports/} already holds that name.
     *
     * @return the run name used when neither --out nor --run-name is given
     */
    public String defaultRunName() {
        return DefaultRunName.of(command, started, RunOptions.REPORTS);
    }

    /**
     * Checks the output folder and locks it; call it after every input is registered and before
     * anything is computed (the folder may not be or contain an input).
     *
     * @param defaultRunName run name used when neither --out nor --run-name is given
     * @return an open run folder (commit it at the end; close it in any case)
     */
    public RunFolder openRunFolder(final String defaultRunName) {
        return RunFolder.open(outputFolder(defaultRunName), force(), inputs, marker());
    }

    /**
     * Checks the single output file named by --out and locks it; call it after every input is
     * registered and before anything is computed.
     *
     * @param firstLine the first line of every output of this command (an existing file is
     *                  replaced with --force only if it starts with it)
     * @return the reserved file, if --out was given
     */
    public Optional<AtomicOutput.OutputFile> reserveOutputFile(final String firstLine) {
        return outOption().map(path -> AtomicOutput.reserveFile(path, force(), inputs, firstLine, command));
    }

    /** @return the marker of this run's output folder */
    public RunMarker marker() {
        return new RunMarker(command, toolVersion(), started);
    }

    /** @return when the run started */
    public Instant started() {
        return started;
    }

    /** @return the tool version */
    public String toolVersion() {
        return ToolVersion.get();
    }

    /** @return the preset used, if any */
    public Optional<PresetFile> preset() {
        return preset;
    }

    /** @return every option that has a value, with where the value came from */
    public List<Setting> settings() {
        return settings;
    }

    private static Collection<String> presetKeys(final CommandSpec spec) {
        TreeSet<String> keys = new TreeSet<>();
        for (OptionSpec option : spec.options()) {
            String key = PresetDefaults.key(option);
            if (!NOT_FROM_PRESET.contains(key)) {
                keys.add(key);
            }
        }
        return keys;
    }

    private static List<Setting> collectSettings(final CommandSpec spec, final Optional<PresetFile> preset) {
        CommandLine.ParseResult parsed = spec.commandLine().getParseResult();
        List<Setting> list = new ArrayList<>();
        for (OptionSpec option : spec.options()) {
            if (option.usageHelp() || option.versionHelp() || option.getValue() == null) {
                continue;
            }
            String key = PresetDefaults.key(option);
            String origin = "default";
            if (parsed != null && parsed.hasMatchedOption(option)) {
                origin = "command line";
            } else if (preset.isPresent() && preset.get().get(key).isPresent()) {
                origin = "preset " + preset.get().file() + ":" + preset.get().get(key).get().line();
            }
            list.add(new Setting(key, text(option.getValue()), origin));
        }
        return List.copyOf(list);
    }

    private static String text(final Object value) {
        if (value instanceof Object[]) {
            return Arrays.stream((Object[]) value).map(RunContext::text).collect(Collectors.joining(","));
        }
        if (value instanceof Collection<?>) {
            return ((Collection<?>) value).stream().map(RunContext::text).collect(Collectors.joining(","));
        }
        if (value instanceof Double || value instanceof Float) {
            double v = ((Number) value).doubleValue();
            return Double.isFinite(v) ? org.nebulith.format.Decimal.shortest(v) : String.valueOf(v);
        }
        return String.valueOf(value);
    }
}
