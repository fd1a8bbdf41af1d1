package org.nebulith.files;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.FileSystemException;
import java.nio.file.Path;

/**
 * Writing an output failed (a full disk, a lost mount, permissions changed during the run). The
 * message names the output as the user knows it, never the hidden temporary path it was being
 * built in; nothing half-written is left under that name.
 */
public final class OutputWriteException extends UncheckedIOException {

    private static final long serialVersionUID = 1L;

    /**
     * @param output the final output path
     * @param cause  what failed
     */
    public OutputWriteException(final Path output, final IOException cause) {
        super("cannot write " + output + ": " + reason(cause), cause);
    }

    /**
     * @param cause an I/O failure
     * @return its reason without the (temporary) path it names
     */
    static String reason(final IOException cause) {
        if (cause instanceof FileSystemException) {
            String reason = ((FileSystemException) cause).getReason();
            if (reason != null) {
                return reason;
            }
            if (cause instanceof java.nio.file.AccessDeniedException) {
                return "permission denied";
            }
            if (cause instanceof java.nio.file.NoSuchFileException) {
                return "a folder on the way no longer exists";
            }
            return cause.getClass().getSimpleName();
        }
        return cause.getMessage() == null ? cause.getClass().getSimpleName() : cause.getMessage();
    }
}
