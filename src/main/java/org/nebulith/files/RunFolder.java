package org.nebulith.files;

import java.io.BufferedWriter;
import java.io.FilterWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;

import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;

/**
 * An output folder built in a hidden temporary sibling and renamed to its final name by
 * {@link #commit()}, so that all files of a run appear together. Until then nothing appears
 * under the final name: if the run fails, {@link #close()} deletes the temporary folder, and if
 * the JVM is stopped (Ctrl-C, SIGTERM) a shutdown hook does. Only a hard kill (SIGKILL, power
 * loss) can leave a hidden folder behind, never a half-written run folder.
 *
 * <p>Opening does every check of the path before anything is computed ({@link OutputChecks}) and
 * takes the output's {@link OutputLock} for the whole run, so a second run on the same output is
 * refused at once. The finished folder gets a {@link RunMarker}.
 *
 * <p>With {@code force}, an existing folder is replaced at commit, and only if it is a finished
 * run of this tool holding only its own files: it is renamed aside, the new folder renamed in,
 * and the old one deleted (restored if the second rename fails). Nothing is deleted before the
 * run is finished.
 *
 * <p>A resumable folder ({@link #openResumable}) has a fixed hidden name, {@code .NAME.unfinished},
 * and is kept when the run stops, so that a later run with {@code --resume} continues from its
 * partial files.
 *
 * <p>Use with try-with-resources:
 * <pre>{@code
 * try (RunFolder run = RunFolder.open(Path.of("reports/demo"), force, inputs, RunMarker.now("sequence", version))) {
 *     run.writeText("summary.md", markdown);
 *     run.commit();
 * }
 * }</pre>
 */
public final class RunFolder implements AutoCloseable {

    private static final Set<Path> OPEN = ConcurrentHashMap.newKeySet();

    static {
        Runtime.getRuntime().addShutdownHook(new Thread(RunFolder::cleanUp, "nebulith-output-cleanup"));
    }

    private final Path target;
    private final Path working;
    private final boolean replace;
    private final boolean resumable;
    private final RunMarker marker;
    private final OutputLock lock;
    private boolean committed;
    private boolean closed;

    private RunFolder(final Path target, final Path working, final boolean replace, final boolean resumable,
                      final RunMarker marker, final OutputLock lock) {
        this.target = target;
        this.working = working;
        this.replace = replace;
        this.resumable = resumable;
        this.marker = marker;
        this.lock = lock;
    }

    /**
     * Checks the path, takes the lock and creates the temporary folder.
     *
     * @param target the final folder, e.g. {@code reports/demo}
     * @param force  whether an earlier run folder there may be replaced at commit
     * @param inputs the run's inputs (all registered already); the folder may not be or hold one
     * @param marker what the run is, for the folder's marker
     * @return the open folder
     * @throws InputException if the path cannot or may not be used, or another run writes it
     */
    public static RunFolder open(final Path target, final boolean force, final RunInputs inputs, final RunMarker marker) {
        OutputChecks.runFolder(target, force, inputs);
        OutputLock lock = OutputLock.acquire(target, marker.command());
        try {
            OutputChecks.runFolder(target, force, inputs);
            Path working = AtomicOutput.sibling(target, "partial");
            createFolder(target, working);
            OPEN.add(working);
            return new RunFolder(target, working, force, false, marker, lock);
        } catch (RuntimeException e) {
            lock.close();
            throw e;
        }
    }

    /**
     * Like {@link #open}, for a run that can be resumed: the temporary folder has a fixed name and is
     * kept if the run stops.
     *
     * @param target the final folder
     * @param force  start again: an unfinished folder is discarded, an earlier run replaced at commit
     * @param resume continue the unfinished folder if there is one; an earlier finished run there is
     *               replaced at commit (its results are carried over by the caller)
     * @param inputs the run's inputs
     * @param marker what the run is
     * @return the open folder; {@link #resumed()} tells whether an unfinished one was taken up
     * @throws InputException as {@link #open}, or if an unfinished run is there and neither resume nor force is set
     */
    public static RunFolder openResumable(final Path target, final boolean force, final boolean resume,
                                          final RunInputs inputs, final RunMarker marker) {
        OutputChecks.runFolder(target, force || resume, inputs);
        OutputLock lock = OutputLock.acquire(target, marker.command());
        try {
            OutputChecks.runFolder(target, force || resume, inputs);
            Path working = unfinished(target);
            if (Files.exists(working, LinkOption.NOFOLLOW_LINKS) && !resume) {
                if (!force) {
                    throw InputException.inFile(target, "an interrupted run left its partial results in " + working,
                            "--resume to continue it, or --force to start again");
                }
                AtomicOutput.deleteQuietly(working);
            }
            if (!Files.isDirectory(working, LinkOption.NOFOLLOW_LINKS)) {
                createFolder(target, working);
            }
            return new RunFolder(target, working, force || resume, true, marker, lock);
        } catch (RuntimeException e) {
            lock.close();
            throw e;
        }
    }

