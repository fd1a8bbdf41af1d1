package org.nebulith.errors;

/**
 * Bad user input: a file, a line, a field or an option value that the program cannot accept.
 * The command line maps it to exit code 2 and prints its message as one line, without a stack
 * trace.
 */
public final class InputException extends NebulithException {

    private static final long serialVersionUID = 1L;

    /**
     * @param key   an input message of {@link Messages}
     * @param cause the underlying cause, or null
     * @param parts the template parameters
     */
    public InputException(final Messages key, final Throwable cause, final Object... parts) {
        super(key, cause, parts);
    }

    /** Longest value shown in a message ({@link Messages#ECHO_LIMIT}); longer values are cut. */
    public static final int VALUE_SHOWN = Messages.ECHO_LIMIT;

    /**
     * A bad field of an input file, in the one shape every reader uses:
     * {@code file: line N: field "F": value "V": what is wrong; accepted: what would be accepted}.
     *
     * @param file     the file as the user named it
     * @param line     1-based line number (0 if the field is missing from the file altogether)
     * @param field    the column or key
     * @param value    the value found (cut to {@value #VALUE_SHOWN} characters; empty if missing)
     * @param problem  what is wrong
     * @param accepted what would be accepted
     * @return the exception
     */
    public static InputException atField(final Object file, final long line, final String field, final Object value,
                                         final String problem, final String accepted) {
        Object shown = value instanceof Number ? value : shown(value);
        return new InputException(Messages.BAD_INPUT_FIELD, null, file, line, field, shown, problem, accepted);
    }

    /**
     * @param value any value
     * @return its text on one line, stripped and cut to {@value #VALUE_SHOWN} characters, the full
     *         length noted after the cut ({@link Messages#echo})
     */
    public static String shown(final Object value) {
        return Messages.echo(String.valueOf(value).replaceAll("[\\r\\n\\t]+", " ").strip());
    }

    /**
     * A bad input file as a whole.
     *
     * @param file     the file as the user named it
     * @param problem  what is wrong
     * @param accepted what would be accepted
     * @return the exception
     */
    public static InputException inFile(final Object file, final String problem, final String accepted) {
        return new InputException(Messages.BAD_INPUT_FILE, null, file, problem, accepted);
    }

    /**
     * A bad command-line option value.
     *
     * @param option   the option name, e.g. {@code --T-K}
     * @param value    the value given
     * @param problem  what is wrong
     * @param accepted what would be accepted
     * @return the exception
     */
    public static InputException atOption(final String option, final Object value, final String problem,
                                          final String accepted) {
        Object shown = value instanceof Number ? value : shown(value);
        return new InputException(Messages.BAD_OPTION_VALUE, null, option, shown, problem, accepted);
    }

    /**
     * @param e why a file could not be read
     * @return the reason in words ("no such file", "permission denied", ...), else the exception's kind
     */
    public static String reason(final java.io.IOException e) {
        if (e instanceof java.nio.file.NoSuchFileException) {
            return "no such file";
        }
        if (e instanceof java.nio.file.AccessDeniedException) {
            return "permission denied";
        }
        if (e.getMessage() != null && e.getMessage().contains("Is a directory")) {
            return "a folder, not a file";
        }
        return e.getClass().getSimpleName();
    }
}
