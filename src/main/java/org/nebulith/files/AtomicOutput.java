package org.nebulith.files;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.concurrent.atomic.AtomicLong;
import java.util.regex.Pattern;

import org.nebulith.errors.InputException;

/**
 * Writes outputs so that nothing half-written is ever visible under the final name.
 *
 * <p>A single file is written to a hidden temporary sibling ({@code .name.partial-PID-N}) and
 * moved onto its name at the end (an atomic rename on the same file system). A run folder is
 * built the same way, as a hidden sibling folder renamed at {@link RunFolder#commit()}; see
 * {@link RunFolder}. Both refuse to replace an existing output unless {@code force} is set and
 * refuse any path that is one of the run's inputs.
 */
public final class AtomicOutput {

    /** What a plain output file or folder name may look like. */
    public static final Pattern SAFE_NAME = Pattern.compile("[A-Za-z0-9][A-Za-z0-9._-]*");

    /** The accepted form of {@link #SAFE_NAME}, for messages. */
    public static final String SAFE_NAME_TEXT =
            "letters, digits, '.', '_' and '-', starting with a letter or digit";

    private static final AtomicLong COUNTER = new AtomicLong();

    /** Writes content to an output stream. */
    @FunctionalInterface
    public interface Content {
        /**
         * @param out the stream to write to (closed by the caller)
         * @throws IOException on failure; the partial file is then removed
         */
        void writeTo(OutputStream out) throws IOException;
    }

    private AtomicOutput() {
    }

    /**
     * Writes a file atomically, under the output's lock. With {@code force} an existing file is
     * replaced only if it starts with the same first line as the new content (an earlier output
     * of the same kind), never a user's other file.
     *
     * @param target  the final path
     * @param content what to write
     * @param force   whether an earlier output may be replaced
     * @param inputs  the run's inputs, which are never overwritten
     * @return target
     * @throws InputException if the target exists without force, is not an earlier output, or is an input
     * @throws OutputWriteException if writing fails (nothing is left behind)
     */
    public static Path writeFile(final Path target, final Content content, final boolean force,
                                 final RunInputs inputs) {
        byte[] bytes = render(target, content);
        String text = new String(bytes, StandardCharsets.UTF_8);
        int end = text.indexOf('\n');
        try (OutputFile file = reserveFile(target, force, inputs, end < 0 ? text : text.substring(0, end), "write")) {
            file.write(out -> out.write(bytes));
        }
        return target;
    }

    private static byte[] render(final Path target, final Content content) {
        java.io.ByteArrayOutputStream buffer = new java.io.ByteArrayOutputStream();
        try {
            content.writeTo(buffer);
        } catch (IOException e) {
            throw new OutputWriteException(target, e);
        }
        return buffer.toByteArray();
    }

    /**
     * Writes a UTF-8 text file atomically, see {@link #writeFile(Path, Content, boolean, RunInputs)}.
     *
     * @param target the final path
     * @param text   the content
     * @param force  whether an earlier output may be replaced
     * @param inputs the run's inputs
     * @return target
     */
    public static Path writeText(final Path target, final String text, final boolean force, final RunInputs inputs) {
        return writeFile(target, out -> out.write(text.getBytes(StandardCharsets.UTF_8)), force, inputs);
    }

    /**
     * Checks a single-file output and takes its lock, before anything is computed.
     *
     * @param target    the final path
     * @param force     whether an earlier output may be replaced
     * @param inputs    the run's inputs (all registered)
     * @param firstLine the first line of every output of this kind: an existing file is replaced only if it
     *                  starts with it
     * @param command   what is running (named to a second run that finds the lock)
     * @return the reserved file; write it, then close it
     * @throws InputException if the path cannot or may not be used, or another run writes it
     */
    public static OutputFile reserveFile(final Path target, final boolean force, final RunInputs inputs,
                                         final String firstLine, final String command) {
        OutputChecks.file(target, force, inputs, firstLine);
        OutputLock lock = OutputLock.acquire(target, command);
        try {
            OutputChecks.file(target, force, inputs, firstLine);
        } catch (RuntimeException e) {
            lock.close();
            throw e;
        }
        return new OutputFile(target, lock);
    }

    /**
     * Opens a run folder built in a temporary sibling; see {@link RunFolder}.
     *
     * @param target the final folder, e.g. {@code reports/demo}
     * @param force  whether an earlier run folder may be replaced at commit
     * @param inputs the run's inputs; the folder may not be or contain one
     * @return the open folder
     * @throws InputException if the folder exists without force, or is or holds an input
     */
    public static RunFolder openRunFolder(final Path target, final boolean force, final RunInputs inputs) {
        return RunFolder.open(target, force, inputs, RunMarker.now("run", "dev"));
    }

    /** A single output file reserved by {@link #reserveFile}: checked, locked, written once. */
    public static final class OutputFile implements AutoCloseable {
        private final Path target;
        private final OutputLock lock;

        private OutputFile(final Path target, final OutputLock lock) {
            this.target = target;
            this.lock = lock;
        }

        /** @return the final path */
        public Path target() {
            return target;
        }

        /**
         * @param content what to write (to a hidden sibling, then renamed onto the target)
         * @throws OutputWriteException naming the target if writing fails
         */
        public void write(final Content content) {
            try {
                replaceAtomically(target, content);
            } catch (UncheckedIOException e) {
                throw new OutputWriteException(target, e.getCause());
            }
        }

        /** Releases the lock. */
        @Override
        public void close() {
            lock.close();
        }
    }

    /**
     * Writes content to a temporary sibling of {@code target} and moves it into place,
     * replacing any existing file. Within a run folder no checks are needed, so {@link RunFolder}
     * uses this directly.
     *
     * @param target  the final path
     * @param content what to write
     */
    static void replaceAtomically(final Path target, final Content content) {
        Path temp = sibling(target, "partial");
        try {
            Path parent = target.toAbsolutePath().getParent();
            Files.createDirectories(parent);
            try (OutputStream out = Files.newOutputStream(temp)) {
                content.writeTo(out);
            }
            move(temp, target);
        } catch (IOException e) {
            deleteQuietly(temp);
            throw new UncheckedIOException(e);
        } catch (RuntimeException | Error e) {
            deleteQuietly(temp);
            throw e;
        }
    }

    /**
     * @param target a path
     * @param kind   a word for the sibling's purpose
     * @return a hidden, unique sibling path {@code .name.kind-PID-N}
     */
    static Path sibling(final Path target, final String kind) {
        Path absolute = target.toAbsolutePath().normalize();
        String name = "." + absolute.getFileName() + "." + kind + "-" + ProcessHandle.current().pid() + "-"
                + COUNTER.incrementAndGet();
        return absolute.resolveSibling(name);
    }

    /** Renames atomically where the file system allows it. */
    static void move(final Path from, final Path to) throws IOException {
        try {
            Files.move(from, to, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
        } catch (AtomicMoveNotSupportedException e) {
            Files.move(from, to, StandardCopyOption.REPLACE_EXISTING);
        }
    }

    /** Deletes a file or a folder tree, ignoring failures (used on error paths only). */
    static void deleteQuietly(final Path path) {
        try {
            if (Files.isDirectory(path, java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
                try (var entries = Files.list(path)) {
                    entries.forEach(AtomicOutput::deleteQuietly);
                }
            }
            Files.deleteIfExists(path);
        } catch (IOException | UncheckedIOException e) {
            // best effort on an error path
        }
    }
}