    /**
     * @param target a run folder
     * @return the fixed hidden sibling where a resumable run of it is built
     */
    public static Path unfinished(final Path target) {
        Path absolute = target.toAbsolutePath().normalize();
        return absolute.resolveSibling("." + absolute.getFileName() + ".unfinished");
    }

    private static void createFolder(final Path target, final Path working) {
        try {
            Files.createDirectories(working.getParent());
            Files.createDirectory(working);
        } catch (IOException e) {
            throw new InputException(Messages.OUTPUT_UNUSABLE, e, target, "cannot create a folder beside it ("
                    + OutputWriteException.reason(e) + ")", "a path in a writable folder");
        }
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
            throw new OutputWriteException(target.resolve(name), e);
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
     * @throws OutputWriteException naming the final path if writing fails
     */
    public Path write(final String name, final AtomicOutput.Content content) {
        Path path = file(name);
        try {
            AtomicOutput.replaceAtomically(path, content);
        } catch (UncheckedIOException e) {
            throw new OutputWriteException(target.resolve(name), e.getCause());
        }
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
     * temporary folder; it becomes visible only at commit. Failures name the final path.
     *
     * @param name file name
     * @return a buffered writer, to be closed by the caller
     */
    public Writer newWriter(final String name) {
        Path path = file(name);
        try {
            return named(new BufferedWriter(new OutputStreamWriter(Files.newOutputStream(path), StandardCharsets.UTF_8)),
                    target.resolve(name));
        } catch (IOException e) {
            throw new OutputWriteException(target.resolve(name), e);
        }
    }

    /**
     * @param out    a writer on a file in the temporary folder
     * @param shown  the file's final path
     * @return a writer whose failures name {@code shown}
     */
    public static Writer named(final Writer out, final Path shown) {
        return new FilterWriter(out) {
            @Override
            public void write(final int c) throws IOException {
                guard(() -> super.write(c));
            }

            @Override
            public void write(final char[] buf, final int off, final int len) throws IOException {
                guard(() -> super.write(buf, off, len));
            }

            @Override
            public void write(final String str, final int off, final int len) throws IOException {
                guard(() -> super.write(str, off, len));
            }

            @Override
            public void flush() throws IOException {
                guard(super::flush);
            }

            @Override
            public void close() throws IOException {
                guard(super::close);
            }

            private void guard(final IoAction action) throws IOException {
                try {
                    action.run();
                } catch (IOException e) {
                    throw new OutputWriteException(shown, e);
                }
            }
        };
    }

    /** An I/O step. */
    @FunctionalInterface
    private interface IoAction {
        void run() throws IOException;
    }

    /**
     * Moves the finished folder to its final name (with its {@link RunMarker}); an earlier run there
     * is replaced as a whole.
     *
     * @return the final folder
     * @throws OutputWriteException if the rename fails (the earlier run is then left as it was)
     */
    public synchronized Path commit() {
        if (committed) {
            return target;
        }
        try {
            marker.writeInto(working);
            if (Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
                OutputChecks.runFolder(target, replace, new RunInputs());
                replaceExisting();
            } else {
                Files.move(working, target, StandardCopyOption.ATOMIC_MOVE);
            }
        } catch (IOException e) {
            throw new OutputWriteException(target, e);
        }
        committed = true;
        OPEN.remove(working);
        return target;
    }

    private void replaceExisting() throws IOException {
        Path old = AtomicOutput.sibling(target, "replaced");
        Files.move(target, old, StandardCopyOption.ATOMIC_MOVE);
        try {
            Files.move(working, target, StandardCopyOption.ATOMIC_MOVE);
        } catch (IOException e) {
            Files.move(old, target, StandardCopyOption.ATOMIC_MOVE);
            throw e;
        }
        AtomicOutput.deleteQuietly(old);
    }

    /** @return whether this resumable run took up an unfinished folder that holds files */
    public boolean resumed() {
        try (var files = Files.list(working)) {
            return resumable && files.findAny().isPresent();
        } catch (IOException e) {
            return false;
        }
    }

    /** For a resumable folder: deletes the unfinished work at close instead of keeping it. */
    public synchronized void discardOnClose() {
        if (resumable && !committed) {
            OPEN.add(working);
        }
    }

    /**
     * Deletes the temporary folder unless the run was committed (a resumable one is kept, see
     * {@link #discardOnClose()}), and releases the lock.
     */
    @Override
    public synchronized void close() {
        if (closed) {
            return;
        }
        closed = true;
        if (!committed && (OPEN.remove(working) || isEmpty(working))) {
            AtomicOutput.deleteQuietly(working);
        }
        lock.close();
    }

    /** @return the lock file of the output while the run is open */
    public Optional<Path> lockFile() {
        return closed ? Optional.empty() : Optional.of(lock.file());
    }

    private static boolean isEmpty(final Path folder) {
        try (var files = Files.list(folder)) {
            return files.findAny().isEmpty();
        } catch (IOException e) {
            return false;
        }
    }

    private static void cleanUp() {
        for (Path path : OPEN) {
            AtomicOutput.deleteQuietly(path);
        }
    }
}
