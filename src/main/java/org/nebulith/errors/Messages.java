package org.nebulith.errors;

import java.text.MessageFormat;
import java.util.Locale;

import org.nebulith.format.Decimal;

/**
 * The one catalogue of user-facing error messages. Each template uses {@link MessageFormat}
 * placeholders {@code {0}..{n-1}} and declares how many parameters it takes; a test checks that
 * every template formats with exactly that many. Numbers are formatted with {@link Locale#ROOT}.
 *
 * <p>Input messages follow one shape so that a user can fix the input without a debugger:
 * where (file, line, field), what is wrong, what is accepted.
 */
public enum Messages {

    /** A bad value in an input file: file, line, field, value (cut to 80 characters), what is wrong, what is accepted. */
    BAD_INPUT_FIELD(6, "{0}: line {1}: field \"{2}\": value \"{3}\": {4}; accepted: {5}"),
    /** A bad input file as a whole (no line): file, what is wrong, what is accepted. */
    BAD_INPUT_FILE(3, "{0}: {1}; accepted: {2}"),
    /** A bad command-line value: option, value, what is wrong, what is accepted. */
    BAD_OPTION_VALUE(4, "option {0}: value \"{1}\": {2}; accepted: {3}"),
    /** An input file that cannot be found or read: file, reason. */
    INPUT_NOT_READABLE(2, "{0}: cannot read input file ({1}); accepted: an existing, readable file"),
    /** A preset name that resolves to no file: name, searched folders, available names. */
    UNKNOWN_PRESET(3, "preset \"{0}\" not found in {1}; available presets: {2}"),
    /** An option that was renamed: old name, new option with its parameter, what it means. */
    RENAMED_OPTION(3, "option {0} was renamed: use {1} ({2})"),
    /** An output folder or file exists: path. */
    OUTPUT_EXISTS(1, "{0}: output already exists; use --force to replace it, or choose another --out or --run-name"),
    /** An output would overwrite or replace an input of the same run: output, input. */
    OUTPUT_IS_INPUT(2, "{0}: refusing to write here because it would overwrite the input file {1}"),
    /** An existing output that a run may not replace (not an earlier run of this tool, or a protected folder): path, why, accepted. */
    OUTPUT_NOT_REPLACEABLE(3, "{0}: refusing to replace it: {1}; accepted: {2}"),
    /** An output path that can only fail: path, what is wrong, what is accepted. */
    OUTPUT_UNUSABLE(3, "{0}: cannot write the output here: {1}; accepted: {2}"),
    /** Another run holds the output's lock: output, holder (process, host, command, start). */
    OUTPUT_LOCKED(2, "{0}: another nebulith run is writing this output ({1}); wait for it to finish, or choose"
            + " another --out"),
    /** A lock whose owner is gone: output, holder, lock file. */
    OUTPUT_LOCK_STALE(3, "{0}: locked by {1}, which is no longer running; if no run is writing this output,"
            + " delete {2} and run again"),
    /** An output name that is not a plain file or folder name: name, accepted. */
    BAD_OUTPUT_NAME(2, "output name \"{0}\" is not allowed; accepted: {1}"),
    /** The equilibrium iteration did not converge: T [K], P [bar], composition, iterations, residual. */
    NO_CONVERGENCE(5, "equilibrium did not converge at T = {0} K, P = {1} bar, composition {2} after {3} iterations"
            + " (residual {4})"),
    /** The equilibrium solver found no state that passes its checks: what failed (naming T, P and composition). */
    NO_EQUILIBRIUM(1, "{0}"),
    /** A numerical result is unusable: what, T [K], P [bar], composition. */
    NUMERICAL_FAILURE(4, "{0} at T = {1} K, P = {2} bar, composition {3}"),
    /** A numerical failure inside a feeding zone: zone, r [AU], T [K], P [bar], what failed. */
    ZONE_STATE_FAILURE(5, "zone \"{0}\", r = {1} AU, T = {2} K, P = {3} bar: {4}"),
    /** A survey's failed draws exceed its limit: failed draws, draws of the run, the limit (fraction). */
    TOO_MANY_FAILED_DRAWS(3, "{0} of {1} draws failed, more than --max-failed-fraction {2} of all draws of the run;"
            + " the failures are listed in .failures.csv.partial"),
    /** A strict survey stopped at its first failure: the failure (star, stage, zone, state, reason). */
    STRICT_FAILURE(1, "--strict: stopped at the first failed estimate: {0}"),
    /** A non-finite number reached an output table: table, column, row (1-based, header excluded), value. */
    NON_FINITE_OUTPUT(4, "{0}: column \"{1}\", row {2}: value {3} is not a finite number; nothing was written"),
    /** A condensation sequence stopped on a state without a checked equilibrium: the solver's message (names T, P, composition). */
    SEQUENCE_STOPPED(1, "condensation sequence stopped: {0}"),
    /** The interior-structure equations could not be solved: what failed, naming the planet model. */
    STRUCTURE_FAILURE(1, "interior structure not solved: {0}"),
    /** A sub-command that the build does not provide yet: command name. */
    NOT_YET_AVAILABLE(1, "the \"{0}\" command is not yet available in this build"),
    /** A branch that should be impossible: description. */
    INTERNAL(1, "internal error: {0}; please report it together with the command line");

    private final int parameterCount;
    private final String template;

    Messages(final int parameterCount, final String template) {
        this.parameterCount = parameterCount;
        this.template = template;
    }

    /** @return the number of parameters the template expects */
    public int parameterCount() {
        return parameterCount;
    }

    /** @return the raw {@link MessageFormat} template */
    public String template() {
        return template;
    }

    /**
     * Formats the template. Numbers are rendered with {@link Locale#ROOT} and no grouping;
     * doubles keep their shortest round-trip representation so that a state can be reproduced.
     *
     * @param parts exactly {@link #parameterCount()} values
     * @return the formatted message
     * @throws IllegalArgumentException if the number of parts does not match
     */
    public String format(final Object... parts) {
        if (parts.length != parameterCount) {
            throw new IllegalArgumentException(name() + " expects " + parameterCount + " parameters, got "
                    + parts.length);
        }
        Object[] shown = new Object[parts.length];
        for (int i = 0; i < parts.length; i++) {
            shown[i] = render(parts[i]);
        }
        return new MessageFormat(template, Locale.ROOT).format(shown);
    }

    /** Longest echoed value, in characters; longer values are cut (see {@link #echo(Object)}). */
    public static final int ECHO_LIMIT = 80;

    /** Parts longer than this are cut even where they are not an echoed value (a safety net). */
    private static final int PART_LIMIT = 2000;

    /**
     * @param value a value from the user's input, to be quoted in a message
     * @return its text, cut to {@value #ECHO_LIMIT} characters (with the full length noted)
     */
    public static String echo(final Object value) {
        return cut(String.valueOf(value), ECHO_LIMIT);
    }

    private static String cut(final String text, final int limit) {
        if (text.length() <= limit) {
            return text;
        }
        return text.substring(0, limit) + "... (" + text.length() + " characters)";
    }

    private static Object render(final Object part) {
        if (part instanceof CharSequence && ((CharSequence) part).length() > PART_LIMIT) {
            return cut(part.toString(), ECHO_LIMIT);
        }
        if (part instanceof Double || part instanceof Float) {
            double value = ((Number) part).doubleValue();
            return Double.isFinite(value) ? Decimal.format(value) : Double.toString(value);
        }
        if (part instanceof Number) {
            return part.toString();
        }
        return String.valueOf(part);
    }
}
