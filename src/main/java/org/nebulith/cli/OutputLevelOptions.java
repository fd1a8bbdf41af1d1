package org.nebulith.cli;

import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code --quiet} and {@code --verbose}, accepted before or after the sub-command name. Whichever
 * command they are given to, the setting is stored on the top-level command, so there is one
 * answer per run ({@link #verbosity()} on any instance).
 */
public final class OutputLevelOptions {

    @Spec(Spec.Target.MIXEE)
    private CommandSpec mixee;

    private boolean quiet;
    private boolean verbose;

    /** @param value whether --quiet was given */
    @Option(names = {"-q", "--quiet"}, description = "Print only results and errors: no notes, no progress.")
    void setQuiet(final boolean value) {
        if (value) {
            OutputLevelOptions root = root();
            root.quiet = true;
            root.checkExclusive();
        }
    }

    /** @param value whether --verbose was given */
    @Option(names = {"-v", "--verbose"}, description = "Print details, and the stack trace of any failure.")
    void setVerbose(final boolean value) {
        if (value) {
            OutputLevelOptions root = root();
            root.verbose = true;
            root.checkExclusive();
        }
    }

    /** @return the verbosity of this run */
    public Verbosity verbosity() {
        OutputLevelOptions root = root();
        if (root.quiet) {
            return Verbosity.QUIET;
        }
        return root.verbose ? Verbosity.VERBOSE : Verbosity.NORMAL;
    }

    private void checkExclusive() {
        if (quiet && verbose) {
            throw new ParameterException(mixee.commandLine(), "--quiet and --verbose exclude each other; give one");
        }
    }

    private OutputLevelOptions root() {
        if (mixee == null) {
            return this;
        }
        Object top = mixee.root().userObject();
        return top instanceof NebulithCommand ? ((NebulithCommand) top).outputLevel() : this;
    }
}
