package org.nebulith.thermo.audit;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * Second published enthalpies of formation of gases (bundled {@code gas-formation-reference.csv},
 * columns {@code species,H_f_298_J_per_mol,source}), for the audit's comparison.
 */
public final class GasReferences {
    /** One value. */
    public record Reference(String species, double hfJPerMol, String source) {
    }

    private final List<Reference> refs;

    private GasReferences(List<Reference> refs) {
        this.refs = List.copyOf(refs);
    }

    /** @return the bundled table */
    public static GasReferences bundled() {
        List<Reference> out = new ArrayList<>();
        try (InputStream in = GasReferences.class.getResourceAsStream("gas-formation-reference.csv");
             CSVParser p = CSVParser.parse(new InputStreamReader(in, StandardCharsets.UTF_8),
                     CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get())) {
            for (CSVRecord r : p) {
                out.add(new Reference(r.get("species"), Double.parseDouble(r.get("H_f_298_J_per_mol")), r.get("source")));
            }
        } catch (IOException ex) {
            throw new UncheckedIOException(ex);
        }
        return new GasReferences(out);
    }

    /** @param id species id @return its second value, if held */
    public Optional<Reference> find(String id) {
        return refs.stream().filter(r -> r.species().equals(id)).findFirst();
    }
}
