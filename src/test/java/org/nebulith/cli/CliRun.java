package org.nebulith.cli;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.function.Supplier;

/**
 * Runs the command line in-process and keeps what it printed: the one fixture of the command-line
 * tests. Each {@link #run} clears the previous output.
 */
final class CliRun {
    private final ByteArrayOutputStream out = new ByteArrayOutputStream();
    private final ByteArrayOutputStream err = new ByteArrayOutputStream();
    private final Supplier<List<Object>> extraCommands;

    /** Runs the shipped commands only. */
    CliRun() {
        this(List::of);
    }

    /** @param extraCommands makes, for each run, fresh sub-commands added for the test (stand-ins, probes) */
    CliRun(Supplier<List<Object>> extraCommands) {
        this.extraCommands = extraCommands;
    }

    /** @param args the command line @return the exit code */
    int run(String... args) {
        out.reset();
        err.reset();
        return Main.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), extraCommands.get());
    }

    /** @return what the last run printed on standard output */
    String out() {
        return out.toString(StandardCharsets.UTF_8);
    }

    /** @return what the last run printed on standard error */
    String err() {
        return err.toString(StandardCharsets.UTF_8);
    }
}
