package org.nebulith.cli;

import java.util.concurrent.Callable;

import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * Base of every sub-command that runs a computation. A sub-command
 * <ol>
 * <li>extends this class, is annotated {@code @Command(name = ..., description = ..., footer = examples)}
 *     and declares its own {@code @Option}s (units in the names: {@code --T-K}, {@code --P-bar});</li>
 * <li>is listed in {@link NebulithCommand}'s {@code subcommands};</li>
 * <li>implements {@link #execute(RunContext)}, which gets from the context the verbosity, progress,
 *     the input registry (checksums, overwrite protection), the effective settings with their
 *     origin, and the output folder ({@link RunContext#openRunFolder(String)}).</li>
 * </ol>
 * It inherits {@code --help}, {@code --version}, {@code --quiet} and {@code --verbose}; output
 * options come from a mixin (see {@link #outputTarget()}). Every option can be set from a preset by its long name without dashes.
 * Order inside {@code execute}: check the options, register every input file, open the output
 * ({@link RunContext#openRunFolder(String)} or {@link RunContext#reserveOutputFile(String)}: every check
 * of the output path and its lock), and only then compute.
 * Failures are thrown, not printed: {@link FailureReport} maps them to exit codes.
 */
@Command(mixinStandardHelpOptions = true, versionProvider = ToolVersion.class, sortOptions = false, usageHelpAutoWidth = true,
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:success", "1:internal error or output I/O failure", "2:bad input; nothing written",
            "3:numerical failure; the message names T, P and composition"})
public abstract class RunCommand implements Callable<Integer> {

    @Spec
    private CommandSpec spec;

    @Mixin
    private OutputLevelOptions outputLevel;

    @Override
    public final Integer call() throws Exception {
        return execute(RunContext.create(spec, outputLevel.verbosity(), outputTarget()));
    }

    /**
     * A command that writes declares its output options as a mixin ({@link RunOptions} for a run
     * folder, {@link FileOutputOptions} for one table) and returns them here; one that writes
     * nothing declares at most a {@link PresetOption}.
     *
     * @return the command's output options
     */
    protected OutputTarget outputTarget() {
        return OutputTarget.NONE;
    }

    /**
     * Runs the command.
     *
     * @param context the run's context
     * @return the exit code ({@link ExitCodes#OK} normally; failures are thrown)
     * @throws Exception any failure, mapped by {@link FailureReport}
     */
    protected abstract int execute(RunContext context) throws Exception;

    /** @return the run's verbosity */
    Verbosity verbosity() {
        return outputLevel == null ? Verbosity.NORMAL : outputLevel.verbosity();
    }
}
