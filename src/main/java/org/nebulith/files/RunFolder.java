package org.nebulith.files;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;

/**
 * An output folder built in a hidden temporary sibling ({@code .name.partial-PID-N}) and renamed
 * to its final name by {@link #commit()}. Until then nothing appears under the final name: if the
 * run fails, {@link #close()} deletes the temporary folder, and if the JVM is stopped (Ctrl-C,
 * SIGTERM) a shutdown hook does. Only a hard kill (SIGKILL, power loss) can leave a hidden
 * {@code .partial} folder behind, never a half-written run folder.
 *
 * <p>With {@code force}, an existing folder is replaced at commit: it is renamed aside, the new
 * folder renamed in, and the old one deleted (restored if the second rename fails).
 *
 * <p>Use with try-with-resources:
 * <pre>{@code
 * try (RunFolder run = AtomicOutput.openRunFolder(Path.of("reports/demo"), force, inputs)) {
 *     run.writeText("summary.md", markdown);
 *     run.commit();
 * }
 * }</pre>
 */
public final class RunFolder implements AutoCloseable {

    private static final Set<Path> OPEN = ConcurrentHashMap.newKeySet();

    static {
        Runtime.getRuntime().addShutdownHook(new Thread(RunFolder::deleteAllOpen, "nebulith-output-cleanup"));
    }

    private final Path target;
    private final Path working;
    private final boolean force;
    private boolean committed;

    private RunFolder(final Path target, final Path working, final boolean force) {
        this.target = target;
        this.working = working;
        this.force = force;
    }

    static RunFolder open(final Path target, final boolean force, final RunInputs inputs) {
        inputs.checkNotInput(target);
        if (Files.exists(target) && !force) {
            throw new InputException(Messages.OUTPUT_EXISTS, null, target);
        }
        if (Files.exists(target) && !Files.isDirectory(target)) {
            throw InputException.inFile(target, "exists and is not a folder", "a folder path for --out");
        }
        Path working = AtomicOutput.sibling(target, "partial");
        try {
            Files.createDirectories(working.getParent());
            Files.createDirectory(working);
        } catch (IOException e) {
            throw new UncheckedIOException("cannot create output folder next to " + target + ": " + e.getMessage(), e);
        }
        OPEN.add(working);
        return new RunFolder(target, working, force);
    }

    /** @return the final folder (does not exist, or holds the old run, until commit) */
    public Path target() {
        return target;
    }

    /** @return the temporary folder where the run is being built */
    public Path workingFolder() {
        return working;
    }

    /**
     * @param name a plain file name ({@link AtomicOutput#SAFE_NAME}), or names joined by '/'
     * @return its path inside the temporary folder (parent folders are created)
     * @throws InputException if the name is not a plain relative name
     */
    public Path file(final String name) {
        Path path = working;
        for (String part : name.split("/", -1)) {
            if (!AtomicOutput.SAFE_NAME.matcher(part).matches()) {
                throw new InputException(Messages.BAD_OUTPUT_NAME, null, name, AtomicOutput.SAFE_NAME_TEXT);
            }
            path = path.resolve(part);
        }
        try {
            Files.createDirectories(path.getParent());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return path;
    }

    /**
     * Writes one file of the run (atomically inside the temporary folder too, so a failed chart
     * render leaves no empty file even before commit).
     *
     * @param name    file name, see {@link #file(String)}
     * @param content what to write
     * @return the path in the temporary folder
     */
    public Path write(final String name, final AtomicOutput.Content content) {
        Path path = file(name);
        AtomicOutput.replaceAtomically(path, content);
        return path;
    }

    /**
     * @param name file name
     * @param text UTF-8 text
     * @return the path in the temporary folder
     */
    public Path writeText(final String name, final String text) {
        return write(name, out -> out.write(text.getBytes(StandardCharsets.UTF_8)));
    }

    /**
     * Writes a table as CSV (formatted completely before anything is written, so a refused NaN
     * leaves no file).
     *
     * @param name  file name
     * @param table the table
     * @return the path in the temporary folder
     */
    public Path writeCsv(final String name, final Table table) {
        return writeText(name, CsvTableWriter.toCsv(table));
    }

    /**
     * Opens a UTF-8 writer for streaming a large file (a survey table) straight into the
     * temporary folder; it becomes visible only at commit.
     *
     * @param name file name
     * @return a buffered writer, to be closed by the caller
     */
    public Writer newWriter(final String name) {
        try {
            return new BufferedWriter(new OutputStreamWriter(Files.newOutputStream(file(name)), StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Moves the finished folder to its final name.
     *
     * @return the final folder
     */
    public synchronized Path commit() {
        if (committed) {
            return target;
        }
        try {
            if (Files.exists(target)) {
                if (!force) {
                    throw new InputException(Messages.OUTPUT_EXISTS, null, target);
                }
                replaceExisting();
            } else {
                Files.move(working, target, java.nio.file.StandardCopyOption.ATOMIC_MOVE);
            }
        } catch (IOException e) {
            throw new UncheckedIOException("cannot move the finished run to " + target + ": " + e.getMessage(), e);
        }
        committed = true;
        OPEN.remove(working);
        return target;
    }

    private void replaceExisting() throws IOException {
        Path old = AtomicOutput.sibling(target, "replaced");
        Files.move(target, old, java.nio.file.StandardCopyOption.ATOMIC_MOVE);
        try {
            Files.move(working, target, java.nio.file.StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            Files.move(old, target, java.nio.file.StandardCopyOption.ATOMIC_MOVE);
            throw e;
        }
        AtomicOutput.deleteQuietly(old);
    }

    /** Deletes the temporary folder unless the run was committed. */
    @Override
    public synchronized void close() {
        if (!committed) {
            AtomicOutput.deleteQuietly(working);
            OPEN.remove(working);
        }
    }

    private static void deleteAllOpen() {
        for (Path path : OPEN) {
            AtomicOutput.deleteQuietly(path);
        }
    }
}
