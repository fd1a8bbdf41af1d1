package org.nebulith.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.net.URI;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileSystem;
import java.nio.file.FileSystemAlreadyExistsException;
import java.nio.file.FileSystems;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.stream.Stream;

import org.nebulith.composition.AbundanceFileReader;
import org.nebulith.disk.DiskParameterReader;
import org.nebulith.disk.TabulatedDiskReader;
import org.nebulith.zones.ZoneFileReader;

/**
 * The named inputs shipped with Nebulith and those a user keeps beside their work. A name resolves
 * to the working folder's copy first ({@code presets/NAME.csv}, {@code feeding-zones/NAME.csv},
 * {@code presets/NAME.settings}), then to the built-in copy inside the jar; the kind of a
 * {@code .csv} file is told by its header line. Whatever is used is recorded with its SHA-256 in
 * the run's inputs ({@link RunContext#namedInput}).
 */
public final class PresetCatalogue {

    /** The kinds of named inputs, with the folder they live in and their file-name ending. */
    public enum Kind {
        /** Gas compositions: header {@value AbundanceFileReader#HEADER}. */
        COMPOSITION("composition", "presets", ".csv"),
        /** Disk models: header {@value DiskParameterReader#HEADER} or {@value TabulatedDiskReader#HEADER}. */
        DISK("disk", "presets", ".csv"),
        /** Feeding-zone files: header {@value ZoneFileReader#HEADER}. */
        ZONES("zones", "feeding-zones", ".csv"),
        /** Star catalogues for the survey: header starting {@code star,}. */
        CATALOGUE("catalogue", "presets", ".csv"),
        /** Planets with measured mass and radius (measured): header starting {@code planet,star,}. */
        PLANETS("planets", "presets", ".csv"),
        /** Run settings: {@code key = value} lines ({@link PresetFile}). */
        SETTINGS("settings", "presets", PresetLocator.EXTENSION);

        private final String label;
        private final String folder;
        private final String extension;

        Kind(final String label, final String folder, final String extension) {
            this.label = label;
            this.folder = folder;
            this.extension = extension;
        }

        /** @return the word shown in listings */
        public String label() {
            return label;
        }

        /** @return the folder (relative to the working folder, and inside the jar) */
        public String folder() {
            return folder;
        }

        /** @return the file-name ending */
        public String extension() {
            return extension;
        }
    }

    /**
     * One named input.
     *
     * @param kind    what it is
     * @param name    its name (file name without the ending)
     * @param shown   where it came from, as shown to users: the working-folder path, or
     *                {@code built-in presets/NAME.csv}
     * @param file    the working-folder file, or null for a built-in copy
     * @param content its bytes
     */
    public record Entry(Kind kind, String name, String shown, Path file, byte[] content) {
        /** @return whether this is the copy inside the jar */
        public boolean builtIn() {
            return file == null;
        }

        /** @return the content as UTF-8 text */
        public String text() {
            return new String(content, StandardCharsets.UTF_8);
        }

        /** @return the first comment line without its {@code #}, or the settings' description */
        public String description() {
            for (String line : text().split("\r?\n")) {
                String s = line.strip();
                if (kind == Kind.SETTINGS && s.startsWith(PresetFile.DESCRIPTION)) {
                    return s.substring(s.indexOf('=') + 1).strip();
                }
                if (kind != Kind.SETTINGS && s.startsWith("#")) {
                    return s.replaceFirst("^#+\\s*", "");
                }
            }
            return "";
        }
    }

    /** Label prefix of built-in copies. */
    public static final String BUILT_IN = "built-in ";

    private final Path workingFolder;

    /** @param workingFolder the folder whose presets/ and feeding-zones/ come first */
    public PresetCatalogue(final Path workingFolder) {
        this.workingFolder = workingFolder;
    }

    /** @return the catalogue of the process's working folder */
    public static PresetCatalogue here() {
        return new PresetCatalogue(Path.of(""));
    }

    /**
     * @param kind the kind asked for
     * @param name a bare name (no folder, no ending)
     * @return the working-folder copy if it exists and is of that kind, else the built-in copy
     */
    public Optional<Entry> find(final Kind kind, final String name) {
        if (!name.matches("[A-Za-z0-9._-]+")) {
            return Optional.empty();
        }
        String fileName = name + kind.extension();
        Path local = workingFolder.resolve(kind.folder()).resolve(fileName);
        if (Files.isRegularFile(local)) {
            Entry e = new Entry(kind, name, local.toString(), local, read(local));
            if (kindOf(e.text(), kind.extension()) == kind) {
                return Optional.of(e);
            }
        }
        return builtIn(kind, name);
    }

