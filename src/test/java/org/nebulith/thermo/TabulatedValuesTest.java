package org.nebulith.thermo;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;

/**
 * Cp, S, -(G-H298)/T and H-H298 of database species against NIST-JANAF (Chase 1998) figures; the
 * source of each figure is named per row in {@code janaf-reference.csv} and in its header.
 */
class TabulatedValuesTest {
    private static final double T_REF = 298.15;

    @Test
    void speciesReproduceTabulatedFunctions() throws IOException {
        SpeciesDatabase db = SpeciesDatabase.bundled();
        List<String> failures = new ArrayList<>();
        int checked = 0;
        try (InputStream in = getClass().getResourceAsStream("janaf-reference.csv");
             CSVParser p = CSVParser.parse(new InputStreamReader(in, StandardCharsets.UTF_8),
                     CSVFormat.RFC4180.builder().setCommentMarker('#').setHeader().setSkipHeaderRecord(true).get())) {
            for (CSVRecord r : p) {
                ThermoModel m = db.get(r.get("species")).thermo();
                double t = Double.parseDouble(r.get("T_K"));
                double dh = (m.hJPerMol(t) - m.hJPerMol(T_REF)) / 1000;
                double s = m.sJPerMolK(t);
                double gef = s - dh * 1000 / t;
                String where = r.get("species") + " at " + t + " K (" + r.get("source") + ")";
                check(failures, where + " Cp", num(r, "Cp"), m.cpJPerMolK(t), num(r, "tol_Cp"));
                check(failures, where + " S", num(r, "S"), s, num(r, "tol_S"));
                check(failures, where + " -(G-H298)/T", num(r, "gef"), gef, num(r, "tol_S") + num(r, "tol_H_kJ") * 1000 / t);
                check(failures, where + " H-H298", num(r, "H_minus_H298_kJ"), dh, num(r, "tol_H_kJ"));
                checked++;
            }
        }
        assertTrue(checked >= 30, "reference rows read: " + checked);
        assertEquals(List.of(), failures);
    }

    private static double num(CSVRecord r, String col) {
        return Double.parseDouble(r.get(col));
    }

    private static void check(List<String> failures, String what, double expected, double actual, double tol) {
        if (!(Math.abs(expected - actual) <= tol)) {
            failures.add(String.format("%s: expected %.3f, got %.3f (tolerance %.3f)", what, expected, actual, tol));
        }
    }
}
