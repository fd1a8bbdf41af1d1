package org.nebulith.files;

import java.io.BufferedReader;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.Optional;

import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;

/**
 * The checks of an output path, all done before anything is computed: not an input nor a folder
 * holding one, not a symbolic link (dangling or not), of the right kind (folder or file), in a
 * writable place, and, when it exists, replaced only with {@code --force} and only if it is an
 * earlier output of this tool. The working folder, any folder above it, the home folder and the
 * file-system root are never replaced.
 */
final class OutputChecks {

    private OutputChecks() {
    }

    /**
     * @param target  the run folder
     * @param replace whether an existing folder may be replaced (--force, or --resume of a survey)
     * @param inputs  the run's inputs
     * @throws InputException if the folder cannot or may not be written
     */
    static void runFolder(final Path target, final boolean replace, final RunInputs inputs) {
        common(target, inputs);
        if (!Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
            writableParent(target);
            return;
        }
        if (!Files.isDirectory(target, LinkOption.NOFOLLOW_LINKS)) {
            throw new InputException(Messages.OUTPUT_UNUSABLE, null, target, "it exists and is not a folder",
                    "a folder path for --out (a new name, or an earlier run folder with --force)");
        }
        Optional<String> why = RunMarker.whyNotReplaceable(target);
        if (!replace && why.isEmpty()) {
            throw new InputException(Messages.OUTPUT_EXISTS, null, target);
        }
        if (why.isPresent()) {
            throw new InputException(Messages.OUTPUT_NOT_REPLACEABLE, null, target, why.get(),
                    "a new --out, or a run folder of an earlier nebulith run holding only its own files");
        }
        writableParent(target);
    }

    /**
     * @param target    the output file
     * @param force     whether an existing file may be replaced
     * @param inputs    the run's inputs
     * @param firstLine the first line that every output of this kind starts with (an existing file
     *                  is replaced only if it starts with it)
     * @throws InputException if the file cannot or may not be written
     */
    static void file(final Path target, final boolean force, final RunInputs inputs, final String firstLine) {
        common(target, inputs);
        if (Files.exists(target, LinkOption.NOFOLLOW_LINKS)) {
            if (Files.isDirectory(target)) {
                throw new InputException(Messages.OUTPUT_UNUSABLE, null, target, "it is a folder",
                        "a file path for --out (this command writes one table)");
            }
            if (!force) {
                throw new InputException(Messages.OUTPUT_EXISTS, null, target);
            }
            if (!startsWith(target, firstLine)) {
                throw new InputException(Messages.OUTPUT_NOT_REPLACEABLE, null, target,
                        "it does not start with the header of this command's table, so it is not an earlier output",
                        "a new --out file, or a table written by an earlier run of this command");
            }
        }
        writableParent(target);
    }

    private static void common(final Path target, final RunInputs inputs) {
        protectedFolder(target).ifPresent(what -> {
            throw new InputException(Messages.OUTPUT_NOT_REPLACEABLE, null, target, "it is " + what
                    + ", which a run never replaces", "a new folder for --out, e.g. reports/NAME");
        });
        inputs.checkNotInput(target);
        if (Files.isSymbolicLink(target)) {
            throw new InputException(Messages.OUTPUT_UNUSABLE, null, target, Files.exists(target)
                    ? "it is a symbolic link" : "it is a dangling symbolic link",
                    "a path that is not a symbolic link (give the real path)");
        }
    }

    /** @return what the path is, if it is the working folder, above it, the home folder or the root */
    static Optional<String> protectedFolder(final Path target) {
        Path t = PathIdentity.canonical(target);
        Path cwd = PathIdentity.canonical(Path.of(""));
        if (t.getParent() == null) {
            return Optional.of("the file-system root");
        }
        if (t.equals(cwd)) {
            return Optional.of("the working folder");
        }
        if (cwd.startsWith(t)) {
            return Optional.of("a folder holding the working folder");
        }
        String home = System.getProperty("user.home");
        if (home != null && !home.isBlank() && t.equals(PathIdentity.canonical(Path.of(home)))) {
            return Optional.of("the home folder");
        }
        return Optional.empty();
    }

    private static void writableParent(final Path target) {
        Path parent = target.toAbsolutePath().normalize().getParent();
        while (parent != null && !Files.exists(parent)) {
            parent = parent.getParent();
        }
        if (parent == null) {
            return;
        }
        if (!Files.isDirectory(parent)) {
            throw new InputException(Messages.OUTPUT_UNUSABLE, null, target, parent + " is not a folder",
                    "a path whose parents are folders");
        }
        if (!Files.isWritable(parent)) {
            throw new InputException(Messages.OUTPUT_UNUSABLE, null, target, "the folder " + parent
                    + " is not writable", "a path in a writable folder");
        }
    }

    private static boolean startsWith(final Path file, final String firstLine) {
        try (BufferedReader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            String line = in.readLine();
            return line != null && line.equals(firstLine);
        } catch (IOException | RuntimeException e) {
            return false;
        }
    }
}
