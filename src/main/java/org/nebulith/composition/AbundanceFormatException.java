package org.nebulith.composition;

/**
 * A bad abundance file or inline composition. The message is one line naming the file, line and
 * field, what is wrong and what is accepted; the command line maps it to exit code 2.
 */
public class AbundanceFormatException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    /**
     * @param file   file or source name
     * @param line   1-based line number (0 if not tied to a line)
     * @param field  the field at fault
     * @param detail what is wrong and what is accepted
     */
    public AbundanceFormatException(String file, int line, String field, String detail) {
        super(file + (line > 0 ? ":" + line : "") + ": field '" + field + "': " + detail);
    }
}
