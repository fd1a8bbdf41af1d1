package org.nebulith.disk;

/**
 * A bad disk or feeding-zone file. The message is one line: file, line, field, what is wrong and
 * what is accepted. The command line maps it to exit code 2 (no stack trace).
 *
 * <p>Stand-in until {@code org.nebulith.errors.InputException} is on main; the constructor takes
 * the same parts as {@code InputException.atField}.
 */
public class DiskFormatException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    /**
     * @param file     the file as the user named it
     * @param line     1-based line (0 if the problem concerns the whole file)
     * @param field    the column or key
     * @param problem  what is wrong
     * @param accepted what would be accepted
     */
    public DiskFormatException(String file, long line, String field, String problem, String accepted) {
        super(file + (line > 0 ? ":" + line : "") + ": field '" + field + "': " + problem + " (accepted: " + accepted + ")");
    }
}
