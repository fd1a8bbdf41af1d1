package org.nebulith.thermo.source;

import java.io.IOException;
import java.io.Reader;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.nebulith.errors.InputException;

/**
 * The corrections table ({@code corrections.csv} beside the source files): published values that the
 * converter replaces while building the species file, so that the source files stay as published.
 * Columns: {@code species,field,file_value,corrected_value,source,reason}. The only field so far is
 * {@value #ENTHALPY_OF_FORMATION}: for a NASA entry every interval's integration constant b1 is shifted
 * by (corrected - file) / R (heat capacity and entropy unchanged); for a mineral row the H_f_298 parameter
 * is replaced. The file value must equal the source's value (1e-9 relative), so a correction that no
 * longer applies stops the build instead of silently shifting a changed row.
 */
public final class Corrections {
    /** The field name of the enthalpy of formation at 298.15 K [J/mol]. */
    public static final String ENTHALPY_OF_FORMATION = "H_f_298_J_per_mol";
    /** The file name in the source folder. */
    public static final String FILE = "corrections.csv";
    static final List<String> COLUMNS = List.of("species", "field", "file_value", "corrected_value", "source", "reason");

    /**
     * One correction.
     *
     * @param species        species id (NASA name or mineral id)
     * @param field          corrected field
     * @param fileValue      the value in the source file
     * @param correctedValue the value used
     * @param source         the publication of the corrected value
     * @param reason         why the file value is wrong
     * @param line           line in the corrections file (1-based)
     */
    public record Correction(String species, String field, double fileValue, double correctedValue, String source,
                             String reason, long line) {
        /** @return corrected minus file value */
        public double shift() {
            return correctedValue - fileValue;
        }
    }

    private final List<Correction> rows;

    private Corrections(List<Correction> rows) {
        this.rows = List.copyOf(rows);
    }

    /** @return an empty table */
    public static Corrections none() {
        return new Corrections(List.of());
    }

    /**
     * @param in   the table
     * @param file its name for messages
     * @return the corrections
     * @throws InputException naming line and field of anything not understood
     */
    public static Corrections read(Reader in, String file) throws IOException {
        List<Correction> out = new ArrayList<>();
        CSVFormat fmt = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get();
        try (CSVParser p = CSVParser.parse(in, fmt)) {
            if (!p.getHeaderNames().equals(COLUMNS)) {
                throw InputException.atField(file, 1, "header", String.join(",", p.getHeaderNames()), "not the header",
                        String.join(",", COLUMNS));
            }
            for (CSVRecord r : p) {
                long line = r.getRecordNumber() + 1;
                String field = r.get("field").trim();
                if (!field.equals(ENTHALPY_OF_FORMATION)) {
                    throw InputException.atField(file, line, "field", field, "cannot be corrected",
                            ENTHALPY_OF_FORMATION);
                }
                for (String c : List.of("species", "source", "reason")) {
                    if (r.get(c).isBlank()) {
                        throw InputException.atField(file, line, c, "", "empty", "a non-empty text");
                    }
                }
                out.add(new Correction(r.get("species").trim(), field, number(r, "file_value", file, line),
                        number(r, "corrected_value", file, line), r.get("source").trim(), r.get("reason").trim(), line));
            }
        }
        return new Corrections(out);
    }

    private static double number(CSVRecord r, String col, String file, long line) {
        try {
            double v = Double.parseDouble(r.get(col).trim());
            if (Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException ex) {
            // reported below
        }
        throw InputException.atField(file, line, col, r.get(col), "not a finite number", "a number in J/mol");
    }

    /** @param species a species id @return its correction of the enthalpy of formation, if any */
    public Optional<Correction> enthalpyOfFormation(String species) {
        return rows.stream().filter(c -> c.species().equals(species) && c.field().equals(ENTHALPY_OF_FORMATION))
                .findFirst();
    }

    /** @return every correction in file order */
    public List<Correction> all() {
        return rows;
    }

    /**
     * @param c         a correction
     * @param published the value found in the source
     * @param file      the corrections file name
     * @throws InputException if the source no longer holds the value the correction was written for
     */
    static void checkApplies(Correction c, double published, String file) {
        if (Math.abs(published - c.fileValue()) > 1e-9 * Math.max(1, Math.abs(published))) {
            throw InputException.atField(file, c.line(), "file_value", c.fileValue(), "the source holds "
                    + published + " for " + c.species(), "the value of the source file (or remove the correction)");
        }
    }
}
