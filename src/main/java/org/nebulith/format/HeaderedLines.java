package org.nebulith.format;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.util.List;

/**
 * The line layout shared by Nebulith's small data files (compositions, disk parameters, disk
 * tables): blank lines are skipped, lines starting with {@code #} are comments, the first other line
 * must be exactly the header, and every line after it is a data row.
 */
public final class HeaderedLines {
    /** Receives one data row. */
    public interface Row {
        /** @param line the stripped line @param lineNo its 1-based number */
        void accept(String line, int lineNo);
    }

    /** Makes the exception for a wrong header line. */
    public interface BadHeader {
        /** @param line the line found @param lineNo its number @return the exception to throw */
        RuntimeException at(String line, int lineNo);
    }

    private HeaderedLines() {
    }

    /**
     * @param in       the file contents
     * @param header   the exact header line
     * @param comments receives the comment texts (without {@code #}), in order
     * @param bad      the error for a wrong header
     * @param row      receives each data row
     * @return true if the header was found
     * @throws IOException on read failure
     */
    public static boolean read(Reader in, String header, List<String> comments, BadHeader bad, Row row)
            throws IOException {
        boolean headerSeen = false;
        try (BufferedReader br = new BufferedReader(TextInput.withoutBom(in))) {
            int lineNo = 0;
            for (String raw = br.readLine(); raw != null; raw = br.readLine()) {
                lineNo++;
                String line = raw.strip();
                if (line.isEmpty()) {
                    continue;
                }
                if (line.startsWith("#")) {
                    comments.add(line.substring(1).strip());
                } else if (!headerSeen) {
                    if (!line.equals(header)) {
                        throw bad.at(line, lineNo);
                    }
                    headerSeen = true;
                } else {
                    row.accept(line, lineNo);
                }
            }
        }
        return headerSeen;
    }
}
