package org.nebulith.thermo;

/**
 * A data file that cannot be read. The message is one line naming the file, the line, the field,
 * what is wrong and what is accepted, e.g.
 * {@code my-species.csv: line 12: field T_min_K: 'abc' is not a number; accepted: a temperature in K}.
 * The command-line tool maps it to exit code 2.
 */
public class DataFormatException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final String file;
    private final long line;
    private final String field;

    /**
     * @param file     the file name as the user gave it
     * @param line     1-based line number, or 0 if the problem concerns the whole file
     * @param field    the column or item at fault (may be empty)
     * @param problem  what is wrong
     * @param accepted what would be accepted
     */
    public DataFormatException(String file, long line, String field, String problem, String accepted) {
        super(format(file, line, field, problem, accepted));
        this.file = file;
        this.line = line;
        this.field = field;
    }

    private static String format(String file, long line, String field, String problem, String accepted) {
        StringBuilder b = new StringBuilder(file);
        if (line > 0) {
            b.append(": line ").append(line);
        }
        if (field != null && !field.isEmpty()) {
            b.append(": field ").append(field);
        }
        b.append(": ").append(problem.replace('\n', ' '));
        if (accepted != null && !accepted.isEmpty()) {
            b.append("; accepted: ").append(accepted);
        }
        return b.toString();
    }

    /** @return the file name */
    public String file() {
        return file;
    }

    /** @return the 1-based line, 0 if not line-specific */
    public long line() {
        return line;
    }

    /** @return the field at fault, possibly empty */
    public String field() {
        return field;
    }
}
