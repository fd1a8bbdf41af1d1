package org.nebulith.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.TreeMap;
import java.util.stream.Stream;

import org.nebulith.errors.InputException;
import org.nebulith.errors.Messages;

/**
 * Finds run-settings presets. {@code --preset X} means the file X if it exists (or X contains a
 * '/' or ends in {@value #EXTENSION}); otherwise {@code X}{@value #EXTENSION} in the preset
 * folders: those listed in the environment variable {@code NEBULITH_PRESETS} (separated by the
 * platform path separator), then {@code presets/} under the working folder, then the built-in
 * copies inside the jar.
 */
public final class PresetLocator {

    /** File-name ending of run-settings presets. */
    public static final String EXTENSION = ".settings";

    private PresetLocator() {
    }

    /** @return the preset folders searched by default, in order (the built-in copies come after them) */
    public static List<Path> defaultFolders() {
        List<Path> folders = environmentFolders();
        folders.add(Path.of("presets"));
        return folders;
    }

    /** @return the folders listed in {@code NEBULITH_PRESETS} */
    public static List<Path> environmentFolders() {
        List<Path> folders = new ArrayList<>();
        String env = System.getenv("NEBULITH_PRESETS");
        if (env != null && !env.isBlank()) {
            for (String part : env.split(java.io.File.pathSeparator)) {
                if (!part.isBlank()) {
                    folders.add(Path.of(part));
                }
            }
        }
        return folders;
    }

    /**
     * @param nameOrPath the value of --preset
     * @param folders    the folders searched first
     * @return the built-in settings preset of that name, if it is a bare name found in none of the folders
     */
    public static java.util.Optional<PresetCatalogue.Entry> builtIn(final String nameOrPath, final List<Path> folders) {
        if (Files.isRegularFile(Path.of(nameOrPath)) || nameOrPath.contains("/") || nameOrPath.endsWith(EXTENSION)) {
            return java.util.Optional.empty();
        }
        for (Path folder : folders) {
            if (Files.isRegularFile(folder.resolve(nameOrPath + EXTENSION))) {
                return java.util.Optional.empty();
            }
        }
        return PresetCatalogue.builtIn(PresetCatalogue.Kind.SETTINGS, nameOrPath);
    }

    /**
     * @param nameOrPath the value of --preset
     * @param folders    the folders to search for a bare name
     * @return the preset file
     * @throws InputException if nothing is found, listing the available presets
     */
    public static Path resolve(final String nameOrPath, final List<Path> folders) {
        Path direct = Path.of(nameOrPath);
        if (Files.isRegularFile(direct) || nameOrPath.contains("/") || nameOrPath.endsWith(EXTENSION)) {
            if (!Files.isRegularFile(direct)) {
                throw new InputException(Messages.INPUT_NOT_READABLE, null, direct, "no such file");
            }
            return direct;
        }
        for (Path folder : folders) {
            Path candidate = folder.resolve(nameOrPath + EXTENSION);
            if (Files.isRegularFile(candidate)) {
                return candidate;
            }
        }
        java.util.TreeSet<String> names = new java.util.TreeSet<>(available(folders).keySet());
        PresetCatalogue.here().all().stream().filter(e -> e.kind() == PresetCatalogue.Kind.SETTINGS)
                .forEach(e -> names.add(e.name()));
        throw new InputException(Messages.UNKNOWN_PRESET, null, nameOrPath, folders,
                names.isEmpty() ? "(none)" : String.join(", ", names));
    }

    /**
     * @param folders the folders to search
     * @return preset name to file, sorted by name; an earlier folder wins over a later one
     */
    public static TreeMap<String, Path> available(final List<Path> folders) {
        TreeMap<String, Path> found = new TreeMap<>();
        for (Path folder : folders) {
            if (!Files.isDirectory(folder)) {
                continue;
            }
            try (Stream<Path> files = Files.list(folder)) {
                files.filter(f -> f.getFileName().toString().endsWith(EXTENSION) && Files.isRegularFile(f))
                        .forEach(f -> {
                            String name = f.getFileName().toString();
                            found.putIfAbsent(name.substring(0, name.length() - EXTENSION.length()), f);
                        });
            } catch (IOException e) {
                // an unreadable folder contributes nothing
            }
        }
        return found;
    }
}
