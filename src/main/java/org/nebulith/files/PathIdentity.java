package org.nebulith.files;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Whether two paths name the same file, following symbolic links where the files exist. */
final class PathIdentity {

    private PathIdentity() {
    }

    /**
     * @param a a path
     * @param b another path
     * @return true if both name the same file (or, when one does not exist, the same normalised location)
     */
    static boolean same(final Path a, final Path b) {
        if (Files.exists(a) && Files.exists(b)) {
            try {
                return Files.isSameFile(a, b);
            } catch (IOException e) {
                return canonical(a).equals(canonical(b));
            }
        }
        return canonical(a).equals(canonical(b));
    }

    /**
     * @param folder a folder
     * @param file   a file
     * @return true if {@code file} lies strictly inside {@code folder}
     */
    static boolean contains(final Path folder, final Path file) {
        Path f = canonical(folder);
        Path x = canonical(file);
        return !f.equals(x) && x.startsWith(f);
    }

    /**
     * @param path a path
     * @return its real path where it exists, else the real path of its nearest existing ancestor
     *         with the rest appended, normalised and absolute
     */
    static Path canonical(final Path path) {
        Path absolute = path.toAbsolutePath().normalize();
        Path existing = absolute;
        while (existing != null && !Files.exists(existing)) {
            existing = existing.getParent();
        }
        if (existing == null) {
            return absolute;
        }
        try {
            return existing.toRealPath().resolve(existing.relativize(absolute)).normalize();
        } catch (IOException e) {
            return absolute;
        }
    }
}
