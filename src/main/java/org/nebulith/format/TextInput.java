package org.nebulith.format;

import java.io.IOException;
import java.io.PushbackReader;
import java.io.Reader;

/**
 * The one rule of every text-file reader: a byte-order mark at the start of the file (as some
 * spreadsheet programs write in front of UTF-8) is not part of the first line.
 */
public final class TextInput {

    /** The byte-order mark as a character. */
    public static final char BOM = '\uFEFF';

    private TextInput() {
    }

    /**
     * @param in a reader positioned at the start of a file
     * @return a reader of the same text without a leading byte-order mark
     * @throws IOException if the first character cannot be read
     */
    public static Reader withoutBom(final Reader in) throws IOException {
        PushbackReader pushback = new PushbackReader(in, 1);
        int first = pushback.read();
        if (first >= 0 && first != BOM) {
            pushback.unread(first);
        }
        return pushback;
    }

    /**
     * @param text the whole text of a file
     * @return the text without a leading byte-order mark
     */
    public static String withoutBom(final String text) {
        return !text.isEmpty() && text.charAt(0) == BOM ? text.substring(1) : text;
    }
}
