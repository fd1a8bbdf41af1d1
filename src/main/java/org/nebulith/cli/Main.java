package org.nebulith.cli;

import java.io.PrintStream;
import java.io.PrintWriter;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.List;

import picocli.CommandLine;

/**
 * Entry point of {@code nebulith.jar}. Sets headless AWT before any chart class loads, loads the
 * preset named by {@code --preset} (if any) as the default values of the sub-command's options,
 * runs the command and exits with its code (see {@link ExitCodes}).
 */
public final class Main {

    private Main() {
    }

    /**
     * @param args command-line arguments
     */
    public static void main(final String[] args) {
        System.setProperty("java.awt.headless", "true");
        System.exit(run(args, System.out, System.err));
    }

    /**
     * Runs one command without exiting the JVM (tests call this).
     *
     * @param args command-line arguments
     * @param out  stream for results
     * @param err  stream for notes, progress and errors
     * @return the exit code
     */
    public static int run(final String[] args, final PrintStream out, final PrintStream err) {
        return run(args, out, err, List.of());
    }

    /**
     * Runs one command with extra sub-commands registered (a test hook).
     *
     * @param args  command-line arguments
     * @param out   stream for results
     * @param err   stream for notes, progress and errors
     * @param extra additional sub-command objects
     * @return the exit code
     */
    static int run(final String[] args, final PrintStream out, final PrintStream err, final List<Object> extra) {
        System.setProperty("java.awt.headless", "true");
        PrintWriter errWriter = new PrintWriter(err, true, StandardCharsets.UTF_8);
        boolean verbose = Arrays.asList(args).contains("--verbose") || Arrays.asList(args).contains("-v");
        PresetDefaults defaults;
        java.util.Optional<org.nebulith.errors.InputException> retired = RetiredOptions.check(List.of(args));
        if (retired.isPresent()) {
            return FailureReport.report(retired.get(), errWriter, verbose);
        }
        try {
            defaults = PresetDefaults.fromArguments(List.of(args), PresetLocator.defaultFolders());
        } catch (RuntimeException e) {
            return FailureReport.report(e, errWriter, verbose);
        }
        CommandLine cli = commandLine(out, err, errWriter, NebulithCommand.SUBCOMMANDS, extra, List.of(args));
        cli.setDefaultValueProvider(defaults);
        cli.setParameterExceptionHandler((ex, arguments) -> parameterFailure(ex, defaults, errWriter, verbose));
        cli.setExecutionExceptionHandler((ex, line, parsed) ->
                FailureReport.report(ex, errWriter, line.getCommand() instanceof RunCommand
                        ? ((RunCommand) line.getCommand()).verbosity() == Verbosity.VERBOSE : verbose));
        int code = cli.execute(args);
        out.flush();
        err.flush();
        return code;
    }

    /**
     * @param out      stream for results
     * @param err      stream for notes
     * @param errWriter writer on err
     * @return the configured command line (no preset)
     */
    static CommandLine commandLine(final PrintStream out, final PrintStream err, final PrintWriter errWriter) {
        return commandLine(out, err, errWriter, NebulithCommand.SUBCOMMANDS, List.of(), List.of());
    }

    /**
     * @param all   the sub-command classes
     * @param extra additional sub-command objects (always registered)
     * @param args  the arguments: when the first one that is not an option names a sub-command other
     *              than help and completion, only that one is registered (the others' models cost a
     *              fresh JVM about 0.4 s); otherwise all are
     */
    static CommandLine commandLine(final PrintStream out, final PrintStream err, final PrintWriter errWriter,
                                   final List<Class<?>> all, final List<Object> extra, final List<String> args) {
        CommandLine cli = new CommandLine(new NebulithCommand(out, err));
        Class<?> only = named(all, args);
        for (Class<?> c : all) {
            if (only == null || c == only) {
                cli.addSubcommand(c);
            }
        }
        extra.forEach(cli::addSubcommand);
        cli.setOut(new PrintWriter(out, true, StandardCharsets.UTF_8));
        cli.setErr(errWriter);
        cli.setCaseInsensitiveEnumValuesAllowed(true);
        cli.setAbbreviatedOptionsAllowed(false);
        return cli;
    }

    /** @return the sub-command the arguments name, or null for help, completion or none */
    private static Class<?> named(final List<Class<?>> all, final List<String> args) {
        String first = args.stream().filter(a -> !a.startsWith("-")).findFirst().orElse(null);
        if (first == null || first.equals("help") || first.equals("completion")) {
            return null;
        }
        for (Class<?> c : all) {
            CommandLine.Command a = c.getAnnotation(CommandLine.Command.class);
            if (a != null && a.name().equals(first)) {
                return c;
            }
        }
        return null;
    }

    private static int parameterFailure(final CommandLine.ParameterException ex, final PresetDefaults defaults,
                                        final PrintWriter err, final boolean verbose) {
        RuntimeException shown = defaults.explain(ex);
        int code = FailureReport.report(shown, err, verbose);
        if (shown == ex) {
            CommandLine failed = ex.getCommandLine();
            err.println("Try 'nebulith " + (failed.getParent() == null ? "" : failed.getCommandName() + " ")
                    + "--help' for the accepted options.");
            err.flush();
        }
        return code;
    }
}
