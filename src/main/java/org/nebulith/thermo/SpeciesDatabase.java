package org.nebulith.thermo;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

import org.nebulith.errors.InputException;

/**
 * An immutable collection of species read from one or more species files (format:
 * {@link SpeciesFileFormat}). The bundled database ({@link #bundled()}) is generated from the NASA
 * Glenn file and the mineral table by {@code org.nebulith.thermo.source.DatabaseConverter}.
 */
public final class SpeciesDatabase {
    /** Classpath location of the bundled species file. */
    public static final String BUNDLED_RESOURCE = "/org/nebulith/thermo/species.csv";

    /** Opens the bytes of a species file. */
    @FunctionalInterface
    public interface StreamOpener {
        /** @return a fresh stream of the file's bytes (UTF-8) @throws IOException on failure */
        InputStream open() throws IOException;
    }

    private static volatile SpeciesDatabase bundled;

    private final String name;
    private final List<Species> species;
    private final Map<String, Species> byId;
    private final Map<String, String> sources;

    private SpeciesDatabase(String name, List<Species> species, Map<String, String> sources) {
        this.name = name;
        this.species = List.copyOf(species);
        Map<String, Species> m = new LinkedHashMap<>();
        for (Species s : species) {
            m.put(s.id(), s);
        }
        this.byId = m;
        this.sources = Map.copyOf(sources);
    }

    /**
     * @return the database shipped with Nebulith (read once, then shared)
     * @throws InputException if the bundled file is damaged
     */
    public static SpeciesDatabase bundled() {
        SpeciesDatabase db = bundled;
        if (db == null) {
            synchronized (SpeciesDatabase.class) {
                db = bundled;
                if (db == null) {
                    db = load("species.csv (bundled)", () -> {
                        InputStream in = SpeciesDatabase.class.getResourceAsStream(BUNDLED_RESOURCE);
                        if (in == null) {
                            throw new IOException("resource " + BUNDLED_RESOURCE + " missing from the classpath");
                        }
                        return in;
                    });
                    bundled = db;
                }
            }
        }
        return db;
    }

    /**
     * Reads a species file.
     *
     * @param name   the file name as the user knows it (used in messages)
     * @param opener supplies the bytes
     * @return the database
     * @throws InputException  on any malformed content (nothing is loaded)
     * @throws UncheckedIOException if the bytes cannot be read
     */
    public static SpeciesDatabase load(String name, StreamOpener opener) {
        String text;
        try (InputStream in = opener.open()) {
            text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException ex) {
            throw new UncheckedIOException(name + ": cannot read (" + ex.getMessage() + ")", ex);
        }
        SpeciesFileReader.Result r = SpeciesFileReader.read(name, text);
        return new SpeciesDatabase(name, r.species(), r.sources());
    }

    /**
     * @param other species to add (e.g. a user file)
     * @return a database with the species of both
     * @throws InputException naming the other file if one of its ids is already present
     */
    public SpeciesDatabase plus(SpeciesDatabase other) {
        List<Species> all = new ArrayList<>(species);
        for (Species s : other.species) {
            if (byId.containsKey(s.id())) {
                throw InputException.atField(other.name, 0, "id", s.id(), "already defined in " + name, "ids that are new (rename the species, e.g. '" + s.id() + "/mine')");
            }
            all.add(s);
        }
        Map<String, String> src = new LinkedHashMap<>(sources);
        for (Map.Entry<String, String> e : other.sources.entrySet()) {
            String old = src.putIfAbsent(e.getKey(), e.getValue());
            if (old != null && !old.equals(e.getValue())) {
                throw InputException.atField(other.name, 0, "source declaration", e.getKey(),
                        "already declared in " + name + " with another citation", "a new source key");
            }
        }
        return new SpeciesDatabase(name + " + " + other.name, all, src);
    }

    /** @return the name of the file(s) read */
    public String name() {
        return name;
    }

    /** @return all species in file order, unmodifiable */
    public List<Species> species() {
        return species;
    }

    /** @param id a species id @return the species, if present */
    public Optional<Species> find(String id) {
        return Optional.ofNullable(byId.get(id));
    }

    /**
     * @param id a species id
     * @return the species
     * @throws IllegalArgumentException if there is no such species
     */
    public Species get(String id) {
        Species s = byId.get(id);
        if (s == null) {
            throw new IllegalArgumentException("no species '" + id + "' in " + name);
        }
        return s;
    }

    /** @return the declared publications: source key to citation */
    public Map<String, String> sources() {
        return sources;
    }
}
