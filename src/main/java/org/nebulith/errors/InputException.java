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

    /**
     * A bad field of an input file.
     *
     * @param file     the file as the user named it
     * @param line     1-based line number
     * @param field    the column or key
     * @param problem  what is wrong
     * @param accepted what would be accepted
     * @return the exception
     */
    public static InputException atField(final Object file, final long line, final String field,
                                         final String problem, final String accepted) {
        return new InputException(Messages.BAD_INPUT_FIELD, null, file, line, field, problem, accepted);
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
        Object shown = value instanceof CharSequence ? Messages.echo(value) : value;
        return new InputException(Messages.BAD_OPTION_VALUE, null, option, shown, problem, accepted);
    }
}
