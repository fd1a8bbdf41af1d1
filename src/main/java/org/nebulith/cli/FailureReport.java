package org.nebulith.cli;

import java.io.FileNotFoundException;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.NoSuchFileException;

import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;
import org.nebulith.errors.InternalException;
import org.nebulith.errors.NebulithException;
import org.nebulith.errors.NumericalException;
import org.nebulith.files.OutputWriteException;

import picocli.CommandLine;

/**
 * Maps a failure to an exit code and one line of text. The mapping, in order:
 * <ol>
 * <li>an {@link InputException} anywhere in the cause chain: 2 (bad input); a
 *     {@link NumericalException} (the solver's {@code ConvergenceException} among them): 3;
 *     an {@link InternalException}: 1;</li>
 * <li>a picocli {@link CommandLine.ParameterException} (unknown option, bad value): 2;</li>
 * <li>a missing or unreadable file ({@link NoSuchFileException}, {@link AccessDeniedException},
 *     {@link FileNotFoundException}) in the cause chain: 2;</li>
 * <li>other I/O failures: 1; anything else (an {@link IllegalArgumentException} from a library
 *     precondition among them: the command line should have checked its input first): 1, reported
 *     as an internal error with the hint to report it.</li>
 * </ol>
 * The stack trace is printed only with {@code --verbose}.
 */
final class FailureReport {

    /**
     * @param exitCode the exit code
     * @param message  the one line shown to the user
     */
    record Outcome(int exitCode, String message) {
    }

    private FailureReport() {
    }

    /**
     * @param failure what was thrown
     * @return exit code and message
     */
    static Outcome classify(final Throwable failure) {
        Outcome outcome = classifyRaw(failure);
        boolean picocli = failure instanceof CommandLine.ParameterException;
        return new Outcome(outcome.exitCode(), shorten(outcome.message(), picocli ? Messages.ECHO_LIMIT : LONG_MESSAGE));
    }

    /** Messages longer than this get their long quoted values cut [characters]. */
    private static final int LONG_MESSAGE = 300;

    /** Longest message line shown [characters]; an echoed value is cut well before. */
    private static final int MAX_MESSAGE = 1000;
    private static final java.util.regex.Pattern LONG_QUOTED =
            java.util.regex.Pattern.compile("(['\"])([^'\"]{" + Messages.ECHO_LIMIT + "})[^'\"]+\\1");

    /**
     * @param message a failure message
     * @param above   length from which quoted values are cut
     * @return the message with every quoted value longer than {@link Messages#ECHO_LIMIT} cut, and at
     *         most {@value #MAX_MESSAGE} characters long
     */
    static String shorten(final String message, final int above) {
        if (message == null || message.length() <= above) {
            return message;
        }
        String cut = LONG_QUOTED.matcher(message).replaceAll("$1$2...$1");
        return cut.length() <= MAX_MESSAGE ? cut : cut.substring(0, MAX_MESSAGE) + "... (message cut)";
    }

    private static Outcome classifyRaw(final Throwable failure) {
        for (Throwable t = failure; t != null; t = t.getCause()) {
            if (t instanceof OutputWriteException) {
                return new Outcome(ExitCodes.FAILURE, t.getMessage());
            }
        }
        for (Throwable t = failure; t != null; t = t.getCause()) {
            if (t instanceof java.nio.charset.CharacterCodingException) {
                return new Outcome(ExitCodes.BAD_INPUT, "an input file is not UTF-8 text (" + t.getClass().getSimpleName()
                        + "); accepted: UTF-8 text");
            }
        }
        for (Throwable t = failure; t != null; t = t.getCause()) {
            if (t instanceof NebulithException) {
                return new Outcome(exitCodeOf((NebulithException) t), t.getMessage());
            }
        }
        if (failure instanceof CommandLine.ParameterException) {
            return new Outcome(ExitCodes.BAD_INPUT, failure.getMessage());
        }
        for (Throwable t = failure; t != null; t = t.getCause()) {
            if (t instanceof NoSuchFileException || t instanceof AccessDeniedException
                    || t instanceof FileNotFoundException) {
                return new Outcome(ExitCodes.BAD_INPUT, "cannot read " + t.getMessage());
            }
        }
        if (failure instanceof IOException || failure instanceof UncheckedIOException) {
            return new Outcome(ExitCodes.FAILURE, "I/O error: " + failure.getMessage());
        }
        return new Outcome(ExitCodes.FAILURE, "internal error: " + failure
                + "; please report it together with the command line (rerun with --verbose for details)");
    }

    /**
     * Prints the failure as one line (plus the stack trace when verbose) and returns its exit code.
     *
     * @param failure what was thrown
     * @param err     the error stream
     * @param verbose whether to print the stack trace
     * @return the exit code
     */
    static int report(final Throwable failure, final PrintWriter err, final boolean verbose) {
        Outcome outcome = classify(failure);
        err.println("nebulith: " + outcome.message());
        if (verbose) {
            failure.printStackTrace(err);
        }
        err.flush();
        return outcome.exitCode();
    }

    private static int exitCodeOf(final NebulithException e) {
        if (e instanceof InputException) {
            return ExitCodes.BAD_INPUT;
        }
        if (e instanceof NumericalException) {
            return ExitCodes.NUMERICAL;
        }
        return ExitCodes.FAILURE;
    }
}
