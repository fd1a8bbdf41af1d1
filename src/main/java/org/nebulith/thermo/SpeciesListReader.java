package org.nebulith.thermo;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.Reader;
import java.util.LinkedHashSet;
import java.util.Set;

import org.nebulith.errors.InputException;

/**
 * Reads a list of species ids, one per line; blank lines and lines starting with {@code #} are
 * ignored. Every id must name a species of the expected kind in the data set.
 */
public final class SpeciesListReader {
    private SpeciesListReader() {
    }

    /**
     * @param in       the list
     * @param name     the file name, for messages
     * @param dataSet  the data set the ids must belong to
     * @param gas      true for a list of gases, false for condensed species
     * @return the ids, in file order
     * @throws InputException naming file and line for an unknown id or one of the wrong kind
     * @throws IOException on read failure
     */
    public static Set<String> read(Reader in, String name, DataSet dataSet, boolean gas) throws IOException {
        Set<String> known = new LinkedHashSet<>();
        for (Species s : gas ? dataSet.gases() : dataSet.condensed()) {
            known.add(s.id());
        }
        Set<String> ids = new LinkedHashSet<>();
        try (BufferedReader br = new BufferedReader(org.nebulith.format.TextInput.withoutBom(in))) {
            int lineNo = 0;
            for (String line = br.readLine(); line != null; line = br.readLine()) {
                lineNo++;
                String id = line.trim();
                if (id.isEmpty() || id.startsWith("#")) {
                    continue;
                }
                if (!known.contains(id)) {
                    throw InputException.atField(name, lineNo, "species id", id,
                            "not a " + (gas ? "gas" : "condensed") + " species of data set " + dataSet.name(), "ids as spelled in the data set, one per line, # for comments");
                }
                ids.add(id);
            }
        }
        if (ids.isEmpty()) {
            throw InputException.atField(name, 0, "species id", "", "the list is empty",
                    "at least one species id, one per line");
        }
        return ids;
    }
}
