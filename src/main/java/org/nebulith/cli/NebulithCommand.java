package org.nebulith.cli;

import java.io.PrintStream;

import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * The top-level {@code nebulith} command: global options and the list of sub-commands.
 * A new sub-command is added to {@link #SUBCOMMANDS} below (see {@link RunCommand}).
 */
@Command(name = "nebulith",
        mixinStandardHelpOptions = true,
        versionProvider = ToolVersion.class,
        sortOptions = false,
        usageHelpAutoWidth = true,
        description = {
            "What rocky planets are made of, from a star's abundances and a disk model.",
            "Equilibrium condensation, feeding zones, bulk planet composition, reports and charts.",
        },
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {
            "0:success",
            "1:internal error or output I/O failure",
            "2:bad input (file, field, option or preset); nothing written",
            "3:numerical failure (non-convergence); the message names T, P and composition",
        },
        footerHeading = "%nExamples:%n",
        footer = {
            "  nebulith planet                 the built-in demo scenario, report in reports/",
            "  nebulith sequence --help        options and examples of one command",
            "  nebulith planet --preset NAME   settings from presets/NAME.settings",
            "  source <(nebulith completion)   shell completion for bash or zsh",
        })
public final class NebulithCommand implements Runnable {

    /**
     * The sub-commands, in the order of the usage help. {@link Main} registers only the one a run
     * names (building picocli's model of all of them costs a fresh JVM about 0.4 s), all of them
     * for help, completion and an unknown or missing command.
     */
    static final java.util.List<Class<?>> SUBCOMMANDS = java.util.List.of(
            PointCommand.class,
            SequenceCommand.class,
            PlanetCommand.class,
            SurveyCommand.class,
            InteriorCommand.class,
            MeasuredCommand.class,
            SurveyBenchCommand.class,
            BenchCommand.class,
            BenchRobustCommand.class,
            PresetsCommand.class,
            DataAuditCommand.class,
            CompletionCommand.class,
            CommandLine.HelpCommand.class);

    @Mixin
    private OutputLevelOptions outputLevel;

    @Spec
    private CommandSpec spec;

    private final PrintStream out;
    private final PrintStream err;

    /**
     * @param out stream for results
     * @param err stream for notes, progress and errors
     */
    public NebulithCommand(final PrintStream out, final PrintStream err) {
        this.out = out;
        this.err = err;
    }

    /** No sub-command given: print the usage and fail as bad input. */
    @Override
    public void run() {
        throw new CommandLine.ParameterException(spec.commandLine(),
                "missing command; choose one of " + spec.subcommands().keySet());
    }

    /** @return the run's --quiet / --verbose setting holder */
    OutputLevelOptions outputLevel() {
        return outputLevel;
    }

    /** @return stream for results */
    PrintStream out() {
        return out;
    }

    /** @return stream for notes, progress and errors */
    PrintStream err() {
        return err;
    }
}
