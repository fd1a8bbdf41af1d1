package org.nebulith.survey;

import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;

/**
 * One problem of a catalogue: where (line, column), what is wrong, what is accepted.
 *
 * @param line     1-based line of the file
 * @param column   the column (header name), or {@code (row)} for the row as a whole
 * @param star     the row's star name, or empty (header problems, nameless rows)
 * @param value    the value found (empty if none)
 * @param problem  what is wrong
 * @param accepted what would be accepted
 */
public record CatalogueProblem(long line, String column, String star, String value, String problem, String accepted) {

    /**
     * A problem with no value to show (a missing cell, a row as a whole).
     *
     * @param line     1-based line of the file
     * @param column   the column
     * @param star     the row's star name, or empty
     * @param problem  what is wrong
     * @param accepted what would be accepted
     */
    public CatalogueProblem(long line, String column, String star, String problem, String accepted) {
        this(line, column, star, "", problem, accepted);
    }

    /**
     * @param file the catalogue as the user named it
     * @return the one-line message: {@code file: line L: field "C": value "V": [star 'S': ]problem; accepted: ...}
     */
    public String text(Object file) {
        String what = star.isEmpty() ? problem : "star '" + Messages.echo(star) + "': " + problem;
        return Messages.BAD_INPUT_FIELD.format(file, line, Messages.echo(column), InputException.shown(value), what, accepted);
    }
}
