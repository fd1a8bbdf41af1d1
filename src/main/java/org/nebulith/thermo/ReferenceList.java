package org.nebulith.thermo;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.LinkedHashSet;
import java.util.Set;

/** The condensed species of the pure-phase reference sequence (resource {@code reference-pure.txt}). */
final class ReferenceList {
    private static final String RESOURCE = "/org/nebulith/thermo/reference-pure.txt";

    private ReferenceList() {
    }

    static Set<String> condensedIds() {
        try (InputStream in = ReferenceList.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("resource " + RESOURCE + " missing from the classpath");
            }
            Set<String> ids = new LinkedHashSet<>();
            for (String l : new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\r?\n")) {
                if (!l.isBlank() && !l.startsWith("#")) {
                    ids.add(l.trim());
                }
            }
            return ids;
        } catch (IOException ex) {
            throw new UncheckedIOException(ex);
        }
    }
}