    /**
     * @param kind the kind asked for
     * @param name a bare name (no folder, no ending)
     * @return the copy inside the jar, if there is one of that kind
     */
    public static Optional<Entry> builtIn(final Kind kind, final String name) {
        if (!name.matches("[A-Za-z0-9._-]+")) {
            return Optional.empty();
        }
        String fileName = name + kind.extension();
        byte[] builtIn = resource("/" + kind.folder() + "/" + fileName);
        if (builtIn != null && kindOf(new String(builtIn, StandardCharsets.UTF_8), kind.extension()) == kind) {
            return Optional.of(new Entry(kind, name, BUILT_IN + kind.folder() + "/" + fileName, null, builtIn));
        }
        return Optional.empty();
    }

    /**
     * @return every named input, working-folder copies hiding built-in ones of the same name and
     *         kind, sorted by kind then name
     */
    public List<Entry> all() {
        Map<String, Entry> found = new TreeMap<>();
        for (String folder : List.of("presets", "feeding-zones")) {
            for (String fileName : builtInFiles(folder)) {
                add(found, null, BUILT_IN + folder + "/" + fileName, resource("/" + folder + "/" + fileName), fileName);
            }
            Path local = workingFolder.resolve(folder);
            if (Files.isDirectory(local)) {
                try (Stream<Path> files = Files.list(local)) {
                    files.filter(Files::isRegularFile).sorted()
                            .forEach(f -> add(found, f, f.toString(), read(f), f.getFileName().toString()));
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            }
        }
        List<Entry> out = new ArrayList<>(found.values());
        out.sort((a, b) -> a.kind() != b.kind() ? a.kind().compareTo(b.kind()) : a.name().compareTo(b.name()));
        return out;
    }

    private static void add(final Map<String, Entry> found, final Path file, final String shown, final byte[] content,
                            final String fileName) {
        if (content == null) {
            return;
        }
        int dot = fileName.lastIndexOf('.');
        Kind kind = dot < 0 ? null : kindOf(new String(content, StandardCharsets.UTF_8), fileName.substring(dot));
        if (kind != null) {
            String name = fileName.substring(0, dot);
            found.put(kind + "/" + name, new Entry(kind, name, shown, file, content));
        }
    }

    /**
     * @param text      a file's content
     * @param extension its file-name ending, with the dot
     * @return its kind, told by the ending and the first line that is neither blank nor a comment;
     *         null if it is none of the kinds
     */
    static Kind kindOf(final String text, final String extension) {
        if (extension.equals(PresetLocator.EXTENSION)) {
            return Kind.SETTINGS;
        }
        if (!extension.equals(".csv")) {
            return null;
        }
        for (String line : text.split("\r?\n")) {
            String s = line.strip();
            if (s.isEmpty() || s.startsWith("#")) {
                continue;
            }
            if (s.equals(AbundanceFileReader.HEADER)) {
                return Kind.COMPOSITION;
            }
            if (s.equals(DiskParameterReader.HEADER) || s.equals(TabulatedDiskReader.HEADER)) {
                return Kind.DISK;
            }
            if (s.startsWith(ZoneFileReader.HEADER)) {
                return Kind.ZONES;
            }
            if (s.startsWith("planet,star,")) {
                return Kind.PLANETS;
            }
            return s.startsWith("star,") ? Kind.CATALOGUE : null;
        }
        return null;
    }

    private static byte[] read(final Path file) {
        try {
            return Files.readAllBytes(file);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static byte[] resource(final String name) {
        try (InputStream in = PresetCatalogue.class.getResourceAsStream(name)) {
            return in == null ? null : in.readAllBytes();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** @return the names of the files shipped in a classpath folder (inside the jar or in target/classes) */
    private static List<String> builtInFiles(final String folder) {
        URL url = PresetCatalogue.class.getResource("/" + folder);
        if (url == null) {
            return List.of();
        }
        try {
            URI uri = url.toURI();
            if (!"jar".equals(uri.getScheme())) {
                return list(Path.of(uri));
            }
            try {
                FileSystem fs = FileSystems.newFileSystem(uri, Map.of());
                try (fs) {
                    return list(fs.getPath("/" + folder));
                }
            } catch (FileSystemAlreadyExistsException e) {
                return list(FileSystems.getFileSystem(uri).getPath("/" + folder));
            }
        } catch (URISyntaxException | IOException e) {
            throw new IllegalStateException("cannot list the built-in " + folder + ": " + e.getMessage(), e);
        }
    }

    private static List<String> list(final Path dir) throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
